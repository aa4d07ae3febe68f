using System.Diagnostics;
using Electrostat.Numerics.Sparse;

namespace Electrostat.Numerics.Multigrid;

/// <summary>
/// Strength of connection and greedy aggregation, following Vaněk, Mandel and Brezina 1996, "Algebraic
/// multigrid by smoothed aggregation for second and fourth order elliptic problems", Computing 56:179–196, §3:
/// j is strongly connected to i when a_ij² &gt; θ²·|a_ii·a_jj|; phase 1 makes an aggregate of every node whose
/// strong neighbourhood is still untouched, phase 2 attaches leftovers to the strongest phase-1 aggregate
/// they touch, phase 3 groups what remains.
/// </summary>
internal static class Aggregation
{
    /// <summary>Returns the aggregate index of every row; <paramref name="count"/> is the number of aggregates.</summary>
    public static int[] Build(CsrMatrix a, double[] diagonal, double theta, out int count)
    {
        int n = a.Rows;
        var rp = a.RowPointers; var ci = a.ColumnIndices; var v = a.Values;
        double theta2 = theta * theta;
        var agg = new int[n];
        Array.Fill(agg, -1);
        count = 0;

        // Phase 1: root aggregates of whole untouched strong neighbourhoods.
        for (int i = 0; i < n; i++)
        {
            if (agg[i] != -1)
            {
                continue;
            }
            bool free = true;
            int strong = 0;
            double di = Math.Abs(diagonal[i]);
            for (int k = rp[i]; k < rp[i + 1]; k++)
            {
                int j = ci[k];
                if (j != i && v[k] * v[k] > theta2 * di * Math.Abs(diagonal[j]))
                {
                    strong++;
                    if (agg[j] != -1)
                    {
                        free = false;
                        break;
                    }
                }
            }
            if (!free || strong == 0)
            {
                continue;
            }
            agg[i] = count;
            for (int k = rp[i]; k < rp[i + 1]; k++)
            {
                int j = ci[k];
                if (j != i && v[k] * v[k] > theta2 * di * Math.Abs(diagonal[j]))
                {
                    agg[j] = count;
                }
            }
            count++;
        }

        // Phase 2: attach to the strongest neighbouring phase-1 aggregate (read from a snapshot so that
        // aggregates do not grow in chains).
        var phase1 = (int[])agg.Clone();
        for (int i = 0; i < n; i++)
        {
            if (phase1[i] != -1)
            {
                continue;
            }
            double di = Math.Abs(diagonal[i]);
            double best = 0;
            int bestAgg = -1;
            for (int k = rp[i]; k < rp[i + 1]; k++)
            {
                int j = ci[k];
                double s = v[k] * v[k];
                if (j != i && phase1[j] != -1 && s > theta2 * di * Math.Abs(diagonal[j]) && s > best)
                {
                    best = s;
                    bestAgg = phase1[j];
                }
            }
            agg[i] = bestAgg;
        }

        // Phase 3: the rest form aggregates with their still-free strong neighbours (isolated rows become
        // singletons, so every row has an aggregate).
        for (int i = 0; i < n; i++)
        {
            if (agg[i] != -1)
            {
                continue;
            }
            agg[i] = count;
            double di = Math.Abs(diagonal[i]);
            for (int k = rp[i]; k < rp[i + 1]; k++)
            {
                int j = ci[k];
                if (j != i && agg[j] == -1 && v[k] * v[k] > theta2 * di * Math.Abs(diagonal[j]))
                {
                    agg[j] = count;
                }
            }
            count++;
        }
        Debug.Assert(Array.TrueForAll(agg, g => g >= 0));
        return agg;
    }
}
