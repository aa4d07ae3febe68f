using System.Diagnostics;
using Electrostat.Numerics.Parallelism;
using MathNet.Numerics.LinearAlgebra;

namespace Electrostat.Numerics.Sparse;

/// <summary>
/// A real sparse matrix in compressed sparse row (CSR) form: row <c>i</c> holds the entries
/// <c>Values[k]</c> at columns <c>ColumnIndices[k]</c> for <c>k</c> in <c>[RowPointers[i], RowPointers[i+1])</c>.
/// </summary>
/// <remarks>
/// Invariants (checked by <see cref="Validate"/>): <c>RowPointers[0] == 0</c>, row pointers are
/// non-decreasing, and the column indices of each row are strictly increasing and inside
/// <c>[0, Columns)</c>. Explicitly stored zeros are allowed (the assembly pattern keeps them).
/// The matrix is usually symmetric in use, but the type stores both triangles and makes no symmetry
/// assumption, so rectangular coupling blocks use the same type. The value array may be changed in place
/// (assembly writes into it); the pattern arrays must not be.
/// </remarks>
public sealed class CsrMatrix
{
    private PartitionCache? _partition;

    /// <summary>Creates a matrix over existing arrays (not copied). Throws if the CSR invariants fail.</summary>
    /// <param name="rows">Number of rows.</param>
    /// <param name="columns">Number of columns.</param>
    /// <param name="rowPointers">Length <paramref name="rows"/> + 1.</param>
    /// <param name="columnIndices">Column of each entry, sorted within each row.</param>
    /// <param name="values">Value of each entry.</param>
    public CsrMatrix(int rows, int columns, int[] rowPointers, int[] columnIndices, double[] values)
        : this(rows, columns, rowPointers, columnIndices, values, validate: true)
    {
    }

    internal CsrMatrix(int rows, int columns, int[] rowPointers, int[] columnIndices, double[] values, bool validate)
    {
        ArgumentNullException.ThrowIfNull(rowPointers);
        ArgumentNullException.ThrowIfNull(columnIndices);
        ArgumentNullException.ThrowIfNull(values);
        Rows = rows;
        Columns = columns;
        RowPointers = rowPointers;
        ColumnIndices = columnIndices;
        Values = values;
        if (validate)
        {
            Validate();
        }
    }

    /// <summary>Number of rows.</summary>
    public int Rows { get; }

    /// <summary>Number of columns.</summary>
    public int Columns { get; }

    /// <summary>Row start offsets into <see cref="ColumnIndices"/> and <see cref="Values"/>, length Rows + 1.</summary>
    public int[] RowPointers { get; }

    /// <summary>Column index of each stored entry (sorted, unique within a row).</summary>
    public int[] ColumnIndices { get; }

    /// <summary>Value of each stored entry.</summary>
    public double[] Values { get; }

    /// <summary>Number of stored entries.</summary>
    public int NonZeroCount => RowPointers[Rows];

    /// <summary>The row split for the current worker count (<see cref="Parallelism.WorkerLimit"/> scope), cached per
    /// count: a matrix built outside a limited scope and used inside one follows the scope's limit.</summary>
    internal RowPartition Partition
    {
        get
        {
            int workers = ParallelPolicy.DefaultWorkers;
            var cached = _partition;
            if (cached is not null && cached.Workers == workers) return cached.Rows;
            cached = new PartitionCache(workers, RowPartition.ByEntries(RowPointers, Rows, workers));
            _partition = cached; // one reference write: readers see a consistent pair
            return cached.Rows;
        }
    }

    private sealed record PartitionCache(int Workers, RowPartition Rows);

