namespace Electrostat.Numerics.Solvers;

/// <summary>Stopping rule and bookkeeping for <see cref="ConjugateGradient"/>.</summary>
public sealed record PcgOptions
{
    /// <summary>Stop when ‖b − A·x‖₂ / ‖b‖₂ ≤ this value (dimensionless).</summary>
    public double RelativeTolerance { get; init; } = 1e-10;

    /// <summary>Give up (and report failure, without throwing) after this many iterations.</summary>
    public int MaxIterations { get; init; } = 1000;

    /// <summary>Record ‖r‖/‖b‖ after every iteration in <see cref="PcgReport.ResidualHistory"/>.</summary>
    public bool RecordHistory { get; init; } = true;
}
