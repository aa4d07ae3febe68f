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
        // Angles are binned by their cosines against the cosines of the bin edges (cos falls as the angle grows), so
        // no trigonometric call is needed per triangle; only triangles below the bound get their angle computed.
        Span<double> edgeCos = stackalloc double[17];
        for (int k = 0; k < 17; k++) edgeCos[k] = Math.Cos((k + 1) * 10 * Math.PI / 180);
        double boundCos = Math.Cos(boundDegrees * Math.PI / 180);
        var hist = new int[18];
        double maxCos = -1, minCos = 1;
        int belowCount = 0;
        var x = mesh.X;
        var y = mesh.Y;
        var tri = mesh.Triangles;
        Span<double> ang = stackalloc double[3];
        for (int t = 0; t < mesh.TriangleCount; t++)
        {
            int a = tri[3 * t], b = tri[3 * t + 1], c = tri[3 * t + 2];
            double abx = x[b] - x[a], aby = y[b] - y[a];
            double acx = x[c] - x[a], acy = y[c] - y[a];
            double bcx = x[c] - x[b], bcy = y[c] - y[b];
            double lab = Math.Sqrt(abx * abx + aby * aby), lac = Math.Sqrt(acx * acx + acy * acy), lbc = Math.Sqrt(bcx * bcx + bcy * bcy);
            double cosA = (abx * acx + aby * acy) / (lab * lac);
            double cosB = -(abx * bcx + aby * bcy) / (lab * lbc);
            double cosC = (acx * bcx + acy * bcy) / (lac * lbc);
            double hi = Math.Max(cosA, Math.Max(cosB, cosC));
            double lo = Math.Min(cosA, Math.Min(cosB, cosC));
            if (hi > maxCos) maxCos = hi;
            if (lo < minCos) minCos = lo;
            hist[Bin(cosA, edgeCos)]++;
            hist[Bin(cosB, edgeCos)]++;
            hist[Bin(cosC, edgeCos)]++;
            if (hi > boundCos)
            {
                TriangleAngles(mesh, t, ang);
                double minAngle = Math.Min(ang[0], Math.Min(ang[1], ang[2]));
                if (minAngle < boundDegrees)
                {
                    belowCount++;
                    below?.Add((t, minAngle));
                }
            }
        }
        double minA = Math.Acos(Math.Clamp(maxCos, -1, 1)) * (180 / Math.PI);
        double maxA = Math.Acos(Math.Clamp(minCos, -1, 1)) * (180 / Math.PI);
        if (mesh.TriangleCount == 0) minA = maxA = 0;
        return new MeshQuality(mesh.TriangleCount, mesh.VertexCount, minA, maxA, hist, belowCount);
    }

    private static int Bin(double cos, ReadOnlySpan<double> edgeCos)
    {
        int k = 0;
        while (k < 17 && cos <= edgeCos[k]) k++;
        return k;
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
