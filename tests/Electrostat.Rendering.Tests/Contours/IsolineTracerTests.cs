using Electrostat.Rendering.Contours;

namespace Electrostat.Rendering.Tests.Contours;

public class IsolineTracerTests
{
    [Fact]
    public void LinearTriangle_LevelLineJoinsTheExactEdgeCrossings()
    {
        // φ = 3x + y on the triangle (0,0), (1,0), (0,1): values 0, 3, 1. The level 1.5 crosses edge (0,0)-(1,0) at
        // x = 0.5 and edge (1,0)-(0,1) where 3(1−s) + s = 1.5, s = 0.75, i.e. (0.25, 0.75).
        var segs = IsolineTracer.Trace([0, 1, 0], [0, 0, 1], [0, 1, 2], [0, 3, 1], [1.5]);
        var s = Assert.Single(segs);
        var pts = new[] { (s.X0, s.Y0), (s.X1, s.Y1) }.OrderBy(p => p.Item1).ToArray();
        Assert.Equal(0.25, pts[0].Item1, 12);
        Assert.Equal(0.75, pts[0].Item2, 12);
        Assert.Equal(0.5, pts[1].Item1, 12);
        Assert.Equal(0.0, pts[1].Item2, 12);
        // Every point of the segment is on the level: 3x + y = 1.5.
        Assert.Equal(1.5, 3 * s.X0 + s.Y0, 12);
        Assert.Equal(1.5, 3 * s.X1 + s.Y1, 12);
    }

    [Fact]
    public void LevelOutsideTheRange_OrThroughAVertexOnly_GivesNoDegenerateSegment()
    {
        Assert.Empty(IsolineTracer.Trace([0, 1, 0], [0, 0, 1], [0, 1, 2], [0, 3, 1], [5]));
        // The level equals the lowest vertex value: that vertex counts as above, so no crossing at all.
        Assert.Empty(IsolineTracer.Trace([0, 1, 0], [0, 0, 1], [0, 1, 2], [0, 3, 1], [0]));
    }

    [Fact]
    public void RoundSteps_AreOneTwoOrFiveTimesAPowerOfTen()
    {
        Assert.Equal(1000, RoundSteps.Step(10_000, 10), 9);
        Assert.Equal(0.2, RoundSteps.Step(1.7, 10), 12);
        Assert.Equal(50, RoundSteps.Step(430, 10), 9);
        Assert.Equal([-500.0, 0, 500], RoundSteps.Inside(-1000, 1000, 4));
    }
}
