using Electrostat.Numerics.Solvers;
using Electrostat.Numerics.Sparse;
using MathNet.Numerics.LinearAlgebra;

namespace Electrostat.Numerics.Tests.Solvers;

public class ConjugateGradientTests
{
    [Theory]
    [InlineData(20, 1)]
    [InlineData(120, 2)]
    public void Solve_SmallSpd_MatchesDenseCholesky(int n, int seed)
    {
        // Reference: MathNet.Numerics dense Cholesky solve of the same system.
        var a = TestProblems.RandomSpd(n, 0.1, seed);
        var b = TestProblems.RandomVector(n, seed + 100);
        var x = new double[n];
        var report = ConjugateGradient.Solve(a, b, x, new JacobiPreconditioner(a), new PcgOptions { RelativeTolerance = 1e-12 });
        Assert.True(report.Converged, report.ToString());
        Assert.True(report.FinalRelativeResidual <= 1e-12);
        var expected = a.ToDense().Cholesky().Solve(Vector<double>.Build.DenseOfArray(b));
        for (int i = 0; i < n; i++)
        {
            Assert.Equal(expected[i], x[i], 1e-8);
        }
        Assert.Equal(report.Iterations, report.ResidualHistory.Count);
    }

    [Fact]
    public void Solve_PlainCg_TerminatesWithinDimensionForDistinctEigenvalues()
    {
        // In exact arithmetic CG ends in at most as many steps as A has distinct eigenvalues
        // (Hestenes and Stiefel 1952, §5). diag(1..5) has five.
        var a = CsrMatrix.FromTriplets(5, 5, Enumerable.Range(0, 5).Select(i => (i, i, i + 1.0)));
        var x = new double[5];
        var report = ConjugateGradient.Solve(a, [1, 1, 1, 1, 1], x, null, new PcgOptions { RelativeTolerance = 1e-13 });
        Assert.True(report.Converged);
        Assert.True(report.Iterations <= 5);
        Assert.Equal(0.25, x[3], 1e-12);
    }

    [Fact]
    public void Solve_IterationLimit_ReportsFailureWithoutThrowing()
    {
        var a = TestProblems.FivePoint(30);
        var b = TestProblems.RandomVector(a.Rows, 4);
        var x = new double[a.Rows];
        var report = ConjugateGradient.Solve(a, b, x, null, new PcgOptions { MaxIterations = 5 });
        Assert.Equal(PcgStatus.MaxIterationsReached, report.Status);
        Assert.False(report.Converged);
        Assert.Equal(5, report.Iterations);
        Assert.True(report.FinalRelativeResidual > 1e-10);
        Assert.True(report.FinalRelativeResidual < report.InitialRelativeResidual);
    }

    [Fact]
    public void Solve_WarmStartAtSolution_TakesNoIterations()
    {
        var a = TestProblems.FivePoint(10);
        var exact = TestProblems.RandomVector(a.Rows, 8);
        var b = new double[a.Rows];
        a.Multiply(exact, b);
        var x = (double[])exact.Clone();
        var report = ConjugateGradient.Solve(a, b, x);
        Assert.True(report.Converged);
        Assert.Equal(0, report.Iterations);
    }

    [Fact]
    public void Solve_ZeroRightHandSide_ReturnsZero()
    {
        var a = TestProblems.FivePoint(6);
        var x = TestProblems.RandomVector(a.Rows, 9);
        var report = ConjugateGradient.Solve(a, new double[a.Rows], x);
        Assert.True(report.Converged);
        Assert.All(x, v => Assert.Equal(0.0, v));
    }

    [Fact]
    public void Solve_IndefiniteMatrix_ReportsBreakdown()
    {
        var a = CsrMatrix.FromTriplets(2, 2, [(0, 0, 1.0), (1, 1, -1.0)]);
        var x = new double[2];
        var report = ConjugateGradient.Solve(a, [0, 1], x);
        Assert.Equal(PcgStatus.Breakdown, report.Status);
    }
}
