using Electrostat.Numerics.Multigrid;
using Electrostat.Numerics.Solvers;
using Electrostat.Numerics.Sparse;

namespace Electrostat.Numerics.Tests.Multigrid;

public class SmoothedAggregationAmgTests
{
    [Fact]
    public void FivePoint_SolvesTheDiscreteEigenvectorExactly()
    {
        // u_ij = sin(π i h) sin(π j h), h = 1/(n+1), is an eigenvector of the unscaled 5-point Laplacian with
        // eigenvalue λ = 8 sin²(πh/2) (LeVeque, "Finite Difference Methods for Ordinary and Partial Differential
        // Equations", SIAM 2007, §3.4 — section number from memory). So A·x = λu has the exact solution x = u.
        int n = 127;
        double h = 1.0 / (n + 1);
        var a = TestProblems.FivePoint(n);
        var u = new double[n * n];
        for (int j = 0; j < n; j++)
        {
            for (int i = 0; i < n; i++)
            {
                u[i + n * j] = Math.Sin(Math.PI * (i + 1) * h) * Math.Sin(Math.PI * (j + 1) * h);
            }
        }
        double lambda = 8 * Math.Pow(Math.Sin(Math.PI * h / 2), 2);
        var b = u.Select(v => lambda * v).ToArray();
        var amg = SmoothedAggregationAmg.Build(a);
        var x = new double[a.Rows];
        var report = ConjugateGradient.Solve(a, b, x, amg, new PcgOptions { RelativeTolerance = 1e-12 });
        Assert.True(report.Converged, report.ToString());
        // The condition number is ~ (2/(πh))² ≈ 6.6e3, so a 1e-12 residual bounds the error by ~1e-8.
        for (int i = 0; i < u.Length; i++)
        {
            Assert.Equal(u[i], x[i], 1e-8);
        }
        Assert.True(amg.Stats.Levels.Count >= 3, amg.Stats.ToString());
    }

    [Fact]
    public void IterationCount_IsNearlyIndependentOfMeshSize()
    {
        // Smoothed aggregation gives h-independent V-cycle convergence for second-order elliptic problems
        // (Vaněk, Mandel and Brezina 1996, Computing 56:179–196, Theorem 5.4 and §6; Trottenberg, Oosterlee and
        // Schüller, "Multigrid", 2001, §A.4 on AMG). Check it on jittered P1 meshes refined three times.
        var counts = new List<int>();
        foreach (int m in new[] { 32, 64, 128, 256 })
        {
            var a = TestProblems.JitteredP1(m);
            var b = TestProblems.RandomVector(a.Rows, m);
            var amg = SmoothedAggregationAmg.Build(a);
            var x = new double[a.Rows];
            var report = ConjugateGradient.Solve(a, b, x, amg, new PcgOptions { RelativeTolerance = 1e-10 });
            Assert.True(report.Converged, report.ToString());
            Assert.True(amg.Stats.OperatorComplexity < 2.0, amg.Stats.ToString());
            counts.Add(report.Iterations);
        }
        // Unpreconditioned CG would need ~ 2× more iterations per halving of h; here the count may creep by a few.
        Assert.True(counts.Max() <= 20, string.Join(",", counts));
        Assert.True(counts[^1] - counts[0] <= 5, string.Join(",", counts));
    }

    [Fact]
    public void Preconditioner_BeatsJacobi_ByFactorGrowingWithSize()
    {
        var a = TestProblems.JitteredP1(96);
        var b = TestProblems.RandomVector(a.Rows, 1);
        var amgReport = ConjugateGradient.Solve(a, b, new double[a.Rows], SmoothedAggregationAmg.Build(a));
        var jacobiReport = ConjugateGradient.Solve(a, b, new double[a.Rows], new JacobiPreconditioner(a));
        Assert.True(amgReport.Converged && jacobiReport.Converged);
        Assert.True(jacobiReport.Iterations > 5 * amgReport.Iterations, $"{jacobiReport.Iterations} vs {amgReport.Iterations}");
    }

