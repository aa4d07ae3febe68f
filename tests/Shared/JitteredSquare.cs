using System.Diagnostics.CodeAnalysis;

namespace Electrostat.TestSupport;

/// <summary>
/// A generated P1 mesh of the unit square for the numerics tests and the "amg" benchmark: m × m cells, each split into
/// two triangles (alternating diagonals, so no direction is preferred), interior nodes moved randomly by up to
/// <c>jitter</c> × the cell size (fixed seed) so that the stiffness matrix has the irregular values of a real mesh
/// rather than the 5-point stencil. The boundary is Dirichlet (nodes mapped to dof −1): (m − 1)² unknowns.
/// Compiled into Electrostat.Numerics.Tests and Electrostat.Bench.
/// </summary>
[SuppressMessage("Performance", "CA1812", Justification = "Each project that links this file uses part of it.")]
internal sealed class JitteredSquare
{
    private JitteredSquare(double[] x, double[] y, int[] triangles, int[] dofOfNode, int dofCount)
    {
        X = x;
        Y = y;
        Triangles = triangles;
        DofOfNode = dofOfNode;
        DofCount = dofCount;
    }

    public double[] X { get; }

    public double[] Y { get; }

    public int[] Triangles { get; }

    public int[] DofOfNode { get; }

    public int DofCount { get; }

    /// <summary>Builds the mesh. <paramref name="jitter"/> is the largest node move as a fraction of the cell size
    /// (0.2 moves by up to ±10 % in each direction; 0 gives the uniform grid). With <paramref name="shuffle"/> the dofs
    /// are numbered in random order (seeded), the worst case for locality.</summary>
    public static JitteredSquare Create(int cells, int seed = 12345, double jitter = 0.2, bool shuffle = false)
    {
        int m = cells;
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
                double jx = boundary || jitter == 0 ? 0 : (rng.NextDouble() - 0.5) * 2 * jitter * h;
                double jy = boundary || jitter == 0 ? 0 : (rng.NextDouble() - 0.5) * 2 * jitter * h;
                x[n] = i * h + jx;
                y[n] = j * h + jy;
                dof[n] = boundary ? -1 : count++;
            }
        }
        if (shuffle)
        {
            var perm = Enumerable.Range(0, count).ToArray();
            new Random(seed + 1).Shuffle(perm);
            for (int n = 0; n < nodes; n++) dof[n] = dof[n] < 0 ? -1 : perm[dof[n]];
        }
        return new JitteredSquare(x, y, StructuredTriangles(m), dof, count);
    }

    /// <summary>Triangles of an m × m cell grid with nodes j·(m+1)+i, alternating diagonals unless told otherwise.</summary>
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

    /// <summary>P1 stiffness K_ab = area·∇φ_a·∇φ_b of one triangle for −Δu, row-major 3 × 3.</summary>
    public static void P1Stiffness(double[] x, double[] y, ReadOnlySpan<int> nodes, Span<double> k)
    {
        int a = nodes[0], b = nodes[1], c = nodes[2];
        double twiceArea = (x[b] - x[a]) * (y[c] - y[a]) - (x[c] - x[a]) * (y[b] - y[a]);
        Span<double> gx = [y[b] - y[c], y[c] - y[a], y[a] - y[b]];
        Span<double> gy = [x[c] - x[b], x[a] - x[c], x[b] - x[a]];
        for (int p = 0; p < 3; p++)
        {
            for (int q = 0; q < 3; q++) k[3 * p + q] = (gx[p] * gx[q] + gy[p] * gy[q]) / (2 * twiceArea);
        }
    }

    /// <summary>P1 stiffness of triangle <paramref name="e"/> of this mesh.</summary>
    public void ElementStiffness(int e, Span<double> k) => P1Stiffness(X, Y, Triangles.AsSpan(3 * e, 3), k);

    /// <summary>Load vector of f = 1 (each triangle gives area/3 to each of its free nodes).</summary>
    public double[] UnitLoad()
    {
        var b = new double[DofCount];
        for (int e = 0; e < Triangles.Length / 3; e++)
        {
            int a = Triangles[3 * e], bb = Triangles[3 * e + 1], c = Triangles[3 * e + 2];
            double area = 0.5 * ((X[bb] - X[a]) * (Y[c] - Y[a]) - (X[c] - X[a]) * (Y[bb] - Y[a]));
            for (int q = 0; q < 3; q++)
            {
                int d = DofOfNode[Triangles[3 * e + q]];
                if (d >= 0) b[d] += area / 3.0;
            }
        }
        return b;
    }
}
