namespace Electrostat.Rendering.Charts;

/// <summary>A horizontal reference line across a chart (a limit or threshold), dashed, with its own legend entry.</summary>
/// <param name="Name">Legend text.</param>
/// <param name="Y">Ordinate, in the chart's y unit.</param>
public sealed record ChartGuide(string Name, double Y);
