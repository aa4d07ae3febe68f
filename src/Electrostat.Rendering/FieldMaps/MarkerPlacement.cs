namespace Electrostat.Rendering.FieldMaps;

/// <summary>Where a numbered hot-spot marker was drawn.</summary>
/// <param name="Rank">The hot spot's rank (the number shown).</param>
/// <param name="PixelX">Marker centre x, pixels.</param>
/// <param name="PixelY">Marker centre y, pixels.</param>
public readonly record struct MarkerPlacement(int Rank, double PixelX, double PixelY);
