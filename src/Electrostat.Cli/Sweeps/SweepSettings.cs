using Electrostat.Analysis.Pipeline;

namespace Electrostat.Cli.Sweeps;

/// <summary>What every case of a sweep shares: the design, fixed overrides, accuracy, budget and thread count.</summary>
/// <param name="DesignPath">The design file.</param>
/// <param name="FixedOverrides">The <c>--set</c> overrides, applied before the varied values.</param>
/// <param name="Accuracy">Accuracy level of each solve.</param>
/// <param name="MaxTriangles">Element budget of each solve; null for the level's.</param>
/// <param name="Threads">Most cases solved at once (at least 1).</param>
internal sealed record SweepSettings(string DesignPath, IReadOnlyDictionary<string, string> FixedOverrides, AccuracyLevel Accuracy, int? MaxTriangles, int Threads);
