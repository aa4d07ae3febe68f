namespace Electrostat.Cli.Sweeps;

/// <summary>The outcome of one sweep case.</summary>
/// <param name="Index">Position in the full case list (0-based; first axis varies slowest).</param>
/// <param name="Parameters">The varied parameters' values, in the design's units.</param>
/// <param name="Status">"ok" when solved (whatever the verdict), "error" when the case failed.</param>
/// <param name="Verdict">"pass", "fail" or "not_checked" when solved; null on error.</param>
/// <param name="Metrics">Figures by name (see <see cref="CaseMetrics"/>), SI units.</param>
/// <param name="Error">The error message when <paramref name="Status"/> is "error".</param>
/// <param name="Seconds">Wall time of the case, seconds.</param>
internal sealed record SweepCase(
    int Index,
    IReadOnlyDictionary<string, double> Parameters,
    string Status,
    string? Verdict,
    IReadOnlyDictionary<string, double?> Metrics,
    string? Error,
    double Seconds)
{
    /// <summary>True when the case was solved.</summary>
    public bool Ok => Status == "ok";
}
