using Electrostat.Numerics.Parallelism;
using Electrostat.Numerics.Sparse;

namespace Electrostat.Numerics.Multigrid;

/// <summary>
/// The Galerkin coarse matrix A_c = R·A·P with R = Pᵀ, formed row by row without storing A·P: for coarse row I,
/// first w = R(I,:)·A with a fine-index accumulator, then A_c(I,:) = w·P with a coarse-index accumulator
/// (Gustavson-style dense accumulators; Gustavson 1978, ACM TOMS 4:250–269). This never allocates the large
/// fine × coarse intermediate A·P. It works on the double-precision P (not the packed copy the cycle uses):
/// rounded transfer operators would no longer map constants exactly, which turns the exactly singular coarse
/// matrix of a floating (pure Neumann) problem into a nearly singular one that a Cholesky factor accepts with a
/// tiny pivot.
/// </summary>
internal static class GalerkinProduct
{
    public static CsrMatrix Compute(CsrMatrix r, CsrMatrix a, CsrMatrix p)
    {
        int coarse = r.Rows, fine = a.Rows;
        var rrp = r.RowPointers; var rci = r.ColumnIndices; var rv = r.Values;
        var arp = a.RowPointers; var aci = a.ColumnIndices; var av = a.Values;
        var prp = p.RowPointers; var pci = p.ColumnIndices; var pv = p.Values;
        var rowPointers = new int[coarse + 1];
        long work = (long)rrp[coarse] * Math.Max(1, a.NonZeroCount / Math.Max(1, fine));
        var parts = RowPartition.ByEntries(rrp, coarse, work > 100_000 ? ParallelPolicy.DefaultWorkers : 1);
        var buffers = new RowBuffer[parts.Count];
        Parallel.For(0, parts.Count, part =>
        {
            // Dense accumulators stay zero between rows; "touched" lists record which entries to read and reset.
            // Appending to them is branch-free (the count advances only on a first touch), because the
            // first-touch test is unpredictable and mispredictions dominated the branching version.
            var fineMark = new int[fine];
            Array.Fill(fineMark, -1);
            var fineAcc = new double[fine];
            var fineTouched = new int[1024];
            var coarseMark = new int[coarse];
            Array.Fill(coarseMark, -1);
            var coarseAcc = new double[coarse];
            var coarseTouched = new int[1024];
            int s0 = parts.Start(part), e0 = parts.End(part);
            // In smoothed aggregation nnz(A_c) is close to nnz(R); a small margin avoids regrowth in the usual case
            // without allocating (and page-faulting) twice the memory.
            var buffer = new RowBuffer((int)Math.Min(int.MaxValue / 2, 1.2 * (rrp[e0] - rrp[s0]) + 1024));
            for (int row = s0; row < e0; row++)
            {
                int nf = 0;
                for (int kr = rrp[row]; kr < rrp[row + 1]; kr++)
                {
                    int i = rci[kr];
                    double ri = rv[kr];
                    if (nf + arp[i + 1] - arp[i] > fineTouched.Length)
                    {
                        Array.Resize(ref fineTouched, 2 * fineTouched.Length + arp[i + 1] - arp[i]);
                    }
                    for (int ka = arp[i]; ka < arp[i + 1]; ka++)
                    {
                        int k = aci[ka];
                        fineAcc[k] += ri * av[ka];
                        fineTouched[nf] = k;
                        nf += fineMark[k] != row ? 1 : 0;
                        fineMark[k] = row;
                    }
                }
                int nc = 0;
                for (int t = 0; t < nf; t++)
                {
                    int k = fineTouched[t];
                    double wk = fineAcc[k];
                    fineAcc[k] = 0;
                    if (nc + prp[k + 1] - prp[k] > coarseTouched.Length)
                    {
                        Array.Resize(ref coarseTouched, 2 * coarseTouched.Length + prp[k + 1] - prp[k]);
                    }
                    for (int kp = prp[k]; kp < prp[k + 1]; kp++)
                    {
                        int c = pci[kp];
                        coarseAcc[c] += wk * pv[kp];
                        coarseTouched[nc] = c;
                        nc += coarseMark[c] != row ? 1 : 0;
                        coarseMark[c] = row;
                    }
                }
                var cols = coarseTouched.AsSpan(0, nc);
                cols.Sort();
                buffer.Reserve(nc);
                int start = buffer.Count;
                var bc = buffer.Columns;
                var bv = buffer.Values;
                for (int t = 0; t < nc; t++)
                {
                    int c = cols[t];
                    bc[start + t] = c;
                    bv[start + t] = coarseAcc[c];
                    coarseAcc[c] = 0;
                }
                buffer.Count = start + nc;
                rowPointers[row + 1] = nc;
            }
            buffers[part] = buffer;
        });
        return RowBuffer.Concatenate(coarse, coarse, rowPointers, buffers, parts.Start);
    }
}
