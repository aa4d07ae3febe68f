using Electrostat.Meshing.Input;
using Electrostat.Meshing.Output;

namespace Electrostat.Meshing.Designs;

/// <summary>
/// The mesher input built from a design: the planar graph with tags and seeds, and the tables that give tags and
/// region attributes their meaning.
/// </summary>
public sealed class DesignMeshInput
{
    internal DesignMeshInput(PlanarGraph graph, BoundaryTagTable tags, IReadOnlyList<MeshRegion> regions, SegmentSource[] segmentSources,
        SegmentSource[] vertexSources, IReadOnlyDictionary<int, double> expectedAreas, double areaTolerance)
    {
        Graph = graph;
        Tags = tags;
        Regions = regions;
        SegmentSources = segmentSources;
        VertexSources = vertexSources;
        ExpectedRegionAreas = expectedAreas;
        AreaToleranceSquareMetres = areaTolerance;
    }

    /// <summary>The open-space image piece, or null for a closed enclosure.</summary>
    public OpenSpaceImage? OpenSpace { get; internal init; }

    /// <summary>Segment tags the mesher must never split (the open-space circles); empty for a closed enclosure.</summary>
    public IReadOnlySet<int> ProtectedTags => OpenSpace is { } o ? new HashSet<int> { o.InteriorTag, o.ImageTag } : new HashSet<int>();

    /// <summary>The graph handed to the mesher (metres).</summary>
    public PlanarGraph Graph { get; }

    /// <summary>Meaning of every segment tag.</summary>
    public BoundaryTagTable Tags { get; }

    /// <summary>Meaning of region attributes: entry for attribute 0 (background) and j + 1 (dielectric j), for every region present.</summary>
    public IReadOnlyList<MeshRegion> Regions { get; }

    /// <summary>For each input segment of <see cref="Graph"/>, the design entity it was cut from.</summary>
    public SegmentSource[] SegmentSources { get; }

    /// <summary>For each input vertex of <see cref="Graph"/>, the design entity of one segment that ends there.</summary>
    public SegmentSource[] VertexSources { get; }

    /// <summary>Area of each region attribute from the exact design geometry (NetTopologySuite region assembly), m²; the
    /// open-space image region, when present, has the area of its chord polygon.</summary>
    public IReadOnlyDictionary<int, double> ExpectedRegionAreas { get; }

    /// <summary>Bound on the area difference between the chord-polygon outlines and the exact curves, m².</summary>
    public double AreaToleranceSquareMetres { get; }

    /// <summary>Validates a mesh of this input, including the area per region against the design within <see cref="AreaToleranceSquareMetres"/>.</summary>
    /// <param name="result">A mesh generated from <see cref="Graph"/>.</param>
    /// <returns>The validation report.</returns>
    public ValidationReport Validate(MeshResult result)
    {
        ArgumentNullException.ThrowIfNull(result);
        return result.Validate(ExpectedRegionAreas, 1e-9, AreaToleranceSquareMetres);
    }

    /// <summary>The design entity a mesh vertex lies on, or null for a vertex inside a region.</summary>
    /// <param name="result">A mesh generated from <see cref="Graph"/>.</param>
    /// <param name="vertex">Vertex index in <paramref name="result"/>.</param>
    /// <returns>The source entity or null.</returns>
    public SegmentSource? SourceOfVertex(MeshResult result, int vertex)
    {
        ArgumentNullException.ThrowIfNull(result);
        int iv = result.VertexInputVertex[vertex];
        if (iv >= 0) return VertexSources[iv];
        int s = result.VertexInputSegment[vertex];
        return s >= 0 ? SegmentSources[s] : null;
    }
}
