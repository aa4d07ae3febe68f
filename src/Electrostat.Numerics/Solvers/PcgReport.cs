namespace Electrostat.Numerics.Solvers;

/// <summary>The outcome of one conjugate-gradient solve.</summary>
public sealed record PcgReport
{
    /// <summary>How the solve ended. Only <see cref="PcgStatus.Converged"/> means the tolerance was met.</summary>
    public required PcgStatus Status { get; init; }

    /// <summary>True when <see cref="Status"/> is <see cref="PcgStatus.Converged"/>.</summary>
    public bool Converged => Status == PcgStatus.Converged;

    /// <summary>Number of CG iterations (matrix–vector products with A, not counting residual checks).</summary>
    public required int Iterations { get; init; }

    /// <summary>‖b − A·x‖₂/‖b‖₂ of the initial guess (dimensionless).</summary>
    public required double InitialRelativeResidual { get; init; }

    /// <summary>‖b − A·x‖₂/‖b‖₂ of the returned x, recomputed from scratch (not the recursively updated residual).</summary>
    public required double FinalRelativeResidual { get; init; }

    /// <summary>The relative residual after each iteration (empty unless history was requested).</summary>
    public required IReadOnlyList<double> ResidualHistory { get; init; }

    /// <summary>Wall-clock time of the solve, seconds.</summary>
    public required double Seconds { get; init; }

    /// <summary>A one-line human-readable summary.</summary>
    public override string ToString() =>
        $"PCG {Status}: {Iterations} iterations, relative residual {FinalRelativeResidual:E2}, {Seconds:F3} s";
}
