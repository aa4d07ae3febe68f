using Electrostat.Analysis.Adaptivity;

namespace Electrostat.Analysis.Tests.Adaptivity;

public class BudgetStopTests
{
    [Fact]
    public void TinyBudget_StopsNotConverged_AndSaysSo()
    {
        var design = AdaptiveTestSupport.Load("geometries/hv-electrode-over-plate.json");
        var result = AdaptiveTestSupport.Adapt(design, new AdaptiveOptions { MaxTriangles = 40000, RelativeTolerance = 1e-6 });
        Assert.False(result.Converged);
        Assert.StartsWith("not converged", result.StopReason, StringComparison.Ordinal);
        Assert.All(result.Levels, l => Assert.True(l.Triangles <= 40000, $"level {l.Index} has {l.Triangles} triangles"));
        Assert.True(result.Levels.Count >= 2, string.Join(", ", result.Levels.Select(l => l.Triangles)));
        Assert.All(result.PeakErrors.Values, e => Assert.True(e.RelativeError > 0));
    }
}