    [Theory]
    [InlineData(12)]   // one smoother block per level (serial Gauss-Seidel)
    [InlineData(130)]  // fine level large enough for the parallel hybrid smoother
    public void VCycle_IsSymmetricAndPositive(int m)
    {
        // A CG preconditioner must be SPD: x·(M⁻¹y) = y·(M⁻¹x) and x·(M⁻¹x) > 0.
        var a = TestProblems.JitteredP1(m);
        var amg = SmoothedAggregationAmg.Build(a, new AmgOptions { CoarsestRows = 20 });
        Assert.True(amg.Stats.Levels.Count >= 3, amg.Stats.ToString());
        int n = a.Rows;
        for (int trial = 0; trial < 3; trial++)
        {
            var x = TestProblems.RandomVector(n, 10 + trial);
            var y = TestProblems.RandomVector(n, 20 + trial);
            var mx = new double[n];
            var my = new double[n];
            amg.Apply(x, mx);
            amg.Apply(y, my);
            double xMy = Dot(x, my), yMx = Dot(y, mx);
            Assert.True(Math.Abs(xMy - yMx) <= 1e-12 * (Math.Abs(xMy) + Dot(x, mx)), $"{xMy} vs {yMx}");
            Assert.True(Dot(x, mx) > 0);
        }
    }

    [Fact]
    public void Build_ReusesSetup_ForManyRightHandSides()
    {
        var a = TestProblems.JitteredP1(48);
        var amg = SmoothedAggregationAmg.Build(a);
        for (int k = 0; k < 4; k++)
        {
            var b = TestProblems.RandomVector(a.Rows, 30 + k);
            var x = new double[a.Rows];
            var report = ConjugateGradient.Solve(a, b, x, amg);
            Assert.True(report.Converged);
            var r = new double[a.Rows];
            a.Residual(b, x, r);
            Assert.True(Math.Sqrt(Dot(r, r) / Dot(b, b)) <= 1e-10);
        }
    }

    [Fact]
    public void Build_NonPositiveDiagonal_ThrowsNamingTheRow()
    {
        var a = CsrMatrix.FromTriplets(3, 3, [(0, 0, 1.0), (1, 1, 0.0), (2, 2, 1.0)]);
        var ex = Assert.Throws<ArgumentException>(() => SmoothedAggregationAmg.Build(a, new AmgOptions { CoarsestRows = 1 }));
        Assert.Contains("Row 1", ex.Message);
    }

    [Fact]
    public void SingularNeumannProblem_CoarsestLevelUsesPseudoInverse()
    {
        // The pure-Neumann Laplacian is only semidefinite (constants in the kernel); for a right-hand side in
        // the range CG still converges, and the coarsest level must not fail.
        int m = 40;
        var x = new double[(m + 1) * (m + 1)];
        var y = new double[x.Length];
        for (int j = 0; j <= m; j++)
        {
            for (int i = 0; i <= m; i++)
            {
                x[j * (m + 1) + i] = (double)i / m;
                y[j * (m + 1) + i] = (double)j / m;
            }
        }
        var tri = JitteredSquare.StructuredTriangles(m);
        var a = CsrAssemblyPlan.Create(tri, 3, x.Length).Assemble((e, k) => JitteredSquare.P1Stiffness(x, y, tri.AsSpan(3 * e, 3), k));
        var amg = SmoothedAggregationAmg.Build(a, new AmgOptions { CoarsestRows = 50 });
        Assert.Equal("pseudo-inverse", amg.Stats.CoarsestSolver);
        var b = TestProblems.RandomVector(a.Rows, 3);
        double mean = b.Average();
        for (int i = 0; i < b.Length; i++)
        {
            b[i] -= mean;
        }
        var report = ConjugateGradient.Solve(a, b, new double[a.Rows], amg, new PcgOptions { RelativeTolerance = 1e-8 });
        Assert.True(report.Converged, report.ToString());
    }

    [Fact]
    public void StalledCoarsening_OnDiagonallyDominantMatrix_StillGivesSpdPreconditioner()
    {
        // A strongly diagonally dominant matrix has no strong couplings at θ = 0.5, so aggregation stalls at the
        // first level and the (large) last level is relaxed instead of factorised.
        int n = 5000;
        var t = new List<(int, int, double)>();
        for (int i = 0; i < n; i++)
        {
            t.Add((i, i, 10.0));
            if (i > 0) t.Add((i, i - 1, -1.0));
            if (i < n - 1) t.Add((i, i + 1, -1.0));
        }
        var a = CsrMatrix.FromTriplets(n, n, t);
        var amg = SmoothedAggregationAmg.Build(a, new AmgOptions { StrengthThreshold = 0.5 });
        Assert.Single(amg.Stats.Levels);
        Assert.Contains("sweeps", amg.Stats.CoarsestSolver);
        var b = TestProblems.RandomVector(n, 2);
        var report = ConjugateGradient.Solve(a, b, new double[n], amg);
        Assert.True(report.Converged, report.ToString());
        Assert.True(report.Iterations <= 6, report.ToString());
        var x = TestProblems.RandomVector(n, 3);
        var y = TestProblems.RandomVector(n, 4);
        var mx = new double[n];
        var my = new double[n];
        amg.Apply(x, mx);
        amg.Apply(y, my);
        Assert.Equal(Dot(x, my), Dot(y, mx), 1e-10);
    }

