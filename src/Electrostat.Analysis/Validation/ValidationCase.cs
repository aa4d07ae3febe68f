using Electrostat.Analysis.Pipeline;

namespace Electrostat.Analysis.Validation;

/// <summary>
/// One row of the validation table: a quantity computed from one or more designs in geometries/validation/, its
/// published reference value and the tolerance it must meet.
/// </summary>
/// <param name="Name">Short name of the case and quantity.</param>
/// <param name="Source">The published source of the reference value.</param>
/// <param name="DesignFiles">File names under geometries/validation/ that the measurement reads, in order.</param>
/// <param name="ReferenceValue">Reference value, SI units.</param>
/// <param name="DisplayUnit">Unit shown in the table (e.g. "pF/m").</param>
/// <param name="DisplayScale">Factor from SI to <paramref name="DisplayUnit"/> (e.g. 1e12 for pF/m).</param>
/// <param name="RelativeTolerance">Largest allowed |ours − reference| / |reference|; the reason is in <paramref name="ToleranceNote"/>.</param>
/// <param name="ToleranceNote">Why the tolerance has this size.</param>
/// <param name="Smooth">True for a smooth problem, where the tool's error estimate must bracket the true error.</param>
/// <param name="Measure">Reads the value from the solved designs (same order as <paramref name="DesignFiles"/>).</param>
public sealed record ValidationCase(
    string Name,
    string Source,
    IReadOnlyList<string> DesignFiles,
    double ReferenceValue,
    string DisplayUnit,
    double DisplayScale,
    double RelativeTolerance,
    string ToleranceNote,
    bool Smooth,
    Func<IReadOnlyList<SolveOutcome>, ValidationMeasurement> Measure);
