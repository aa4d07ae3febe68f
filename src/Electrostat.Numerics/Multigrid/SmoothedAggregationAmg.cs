using System.Diagnostics;
using Electrostat.Numerics.Solvers;
using Electrostat.Numerics.Sparse;

namespace Electrostat.Numerics.Multigrid;

/// <summary>
/// Algebraic multigrid by smoothed aggregation (Vaněk, Mandel and Brezina 1996, "Algebraic multigrid by smoothed
/// aggregation for second and fourth order elliptic problems", Computing 56:179–196), used as a symmetric positive
/// definite preconditioner for conjugate gradients. Build it once per matrix; apply it to any number of
/// right-hand sides.
/// </summary>
/// <remarks>
/// <para>Setup per level: strength of connection and aggregation (<see cref="AmgOptions.StrengthThreshold"/>),
/// tentative prolongator from the constant near-null-space vector, Jacobi-smoothed prolongator
/// P = (I − ω·D⁻¹A)·T with ω from a power-iteration estimate of ρ(D⁻¹A), restriction R = Pᵀ and the Galerkin
/// coarse matrix A_c = Pᵀ·A·P (formed row by row, no A·P intermediate). The cycle then uses single-precision
/// copies of A_l and P (see <c>PackedCsr</c>); restriction by Pᵀ is fused with the residual computation. The coarsest level (≤ <see cref="AmgOptions.CoarsestRows"/>
/// rows) is factorised densely.</para>
/// <para>Apply: one V-cycle with ℓ1 hybrid Gauss–Seidel (<see cref="AmgOptions.Sweeps"/> forward sweeps before and
/// as many backward sweeps after the coarse correction). Its error propagator is then (I − M⁻ᵀA)(I − P·E_c·PᵀA)(I − M⁻¹A), with E_c the coarse
/// cycle, which is A-self-adjoint; the cycle is therefore a symmetric preconditioner, and positive definite
/// whenever the smoother converges in the A-norm, which the ℓ1 diagonal guarantees.</para>
/// <para>Not thread-safe: work vectors are kept per level, so one instance runs one V-cycle at a time.</para>
/// </remarks>
public sealed class SmoothedAggregationAmg : IPreconditioner
{
    /// <summary>
    /// Largest last level that is factorised densely (rows; a dense Cholesky factor of 1,200 rows costs about 0.6
    /// GFlop and 11 MB); beyond it the last level is only relaxed.
    /// </summary>
    private const int MaxDenseRows = 1200;

    /// <summary>Symmetric sweep pairs on a last level too large to factorise.</summary>
    private const int CoarseSweeps = 4;

    private readonly Level[] _levels;
    private readonly DenseCoarseSolver? _coarse;
    private readonly int _sweeps;

    private SmoothedAggregationAmg(Level[] levels, DenseCoarseSolver? coarse, int sweeps, AmgHierarchyStats stats)
    {
        _levels = levels;
        _coarse = coarse;
        _sweeps = sweeps;
        Stats = stats;
    }

    /// <inheritdoc />
    public int Size => _levels[0].Rows;

    /// <summary>Levels, sizes, complexities and setup time of the hierarchy.</summary>
    public AmgHierarchyStats Stats { get; }

