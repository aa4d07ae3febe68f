namespace Electrostat.Bench;

/// <summary>
/// A generated P1 Laplace problem for the "amg" suite: the unit square cut into m × m cells, each split into two
/// triangles, with the interior nodes moved randomly by up to 20 % of the cell size (fixed seed) so that the
/// stiffness matrix has the irregular values of a real mesh rather than the 5-point stencil. The boundary is
/// Dirichlet (nodes mapped to dof −1), so the system has (m − 1)² unknowns.
/// </summary>
internal sealed class AmgBenchProblem
{
    private AmgBenchProblem(int cells, double[] x, double[] y, int[] triangles, int[] dofOfNode, int dofCount)
    {
        Cells = cells;
        X = x;
        Y = y;
        Triangles = triangles;
        DofOfNode = dofOfNode;
        DofCount = dofCount;
    }

    public int Cells { get; }

    public double[] X { get; }

    public double[] Y { get; }

    public int[] Triangles { get; }

    public int[] DofOfNode { get; }

    public int DofCount { get; }

    /// <summary>Builds the problem; with <paramref name="shuffle"/> the dofs are numbered in random order (seeded),
    /// the worst case for locality, as a mesh refined without renumbering might be.</summary>
    public static AmgBenchProblem Create(int cells, int seed = 12345, bool shuffle = false)
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
                double jx = boundary ? 0 : (rng.NextDouble() - 0.5) * 0.4 * h;
                double jy = boundary ? 0 : (rng.NextDouble() - 0.5) * 0.4 * h;
                x[n] = i * h + jx;
                y[n] = j * h + jy;
                dof[n] = boundary ? -1 : count++;
            }
        }
        if (shuffle)
        {
            var perm = new int[count];
            for (int i = 0; i < count; i++)
            {
                perm[i] = i;
            }
            new Random(seed + 1).Shuffle(perm);
            for (int n = 0; n < nodes; n++)
            {
                dof[n] = dof[n] < 0 ? -1 : perm[dof[n]];
            }
        }
        var tri = new int[m * m * 6];
        int t = 0;
        for (int j = 0; j < m; j++)
        {
            for (int i = 0; i < m; i++)
            {
                int n00 = j * (m + 1) + i, n10 = n00 + 1, n01 = n00 + m + 1, n11 = n01 + 1;
                // Alternate the diagonal so that no direction is preferred.
                if (((i + j) & 1) == 0)
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
        return new AmgBenchProblem(m, x, y, tri, dof, count);
    }

    /// <summary>P1 stiffness of triangle e for −Δu: K_ab = (∇φ_a·∇φ_b)·area.</summary>
    public void ElementStiffness(int e, Span<double> k)
    {
        int a = Triangles[3 * e], b = Triangles[3 * e + 1], c = Triangles[3 * e + 2];
        double x0 = X[a], y0 = Y[a], x1 = X[b], y1 = Y[b], x2 = X[c], y2 = Y[c];
        double twiceArea = (x1 - x0) * (y2 - y0) - (x2 - x0) * (y1 - y0);
        double g0x = y1 - y2, g1x = y2 - y0, g2x = y0 - y1;
        double g0y = x2 - x1, g1y = x0 - x2, g2y = x1 - x0;
        double s = 1.0 / (2.0 * twiceArea);
        k[0] = (g0x * g0x + g0y * g0y) * s;
        k[1] = (g0x * g1x + g0y * g1y) * s;
        k[2] = (g0x * g2x + g0y * g2y) * s;
        k[3] = k[1];
        k[4] = (g1x * g1x + g1y * g1y) * s;
        k[5] = (g1x * g2x + g1y * g2y) * s;
        k[6] = k[2];
        k[7] = k[5];
        k[8] = (g2x * g2x + g2y * g2y) * s;
    }

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
                if (d >= 0)
                {
                    b[d] += area / 3.0;
                }
            }
        }
        return b;
    }
}
