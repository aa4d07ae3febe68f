using System.Diagnostics;
using Electrostat.Numerics.Parallelism;

namespace Electrostat.Numerics.Sparse;

/// <summary>
/// Sparse matrix–matrix product C = A·B by rows with a dense marker accumulator (Gustavson 1978, "Two fast
/// algorithms for sparse matrices: multiplication and permuted transposition", ACM TOMS 4:250–269).
/// Rows are split over the cores; a symbolic pass counts each row, a numeric pass fills it.
/// </summary>
internal static class SparseProduct
{
    public static CsrMatrix Multiply(CsrMatrix a, CsrMatrix b, bool sortRows)
    {
        Debug.Assert(a.Columns == b.Rows);
        int rows = a.Rows, cols = b.Columns;
        var arp = a.RowPointers; var aci = a.ColumnIndices; var av = a.Values;
        var brp = b.RowPointers; var bci = b.ColumnIndices; var bv = b.Values;
        var rp = new int[rows + 1];
        long work = (long)a.NonZeroCount * Math.Max(1, b.NonZeroCount / Math.Max(1, b.Rows));
        var parts = RowPartition.ByEntries(arp, rows, work > 200_000 ? ParallelPolicy.DefaultWorkers : 1);
        Parallel.For(0, parts.Count, p =>
        {
            var marker = new int[cols];
            Array.Fill(marker, -1);
            for (int i = parts.Start(p); i < parts.End(p); i++)
            {
                int count = 0;
                for (int ka = arp[i]; ka < arp[i + 1]; ka++)
                {
                    int j = aci[ka];
                    for (int kb = brp[j]; kb < brp[j + 1]; kb++)
                    {
                        int c = bci[kb];
                        if (marker[c] != i)
                        {
                            marker[c] = i;
                            count++;
                        }
                    }
                }
                rp[i + 1] = count;
            }
        });
        for (int i = 0; i < rows; i++)
        {
            rp[i + 1] += rp[i];
        }
        var ci = new int[rp[rows]];
        var v = new double[rp[rows]];
        Parallel.For(0, parts.Count, p =>
        {
            var position = new int[cols];
            Array.Fill(position, -1);
            for (int i = parts.Start(p); i < parts.End(p); i++)
            {
                int start = rp[i];
                int next = start;
                for (int ka = arp[i]; ka < arp[i + 1]; ka++)
                {
                    int j = aci[ka];
                    double aij = av[ka];
                    for (int kb = brp[j]; kb < brp[j + 1]; kb++)
                    {
                        int c = bci[kb];
                        int pos = position[c];
                        if (pos < start)
                        {
                            position[c] = next;
                            ci[next] = c;
                            v[next] = aij * bv[kb];
                            next++;
                        }
                        else
                        {
                            v[pos] += aij * bv[kb];
                        }
                    }
                }
                Debug.Assert(next == rp[i + 1]);
                if (sortRows)
                {
                    SortRow(ci.AsSpan(start, next - start), v.AsSpan(start, next - start));
                }
            }
        });
        return new CsrMatrix(rows, cols, rp, ci, v, validate: false);
    }

    /// <summary>Sorts one row's (column, value) pairs by column.</summary>
    public static void SortRow(Span<int> columns, Span<double> values)
    {
        if (columns.Length > 32)
        {
            columns.Sort(values);
            return;
        }
        for (int i = 1; i < columns.Length; i++)
        {
            int c = columns[i];
            double x = values[i];
            int j = i - 1;
            while (j >= 0 && columns[j] > c)
            {
                columns[j + 1] = columns[j];
                values[j + 1] = values[j];
                j--;
            }
            columns[j + 1] = c;
            values[j + 1] = x;
        }
    }
}
