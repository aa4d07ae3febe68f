namespace Electrostat.Cli.Sweeps;

/// <summary>Everything a sweep (or a shard, or a merge) writes out.</summary>
/// <param name="DesignPath">The design file as given.</param>
/// <param name="Axes">The varied parameters.</param>
/// <param name="TotalCases">Number of cases in the full grid (goal-seek: the number solved).</param>
/// <param name="Shard">"k/N" for a shard; null for a whole sweep or a merge.</param>
/// <param name="Planar">True when the design is planar (capacitance per metre of depth).</param>
/// <param name="Accuracy">Accuracy level name.</param>
/// <param name="FixedOverrides">The <c>--set</c> overrides shared by every case.</param>
/// <param name="Cases">The cases, by index (goal-seek: by parameter value).</param>
/// <param name="Goal">The goal and its answer, for goal-seek.</param>
/// <param name="GoalResult">The goal-seek answer.</param>
/// <param name="LargestWanted">Goal-seek direction.</param>
/// <param name="RequiredMargin">The design's required margin (a guide on the margin chart), if any.</param>
internal sealed record SweepReport(
    string DesignPath,
    IReadOnlyList<SweepAxis> Axes,
    int TotalCases,
    string? Shard,
    bool Planar,
    string Accuracy,
    IReadOnlyDictionary<string, string> FixedOverrides,
    IReadOnlyList<SweepCase> Cases,
    SweepGoal? Goal = null,
    GoalResult? GoalResult = null,
    bool LargestWanted = false,
    double? RequiredMargin = null)
{
    /// <summary>Metric names in order of first appearance over the cases (a stable column order).</summary>
    public List<string> MetricNames()
    {
        var names = new List<string>();
        var seen = new HashSet<string>(StringComparer.Ordinal);
        foreach (var c in Cases)
            foreach (var k in c.Metrics.Keys)
                if (seen.Add(k)) names.Add(k);
        return names;
    }
}