    /// <summary>Checks the CSR invariants and throws <see cref="ArgumentException"/> naming the first violation.</summary>
    public void Validate()
    {
        if (Rows < 0 || Columns < 0)
        {
            throw new ArgumentException($"Matrix dimensions must be non-negative (got {Rows} x {Columns}).");
        }
        if (RowPointers.Length != Rows + 1 || RowPointers[0] != 0)
        {
            throw new ArgumentException($"RowPointers must have length Rows+1 = {Rows + 1} and start at 0.");
        }
        int nnz = RowPointers[Rows];
        if (ColumnIndices.Length < nnz || Values.Length < nnz)
        {
            throw new ArgumentException($"ColumnIndices/Values hold fewer than the {nnz} entries the row pointers declare.");
        }
        for (int i = 0; i < Rows; i++)
        {
            int s = RowPointers[i], e = RowPointers[i + 1];
            if (e < s)
            {
                throw new ArgumentException($"RowPointers decrease at row {i}.");
            }
            for (int k = s; k < e; k++)
            {
                int c = ColumnIndices[k];
                if ((uint)c >= (uint)Columns)
                {
                    throw new ArgumentException($"Column index {c} in row {i} is outside [0, {Columns}).");
                }
                if (k > s && c <= ColumnIndices[k - 1])
                {
                    throw new ArgumentException($"Column indices of row {i} are not strictly increasing at column {c}.");
                }
            }
        }
    }

    /// <summary>y ← A·x, split over the cores by equal shares of stored entries.</summary>
    public void Multiply(double[] x, double[] y)
    {
        ArgumentNullException.ThrowIfNull(x);
        ArgumentNullException.ThrowIfNull(y);
        if (x.Length != Columns || y.Length != Rows)
        {
            throw new ArgumentException($"Multiply needs x of length {Columns} and y of length {Rows} (got {x.Length}, {y.Length}).");
        }
        if (NonZeroCount < ParallelPolicy.MinimumParallelWork)
        {
            MultiplyRows(x, y, 0, Rows);
            return;
        }
        var parts = Partition;
        Parallel.For(0, parts.Count, k => MultiplyRows(x, y, parts.Start(k), parts.End(k)));
    }

    /// <summary>y ← A·x on the calling thread only (for small matrices and spans).</summary>
    public void MultiplySerial(ReadOnlySpan<double> x, Span<double> y)
    {
        if (x.Length != Columns || y.Length != Rows)
        {
            throw new ArgumentException($"Multiply needs x of length {Columns} and y of length {Rows} (got {x.Length}, {y.Length}).");
        }
        MultiplyRows(x, y, 0, Rows);
    }

    /// <summary>y ← Aᵀ·x (serial scatter; used for rectangular coupling blocks, not in hot loops).</summary>
    public void MultiplyTransposed(ReadOnlySpan<double> x, Span<double> y)
    {
        if (x.Length != Rows || y.Length != Columns)
        {
            throw new ArgumentException($"MultiplyTransposed needs x of length {Rows} and y of length {Columns} (got {x.Length}, {y.Length}).");
        }
        y.Clear();
        for (int i = 0; i < Rows; i++)
        {
            double xi = x[i];
            for (int k = RowPointers[i]; k < RowPointers[i + 1]; k++)
            {
                y[ColumnIndices[k]] += Values[k] * xi;
            }
        }
    }

    /// <summary>y ← y + A·x (parallel for large matrices; used for multigrid interpolation).</summary>
    internal void MultiplyAdd(double[] x, double[] y)
    {
        if (NonZeroCount < ParallelPolicy.MinimumParallelWork)
        {
            MultiplyAddRows(x, y, 0, Rows);
            return;
        }
        var parts = Partition;
        Parallel.For(0, parts.Count, k => MultiplyAddRows(x, y, parts.Start(k), parts.End(k)));
    }

    private void MultiplyAddRows(double[] x, double[] y, int start, int end)
    {
        var rp = RowPointers;
        var ci = ColumnIndices;
        var v = Values;
        for (int i = start; i < end; i++)
        {
            double sum = y[i];
            int e = rp[i + 1];
            for (int k = rp[i]; k < e; k++)
            {
                sum += v[k] * x[ci[k]];
            }
            y[i] = sum;
        }
    }

