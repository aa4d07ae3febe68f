namespace Electrostat.Rendering.Charts;

/// <summary>What a line chart shows. Immutable.</summary>
public sealed record LineChart
{
    /// <summary>Title above the plot.</summary>
    public required string Title { get; init; }

    /// <summary>x axis label with its unit, e.g. "arc length (mm)".</summary>
    public required string XLabel { get; init; }

    /// <summary>y axis label with its unit, e.g. "|E| (kV/mm)".</summary>
    public required string YLabel { get; init; }

    /// <summary>The lines.</summary>
    public IReadOnlyList<ChartSeries> Series { get; init; } = [];

    /// <summary>Horizontal reference lines.</summary>
    public IReadOnlyList<ChartGuide> Guides { get; init; } = [];

    /// <summary>True to start the y axis at zero (when every value is positive).</summary>
    public bool YFromZero { get; init; } = true;

    /// <summary>Image width, pixels.</summary>
    public int WidthPixels { get; init; } = 760;

    /// <summary>Image height, pixels.</summary>
    public int HeightPixels { get; init; } = 380;
}
