using Electrostat.Numerics.Multigrid;
using Electrostat.Numerics.Ordering;
using Electrostat.Numerics.Solvers;
using Electrostat.Numerics.Sparse;

namespace Electrostat.Numerics.Tests.Ordering;

public class DofOrderingTests
{
    [Fact]
    public void ShuffledGrid_GetsBandwidthOfOrderGridWidth()
    {
        // Cuthill–McKee numbers a k × k grid graph by level sets (anti-diagonals from a corner), whose width is at
        // most k, so the bandwidth comes out ≈ k (George and Liu, "Computer Solution of Large Sparse Positive
        // Definite Systems", 1981, ch. 4 — chapter from memory). A random numbering has bandwidth ≈ k².
        int k = 30;
        var perm = Enumerable.Range(0, k * k).ToArray();
        new Random(3).Shuffle(perm);
        var t = new List<(int, int, double)>();
        for (int j = 0; j < k; j++)
        {
            for (int i = 0; i < k; i++)
            {
                int r = perm[i + k * j];
                t.Add((r, r, 4));
                if (i > 0) t.Add((r, perm[i - 1 + k * j], -1));
                if (i < k - 1) t.Add((r, perm[i + 1 + k * j], -1));
                if (j > 0) t.Add((r, perm[i + k * (j - 1)], -1));
                if (j < k - 1) t.Add((r, perm[i + k * (j + 1)], -1));
            }
        }
        var a = CsrMatrix.FromTriplets(k * k, k * k, t);
        Assert.True(Bandwidth(a, Enumerable.Range(0, k * k).ToArray()) > 10 * k);
        var newOfOld = DofOrdering.ReverseCuthillMcKee(a);
        Assert.Equal(Enumerable.Range(0, k * k), newOfOld.Order());
        Assert.True(Bandwidth(a, newOfOld) <= k + 1, $"bandwidth {Bandwidth(a, newOfOld)}");
    }

    [Fact]
    public void DofMapRenumbering_KeepsMergingAndElimination_AndRestoresFastConvergence()
    {
        int m = 60;
        var grid = JitteredSquare.Create(m, jitter: 0);
        var (x, y, dof, count) = (grid.X, grid.Y, grid.DofOfNode, grid.DofCount);
        // Merge two nodes into one dof, then shuffle the dof numbers.
        int merged = dof[(m / 2) * (m + 1) + m / 2];
        dof[(m / 2) * (m + 1) + m / 2 + 1] = merged;
        var used = dof.Where(d => d >= 0).Distinct().Order().ToArray();
        var compact = new Dictionary<int, int>();
        var shuffled = Enumerable.Range(0, used.Length).ToArray();
        new Random(9).Shuffle(shuffled);
        for (int q = 0; q < used.Length; q++)
        {
            compact[used[q]] = shuffled[q];
        }
        for (int n = 0; n < dof.Length; n++)
        {
            dof[n] = dof[n] < 0 ? -1 : compact[dof[n]];
        }
        count = used.Length;
        var tri = JitteredSquare.StructuredTriangles(m);
        var renumbered = DofOrdering.ReverseCuthillMcKee(tri, 3, dof, count);
        for (int n = 0; n < dof.Length; n++)
        {
            Assert.Equal(dof[n] < 0, renumbered[n] < 0);
        }
        Assert.Equal(renumbered[(m / 2) * (m + 1) + m / 2], renumbered[(m / 2) * (m + 1) + m / 2 + 1]);
        Assert.Equal(count, renumbered.Where(d => d >= 0).Distinct().Count());

        var a = CsrAssemblyPlan.Create(tri, 3, renumbered, count).Assemble((e, k) => JitteredSquare.P1Stiffness(x, y, tri.AsSpan(3 * e, 3), k));
        var report = ConjugateGradient.Solve(a, TestProblems.RandomVector(count, 1), new double[count], SmoothedAggregationAmg.Build(a));
        Assert.True(report.Converged && report.Iterations <= 20, report.ToString());
    }

    [Fact]
    public void DisconnectedComponents_AreAllNumbered()
    {
        var a = CsrMatrix.FromTriplets(5, 5, [(0, 0, 1.0), (1, 1, 1.0), (1, 2, -1.0), (2, 1, -1.0), (2, 2, 1.0), (3, 3, 1.0), (4, 4, 1.0)]);
        var p = DofOrdering.ReverseCuthillMcKee(a);
        Assert.Equal([0, 1, 2, 3, 4], p.Order());
    }

    private static int Bandwidth(CsrMatrix a, int[] newOfOld)
    {
        int b = 0;
        for (int i = 0; i < a.Rows; i++)
        {
            for (int k = a.RowPointers[i]; k < a.RowPointers[i + 1]; k++)
            {
                b = Math.Max(b, Math.Abs(newOfOld[i] - newOfOld[a.ColumnIndices[k]]));
            }
        }
        return b;
    }
}
