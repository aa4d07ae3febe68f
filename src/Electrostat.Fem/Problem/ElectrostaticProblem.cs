using Electrostat.Meshing;

namespace Electrostat.Fem.Problem;

/// <summary>
/// A complete electrostatic field problem on a triangle mesh, independent of the design file: geometry, symmetry,
/// materials per region attribute, the conductors, the role of every segment tag and an optional open boundary.
/// </summary>
/// <remarks>
/// The mapping is explicit: <see cref="Materials"/> must name every region attribute that occurs in the mesh, and
/// <see cref="Boundaries"/> every segment tag (the arc tags of <see cref="OpenBoundary"/> excepted). See
/// <see cref="ProblemSymmetry"/> for units of the results, <see cref="RegionMaterial"/> for the sign of charge.
/// </remarks>
public sealed record ElectrostaticProblem
{
    /// <summary>The mesh (metres; x = r, y = z when axisymmetric).</summary>
    public required TriangleMesh Mesh { get; init; }

    /// <summary>Planar (per metre) or axisymmetric (totals).</summary>
    public ProblemSymmetry Symmetry { get; init; } = ProblemSymmetry.Planar;

    /// <summary>Depth of a planar device, metres, used only to turn per-metre results into totals.</summary>
    public double DepthMetres { get; init; } = 1.0;

    /// <summary>Material of each region attribute.</summary>
    public required IReadOnlyDictionary<int, RegionMaterial> Materials { get; init; }

    /// <summary>The conductors (terminals), indexed by <see cref="ConductorBoundary.ConductorIndex"/>.</summary>
    public required IReadOnlyList<ConductorDefinition> Conductors { get; init; }

    /// <summary>Role of each segment tag.</summary>
    public required IReadOnlyDictionary<int, BoundaryRole> Boundaries { get; init; }

    /// <summary>Optional open outer boundary (Kelvin transformation); null for a closed enclosure.</summary>
    public KelvinOpenBoundary? OpenBoundary { get; init; }
}
