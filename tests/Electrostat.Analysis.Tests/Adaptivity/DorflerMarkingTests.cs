using Electrostat.Analysis.Adaptivity;

namespace Electrostat.Analysis.Tests.Adaptivity;

public class DorflerMarkingTests
{
    // Dörfler (SIAM J. Numer. Anal. 33:1106, 1996): the marked set is the smallest one, by decreasing indicator, whose
    // indicators sum to at least θ times the total.
    [Fact]
    public void Marks_SmallestSetReachingTheta()
    {
        double[] eta2 = [1, 10, 3, 6];
        var marked = DorflerMarking.Mark(eta2, 0.7, 0, int.MaxValue);
        Assert.Equal([1, 3], marked); // 10 + 6 = 16 ≥ 0.7·20 = 14; 10 alone is not
    }

    [Fact]
    public void Marks_AtLeastMinimumAndAtMostMaximum()
    {
        double[] eta2 = [5, 1, 1, 1, 1];
        Assert.Equal(3, DorflerMarking.Mark(eta2, 0.1, 3, int.MaxValue).Length);
        Assert.Single(DorflerMarking.Mark(eta2, 1.0, 0, 1));
    }
}
