namespace Electrostat.Numerics.Multigrid;

/// <summary>Shape and cost of a multigrid hierarchy.</summary>
public sealed record AmgHierarchyStats
{
    /// <summary>One entry per level, finest first.</summary>
    public required IReadOnlyList<AmgLevelStats> Levels { get; init; }

    /// <summary>Σ nnz(A_l) / nnz(A_0): memory and smoothing work of a V-cycle relative to one fine matrix.</summary>
    public double OperatorComplexity => Levels.Sum(l => (double)l.NonZeros) / Levels[0].NonZeros;

    /// <summary>Σ rows(A_l) / rows(A_0).</summary>
    public double GridComplexity => Levels.Sum(l => (double)l.Rows) / Levels[0].Rows;

    /// <summary>How the coarsest level is solved ("Cholesky", "pseudo-inverse", or relaxation sweeps if coarsening stalled).</summary>
    public required string CoarsestSolver { get; init; }

    /// <summary>Wall-clock setup time, seconds.</summary>
    public required double SetupSeconds { get; init; }

    /// <summary>A one-line human-readable summary.</summary>
    public override string ToString() =>
        $"{Levels.Count} levels, rows {string.Join('/', Levels.Select(l => l.Rows))}, operator complexity {OperatorComplexity:F2}, grid complexity {GridComplexity:F2}, setup {SetupSeconds:F3} s";
}
