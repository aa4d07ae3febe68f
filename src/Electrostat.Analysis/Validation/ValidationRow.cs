namespace Electrostat.Analysis.Validation;

/// <summary>The result of one validation case.</summary>
/// <param name="Case">The case.</param>
/// <param name="Measurement">The measured value and the tool's estimate (null when the solve failed).</param>
/// <param name="Elements">Triangles of the final meshes of the case's designs (summed).</param>
/// <param name="Seconds">Wall time of the solves of the case's designs (summed), seconds.</param>
/// <param name="Failure">The error message when a design could not be loaded or solved, else null.</param>
public sealed record ValidationRow(ValidationCase Case, ValidationMeasurement? Measurement, int Elements, double Seconds, string? Failure)
{
    /// <summary>|ours − reference| / |reference| (dimensionless), NaN when nothing was measured.</summary>
    public double RelativeError => Measurement is null
        ? double.NaN
        : Math.Abs(Measurement.Value - Case.ReferenceValue) / Math.Abs(Case.ReferenceValue);

    /// <summary>True when the value was measured and lies within the case's tolerance.</summary>
    public bool WithinTolerance => Measurement is not null && RelativeError <= Case.RelativeTolerance;

    /// <summary>True when the tool's estimate is at least the true error (always true for non-smooth cases and for
    /// quantities without an estimate, which are not held to this test).</summary>
    public bool EstimateBrackets => !Case.Smooth || Measurement is null || double.IsNaN(Measurement.EstimatedRelativeError)
        || Measurement.EstimatedRelativeError >= RelativeError || RelativeError < RoundOffFloor;

    /// <summary>Errors below this (dimensionless) are round-off, e.g. P1 reproducing a linear field exactly; an estimate
    /// of zero then counts as bracketing.</summary>
    public const double RoundOffFloor = 1e-9;

    /// <summary>True when the row passes: within tolerance and, on smooth cases, the estimate brackets the error.</summary>
    public bool Passed => WithinTolerance && EstimateBrackets;
}
