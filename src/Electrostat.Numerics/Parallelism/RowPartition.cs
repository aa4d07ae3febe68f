using System.Diagnostics;

namespace Electrostat.Numerics.Parallelism;

/// <summary>
/// A split of the rows <c>[0, rows)</c> of a sparse matrix into a small number of contiguous ranges with
/// about equal numbers of stored entries, so that each worker of a static parallel loop gets the same
/// memory traffic (SpMV and smoothing are bandwidth-bound, so nnz, not rows, measures the work).
/// </summary>
internal sealed class RowPartition
{
    private readonly int[] _starts;

    private RowPartition(int[] starts) => _starts = starts;

    /// <summary>Number of ranges.</summary>
    public int Count => _starts.Length - 1;

    /// <summary>First row of range <paramref name="k"/>.</summary>
    public int Start(int k) => _starts[k];

    /// <summary>One past the last row of range <paramref name="k"/>.</summary>
    public int End(int k) => _starts[k + 1];

    /// <summary>Splits rows by equal shares of the entries counted by <paramref name="rowPointers"/>.</summary>
    public static RowPartition ByEntries(int[] rowPointers, int rows, int parts)
    {
        Debug.Assert(parts >= 1);
        parts = Math.Max(1, Math.Min(parts, Math.Max(1, rows)));
        var starts = new int[parts + 1];
        long nnz = rowPointers[rows];
        int row = 0;
        for (int k = 1; k < parts; k++)
        {
            long target = nnz * k / parts;
            while (row < rows && rowPointers[row] < target)
            {
                row++;
            }
            starts[k] = row;
        }
        starts[parts] = rows;
        return new RowPartition(starts);
    }

    /// <summary>Splits <c>[0, length)</c> into equal contiguous ranges.</summary>
    public static RowPartition Even(int length, int parts)
    {
        parts = Math.Max(1, Math.Min(parts, Math.Max(1, length)));
        var starts = new int[parts + 1];
        for (int k = 0; k <= parts; k++)
        {
            starts[k] = (int)((long)length * k / parts);
        }
        return new RowPartition(starts);
    }
}
