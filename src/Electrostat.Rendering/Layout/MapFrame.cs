namespace Electrostat.Rendering.Layout;

/// <summary>
/// The mapping from design coordinates (metres) to image pixels: uniform scale, y pointing up in the design and
/// down in the image.
/// </summary>
/// <remarks>
/// Pixel convention: pixel (i, j) covers [i, i+1) × [j, j+1), so the centre of the top-left pixel is (0.5, 0.5).
/// px = OffsetX + (x − MinXMetres)·PixelsPerMetre, py = OffsetY + (MaxYMetres − y)·PixelsPerMetre.
/// </remarks>
/// <param name="MinXMetres">Design x shown at the left edge of the plot area, metres.</param>
/// <param name="MaxYMetres">Design y shown at the top edge of the plot area, metres.</param>
/// <param name="PixelsPerMetre">Scale, pixels per metre.</param>
/// <param name="OffsetX">Pixel x of the plot area's left edge.</param>
/// <param name="OffsetY">Pixel y of the plot area's top edge.</param>
public readonly record struct MapFrame(double MinXMetres, double MaxYMetres, double PixelsPerMetre, double OffsetX, double OffsetY)
{
    /// <summary>Pixel x of design x (metres).</summary>
    /// <param name="xMetres">Design x, metres.</param>
    public double PixelX(double xMetres) => OffsetX + (xMetres - MinXMetres) * PixelsPerMetre;

    /// <summary>Pixel y of design y (metres).</summary>
    /// <param name="yMetres">Design y, metres.</param>
    public double PixelY(double yMetres) => OffsetY + (MaxYMetres - yMetres) * PixelsPerMetre;

    /// <summary>Design x (metres) of pixel x.</summary>
    /// <param name="px">Pixel x.</param>
    public double DesignX(double px) => MinXMetres + (px - OffsetX) / PixelsPerMetre;

    /// <summary>Design y (metres) of pixel y.</summary>
    /// <param name="py">Pixel y.</param>
    public double DesignY(double py) => MaxYMetres - (py - OffsetY) / PixelsPerMetre;

    /// <summary>
    /// The frame that fits the box [minX, maxX] × [minY, maxY] (metres) into a plot area of the given size (pixels)
    /// at its top-left pixel (offsetX, offsetY), centred along the axis that has room to spare.
    /// </summary>
    /// <param name="minX">Box left, metres.</param>
    /// <param name="minY">Box bottom, metres.</param>
    /// <param name="maxX">Box right, metres.</param>
    /// <param name="maxY">Box top, metres.</param>
    /// <param name="widthPixels">Plot area width, pixels.</param>
    /// <param name="heightPixels">Plot area height, pixels.</param>
    /// <param name="offsetX">Plot area left, pixels.</param>
    /// <param name="offsetY">Plot area top, pixels.</param>
    public static MapFrame Fit(double minX, double minY, double maxX, double maxY, double widthPixels, double heightPixels, double offsetX, double offsetY)
    {
        double w = Math.Max(maxX - minX, 1e-12), h = Math.Max(maxY - minY, 1e-12);
        double scale = Math.Min(widthPixels / w, heightPixels / h);
        double padX = (widthPixels - w * scale) / 2, padY = (heightPixels - h * scale) / 2;
        return new MapFrame(minX, maxY, scale, offsetX + padX, offsetY + padY);
    }
}
