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
        int nodes = (m + 1) * (m + 1);
        var x = new double[nodes];
        var y = new double[nodes];
        var dof = new int[nodes];
        var rng = new Random(seed);
        double h = 1.0 / m;
        int count = 0;
        for (int j = 0; j <= m; j++)
        {
            for (int i = 0; i <= m; i++)
            {
                int n = j * (m + 1) + i;
                bool boundary = i == 0 || j == 0 || i == m || j == m;
                x[n] = i * h + (boundary ? 0 : (rng.NextDouble() - 0.5) * 0.4 * h);
                y[n] = j * h + (boundary ? 0 : (rng.NextDouble() - 0.5) * 0.4 * h);
                dof[n] = boundary ? -1 : count++;
            }
        }
        var tri = StructuredTriangles(m);
        var plan = CsrAssemblyPlan.Create(tri, 3, dof, count);
        return plan.Assemble((e, k) =>
        {
            var nodes = tri.AsSpan(3 * e, 3);
            P1Stiffness(x, y, nodes, k);
            double eps = coefficient((x[nodes[0]] + x[nodes[1]] + x[nodes[2]]) / 3, (y[nodes[0]] + y[nodes[1]] + y[nodes[2]]) / 3);
            for (int q = 0; q < 9; q++)
            {
                k[q] *= eps;
            }
        });
    }

    /// <summary>Triangles of an m × m cell grid with nodes j·(m+1)+i, alternating diagonals.</summary>
    public static int[] StructuredTriangles(int m, bool alternate = true)
    {
        var tri = new int[m * m * 6];
        int t = 0;
        for (int j = 0; j < m; j++)
        {
            for (int i = 0; i < m; i++)
            {
                int n00 = j * (m + 1) + i, n10 = n00 + 1, n01 = n00 + m + 1, n11 = n01 + 1;
                if (!alternate || ((i + j) & 1) == 0)
                {
                    tri[t++] = n00; tri[t++] = n10; tri[t++] = n11;
                    tri[t++] = n00; tri[t++] = n11; tri[t++] = n01;
                }
                else
                {
                    tri[t++] = n00; tri[t++] = n10; tri[t++] = n01;
                    tri[t++] = n10; tri[t++] = n11; tri[t++] = n01;
                }
            }
        }
        return tri;
    }

    /// <summary>P1 stiffness K_ab = area·∇φ_a·∇φ_b of one triangle, row-major 3 × 3.</summary>
    public static void P1Stiffness(double[] x, double[] y, ReadOnlySpan<int> nodes, Span<double> k)
    {
        int a = nodes[0], b = nodes[1], c = nodes[2];
        double twiceArea = (x[b] - x[a]) * (y[c] - y[a]) - (x[c] - x[a]) * (y[b] - y[a]);
        Span<double> gx = [y[b] - y[c], y[c] - y[a], y[a] - y[b]];
        Span<double> gy = [x[c] - x[b], x[a] - x[c], x[b] - x[a]];
        for (int p = 0; p < 3; p++)
        {
            for (int q = 0; q < 3; q++)
            {
                k[3 * p + q] = (gx[p] * gx[q] + gy[p] * gy[q]) / (2 * twiceArea);
            }
        }
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
