using Electrostat.Analysis;
using Electrostat.Analysis.Adaptivity;
using Electrostat.Analysis.Pipeline;
using Electrostat.Fem.Capacitance;

namespace Electrostat.Rendering.Report;

/// <summary>Everything the report and its figures are drawn from. Nothing here is solved again.</summary>
/// <param name="Context">The solved design (design, tables, final solution).</param>
/// <param name="Analysis">The analysis of the final solution.</param>
/// <param name="Capacitance">The Maxwell capacitance matrix, or null when not computed.</param>
/// <param name="Levels">Adaptive levels, oldest first (empty for a single solve).</param>
/// <param name="Converged">True when the adaptive loop met its tolerance.</param>
/// <param name="StopReason">Why the loop stopped, or null.</param>
/// <param name="PeakErrors">Estimated error of each material's peak |E|, by material name (may be empty).</param>
/// <param name="Warnings">Pipeline warnings in addition to the analysis warnings.</param>
/// <param name="AccuracyName">Name of the accuracy level used, or null.</param>
/// <param name="TotalSeconds">Wall time of the computation, seconds (NaN when unknown).</param>
public sealed record ReportInput(
    AnalysisContext Context,
    AnalysisReport Analysis,
    CapacitanceMatrixResult? Capacitance,
    IReadOnlyList<AdaptiveLevel> Levels,
    bool Converged,
    string? StopReason,
    IReadOnlyDictionary<string, ErrorEstimate> PeakErrors,
    IReadOnlyList<string> Warnings,
    string? AccuracyName,
    double TotalSeconds)
{
    /// <summary>The input for the outcome of <see cref="SolvePipeline.Run"/>.</summary>
    /// <param name="outcome">The pipeline outcome.</param>
    public static ReportInput FromOutcome(SolveOutcome outcome)
    {
        ArgumentNullException.ThrowIfNull(outcome);
        var context = new AnalysisContext(outcome.Design, outcome.Adaptive.Built.Tags, outcome.Adaptive.Built.Regions, outcome.Adaptive.Solution);
        return new ReportInput(context, outcome.Analysis, outcome.Adaptive.Capacitance, outcome.Adaptive.Levels, outcome.Adaptive.Converged,
            outcome.Adaptive.StopReason, outcome.Adaptive.PeakErrors, outcome.Warnings, outcome.Accuracy.Name, outcome.TotalSeconds);
    }

    /// <summary>The input for a single solve without the adaptive loop (no convergence history).</summary>
    /// <param name="context">The solved design.</param>
    /// <param name="analysis">Its analysis.</param>
    /// <param name="capacitance">The capacitance matrix, or null.</param>
    public static ReportInput FromSingleSolve(AnalysisContext context, AnalysisReport analysis, CapacitanceMatrixResult? capacitance) =>
        new(context, analysis, capacitance, [], false, "single solve without adaptive refinement", new Dictionary<string, ErrorEstimate>(), [], null, double.NaN);
}
