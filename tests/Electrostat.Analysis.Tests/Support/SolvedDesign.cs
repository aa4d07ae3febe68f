using Electrostat.Fem.Problem;
using Electrostat.Fem.Solving;
using Electrostat.Geometry.Loading;
using Electrostat.Geometry.Model;
using Electrostat.Meshing;
using Electrostat.Meshing.Designs;

namespace Electrostat.Analysis.Tests.Support;

/// <summary>Loads a design from text, meshes it with the project mesher and solves it with the FEM layer (test helper).</summary>
internal static class SolvedDesign
{
    public static Design Load(string json)
    {
        var r = DesignLoader.LoadFromText(json);
        Assert.False(r.HasErrors, string.Join("\n", r.Errors.Select(e => e.ToString())));
        return r.Design!;
    }

    public static AnalysisContext Solve(string json, MeshOptions? options = null) => Solve(Load(json), options);

    public static AnalysisContext Solve(Design design, MeshOptions? options = null)
    {
        var (input, result) = DesignMesher.Generate(design, options);
        var problem = BuildProblem(design, input, result.Mesh);
        var solution = new FieldSolver(problem).Solve();
        return new AnalysisContext(design, input, solution);
    }

    /// <summary>One terminal per electrode with a meshed surface; electrodes touching the wall belong to the wall.</summary>
    public static ElectrostaticProblem BuildProblem(Design design, DesignMeshInput input, TriangleMesh mesh)
    {
        var terminals = new List<ConductorDefinition>();
        var terminalOfElectrode = new Dictionary<int, int>();
        var boundaries = new Dictionary<int, BoundaryRole>();
        foreach (var tag in input.Tags.Tags)
        {
            switch (tag.Kind)
            {
                case BoundaryKind.Conductor:
                    var electrode = design.Electrodes[tag.ElectrodeIndex];
                    if (electrode.TouchesEnclosure)
                    {
                        boundaries[tag.Tag] = new EnclosureBoundary(design.Enclosure.PotentialVolts);
                        break;
                    }
                    if (!terminalOfElectrode.TryGetValue(electrode.Index, out int k))
                    {
                        k = terminals.Count;
                        terminalOfElectrode[electrode.Index] = k;
                        terminals.Add(electrode.PotentialVolts is double v
                            ? ConductorDefinition.Fixed(electrode.Name, v)
                            : ConductorDefinition.Floating(electrode.Name, electrode.ChargeCoulombs ?? 0));
                    }
                    boundaries[tag.Tag] = new ConductorBoundary(k);
                    break;
                case BoundaryKind.Enclosure:
                    boundaries[tag.Tag] = new EnclosureBoundary(design.Enclosure.PotentialVolts);
                    break;
                default:
                    boundaries[tag.Tag] = new NaturalBoundary();
                    break;
            }
        }
        return new ElectrostaticProblem
        {
            Mesh = mesh,
            Symmetry = design.Symmetry == Symmetry.Axisymmetric ? ProblemSymmetry.Axisymmetric : ProblemSymmetry.Planar,
            DepthMetres = design.DepthMetres,
            Materials = input.Regions.ToDictionary(r => r.Attribute, r => RegionMaterial.Dielectric(r.Material.RelativePermittivity)),
            Conductors = terminals,
            Boundaries = boundaries,
        };
    }
}
