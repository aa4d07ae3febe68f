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
}
