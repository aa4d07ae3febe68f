using System.Diagnostics;
using Electrostat.Numerics.Parallelism;
using Electrostat.Numerics.Sparse;

namespace Electrostat.Numerics.Multigrid;

/// <summary>
/// The ℓ1 hybrid Gauss–Seidel smoother (Baker, Falgout, Kolev and Yang 2011, "Multigrid smoothers for
/// ultraparallel computing", SIAM J. Sci. Comput. 33:2864–2887): rows are split into contiguous blocks, one per
/// core; inside a block it is Gauss–Seidel, across blocks it is Jacobi (off-block values are read from a
/// snapshot taken before the sweep). Each row's diagonal is increased by the ℓ1 norm of its off-block
/// entries, which makes the smoother convergent for any SPD matrix and any number of blocks.
/// </summary>
/// <remarks>
/// As a splitting x ← x + M⁻¹(b − A·x), the forward sweep uses M = block-lower part of A with diagonal d;
/// <see cref="Backward"/> uses Mᵀ. Pairing a forward pre-smoother with a backward post-smoother therefore
/// makes the V-cycle a symmetric operator. The block split is fixed at construction, so results do not
/// depend on thread timing.
/// </remarks>
internal sealed class HybridGaussSeidel
{
    private readonly PackedCsr _a;
    private readonly RowPartition _blocks;
    private readonly double[] _inverseDiagonal;
    private readonly double[] _snapshot;
    private readonly int[] _diagonalPosition;
    private readonly bool[] _hasOffBlock;
    private readonly int[] _offBlockColumns;

    public HybridGaussSeidel(PackedCsr a)
    {
        _a = a;
        int workers = a.RowPointers[a.Rows] >= ParallelPolicy.MinimumParallelWork ? ParallelPolicy.DefaultWorkers : 1;
        _blocks = RowPartition.ByEntries(a.RowPointers, a.Rows, workers);
        _inverseDiagonal = new double[a.Rows];
        _snapshot = _blocks.Count > 1 ? new double[a.Rows] : [];
        _diagonalPosition = new int[a.Rows];
        _hasOffBlock = new bool[a.Rows];
        var rp = a.RowPointers; var ci = a.ColumnIndices; var v = a.Values;
        for (int blk = 0; blk < _blocks.Count; blk++)
        {
            int s = _blocks.Start(blk), e = _blocks.End(blk);
            for (int i = s; i < e; i++)
            {
                double d = 0, offBlock = 0;
                for (int k = rp[i]; k < rp[i + 1]; k++)
                {
                    int j = ci[k];
                    if (j == i)
                    {
                        d += v[k];
                        _diagonalPosition[i] = k;
                    }
                    else if ((uint)(j - s) >= (uint)(e - s))
                    {
                        offBlock += Math.Abs(v[k]);
                        _hasOffBlock[i] = true;
                    }
                }
                if (!(d > 0))
                {
                    throw new ArgumentException($"Row {i} has diagonal {d}; the multigrid preconditioner needs a symmetric positive definite matrix.");
                }
                _inverseDiagonal[i] = 1.0 / (d + offBlock);
            }
        }

        // The sweeps read other blocks' values only at these columns, so only they need a snapshot (a few
        // thousand values at 10⁶ rows instead of a full copy per sweep).
        var columns = new HashSet<int>();
        if (_blocks.Count > 1)
        {
            for (int blk = 0; blk < _blocks.Count; blk++)
            {
                int s = _blocks.Start(blk), e = _blocks.End(blk);
                for (int i = s; i < e; i++)
                {
                    if (!_hasOffBlock[i])
                    {
                        continue;
                    }
                    for (int k = rp[i]; k < rp[i + 1]; k++)
                    {
                        if ((uint)(ci[k] - s) >= (uint)(e - s))
                        {
                            columns.Add(ci[k]);
                        }
                    }
                }
            }
        }
        _offBlockColumns = columns.Order().ToArray();
    }

    private bool Parallel => _blocks.Count > 1;

    /// <summary>One forward sweep starting from x = 0 (x is overwritten; its old content is ignored).</summary>
    public void ForwardFromZero(double[] b, double[] x)
    {
        if (Parallel)
        {
            System.Threading.Tasks.Parallel.For(0, _blocks.Count, blk => ForwardFromZeroBlock(b, x, _blocks.Start(blk), _blocks.End(blk)));
        }
        else
        {
            ForwardFromZeroBlock(b, x, 0, _a.Rows);
        }
    }

    /// <summary>One forward sweep x ← x + M⁻¹(b − A·x).</summary>
    public void Forward(double[] b, double[] x)
    {
        if (Parallel)
        {
            TakeSnapshot(x);
            System.Threading.Tasks.Parallel.For(0, _blocks.Count, blk => Sweep(b, x, _blocks.Start(blk), _blocks.End(blk), forward: true));
        }
        else
        {
            Sweep(b, x, 0, _a.Rows, forward: true);
        }
    }

    /// <summary>One backward sweep x ← x + M⁻ᵀ(b − A·x), the adjoint of <see cref="Forward"/>.</summary>
    public void Backward(double[] b, double[] x)
    {
        if (Parallel)
        {
            TakeSnapshot(x);
            System.Threading.Tasks.Parallel.For(0, _blocks.Count, blk => Sweep(b, x, _blocks.Start(blk), _blocks.End(blk), forward: false));
        }
        else
        {
            Sweep(b, x, 0, _a.Rows, forward: false);
        }
    }

    private void TakeSnapshot(double[] x)
    {
        var snapshot = _snapshot;
        foreach (int j in _offBlockColumns)
        {
            snapshot[j] = x[j];
        }
    }

    private void ForwardFromZeroBlock(double[] b, double[] x, int s, int e)
    {
        var rp = _a.RowPointers; var ci = _a.ColumnIndices; var v = _a.Values; var dInv = _inverseDiagonal;
        var dpos = _diagonalPosition; var offBlock = _hasOffBlock;
        for (int i = s; i < e; i++)
        {
            // Columns are sorted, so the entries left of the diagonal are exactly j < i. Of those only the
            // already-updated rows of this block (j >= s) are nonzero; everything else is still 0.
            double sum = b[i];
            int d = dpos[i];
            if (!offBlock[i])
            {
                for (int k = rp[i]; k < d; k++)
                {
                    sum -= v[k] * x[ci[k]];
                }
            }
            else
            {
                for (int k = rp[i]; k < d; k++)
                {
                    int j = ci[k];
                    if (j >= s)
                    {
                        sum -= v[k] * x[j];
                    }
                }
            }
            x[i] = sum * dInv[i];
        }
    }

    private void Sweep(double[] b, double[] x, int s, int e, bool forward)
    {
        var rp = _a.RowPointers; var ci = _a.ColumnIndices; var v = _a.Values; var dInv = _inverseDiagonal;
        var offBlock = _hasOffBlock;
        var old = Parallel ? _snapshot : x;
        uint len = (uint)(e - s);
        int first = forward ? s : e - 1;
        int step = forward ? 1 : -1;
        for (int t = 0, i = first; t < e - s; t++, i += step)
        {
            double sum = b[i];
            int ke = rp[i + 1];
            if (!offBlock[i])
            {
                for (int k = rp[i]; k < ke; k++)
                {
                    sum -= v[k] * x[ci[k]];
                }
            }
            else
            {
                for (int k = rp[i]; k < ke; k++)
                {
                    int j = ci[k];
                    sum -= v[k] * ((uint)(j - s) < len ? x[j] : old[j]);
                }
            }
            x[i] += sum * dInv[i];
        }
        Debug.Assert(e <= x.Length);
    }
}