    /// <summary>Computes r ← b − A·x (the residual), in parallel for large matrices.</summary>
    public void Residual(double[] b, double[] x, double[] r)
    {
        ArgumentNullException.ThrowIfNull(b);
        ArgumentNullException.ThrowIfNull(x);
        ArgumentNullException.ThrowIfNull(r);
        if (x.Length != Columns || b.Length != Rows || r.Length != Rows)
        {
            throw new ArgumentException("Residual needs b and r of length Rows and x of length Columns.");
        }
        if (NonZeroCount < ParallelPolicy.MinimumParallelWork)
        {
            ResidualRows(b, x, r, 0, Rows);
            return;
        }
        var parts = Partition;
        Parallel.For(0, parts.Count, k => ResidualRows(b, x, r, parts.Start(k), parts.End(k)));
    }

    /// <summary>Returns the stored value at (row, column), or 0 if the entry is not in the pattern.</summary>
    public double this[int row, int column]
    {
        get
        {
            int k = FindEntry(row, column);
            return k >= 0 ? Values[k] : 0.0;
        }
    }

    /// <summary>Returns the index into <see cref="Values"/> of entry (row, column), or −1 if not stored.</summary>
    public int FindEntry(int row, int column)
    {
        if ((uint)row >= (uint)Rows || (uint)column >= (uint)Columns)
        {
            throw new ArgumentOutOfRangeException(nameof(row), $"Entry ({row}, {column}) is outside the {Rows} x {Columns} matrix.");
        }
        int s = RowPointers[row];
        int k = Array.BinarySearch(ColumnIndices, s, RowPointers[row + 1] - s, column);
        return k >= 0 ? k : -1;
    }

    /// <summary>Returns the main diagonal (zeros where not stored).</summary>
    public double[] Diagonal()
    {
        int n = Math.Min(Rows, Columns);
        var d = new double[n];
        var rp = RowPointers; var ci = ColumnIndices; var v = Values;
        Vectors.VectorKernels.ForChunks(n, (s, e) =>
        {
            for (int i = s; i < e; i++)
            {
                for (int k = rp[i]; k < rp[i + 1]; k++)
                {
                    if (ci[k] == i)
                    {
                        d[i] = v[k];
                        break;
                    }
                }
            }
        });
        return d;
    }

    /// <summary>Returns Aᵀ as a new CSR matrix (counting sort, O(nnz)).</summary>
    public CsrMatrix Transpose()
    {
        int nnz = NonZeroCount;
        var rp = new int[Columns + 1];
        for (int k = 0; k < nnz; k++)
        {
            rp[ColumnIndices[k] + 1]++;
        }
        for (int j = 0; j < Columns; j++)
        {
            rp[j + 1] += rp[j];
        }
        var next = new int[Columns];
        Array.Copy(rp, next, Columns);
        var ci = new int[nnz];
        var v = new double[nnz];
        // Rows are visited in increasing order, so each transposed row comes out sorted.
        for (int i = 0; i < Rows; i++)
        {
            for (int k = RowPointers[i]; k < RowPointers[i + 1]; k++)
            {
                int dst = next[ColumnIndices[k]]++;
                ci[dst] = i;
                v[dst] = Values[k];
            }
        }
        return new CsrMatrix(Columns, Rows, rp, ci, v, validate: false);
    }

    /// <summary>Largest |A − Aᵀ| entry relative to the largest |A| entry (0 for an exactly symmetric matrix).</summary>
    public double RelativeAsymmetry()
    {
        if (Rows != Columns)
        {
            throw new InvalidOperationException($"A {Rows} x {Columns} matrix is not square.");
        }
        double maxAbs = 0, maxDiff = 0;
        for (int i = 0; i < Rows; i++)
        {
            for (int k = RowPointers[i]; k < RowPointers[i + 1]; k++)
            {
                int j = ColumnIndices[k];
                maxAbs = Math.Max(maxAbs, Math.Abs(Values[k]));
                int kt = FindEntry(j, i);
                double vt = kt >= 0 ? Values[kt] : 0.0;
                maxDiff = Math.Max(maxDiff, Math.Abs(Values[k] - vt));
            }
        }
        return maxAbs == 0 ? 0 : maxDiff / maxAbs;
    }