    [Fact]
    public void MergedFloatingDof_WithLongRow_ConvergesAndMatchesDirectSolve()
    {
        // A "floating conductor": all nodes inside [0.4, 0.6]² share one dof, so that dof's row couples to the
        // whole ring around the block. Reference: MathNet dense Cholesky on the same (small) system.
        int m = 40;
        var x = new double[(m + 1) * (m + 1)];
        var y = new double[x.Length];
        var dof = new int[x.Length];
        int count = 1; // dof 0 is the merged conductor
        for (int j = 0; j <= m; j++)
        {
            for (int i = 0; i <= m; i++)
            {
                int n = j * (m + 1) + i;
                x[n] = (double)i / m;
                y[n] = (double)j / m;
                bool boundary = i == 0 || j == 0 || i == m || j == m;
                bool inside = x[n] >= 0.4 && x[n] <= 0.6 && y[n] >= 0.4 && y[n] <= 0.6;
                dof[n] = boundary ? -1 : inside ? 0 : count++;
            }
        }
        var tri = JitteredSquare.StructuredTriangles(m);
        var a = CsrAssemblyPlan.Create(tri, 3, dof, count).Assemble((e, k) => JitteredSquare.P1Stiffness(x, y, tri.AsSpan(3 * e, 3), k));
        Assert.True(a.RowPointers[1] - a.RowPointers[0] > 30);
        var b = TestProblems.RandomVector(count, 5);
        var amg = SmoothedAggregationAmg.Build(a, new AmgOptions { CoarsestRows = 30 });
        var u = new double[count];
        var report = ConjugateGradient.Solve(a, b, u, amg, new PcgOptions { RelativeTolerance = 1e-12 });
        Assert.True(report.Converged, report.ToString());
        Assert.True(report.Iterations <= 20, report.ToString());
        var expected = a.ToDense().Cholesky().Solve(MathNet.Numerics.LinearAlgebra.Vector<double>.Build.DenseOfArray(b));
        for (int i = 0; i < count; i++)
        {
            Assert.Equal(expected[i], u[i], 1e-8 * expected.AbsoluteMaximum());
        }
    }

    [Fact]
    public void HighPermittivityContrast_StaysFast_AndAgreesWithJacobiPcg()
    {
        // Regression guard for dielectric designs: disks and a slab with 10⁴ times the coefficient of the rest.
        // (Smoothed with the filtered matrix instead, this problem family needed about twice the iterations.)
        // The solution is checked against CG with the diagonal preconditioner, an independent path.
        var a = TestProblems.JitteredP1(100, 2, (x, y) =>
        {
            double fx = x * 4 - Math.Floor(x * 4) - 0.5, fy = y * 4 - Math.Floor(y * 4) - 0.5;
            return fx * fx + fy * fy < 0.09 || (y > 0.45 && y < 0.5) ? 1e4 : 1.0;
        });
        var b = TestProblems.RandomVector(a.Rows, 6);
        var u = new double[a.Rows];
        var report = ConjugateGradient.Solve(a, b, u, SmoothedAggregationAmg.Build(a), new PcgOptions { RelativeTolerance = 1e-11 });
        Assert.True(report.Converged && report.Iterations <= 25, report.ToString());
        var reference = new double[a.Rows];
        var jacobi = ConjugateGradient.Solve(a, b, reference, new JacobiPreconditioner(a), new PcgOptions { RelativeTolerance = 1e-11, MaxIterations = 20_000 });
        Assert.True(jacobi.Converged, jacobi.ToString());
        double scale = reference.Max(Math.Abs);
        for (int i = 0; i < u.Length; i++)
        {
            Assert.Equal(reference[i], u[i], 1e-6 * scale);
        }
    }

    private static double Dot(double[] a, double[] b) => Electrostat.Numerics.Vectors.VectorKernels.Dot(a, b);
}
