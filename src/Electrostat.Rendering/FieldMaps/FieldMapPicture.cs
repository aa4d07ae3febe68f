using Electrostat.Rendering.Contours;
using Electrostat.Rendering.Drawing;
using Electrostat.Rendering.Layout;

namespace Electrostat.Rendering.FieldMaps;

/// <summary>A rendered field map: the picture and the numbers behind it (scale, colour range, levels, markers).</summary>
/// <param name="Sketch">The recorded picture (encode with <see cref="Png"/> or <see cref="Svg"/>).</param>
/// <param name="Frame">Design-to-pixel mapping of the map area (the right half for a mirrored section).</param>
/// <param name="ColourMinVoltsPerMetre">|E| at the bottom of the colour bar, V/m (the smallest field shown).</param>
/// <param name="ColourMaxVoltsPerMetre">|E| at the top of the colour bar, V/m (the largest field shown).</param>
/// <param name="LogScale">True when the colour scale is logarithmic.</param>
/// <param name="Equipotentials">Traced equipotential segments, design coordinates.</param>
/// <param name="LevelsVolts">Levels of the equipotentials, volts.</param>
/// <param name="Markers">Hot-spot markers as drawn.</param>
public sealed record FieldMapPicture(
    Sketch Sketch,
    MapFrame Frame,
    double ColourMinVoltsPerMetre,
    double ColourMaxVoltsPerMetre,
    bool LogScale,
    IReadOnlyList<IsolineSegment> Equipotentials,
    IReadOnlyList<double> LevelsVolts,
    IReadOnlyList<MarkerPlacement> Markers)
{
    /// <summary>The picture as PNG bytes.</summary>
    public byte[] Png() => PngPainter.Encode(Sketch);

    /// <summary>The picture as an SVG document.</summary>
    public string Svg() => SvgPainter.Write(Sketch);
}