    /// <summary>Returns a dense MathNet copy (for small matrices: tests, capacitance-size blocks).</summary>
    public Matrix<double> ToDense()
    {
        var m = Matrix<double>.Build.Dense(Rows, Columns);
        for (int i = 0; i < Rows; i++)
        {
            for (int k = RowPointers[i]; k < RowPointers[i + 1]; k++)
            {
                m[i, ColumnIndices[k]] += Values[k];
            }
        }
        return m;
    }

    /// <summary>
    /// Builds a matrix from (row, column, value) triplets; duplicates are summed. Sorting-based, meant for
    /// small matrices and tests; FEM assembly should use <see cref="CsrAssemblyPlan"/>.
    /// </summary>
    public static CsrMatrix FromTriplets(int rows, int columns, IEnumerable<(int Row, int Column, double Value)> triplets)
    {
        ArgumentNullException.ThrowIfNull(triplets);
        var list = triplets.ToList();
        foreach (var t in list)
        {
            if ((uint)t.Row >= (uint)rows || (uint)t.Column >= (uint)columns)
            {
                throw new ArgumentOutOfRangeException(nameof(triplets), $"Triplet ({t.Row}, {t.Column}) is outside the {rows} x {columns} matrix.");
            }
        }
        list.Sort((a, b) => a.Row != b.Row ? a.Row.CompareTo(b.Row) : a.Column.CompareTo(b.Column));
        var rp = new int[rows + 1];
        var ci = new List<int>(list.Count);
        var v = new List<double>(list.Count);
        int prevRow = -1, prevColumn = -1;
        foreach (var (r, c, val) in list)
        {
            if (r == prevRow && c == prevColumn)
            {
                v[^1] += val;
                continue;
            }
            ci.Add(c);
            v.Add(val);
            rp[r + 1]++;
            prevRow = r;
            prevColumn = c;
        }
        for (int i = 0; i < rows; i++)
        {
            rp[i + 1] += rp[i];
        }
        return new CsrMatrix(rows, columns, rp, ci.ToArray(), v.ToArray());
    }

    /// <summary>Builds a CSR copy of the nonzero entries of a dense matrix.</summary>
    public static CsrMatrix FromDense(Matrix<double> dense)
    {
        ArgumentNullException.ThrowIfNull(dense);
        var triplets = new List<(int, int, double)>();
        for (int i = 0; i < dense.RowCount; i++)
        {
            for (int j = 0; j < dense.ColumnCount; j++)
            {
                if (dense[i, j] != 0)
                {
                    triplets.Add((i, j, dense[i, j]));
                }
            }
        }
        return FromTriplets(dense.RowCount, dense.ColumnCount, triplets);
    }

    private void MultiplyRows(ReadOnlySpan<double> x, Span<double> y, int start, int end)
    {
        var rp = RowPointers;
        var ci = ColumnIndices;
        var v = Values;
        for (int i = start; i < end; i++)
        {
            double sum = 0;
            int e = rp[i + 1];
            for (int k = rp[i]; k < e; k++)
            {
                sum += v[k] * x[ci[k]];
            }
            y[i] = sum;
        }
    }

    private void ResidualRows(double[] b, double[] x, double[] r, int start, int end)
    {
        var rp = RowPointers;
        var ci = ColumnIndices;
        var v = Values;
        for (int i = start; i < end; i++)
        {
            double sum = b[i];
            int e = rp[i + 1];
            for (int k = rp[i]; k < e; k++)
            {
                sum -= v[k] * x[ci[k]];
            }
            r[i] = sum;
        }
        Debug.Assert(end <= Rows);
    }
}
