using Electrostat.Analysis.Adaptivity;

namespace Electrostat.Analysis.Tests.Adaptivity;

public class ErrorEstimateTests
{
    [Fact]
    public void GeometricSequence_ExtrapolatesToItsLimit()
    {
        // q_k = 1 + 0.1·0.5^k: Richardson extrapolation with the observed ratio recovers the limit 1 exactly
        // (Richardson, Phil. Trans. R. Soc. A 210, 1911: the deferred approach to the limit).
        var q = Enumerable.Range(0, 4).Select(k => 1 + 0.1 * Math.Pow(0.5, k)).ToList();
        var e = ErrorEstimate.FromSequence(q);
        Assert.Equal("richardson", e.Method);
        Assert.Equal(1.0, e.Extrapolated, 12);
        double trueError = Math.Abs(q[^1] - 1) / q[^1];
        Assert.True(e.RelativeError >= trueError);
    }

    [Fact]
    public void NonMonotoneSequence_FallsBackToThreeTimesLastChange()
    {
        var e = ErrorEstimate.FromSequence([1.0, 1.02, 1.01]);
        Assert.Equal("last-change", e.Method);
        Assert.Equal(3 * 0.01 / 1.01, e.RelativeError, 12);
    }

    [Fact]
    public void SingleValue_HasNoEstimate()
    {
        var e = ErrorEstimate.FromSequence([2.0]);
        Assert.Equal("none", e.Method);
        Assert.True(double.IsNaN(e.RelativeError));
    }
}
