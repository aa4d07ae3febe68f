namespace Electrostat.Rendering.FieldMaps;

/// <summary>Options of a field map. Immutable.</summary>
public sealed record FieldMapOptions
{
    /// <summary>Image width, pixels (the height follows the aspect ratio of the view).</summary>
    public int WidthPixels { get; init; } = 1000;

    /// <summary>Per-element or recovered shading.</summary>
    public FieldShading Shading { get; init; } = FieldShading.Recovered;

    /// <summary>
    /// True for a logarithmic colour scale, false for linear, null to choose: logarithmic when the peak exceeds
    /// <see cref="AutoLogRatio"/> times the median |E| (a sharp edge that would leave the rest of a linear map dark).
    /// </summary>
    public bool? LogScale { get; init; }

    /// <summary>Peak-to-median |E| ratio above which the automatic choice is logarithmic (dimensionless).</summary>
    public double AutoLogRatio { get; init; } = 20;

    /// <summary>Wanted number of intervals between equipotentials (the step is rounded to 1, 2, 2.5 or 5 × 10ⁿ volts).</summary>
    public int EquipotentialIntervals { get; init; } = 10;

    /// <summary>True to print each equipotential's voltage beside it.</summary>
    public bool LabelEquipotentials { get; init; } = true;

    /// <summary>True to draw every mesh edge over the shading.</summary>
    public bool MeshOverlay { get; init; }

    /// <summary>Axisymmetric designs only: also draw the mirror image about the axis (the full section).</summary>
    public bool MirrorAxisymmetric { get; init; }

    /// <summary>True to draw the numbered hot-spot markers.</summary>
    public bool HotSpotMarkers { get; init; } = true;

    /// <summary>
    /// Window to show instead of the whole design, metres (min x, min y, max x, max y); null for the whole mesh.
    /// The colour scale then spans the field in the window only.
    /// </summary>
    public (double MinX, double MinY, double MaxX, double MaxY)? Window { get; init; }

    /// <summary>Title printed above the map; null for none.</summary>
    public string? Title { get; init; }
}