    /// <summary>
    /// Builds the hierarchy for the symmetric positive definite <paramref name="matrix"/> (positive diagonal
    /// required). The matrix is referenced, not copied: do not change its values while the preconditioner is in use.
    /// </summary>
    /// <param name="matrix">Square SPD matrix.</param>
    /// <param name="options">Settings; null for the defaults.</param>
    public static SmoothedAggregationAmg Build(CsrMatrix matrix, AmgOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(matrix);
        options ??= new AmgOptions();
        if (matrix.Rows != matrix.Columns)
        {
            throw new ArgumentException($"Multigrid needs a square matrix (got {matrix.Rows} x {matrix.Columns}).", nameof(matrix));
        }
        if (matrix.Rows == 0)
        {
            throw new ArgumentException("The matrix has no rows.", nameof(matrix));
        }
        if (options.Sweeps < 1 || options.CoarsestRows < 1 || options.MaxLevels < 1 || !(options.StrengthThreshold >= 0))
        {
            throw new ArgumentException("AmgOptions: Sweeps, CoarsestRows and MaxLevels must be positive and StrengthThreshold non-negative.", nameof(options));
        }
        var clock = Stopwatch.StartNew();
        var levels = new List<Level>();
        var a = matrix;
        var nullSpace = new double[a.Rows];
        Array.Fill(nullSpace, 1.0);
        double theta = options.StrengthThreshold;
        while (levels.Count + 1 < options.MaxLevels && a.Rows > options.CoarsestRows)
        {
            // The level's work vectors double as scratch for the power iteration.
            var work = new Level(a);
            var diagonal = a.Diagonal();
            for (int i = 0; i < diagonal.Length; i++)
            {
                if (!(diagonal[i] > 0))
                {
                    throw new ArgumentException($"Row {i} of the level-{levels.Count} matrix has diagonal {diagonal[i]}; smoothed aggregation needs a symmetric positive definite matrix.", nameof(matrix));
                }
            }
            var agg = Aggregation.Build(a, diagonal, theta, out int aggregates);
            if (aggregates > options.MaxCoarseningRatio * a.Rows || aggregates == 0)
            {
                break;
            }
            var packed = new PackedCsr(a);
            double rho = Prolongator.SpectralRadiusBound(a, diagonal);
            if (options.SpectralRadiusIterations > 0)
            {
                // Gershgorin is a safe but loose bound on P1 and coarse SA matrices (often 20-60 % high), which
                // under-smooths the prolongator and costs CG iterations; the power estimate is never allowed above it.
                rho = Math.Min(rho, Prolongator.SpectralRadiusEstimate(packed, diagonal, work.RightHandSide, work.Solution, options.SpectralRadiusIterations));
            }
            double omega = options.ProlongatorDamping / rho;
            // The prolongator is smoothed with A itself, not with the filtered matrix of Vaněk et al. (§3, weak
            // couplings lumped onto the diagonal): filtering lowered the operator complexity (1.51 → 1.37) but on
            // high-contrast dielectrics it cost 35 instead of 20 CG iterations at contrast 10³ and 114 instead of
            // 32 at 10⁶ (measured on a jittered P1 problem with 90,000 unknowns); robustness to permittivity
            // contrast matters more here than 10 % of V-cycle time.
            var p = Prolongator.Build(a, diagonal, agg, aggregates, nullSpace, omega, out nullSpace);
            var r = p.Transpose();
            var coarse = GalerkinProduct.Compute(r, a, p);
            var packedP = new PackedCsr(p);
            work.Complete(packed, packedP, new HybridGaussSeidel(packed));
            levels.Add(work);
            a = coarse;
            theta *= 0.5;
        }
        // Aggregation can stall (e.g. a diagonal-dominant matrix without strong couplings) and leave a large
        // last level; a dense factor of it would not fit, so such a level is relaxed by symmetric sweeps instead,
        // which are accurate exactly when coarsening stalled for lack of strong couplings.
        var last = new Level(a);
        DenseCoarseSolver? coarseSolver = null;
        if (a.Rows <= MaxDenseRows)
        {
            coarseSolver = new DenseCoarseSolver(a);
        }
        else
        {
            var packed = new PackedCsr(a);
            last.Complete(packed, null, new HybridGaussSeidel(packed));
        }
        levels.Add(last);
        var stats = new AmgHierarchyStats
        {
            Levels = levels.Select((l, i) => new AmgLevelStats(i, l.Rows, l.NonZeros)).ToArray(),
            CoarsestSolver = coarseSolver?.Method ?? $"{CoarseSweeps} symmetric Gauss-Seidel sweeps",
            SetupSeconds = clock.Elapsed.TotalSeconds,
        };
        return new SmoothedAggregationAmg(levels.ToArray(), coarseSolver, options.Sweeps, stats);
    }

    /// <summary>z ← V·r, one symmetric V-cycle started from zero.</summary>
    public void Apply(double[] r, double[] z)
    {
        ArgumentNullException.ThrowIfNull(r);
        ArgumentNullException.ThrowIfNull(z);
        if (r.Length != Size || z.Length != Size)
        {
            throw new ArgumentException($"Vectors must have length {Size} (got {r.Length}, {z.Length}).");
        }
        Cycle(0, r, z);
    }

    private void Cycle(int l, double[] b, double[] x)
    {
        if (l == _levels.Length - 1)
        {
            if (_coarse is not null)
            {
                _coarse.Solve(b, x);
                return;
            }
            // k symmetric Gauss-Seidel steps from zero: the operator [I − (I − M_s⁻¹A)^k]A⁻¹ is symmetric.
            var relax = _levels[l].Smoother!;
            relax.ForwardFromZero(b, x);
            relax.Backward(b, x);
            for (int s = 1; s < CoarseSweeps; s++)
            {
                relax.Forward(b, x);
                relax.Backward(b, x);
            }
            return;
        }
        var level = _levels[l];
        var next = _levels[l + 1];
        var smoother = level.Smoother!;
        smoother.ForwardFromZero(b, x);
        for (int s = 1; s < _sweeps; s++)
        {
            smoother.Forward(b, x);
        }
        level.Packed!.ResidualRestrict(b, x, level.P!, next.RightHandSide, level.RestrictionPartials!);
        Cycle(l + 1, next.RightHandSide, next.Solution);
        level.P!.MultiplyAdd(next.Solution, x);
        for (int s = 0; s < _sweeps; s++)
        {
            smoother.Backward(b, x);
        }
    }

    /// <summary>
    /// One level. The double-precision level matrix is not kept (only its packed copy), so coarse levels cost
    /// 8 rather than 12 bytes per entry after setup.
    /// </summary>
    private sealed class Level(CsrMatrix a)
    {
        public int Rows { get; } = a.Rows;

        public int NonZeros { get; } = a.NonZeroCount;

        /// <summary>The level matrix as used by the cycle.</summary>
        public PackedCsr? Packed { get; private set; }

        public PackedCsr? P { get; private set; }

        /// <summary>Per-worker coarse vectors for the fused residual-restriction.</summary>
        public double[][]? RestrictionPartials { get; private set; }

        public HybridGaussSeidel? Smoother { get; private set; }

        public double[] RightHandSide { get; } = new double[a.Rows];

        public double[] Solution { get; } = new double[a.Rows];

        public void Complete(PackedCsr packed, PackedCsr? p, HybridGaussSeidel smoother)
        {
            Packed = packed;
            if (p is not null && packed.Workers > 1)
            {
                RestrictionPartials = new double[packed.Workers][];
                for (int k = 0; k < packed.Workers; k++)
                {
                    RestrictionPartials[k] = new double[p.Columns];
                }
            }
            P = p;
            Smoother = smoother;
        }
    }
}
