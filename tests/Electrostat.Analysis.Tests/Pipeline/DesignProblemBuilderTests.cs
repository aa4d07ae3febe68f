using Electrostat.Analysis.Pipeline;
using Electrostat.Analysis.Tests.Adaptivity;
using Electrostat.Fem.Problem;
using Electrostat.Fem.Solving;
using Electrostat.Geometry.Loading;
using Electrostat.Meshing.Designs;

namespace Electrostat.Analysis.Tests.Pipeline;

public class DesignProblemBuilderTests
{
    [Fact]
    public void Sensor_OneTerminalPerConductor_FloatingFingerKeepsItsCharge()
    {
        var design = AdaptiveTestSupport.Load("geometries/capacitive-sensor-pcb.json");
        var (input, result) = DesignMesher.Generate(design);
        var built = DesignProblemBuilder.Build(design, input, result.Mesh);
        Assert.Equal(["pad_left", "pad_center", "pad_right", "ground_plane", "finger"], built.Problem.Conductors.Select(c => c.Name));
        Assert.True(built.Problem.Conductors[4].IsFloating);
        Assert.Equal(3.3, built.Problem.Conductors[0].PotentialVolts);
        Assert.Equal(ProblemSymmetry.Planar, built.Problem.Symmetry);
        Assert.Equal(0.01, built.Problem.DepthMetres, 12);
    }

    [Fact]
    public void ConductorTouchingTheEnclosure_BecomesPartOfIt()
    {
        var design = AdaptiveTestSupport.Load("geometries/feedthrough-axisymmetric.json");
        var (input, result) = DesignMesher.Generate(design);
        var built = DesignProblemBuilder.Build(design, input, result.Mesh);
        Assert.DoesNotContain(built.Problem.Conductors, c => c.Name == "flange");
        int flangeTag = input.Tags.ConductorTag(1)!.Value;
        Assert.IsType<EnclosureBoundary>(built.Problem.Boundaries[flangeTag]);
    }

    [Fact]
    public void TouchingConductorsAtOnePotential_AreOneTerminal()
    {
        // Two overlapping bars at 5 V form one electrode (Design convention); the builder must give one terminal.
        const string json = """
        {
          "units": "mm", "symmetry": "planar",
          "materials": { "gas": { "relative_permittivity": 1 } }, "background": "gas",
          "enclosure": { "shape": { "type": "rectangle", "min": [-20, -20], "max": [20, 20] }, "potential": 0 },
          "conductors": [
            { "name": "a", "potential": 5, "shape": { "type": "rectangle", "min": [-5, -1], "max": [1, 1] } },
            { "name": "b", "potential": 5, "shape": { "type": "rectangle", "min": [0, -1], "max": [5, 1] } }
          ]
        }
        """;
        var loaded = DesignLoader.LoadFromText(json);
        Assert.False(loaded.HasErrors, string.Join("\n", loaded.Errors));
        var design = loaded.Design!;
        var (input, result) = DesignMesher.Generate(design);
        var built = DesignProblemBuilder.Build(design, input, result.Mesh);
        Assert.Single(built.Problem.Conductors);
        var solution = new FieldSolver(built.Problem).Solve();
        Assert.True(solution.Report.Converged);
        Assert.Equal(5.0, solution.Conductors[0].PotentialVolts);
    }
}
