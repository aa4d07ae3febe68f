namespace Electrostat.Meshing;

/// <summary>
/// An immutable-by-convention conforming triangle mesh: the mesher's output and the FEM layer's input.
/// </summary>
/// <remarks>
/// Conventions (stated once, here):
/// <list type="bullet">
/// <item>Coordinates are in metres (SI), <see cref="X"/>[i], <see cref="Y"/>[i] for vertex i.
/// For axisymmetric designs x is the radius r ≥ 0 and y is the axial coordinate z.</item>
/// <item><see cref="Triangles"/> holds three vertex indices per triangle, in counter-clockwise order
/// (positive signed area).</item>
/// <item><see cref="TriangleRegion"/> holds the region attribute of each triangle, taken from the region seed
/// that the flood fill reached it from. Holes and the exterior carry no triangles.</item>
/// <item><see cref="SegmentVertices"/> lists every constrained edge (subsegment of an input segment) of the final
/// mesh, two vertex indices per edge; <see cref="SegmentTag"/> carries the tag of the input segment it came from.
/// The meaning of a tag (conductor, enclosure, symmetry plane, interface) belongs to whoever built the input graph.</item>
/// </list>
/// Arrays are shared, not copied: callers must not mutate them.
/// </remarks>
public sealed class TriangleMesh
{
    /// <summary>Creates a mesh from its arrays (taken by reference, not copied).</summary>
    /// <param name="x">Vertex x coordinates, metres.</param>
    /// <param name="y">Vertex y coordinates, metres.</param>
    /// <param name="triangles">Three vertex indices per triangle, counter-clockwise.</param>
    /// <param name="triangleRegion">Region attribute per triangle.</param>
    /// <param name="segmentVertices">Two vertex indices per constrained edge.</param>
    /// <param name="segmentTag">Tag of the input segment each constrained edge lies on.</param>
    public TriangleMesh(double[] x, double[] y, int[] triangles, int[] triangleRegion, int[] segmentVertices, int[] segmentTag)
    {
        ArgumentNullException.ThrowIfNull(x);
        ArgumentNullException.ThrowIfNull(y);
        ArgumentNullException.ThrowIfNull(triangles);
        ArgumentNullException.ThrowIfNull(triangleRegion);
        ArgumentNullException.ThrowIfNull(segmentVertices);
        ArgumentNullException.ThrowIfNull(segmentTag);
        if (x.Length != y.Length) throw new ArgumentException("x and y must have the same length.", nameof(y));
        if (triangles.Length != 3 * triangleRegion.Length) throw new ArgumentException("triangles must hold 3 indices per region entry.", nameof(triangles));
        if (segmentVertices.Length != 2 * segmentTag.Length) throw new ArgumentException("segmentVertices must hold 2 indices per tag.", nameof(segmentVertices));
        X = x;
        Y = y;
        Triangles = triangles;
        TriangleRegion = triangleRegion;
        SegmentVertices = segmentVertices;
        SegmentTag = segmentTag;
    }

    /// <summary>Vertex x coordinates (radius r for axisymmetric designs), metres.</summary>
    public double[] X { get; }

    /// <summary>Vertex y coordinates (axial z for axisymmetric designs), metres.</summary>
    public double[] Y { get; }

    /// <summary>Three vertex indices per triangle, counter-clockwise.</summary>
    public int[] Triangles { get; }

    /// <summary>Region attribute of each triangle.</summary>
    public int[] TriangleRegion { get; }

    /// <summary>Two vertex indices per constrained (boundary or interface) edge.</summary>
    public int[] SegmentVertices { get; }

    /// <summary>Tag of the input segment that each constrained edge lies on.</summary>
    public int[] SegmentTag { get; }

    /// <summary>Number of vertices.</summary>
    public int VertexCount => X.Length;

    /// <summary>Number of triangles.</summary>
    public int TriangleCount => TriangleRegion.Length;

    /// <summary>Number of constrained edges.</summary>
    public int SegmentCount => SegmentTag.Length;

    /// <summary>
    /// Finds a triangle containing the point (x, y) and its barycentric coordinates there, by a linear scan
    /// (O(triangles): meant for a few probes, not for bulk interpolation). Points on a shared edge go to the
    /// first triangle found; a tolerance of 1e-12 in barycentric terms admits points on the boundary.
    /// </summary>
    /// <param name="x">x (or r), metres.</param>
    /// <param name="y">y (or z), metres.</param>
    /// <param name="triangle">The triangle found, or -1.</param>
    /// <param name="l0">Barycentric weight of the triangle's first vertex.</param>
    /// <param name="l1">Barycentric weight of the second vertex.</param>
    /// <param name="l2">Barycentric weight of the third vertex.</param>
    /// <returns>True when the point lies in the mesh.</returns>
    public bool TryLocate(double x, double y, out int triangle, out double l0, out double l1, out double l2)
    {
        const double tolerance = -1e-12;
        for (int t = 0; t < TriangleCount; t++)
        {
            int a = Triangles[3 * t], b = Triangles[3 * t + 1], c = Triangles[3 * t + 2];
            double x0 = X[a], y0 = Y[a];
            double d = (X[b] - x0) * (Y[c] - y0) - (X[c] - x0) * (Y[b] - y0);
            if (d == 0) continue;
            double w1 = ((x - x0) * (Y[c] - y0) - (X[c] - x0) * (y - y0)) / d;
            double w2 = ((X[b] - x0) * (y - y0) - (x - x0) * (Y[b] - y0)) / d;
            double w0 = 1 - w1 - w2;
            if (w0 < tolerance || w1 < tolerance || w2 < tolerance) continue;
            (triangle, l0, l1, l2) = (t, w0, w1, w2);
            return true;
        }
        (triangle, l0, l1, l2) = (-1, 0, 0, 0);
        return false;
    }
}
