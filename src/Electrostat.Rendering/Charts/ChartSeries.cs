namespace Electrostat.Rendering.Charts;

/// <summary>One line of a chart, in the units named by the chart's axis labels.</summary>
/// <param name="Name">Legend text.</param>
/// <param name="X">Abscissae.</param>
/// <param name="Y">Ordinates (same length as <paramref name="X"/>); NaN breaks the line.</param>
/// <param name="ShowPoints">True to mark each point with a dot (sweeps with few points).</param>
public sealed record ChartSeries(string Name, IReadOnlyList<double> X, IReadOnlyList<double> Y, bool ShowPoints = false);
