using Electrostat.Fem.Assembly;
using Electrostat.Fem.Problem;
using Electrostat.Fem.Solving;
using Electrostat.Fem.Tests.Support;
using static Electrostat.Fem.Tests.Support.Problems;

namespace Electrostat.Fem.Tests.Problem;

public class ProblemValidationTests
{
    private static readonly Electrostat.Meshing.TriangleMesh Square = StructuredMeshes.Rectangle(0, 1, 0, 1, 4, 4);

    private static Dictionary<int, BoundaryRole> Roles() => new()
    {
        [StructuredMeshes.Top] = On(0), [StructuredMeshes.Bottom] = Enclosure(),
        [StructuredMeshes.Left] = Natural, [StructuredMeshes.Right] = Natural,
    };

    [Fact]
    public void MissingMaterial_NamesTheRegion()
    {
        var p = Make(Square, [ConductorDefinition.Fixed("lid", 1)], Roles(), new Dictionary<int, RegionMaterial> { [5] = RegionMaterial.Vacuum });
        var ex = Assert.Throws<FieldProblemException>(() => new FieldSolver(p));
        Assert.Contains("Region 0", ex.Message);
    }

    [Fact]
    public void UnmappedTag_NamesTheTag()
    {
        var roles = Roles();
        roles.Remove(StructuredMeshes.Left);
        var ex = Assert.Throws<FieldProblemException>(() => new FieldSolver(Make(Square, [ConductorDefinition.Fixed("lid", 1)], roles)));
        Assert.Contains($"tag {StructuredMeshes.Left}", ex.Message);
    }

    [Fact]
    public void ConductorTouchingEnclosure_IsAShortCircuit()
    {
        var roles = Roles();
        roles[StructuredMeshes.Left] = Enclosure();
        var ex = Assert.Throws<FieldProblemException>(() => new FieldSolver(Make(Square, [ConductorDefinition.Fixed("lid", 1)], roles)));
        Assert.Contains("short circuit", ex.Message);
    }

    [Fact]
    public void NoReferencePotential_IsReported()
    {
        var roles = Roles();
        roles[StructuredMeshes.Bottom] = Natural;
        var solver = new FieldSolver(Make(Square, [ConductorDefinition.Floating("lid", 1e-9)], roles));
        var ex = Assert.Throws<FieldProblemException>(() => solver.Solve());
        Assert.Contains("undetermined", ex.Message);
    }

    [Fact]
    public void DetachedPiece_IsReportedWithAPlace()
    {
        // A second square far away with only natural boundaries has no reference potential.
        var lone = StructuredMeshes.Rectangle(5, 6, 0, 1, 2, 2, sideTag: (_, _, _) => 77);
        var mesh = StructuredMeshes.Union(Square, lone);
        var roles = Roles();
        roles[77] = Natural;
        var solver = new FieldSolver(Make(mesh, [ConductorDefinition.Fixed("lid", 1)], roles));
        var ex = Assert.Throws<FieldProblemException>(() => solver.Solve());
        Assert.Contains("undetermined", ex.Message);
        Assert.Contains("(5", ex.Message);
    }

    [Fact]
    public void ConductorWithoutSegments_IsReported()
    {
        var ex = Assert.Throws<FieldProblemException>(() => new FieldSolver(Make(Square, [ConductorDefinition.Fixed("lid", 1), ConductorDefinition.Fixed("ghost", 2)], Roles())));
        Assert.Contains("'ghost'", ex.Message);
    }

    [Fact]
    public void WarmStartFromTheSolution_ConvergesAtOnce()
    {
        var solver = new FieldSolver(Make(StructuredMeshes.Rectangle(0, 1, 0, 1, 40, 40), [ConductorDefinition.Fixed("lid", 1)], Roles()));
        var first = solver.Solve();
        var second = solver.Solve(first.PotentialVolts);
        Assert.True(second.Report.Converged);
        Assert.True(second.Report.Iterations <= 1, $"{second.Report.Iterations} iterations from the converged guess");
        Assert.Equal(first.PotentialVolts[100], second.PotentialVolts[100], 9);
    }
}
