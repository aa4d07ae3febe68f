using Electrostat.Meshing.Input;

namespace Electrostat.Meshing.Output;

/// <summary>
/// A generated mesh with its provenance and quality: the <see cref="TriangleMesh"/> contract, maps back to the input
/// graph, quality statistics and the triangles left below the angle bound.
/// </summary>
public sealed class MeshResult
{
    private readonly Func<string?> _topologyCheck;

    internal MeshResult(TriangleMesh mesh, PlanarGraph graph, MeshOptions options, int[] vertexInputVertex, int[] vertexInputSegment,
        int[] segmentInputSegment, IReadOnlyList<SkippedTriangle> skipped, MeshQuality quality, Func<string?> topologyCheck)
    {
        Mesh = mesh;
        Graph = graph;
        Options = options;
        VertexInputVertex = vertexInputVertex;
        VertexInputSegment = vertexInputSegment;
        SegmentInputSegment = segmentInputSegment;
        SkippedTriangles = skipped;
        Quality = quality;
        _topologyCheck = topologyCheck;
    }

    /// <summary>The mesh (vertices in metres, CCW triangles, regions, tagged constrained edges).</summary>
    public TriangleMesh Mesh { get; }

    /// <summary>The input graph the mesh was built from.</summary>
    public PlanarGraph Graph { get; }

    /// <summary>The options used.</summary>
    public MeshOptions Options { get; }

    /// <summary>For each mesh vertex, the index of the input vertex it is, or -1 for a Steiner point.</summary>
    public int[] VertexInputVertex { get; }

    /// <summary>For each mesh vertex, the index of the input segment it was inserted on (Steiner point on a segment), or -1.
    /// Input vertices report -1 here; use <see cref="VertexInputVertex"/> for them.</summary>
    public int[] VertexInputSegment { get; }

    /// <summary>For each constrained edge of <see cref="Mesh"/>, the index of the input segment it lies on.</summary>
    public int[] SegmentInputSegment { get; }

    /// <summary>Triangles left below the minimum-angle bound, with the reason.</summary>
    public IReadOnlyList<SkippedTriangle> SkippedTriangles { get; }

    /// <summary>Quality statistics.</summary>
    public MeshQuality Quality { get; }

    /// <summary>
    /// Checks every mesh invariant (see <see cref="MeshValidator"/>) and the internal topology of the refinable mesh it
    /// came from (unless that mesh has been refined since this export); optionally compares area per region attribute.
    /// </summary>
    /// <param name="expectedRegionAreas">Expected area per region attribute, m²; null to skip the area check.</param>
    /// <param name="areaRelativeTolerance">Relative tolerance for the area check.</param>
    /// <param name="areaAbsoluteToleranceSquareMetres">Absolute tolerance for the area check, m² (the larger of the two applies).</param>
    /// <returns>The report; <see cref="ValidationReport.IsValid"/> is true when all invariants hold.</returns>
    public ValidationReport Validate(IReadOnlyDictionary<int, double>? expectedRegionAreas = null, double areaRelativeTolerance = 1e-9, double areaAbsoluteToleranceSquareMetres = 0) =>
        MeshValidator.Validate(this, expectedRegionAreas, areaRelativeTolerance, areaAbsoluteToleranceSquareMetres, _topologyCheck());
}
