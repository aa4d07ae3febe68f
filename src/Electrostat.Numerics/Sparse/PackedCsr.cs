using Electrostat.Numerics.Parallelism;

namespace Electrostat.Numerics.Sparse;

/// <summary>
/// A CSR matrix whose values are stored in single precision and used in double-precision arithmetic: the
/// working form of multigrid operators, whose V-cycle is memory-bound, so halving the value bytes cuts its
/// traffic by about a third. It shares the pattern arrays of the double matrix it was packed from.
/// </summary>
/// <remarks>
/// The packed matrix is an exactly symmetric perturbation (relative 6e-8) of a symmetric source, and a packed
/// prolongator and its packed transpose stay exact transposes, so a V-cycle built from packed operators is still
/// an exactly symmetric preconditioner; only its approximation quality, not its symmetry, sees the rounding.
/// </remarks>
internal sealed class PackedCsr
{
    private readonly RowPartition _partition;

    public PackedCsr(CsrMatrix source)
    {
        Rows = source.Rows;
        Columns = source.Columns;
        RowPointers = source.RowPointers;
        ColumnIndices = source.ColumnIndices;
        int nnz = source.NonZeroCount;
        Values = new float[nnz];
        var v = source.Values;
        var packed = Values;
        Vectors.VectorKernels.ForChunks(nnz, (s, e) =>
        {
            for (int k = s; k < e; k++)
            {
                packed[k] = (float)v[k];
            }
        });
        int workers = nnz >= ParallelPolicy.MinimumParallelWork ? ParallelPolicy.DefaultWorkers : 1;
        _partition = RowPartition.ByEntries(RowPointers, Rows, workers);
    }

    public int Rows { get; }

    public int Columns { get; }

    public int[] RowPointers { get; }

    public int[] ColumnIndices { get; }

    public float[] Values { get; }

    /// <summary>y ← A·x.</summary>
    public void Multiply(double[] x, double[] y) => Run((s, e) => MultiplyRows(x, y, s, e, accumulate: false));

    /// <summary>y ← y + A·x.</summary>
    public void MultiplyAdd(double[] x, double[] y) => Run((s, e) => MultiplyRows(x, y, s, e, accumulate: true));

    /// <summary>r ← b − A·x.</summary>
    public void Residual(double[] b, double[] x, double[] r) => Run((s, e) => ResidualRows(b, x, r, s, e));

    /// <summary>
    /// Fused residual and restriction: c ← Pᵀ·(b − A·x) without storing the residual, where
    /// <paramref name="prolongator"/> (fine × coarse) is read row by row alongside A. Each worker scatters into its
    /// own coarse vector from <paramref name="partials"/> (one per worker, coarse length) and they are summed in
    /// worker order, so the result does not depend on thread timing. Saves writing and re-reading the fine
    /// residual and reading a separate restriction matrix.
    /// </summary>
    public void ResidualRestrict(double[] b, double[] x, PackedCsr prolongator, double[] coarse, double[][] partials)
    {
        int parts = _partition.Count;
        if (parts == 1)
        {
            Array.Clear(coarse);
            ResidualRestrictRows(b, x, prolongator, coarse, 0, Rows);
            return;
        }
        Parallel.For(0, parts, k =>
        {
            var local = partials[k];
            Array.Clear(local);
            ResidualRestrictRows(b, x, prolongator, local, _partition.Start(k), _partition.End(k));
        });
        Vectors.VectorKernels.ForChunks(coarse.Length, (s, e) =>
        {
            for (int j = s; j < e; j++)
            {
                double sum = 0;
                for (int k = 0; k < parts; k++)
                {
                    sum += partials[k][j];
                }
                coarse[j] = sum;
            }
        });
    }

    /// <summary>Number of row blocks the kernels use (one per worker).</summary>
    public int Workers => _partition.Count;

    private void ResidualRestrictRows(double[] b, double[] x, PackedCsr prolongator, double[] coarse, int start, int end)
    {
        var rp = RowPointers; var ci = ColumnIndices; var v = Values;
        var prp = prolongator.RowPointers; var pci = prolongator.ColumnIndices; var pv = prolongator.Values;
        for (int i = start; i < end; i++)
        {
            double sum = b[i];
            int e = rp[i + 1];
            for (int k = rp[i]; k < e; k++)
            {
                sum -= v[k] * x[ci[k]];
            }
            int pe = prp[i + 1];
            for (int k = prp[i]; k < pe; k++)
            {
                coarse[pci[k]] += pv[k] * sum;
            }
        }
    }

    private void Run(Action<int, int> body)
    {
        if (_partition.Count == 1)
        {
            body(0, Rows);
            return;
        }
        Parallel.For(0, _partition.Count, k => body(_partition.Start(k), _partition.End(k)));
    }

    private void MultiplyRows(double[] x, double[] y, int start, int end, bool accumulate)
    {
        var rp = RowPointers; var ci = ColumnIndices; var v = Values;
        for (int i = start; i < end; i++)
        {
            double sum = accumulate ? y[i] : 0.0;
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
        var rp = RowPointers; var ci = ColumnIndices; var v = Values;
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
    }
}
