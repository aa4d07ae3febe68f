using System.Diagnostics;
using Electrostat.Numerics.Parallelism;
using Electrostat.Numerics.Sparse;

namespace Electrostat.Numerics.Multigrid;

/// <summary>
/// Tentative and smoothed prolongators of smoothed aggregation (Vaněk, Mandel and Brezina 1996, §2, eqs. 2.2–2.5).
/// With one near-null-space vector B the tentative prolongator is T(i, agg(i)) = B_i / ‖B restricted to the
/// aggregate‖, i.e. the QR factorisation of each aggregate's block of B; the coarse null-space vector is the
/// aggregate norm. The smoothed prolongator is P = (I − ω·D⁻¹A)·T with ω = (4/3)/ρ(D⁻¹A).
/// </summary>
internal static class Prolongator
{
    /// <summary>
    /// Builds P = (I − ω·D⁻¹A)·T and returns it; <paramref name="coarseNullSpace"/> receives the coarse B.
    /// </summary>
    public static CsrMatrix Build(CsrMatrix a, double[] diagonal, int[] agg, int aggregates, double[] nullSpace, double omega, out double[] coarseNullSpace)
    {
        int n = a.Rows;
        var norms = new double[aggregates];
        for (int i = 0; i < n; i++)
        {
            norms[agg[i]] += nullSpace[i] * nullSpace[i];
        }
        for (int c = 0; c < aggregates; c++)
        {
            norms[c] = Math.Sqrt(norms[c]);
        }
        coarseNullSpace = norms;
        var t = new double[n];
        for (int i = 0; i < n; i++)
        {
            // An aggregate whose B is zero keeps T = 0 there; that only happens for B with zeros, not for constants.
            t[i] = norms[agg[i]] > 0 ? nullSpace[i] / norms[agg[i]] : 0.0;
        }

        // Two passes (count, then fill the final arrays) rather than growable buffers: the extra pass is cheaper
        // than allocating and page-faulting a second copy of P.
        var rp = a.RowPointers; var ci = a.ColumnIndices; var v = a.Values;
        var prp = new int[n + 1];
        var parts = RowPartition.ByEntries(rp, n, a.NonZeroCount >= ParallelPolicy.MinimumParallelWork ? ParallelPolicy.DefaultWorkers : 1);
        Parallel.For(0, parts.Count, p =>
        {
            var marker = new int[aggregates];
            Array.Fill(marker, -1);
            for (int i = parts.Start(p); i < parts.End(p); i++)
            {
                int count = 0;
                for (int k = rp[i]; k < rp[i + 1]; k++)
                {
                    int c = agg[ci[k]];
                    if (marker[c] != i)
                    {
                        marker[c] = i;
                        count++;
                    }
                }
                if (marker[agg[i]] != i)
                {
                    count++;
                }
                prp[i + 1] = count;
            }
        });
        for (int i = 0; i < n; i++)
        {
            prp[i + 1] += prp[i];
        }
        var pci = new int[prp[n]];
        var pv = new double[prp[n]];
        Parallel.For(0, parts.Count, p =>
        {
            var position = new int[aggregates];
            Array.Fill(position, -1);
            for (int i = parts.Start(p); i < parts.End(p); i++)
            {
                int start = prp[i];
                int next = start;
                double scale = -omega / diagonal[i];
                int own = agg[i];
                position[own] = next;
                pci[next] = own;
                pv[next] = t[i];
                next++;
                for (int k = rp[i]; k < rp[i + 1]; k++)
                {
                    int j = ci[k];
                    int c = agg[j];
                    double val = scale * v[k] * t[j];
                    int pos = position[c];
                    if (pos < start)
                    {
                        position[c] = next;
                        pci[next] = c;
                        pv[next] = val;
                        next++;
                    }
                    else
                    {
                        pv[pos] += val;
                    }
                }
                Debug.Assert(next == prp[i + 1]);
                RowSort.SortRow(pci.AsSpan(start, next - start), pv.AsSpan(start, next - start));
            }
        });
        return new CsrMatrix(n, aggregates, prp, pci, pv, validate: false);
    }

    /// <summary>
    /// Upper bound of ρ(D⁻¹A) by Gershgorin's theorem, max_i Σ_j |a_ij| / a_ii (free to compute, never below ρ,
    /// so ω = (4/3)/bound never over-smooths).
    /// </summary>
    public static double SpectralRadiusBound(CsrMatrix a, double[] diagonal)
    {
        var rp = a.RowPointers; var v = a.Values;
        double max = 0;
        for (int i = 0; i < a.Rows; i++)
        {
            double s = 0;
            for (int k = rp[i]; k < rp[i + 1]; k++)
            {
                s += Math.Abs(v[k]);
            }
            max = Math.Max(max, s / diagonal[i]);
        }
        return max;
    }

    /// <summary>
    /// Estimate of ρ(D⁻¹A) by power iteration. D⁻¹A is self-adjoint in the D-inner product, so the Rayleigh
    /// quotient (xᵀAx)/(xᵀDx) is a lower bound that converges to ρ; the result is raised by 5 % to cover
    /// the shortfall of a few iterations (over-estimating ρ only damps the prolongator smoothing slightly). It runs
    /// on the packed matrix (half the memory traffic; its rounding is far below the 5 % margin).
    /// </summary>
    public static double SpectralRadiusEstimate(PackedCsr a, double[] diagonal, double[] x, double[] y, int iterations)
    {
        int n = a.Rows;
        // Deterministic pseudo-random start so that setup is reproducible.
        ulong state = 0x9E3779B97F4A7C15UL;
        for (int i = 0; i < n; i++)
        {
            state ^= state << 13; state ^= state >> 7; state ^= state << 17;
            x[i] = (state >> 11) * (1.0 / (1UL << 53)) - 0.5;
        }
        double rho = 0;
        var parts = RowPartition.Even(n, n >= 2 * ParallelPolicy.MinimumParallelWork ? ParallelPolicy.DefaultWorkers : 1);
        var sums = new double[parts.Count * 3];
        for (int it = 0; it < iterations; it++)
        {
            a.Multiply(x, y);
            Parallel.For(0, parts.Count, p =>
            {
                double xAx = 0, xDx = 0, yDinvY = 0;
                for (int i = parts.Start(p); i < parts.End(p); i++)
                {
                    double d = diagonal[i];
                    xAx += x[i] * y[i];
                    xDx += x[i] * d * x[i];
                    double z = y[i] / d;
                    y[i] = z;
                    yDinvY += z * d * z;
                }
                sums[3 * p] = xAx;
                sums[3 * p + 1] = xDx;
                sums[3 * p + 2] = yDinvY;
            });
            double num = 0, den = 0, norm = 0;
            for (int p = 0; p < parts.Count; p++)
            {
                num += sums[3 * p];
                den += sums[3 * p + 1];
                norm += sums[3 * p + 2];
            }
            rho = Math.Max(rho, num / den);
            double scale = 1.0 / Math.Sqrt(norm);
            Vectors.VectorKernels.ForChunks(n, (s, e) =>
            {
                for (int i = s; i < e; i++)
                {
                    x[i] = y[i] * scale;
                }
            });
        }
        return 1.05 * rho;
    }
}
