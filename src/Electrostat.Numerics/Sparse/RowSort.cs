namespace Electrostat.Numerics.Sparse;

/// <summary>Sorting of one CSR row's (column, value) pairs by column.</summary>
internal static class RowSort
{
    /// <summary>Sorts by column; insertion sort for the short rows of FEM matrices, introsort otherwise.</summary>
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
