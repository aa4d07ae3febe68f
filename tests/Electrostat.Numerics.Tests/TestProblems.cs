using Electrostat.Numerics.Sparse;

namespace Electrostat.Numerics.Tests;

/// <summary>Small model matrices for the tests.</summary>
internal static class TestProblems
{
    /// <summary>
    /// The 5-point Laplacian (stencil 4, −1, unscaled) on an n × n interior grid of the unit square with
    /// homogeneous Dirichlet boundary; row index i + n·j.
    /// </summary>
    public static CsrMatrix FivePoint(int n)
    {
        var t = new List<(int, int, double)>(5 * n * n);
        for (int j = 0; j < n; j++)
        {
            for (int i = 0; i < n; i++)
            {
                int r = i + n * j;
                t.Add((r, r, 4.0));
                if (i > 0) t.Add((r, r - 1, -1.0));
                if (i < n - 1) t.Add((r, r + 1, -1.0));
                if (j > 0) t.Add((r, r - n, -1.0));
                if (j < n - 1) t.Add((r, r + n, -1.0));
            }
        }
        return CsrMatrix.FromTriplets(n * n, n * n, t);
    }

    /// <summary>
    /// P1 stiffness matrix of −Δ on the unit square cut into m × m cells (two triangles each, alternating
    /// diagonals), interior nodes jittered by up to 20 % of h (seeded), Dirichlet boundary eliminated.
    /// </summary>
    public static CsrMatrix JitteredP1(int m, int seed = 1) => JitteredP1(m, seed, (_, _) => 1.0);

    /// <summary>As <see cref="JitteredP1(int, int)"/> for −∇·(ε∇u) with ε(x, y) evaluated at each triangle's centroid.</summary>
    public static CsrMatrix JitteredP1(int m, int seed, Func<double, double, double> coefficient)
    {
        var mesh = JitteredSquare.Create(m, seed);
        var (x, y, tri) = (mesh.X, mesh.Y, mesh.Triangles);
        var plan = CsrAssemblyPlan.Create(tri, 3, mesh.DofOfNode, mesh.DofCount);
        return plan.Assemble((e, k) =>
        {
            var nodes = tri.AsSpan(3 * e, 3);
            JitteredSquare.P1Stiffness(x, y, nodes, k);
            double eps = coefficient((x[nodes[0]] + x[nodes[1]] + x[nodes[2]]) / 3, (y[nodes[0]] + y[nodes[1]] + y[nodes[2]]) / 3);
            for (int q = 0; q < 9; q++)
            {
                k[q] *= eps;
            }
        });
    }

    /// <summary>A random SPD matrix BᵀB + n·I with a random sparsity pattern (seeded), as CSR.</summary>
    public static CsrMatrix RandomSpd(int n, double density, int seed)
    {
        var rng = new Random(seed);
        var b = MathNet.Numerics.LinearAlgebra.Matrix<double>.Build.Dense(n, n);
        for (int i = 0; i < n; i++)
        {
            for (int j = 0; j < n; j++)
            {
                if (rng.NextDouble() < density)
                {
                    b[i, j] = rng.NextDouble() - 0.5;
                }
            }
        }
        var a = b.TransposeThisAndMultiply(b) + MathNet.Numerics.LinearAlgebra.Matrix<double>.Build.DenseIdentity(n) * 0.1;
        return CsrMatrix.FromDense(a);
    }

    public static double[] RandomVector(int n, int seed)
    {
        var rng = new Random(seed);
        var v = new double[n];
        for (int i = 0; i < n; i++)
        {
            v[i] = rng.NextDouble() - 0.5;
        }
        return v;
    }
}
