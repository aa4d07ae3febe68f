using Electrostat.Meshing;

namespace Electrostat.Rendering.Report;

/// <summary>Size and quality figures of a mesh for the report.</summary>
/// <param name="Vertices">Vertex count.</param>
/// <param name="Triangles">Triangle count.</param>
/// <param name="MinAngleDegrees">Smallest interior angle, degrees.</param>
/// <param name="BelowTwentyDegrees">Triangles with an angle below 20 degrees.</param>
/// <param name="MinEdgeMetres">Shortest edge, metres.</param>
/// <param name="MaxEdgeMetres">Longest edge, metres.</param>
public sealed record MeshStatistics(int Vertices, int Triangles, double MinAngleDegrees, int BelowTwentyDegrees, double MinEdgeMetres, double MaxEdgeMetres)
{
    /// <summary>Measures a mesh.</summary>
    /// <param name="mesh">The mesh.</param>
    public static MeshStatistics Of(TriangleMesh mesh)
    {
        ArgumentNullException.ThrowIfNull(mesh);
        double minAngle = 180, minEdge = double.MaxValue, maxEdge = 0;
        int below = 0;
        Span<double> len2 = stackalloc double[3];
        for (int t = 0; t < mesh.TriangleCount; t++)
        {
            for (int i = 0; i < 3; i++)
            {
                int a = mesh.Triangles[3 * t + (i + 1) % 3], b = mesh.Triangles[3 * t + (i + 2) % 3];
                double dx = mesh.X[b] - mesh.X[a], dy = mesh.Y[b] - mesh.Y[a];
                len2[i] = dx * dx + dy * dy;
            }
            double tMin = 180;
            for (int i = 0; i < 3; i++)
            {
                // Law of cosines for the angle opposite edge i.
                double o = len2[i], p = len2[(i + 1) % 3], q = len2[(i + 2) % 3];
                double cos = (p + q - o) / (2 * Math.Sqrt(p * q));
                tMin = Math.Min(tMin, Math.Acos(Math.Clamp(cos, -1, 1)) * 180 / Math.PI);
                double l = Math.Sqrt(o);
                minEdge = Math.Min(minEdge, l);
                maxEdge = Math.Max(maxEdge, l);
            }
            minAngle = Math.Min(minAngle, tMin);
            if (tMin < 20) below++;
        }
        return new MeshStatistics(mesh.VertexCount, mesh.TriangleCount, mesh.TriangleCount > 0 ? minAngle : double.NaN, below,
            mesh.TriangleCount > 0 ? minEdge : double.NaN, maxEdge);
    }
}
