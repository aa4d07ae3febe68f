namespace Electrostat.Numerics.Sparse;

/// <summary>
/// Growable (column, value) storage for rows produced by one worker, so that a sparse product can be formed in a
/// single numeric pass (no symbolic counting pass); the pieces are concatenated afterwards by
/// <see cref="Concatenate"/>.
/// </summary>
internal sealed class RowBuffer(int capacity)
{
    public int[] Columns { get; private set; } = new int[Math.Max(16, capacity)];

    public double[] Values { get; private set; } = new double[Math.Max(16, capacity)];

    public int Count { get; set; }

    /// <summary>Makes room for <paramref name="extra"/> more entries.</summary>
    public void Reserve(int extra)
    {
        if (Count + extra <= Columns.Length)
        {
            return;
        }
        int size = Math.Max(Count + extra, (int)Math.Min(int.MaxValue - 64, 2L * Columns.Length));
        var c = new int[size];
        var v = new double[size];
        Array.Copy(Columns, c, Count);
        Array.Copy(Values, v, Count);
        Columns = c;
        Values = v;
    }

    /// <summary>
    /// Builds a CSR matrix from per-worker buffers; worker p produced rows [starts[p], starts[p+1]) and
    /// <paramref name="rowPointers"/> holds each row's length at index row + 1 and is turned into row pointers.
    /// </summary>
    public static CsrMatrix Concatenate(int rows, int columns, int[] rowPointers, RowBuffer[] buffers, Func<int, int> partStart)
    {
        for (int i = 0; i < rows; i++)
        {
            rowPointers[i + 1] += rowPointers[i];
        }
        var ci = new int[rowPointers[rows]];
        var v = new double[rowPointers[rows]];
        Parallel.For(0, buffers.Length, p =>
        {
            int offset = rowPointers[partStart(p)];
            Array.Copy(buffers[p].Columns, 0, ci, offset, buffers[p].Count);
            Array.Copy(buffers[p].Values, 0, v, offset, buffers[p].Count);
        });
        return new CsrMatrix(rows, columns, rowPointers, ci, v, validate: false);
    }
}
