using Electrostat.Analysis.Clearance;
using Electrostat.Analysis.HotSpots;

namespace Electrostat.Analysis;

/// <summary>Options of <see cref="DesignAnalyzer"/> (immutable).</summary>
public sealed record AnalysisOptions
{
    /// <summary>Hot-spot selection.</summary>
    public HotSpotOptions HotSpots { get; init; } = new();

    /// <summary>PCB spacing category to check clearances against (IPC-2221B Table 6-1), or null for none.</summary>
    public SpacingCategory? PcbSpacingCategory { get; init; }
}
