using Electrostat.Fem.Problem;
using Electrostat.Geometry.Model;
using Electrostat.Meshing;
using Electrostat.Meshing.Designs;
using FemConductor = Electrostat.Fem.Problem.ConductorDefinition;
using FemMaterial = Electrostat.Fem.Problem.RegionMaterial;
using FemSymmetry = Electrostat.Fem.Problem.ProblemSymmetry;

namespace Electrostat.Analysis.Pipeline;

/// <summary>
/// Turns a design and a mesh of it into an <see cref="ElectrostaticProblem"/>: one terminal per electrode (touching
/// conductors that share a potential are one terminal), the enclosure at its potential, symmetry planes, the axis
/// and material interfaces natural, and one material per region attribute. A design in open space gets the Kelvin
/// open boundary of its image disc (<see cref="OpenSpaceImage"/>), with the potential at infinity equal to the
/// enclosure potential (axisymmetric; planar leaves it free).
/// </summary>
/// <remarks>
/// An electrode that touches the enclosure is part of the enclosure (held at its potential, not a terminal). An
/// electrode with no meshed surface (for example a conductor entirely inside another one) is not a terminal either;
/// <see cref="UnmeshedElectrodes"/> lists those so that the caller can warn.
/// </remarks>
public static class DesignProblemBuilder
{
    /// <summary>Builds the field problem.</summary>
    /// <param name="design">The validated design (SI units).</param>
    /// <param name="input">The mesher input built from <paramref name="design"/> (tag and region tables).</param>
    /// <param name="mesh">A mesh of <paramref name="input"/> (the latest export of the refinable mesh).</param>
    /// <returns>The problem and its maps back to the design.</returns>
    public static BuiltProblem Build(Design design, DesignMeshInput input, TriangleMesh mesh)
    {
        ArgumentNullException.ThrowIfNull(design);
        ArgumentNullException.ThrowIfNull(input);
        ArgumentNullException.ThrowIfNull(mesh);
        var meshed = MeshedElectrodes(design, input.Tags);
        var terminalOf = new int[design.Electrodes.Count];
        Array.Fill(terminalOf, -1);
        var conductors = new List<FemConductor>();
        var terminalElectrodes = new List<int>();
        foreach (var e in design.Electrodes)
        {
            if (e.TouchesEnclosure || !meshed.Contains(e.Index)) continue;
            terminalOf[e.Index] = conductors.Count;
            terminalElectrodes.Add(e.Index);
            conductors.Add(e.PotentialVolts is double v
                ? FemConductor.Fixed(e.Name, v)
                : FemConductor.Floating(e.Name, e.ChargeCoulombs ?? 0));
        }
        var boundaries = new Dictionary<int, BoundaryRole>();
        var enclosure = new EnclosureBoundary(design.Enclosure.PotentialVolts);
        foreach (var t in input.Tags.Tags)
        {
            // The open-space circles get no role: the Kelvin map joins them (see KelvinOpenBoundary).
            if (t.Kind is BoundaryKind.OpenBoundary or BoundaryKind.OpenBoundaryImage) continue;
            boundaries[t.Tag] = t.Kind switch
            {
                BoundaryKind.Conductor => terminalOf[t.ElectrodeIndex] >= 0 ? new ConductorBoundary(terminalOf[t.ElectrodeIndex]) : enclosure,
                BoundaryKind.Enclosure => enclosure,
                _ => new NaturalBoundary(),
            };
        }
        var materials = new Dictionary<int, FemMaterial>();
        foreach (var r in input.Regions) materials[r.Attribute] = FemMaterial.Dielectric(r.Material.RelativePermittivity);
        KelvinOpenBoundary? open = null;
        if (input.OpenSpace is { } o)
        {
            materials[o.ImageRegion] = FemMaterial.Dielectric(o.Material.RelativePermittivity);
            open = new KelvinOpenBoundary(o.InteriorTag, o.ImageTag, o.ImageRegion, o.RadiusMetres, o.CenterX, o.CenterY,
                o.ImageCenterX, o.ImageCenterY, design.Enclosure.PotentialVolts);
        }
        var problem = new ElectrostaticProblem
        {
            Mesh = mesh,
            Symmetry = design.Symmetry == Electrostat.Geometry.Model.Symmetry.Axisymmetric ? FemSymmetry.Axisymmetric : FemSymmetry.Planar,
            DepthMetres = design.DepthMetres,
            Materials = materials,
            Conductors = conductors,
            Boundaries = boundaries,
            OpenBoundary = open,
        };
        return new BuiltProblem(problem, terminalElectrodes, input.Regions, input.Tags);
    }

    /// <summary>Electrodes that have no meshed surface (not terminals of the problem), by index into <c>Design.Electrodes</c>.</summary>
    /// <param name="design">The design.</param>
    /// <param name="tags">The tag table of its mesh input.</param>
    /// <returns>Indices of electrodes without a conductor tag.</returns>
    public static IReadOnlyList<int> UnmeshedElectrodes(Design design, BoundaryTagTable tags)
    {
        ArgumentNullException.ThrowIfNull(design);
        ArgumentNullException.ThrowIfNull(tags);
        var meshed = MeshedElectrodes(design, tags);
        return design.Electrodes.Where(e => !e.TouchesEnclosure && !meshed.Contains(e.Index)).Select(e => e.Index).ToArray();
    }

    private static HashSet<int> MeshedElectrodes(Design design, BoundaryTagTable tags) =>
        tags.OfKind(BoundaryKind.Conductor).Select(t => t.ElectrodeIndex).Where(i => i >= 0 && i < design.Electrodes.Count).ToHashSet();
}
