using Electrostat.Rendering.FieldMaps;

namespace Electrostat.Rendering.Report;

/// <summary>Options of the report and its figures. Immutable.</summary>
public sealed record ReportOptions
{
    /// <summary>Options of the main field map (insets use the same shading and scale type).</summary>
    public FieldMapOptions Map { get; init; } = new();

    /// <summary>Number of hot spots that get a zoomed inset image.</summary>
    public int Insets { get; init; } = 3;

    /// <summary>Columns of the pointer-readout grid embedded in the page.</summary>
    public int ReadoutColumns { get; init; } = 160;

    /// <summary>True to also write the SVG of the field map.</summary>
    public bool WriteSvg { get; init; } = true;
}
