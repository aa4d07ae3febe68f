using Electrostat.Analysis.Recovery;
using Electrostat.Fem.Problem;
using Electrostat.Fem.Solving;
using Electrostat.Geometry.Model;
using Electrostat.Meshing;
using Electrostat.Meshing.Designs;

namespace Electrostat.Analysis;

/// <summary>
/// Everything the analysis functions read: the design (exact shapes, materials, checks), the meaning of the mesh's
/// segment tags and region attributes, and the solved field. Immutable; derived tables (adjacency, recovered field)
/// are built once on first use.
/// </summary>
/// <remarks>
/// Conventions: SI units throughout (metres, volts, V/m, F/m). Design conductor k is <c>Design.Conductors[k]</c>;
/// the tags of <see cref="Tags"/> name design conductors, and the FEM conductor behind a tag is found through
/// <see cref="ElectrostaticProblem.Boundaries"/>, so the analysis does not depend on how the problem builder numbered
/// its terminals. Triangles whose region attribute has no entry in <see cref="Regions"/> (e.g. the image disk of an
/// open boundary) are ignored by the material-based analyses (hot spots, margins, profiles).
/// </remarks>
public sealed class AnalysisContext
{
    private readonly Lazy<MeshTopology> _topology;
    private readonly Lazy<RecoveredField> _recovered;
    private readonly Dictionary<int, MeshRegion> _regions;

    /// <summary>Creates the context.</summary>
    /// <param name="design">The design that was meshed and solved.</param>
    /// <param name="tags">Meaning of the mesh's segment tags (from <see cref="DesignMeshInput.Tags"/>).</param>
    /// <param name="regions">Meaning of the region attributes (from <see cref="DesignMeshInput.Regions"/>).</param>
    /// <param name="solution">The solved field on the mesh built from <paramref name="design"/>.</param>
    public AnalysisContext(Design design, BoundaryTagTable tags, IReadOnlyList<MeshRegion> regions, FieldSolution solution)
    {
        ArgumentNullException.ThrowIfNull(design);
        ArgumentNullException.ThrowIfNull(tags);
        ArgumentNullException.ThrowIfNull(regions);
        ArgumentNullException.ThrowIfNull(solution);
        Design = design;
        Tags = tags;
        Solution = solution;
        _regions = regions.ToDictionary(r => r.Attribute);
        _topology = new Lazy<MeshTopology>(() => new MeshTopology(solution.Mesh, tags));
        _recovered = new Lazy<RecoveredField>(() => FieldRecovery.Recover(solution));
    }

    /// <summary>Creates the context from the mesher input tables of the design.</summary>
    /// <param name="design">The design.</param>
    /// <param name="meshInput">The mesher input built from it (tags and regions).</param>
    /// <param name="solution">The solved field.</param>
    public AnalysisContext(Design design, DesignMeshInput meshInput, FieldSolution solution)
        : this(design, (meshInput ?? throw new ArgumentNullException(nameof(meshInput))).Tags, meshInput.Regions, solution)
    {
    }

    /// <summary>The design.</summary>
    public Design Design { get; }

    /// <summary>Meaning of the segment tags.</summary>
    public BoundaryTagTable Tags { get; }

    /// <summary>The solved field.</summary>
    public FieldSolution Solution { get; }

    /// <summary>Meaning of the region attributes, by attribute.</summary>
    public IReadOnlyDictionary<int, MeshRegion> Regions => _regions;

    /// <summary>The mesh (metres).</summary>
    public TriangleMesh Mesh => Solution.Mesh;

    /// <summary>The recovered (nodal, per material) field and the error indicator, computed on first use.</summary>
    public RecoveredField Recovered => _recovered.Value;

    internal MeshTopology Topology => _topology.Value;

    /// <summary>The design material of a region attribute, or null when the attribute is not a design region.</summary>
    /// <param name="regionAttribute">Region attribute of a triangle.</param>
    public Geometry.Model.Material? MaterialOfRegion(int regionAttribute) =>
        _regions.TryGetValue(regionAttribute, out var r) ? r.Material : null;

    /// <summary>Absolute permittivity of a region (isotropic part, εr·ε0 with εr the mean of the tensor's diagonal), F/m.</summary>
    /// <param name="regionAttribute">Region attribute of a triangle.</param>
    public double PermittivityOfRegion(int regionAttribute)
    {
        var t = Solution.Problem.Materials[regionAttribute].Permittivity;
        return 0.5 * (t.Xx + t.Yy) * Fem.Elements.PhysicalConstants.VacuumPermittivity;
    }

    /// <summary>
    /// Potential of design conductor <paramref name="conductorIndex"/>, volts: from the solution (so floating
    /// conductors get their computed potential), or the design value when the conductor has no meshed surface.
    /// NaN for a floating conductor that was not solved.
    /// </summary>
    /// <param name="conductorIndex">Index into <c>Design.Conductors</c>.</param>
    public double ConductorPotentialVolts(int conductorIndex)
    {
        int? tag = Tags.ConductorTag(conductorIndex);
        if (tag is int t && Solution.Problem.Boundaries.TryGetValue(t, out var role))
        {
            if (role is ConductorBoundary cb) return Solution.Conductors[cb.ConductorIndex].PotentialVolts;
            if (role is EnclosureBoundary eb) return eb.PotentialVolts;
        }
        return Design.Conductors[conductorIndex].PotentialVolts ?? double.NaN;
    }

    /// <summary>Potential of the enclosure wall, volts.</summary>
    public double EnclosurePotentialVolts => Design.Enclosure.PotentialVolts;
}
