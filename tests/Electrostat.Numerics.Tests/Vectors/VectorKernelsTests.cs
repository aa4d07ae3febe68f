using Electrostat.Numerics.Vectors;

namespace Electrostat.Numerics.Tests.Vectors;

public class VectorKernelsTests
{
    [Theory]
    [InlineData(7)]
    [InlineData(1000)]
    [InlineData(300_001)]
    public void Dot_MatchesCompensatedSum(int n)
    {
        // Reference: Neumaier's compensated summation (Neumaier 1974, ZAMM 54:39–51) of the products.
        var x = TestProblems.RandomVector(n, 1);
        var y = TestProblems.RandomVector(n, 2);
        double sum = 0, c = 0;
        for (int i = 0; i < n; i++)
        {
            double p = x[i] * y[i];
            double t = sum + p;
            c += Math.Abs(sum) >= Math.Abs(p) ? (sum - t) + p : (p - t) + sum;
            sum = t;
        }
        double reference = sum + c;
        Assert.Equal(reference, VectorKernels.Dot(x, y), 1e-10 * Math.Sqrt(n));
        Assert.Equal(reference, VectorKernels.Dot(x.AsSpan(), y.AsSpan()), 1e-10 * Math.Sqrt(n));
    }

    [Theory]
    [InlineData(13)]
    [InlineData(200_003)]
    public void AxpyAndXpby_MatchScalarLoops(int n)
    {
        var x = TestProblems.RandomVector(n, 3);
        var y = TestProblems.RandomVector(n, 4);
        var y1 = (double[])y.Clone();
        VectorKernels.Axpy(0.75, x, y1);
        var y2 = (double[])y.Clone();
        VectorKernels.Xpby(x, -1.5, y2);
        for (int i = 0; i < n; i++)
        {
            Assert.Equal(y[i] + 0.75 * x[i], y1[i], 1e-15);
            Assert.Equal(x[i] - 1.5 * y[i], y2[i], 1e-15);
        }
    }

    [Fact]
    public void FusedUpdate_ReturnsNewResidualNorm()
    {
        int n = 100_001;
        var p = TestProblems.RandomVector(n, 5);
        var q = TestProblems.RandomVector(n, 6);
        var x = TestProblems.RandomVector(n, 7);
        var r = TestProblems.RandomVector(n, 8);
        var x0 = (double[])x.Clone();
        var r0 = (double[])r.Clone();
        double rr = VectorKernels.UpdateSolutionAndResidual(0.3, p, q, x, r);
        double expected = 0;
        for (int i = 0; i < n; i++)
        {
            Assert.Equal(x0[i] + 0.3 * p[i], x[i], 1e-15);
            Assert.Equal(r0[i] - 0.3 * q[i], r[i], 1e-15);
            expected += r[i] * r[i];
        }
        Assert.Equal(expected, rr, 1e-9);
    }
}
