namespace Electrostat.Meshing.Output;

/// <summary>Quality statistics of a mesh. Angles in degrees.</summary>
/// <param name="TriangleCount">Number of triangles.</param>
/// <param name="VertexCount">Number of vertices.</param>
/// <param name="MinAngleDegrees">Smallest angle of any triangle.</param>
/// <param name="MaxAngleDegrees">Largest angle of any triangle.</param>
/// <param name="AngleHistogram">Counts of all triangle angles (three per triangle) in 10° bins: bin k holds angles in [10k, 10k+10).</param>
/// <param name="BelowBoundCount">Triangles whose smallest angle is below the requested bound (all of them are listed in <see cref="MeshResult.SkippedTriangles"/>).</param>
public sealed record MeshQuality(int TriangleCount, int VertexCount, double MinAngleDegrees, double MaxAngleDegrees, int[] AngleHistogram, int BelowBoundCount)
{
    /// <summary>Computes the statistics of a mesh.</summary>
    /// <param name="mesh">The mesh.</param>
    /// <param name="boundDegrees">The minimum-angle bound to count against.</param>
    /// <returns>The statistics.</returns>
    public static MeshQuality Of(TriangleMesh mesh, double boundDegrees) => Of(mesh, boundDegrees, null);

    /// <summary>Computes the statistics and, if <paramref name="below"/> is given, lists the triangles below the bound with their smallest angle.</summary>
    internal static MeshQuality Of(TriangleMesh mesh, double boundDegrees, List<(int Triangle, double MinAngle)>? below)
    {
        ArgumentNullException.ThrowIfNull(mesh);
        var hist = new int[18];
        double minA = 180, maxA = 0;
        int belowCount = 0;
        Span<double> ang = stackalloc double[3];
        for (int t = 0; t < mesh.TriangleCount; t++)
        {
            TriangleAngles(mesh, t, ang);
            double lo = Math.Min(ang[0], Math.Min(ang[1], ang[2]));
            double hi = Math.Max(ang[0], Math.Max(ang[1], ang[2]));
            minA = Math.Min(minA, lo);
            maxA = Math.Max(maxA, hi);
            if (lo < boundDegrees)
            {
                belowCount++;
                below?.Add((t, lo));
            }
            for (int k = 0; k < 3; k++) hist[Math.Clamp((int)(ang[k] / 10), 0, 17)]++;
        }
        if (mesh.TriangleCount == 0) minA = maxA = 0;
        return new MeshQuality(mesh.TriangleCount, mesh.VertexCount, minA, maxA, hist, belowCount);
    }

    /// <summary>The three angles of triangle t, degrees (angle k at vertex k).</summary>
    /// <param name="mesh">The mesh.</param>
    /// <param name="t">Triangle index.</param>
    /// <param name="angles">Receives three angles.</param>
    public static void TriangleAngles(TriangleMesh mesh, int t, Span<double> angles)
    {
        ArgumentNullException.ThrowIfNull(mesh);
        int a = mesh.Triangles[3 * t], b = mesh.Triangles[3 * t + 1], c = mesh.Triangles[3 * t + 2];
        double abx = mesh.X[b] - mesh.X[a], aby = mesh.Y[b] - mesh.Y[a];
        double acx = mesh.X[c] - mesh.X[a], acy = mesh.Y[c] - mesh.Y[a];
        double bcx = mesh.X[c] - mesh.X[b], bcy = mesh.Y[c] - mesh.Y[b];
        double cross = Math.Abs(abx * acy - aby * acx);
        // atan2(|cross|, dot) is accurate for all angles, unlike acos of a normalised dot product.
        angles[0] = Math.Atan2(cross, abx * acx + aby * acy) * (180 / Math.PI);
        angles[1] = Math.Atan2(cross, -(abx * bcx + aby * bcy)) * (180 / Math.PI);
        angles[2] = 180 - angles[0] - angles[1];
    }
}
