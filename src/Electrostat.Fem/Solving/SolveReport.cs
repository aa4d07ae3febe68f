namespace Electrostat.Fem.Solving;

/// <summary>What one linear solve did and cost.</summary>
public sealed record SolveReport
{
    /// <summary>Number of unknowns of the reduced system.</summary>
    public required int Unknowns { get; init; }

    /// <summary>Stored entries of the reduced matrix.</summary>
    public required long NonZeros { get; init; }

    /// <summary>Conjugate-gradient iterations.</summary>
    public required int Iterations { get; init; }

    /// <summary>Final ‖b − K·u‖₂/‖b‖₂, recomputed from scratch (dimensionless).</summary>
    public required double RelativeResidual { get; init; }

    /// <summary>True when the residual met the tolerance. When false, the potentials are the last iterate: do not trust them.</summary>
    public required bool Converged { get; init; }

    /// <summary>Assembly time of the matrix this solve used, seconds (0 when it reused one assembled before).</summary>
    public required double AssemblySeconds { get; init; }

    /// <summary>Preconditioner setup time, seconds (0 when it reused one set up before).</summary>
    public required double PreconditionerSetupSeconds { get; init; }

    /// <summary>Right-hand side and conjugate-gradient time, seconds.</summary>
    public required double SolveSeconds { get; init; }

    /// <summary>Name of the preconditioner used.</summary>
    public required string Preconditioner { get; init; }

    /// <summary>A one-line summary.</summary>
    public override string ToString() =>
        $"{Unknowns} unknowns, {Iterations} iterations, residual {RelativeResidual:E2}{(Converged ? "" : " (NOT converged)")}, " +
        $"assembly {AssemblySeconds:F3} s, setup {PreconditionerSetupSeconds:F3} s, solve {SolveSeconds:F3} s";
}
