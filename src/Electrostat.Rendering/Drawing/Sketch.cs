using SkiaSharp;

namespace Electrostat.Rendering.Drawing;

/// <summary>
/// A picture recorded as a list of simple items (shaded triangles, lines, shapes, texts) in pixel coordinates, so
/// that one drawing routine feeds both the PNG painter and the SVG writer.
/// </summary>
/// <remarks>
/// Pixel coordinates: origin top-left, y down. Shaded triangles form the raster layer: the SVG writer embeds them
/// as one PNG image under the vector items, so that an SVG of a fine mesh stays small.
/// </remarks>
public sealed class Sketch
{
    private readonly List<SketchItem> _items = [];

    /// <summary>Creates an empty sketch.</summary>
    /// <param name="widthPixels">Width, pixels.</param>
    /// <param name="heightPixels">Height, pixels.</param>
    /// <param name="background">Background colour.</param>
    public Sketch(int widthPixels, int heightPixels, SKColor background)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(widthPixels, 1);
        ArgumentOutOfRangeException.ThrowIfLessThan(heightPixels, 1);
        WidthPixels = widthPixels;
        HeightPixels = heightPixels;
        Background = background;
    }

    /// <summary>Width, pixels.</summary>
    public int WidthPixels { get; }

    /// <summary>Height, pixels.</summary>
    public int HeightPixels { get; }

    /// <summary>Background colour.</summary>
    public SKColor Background { get; }

    /// <summary>The items in painting order.</summary>
    public IReadOnlyList<SketchItem> Items => _items;

    /// <summary>Adds triangles shaded by per-corner colours (raster layer).</summary>
    /// <param name="positions">Three corners per triangle, pixels.</param>
    /// <param name="colours">Colour of each corner.</param>
    public void ShadedTriangles(SKPoint[] positions, SKColor[] colours) => _items.Add(new ShadedTrianglesItem(positions, colours));

    /// <summary>Adds an open or closed polyline, optionally filled.</summary>
    /// <param name="points">Points, pixels.</param>
    /// <param name="stroke">Stroke colour (transparent for none).</param>
    /// <param name="width">Stroke width, pixels.</param>
    /// <param name="closed">True to close the path.</param>
    /// <param name="fill">Fill colour, or null.</param>
    /// <param name="dashed">True for a dashed stroke.</param>
    public void Polyline(SKPoint[] points, SKColor stroke, float width, bool closed = false, SKColor? fill = null, bool dashed = false) =>
        _items.Add(new PolylineItem(points, stroke, width, closed, fill, dashed));

    /// <summary>Adds many independent straight segments with one style (mesh edges, equipotentials).</summary>
    /// <param name="endpoints">Two points per segment, pixels.</param>
    /// <param name="stroke">Stroke colour.</param>
    /// <param name="width">Stroke width, pixels.</param>
    public void Segments(SKPoint[] endpoints, SKColor stroke, float width) => _items.Add(new SegmentsItem(endpoints, stroke, width));

    /// <summary>Adds an area bounded by closed rings, filled by the even-odd rule (so inner rings are holes).</summary>
    /// <param name="rings">Closed rings, pixels.</param>
    /// <param name="fill">Fill colour.</param>
    /// <param name="stroke">Outline colour.</param>
    /// <param name="width">Outline width, pixels.</param>
    public void Area(SKPoint[][] rings, SKColor fill, SKColor stroke, float width) => _items.Add(new AreaItem(rings, fill, stroke, width));

    /// <summary>Adds a circle.</summary>
    /// <param name="centre">Centre, pixels.</param>
    /// <param name="radius">Radius, pixels.</param>
    /// <param name="fill">Fill colour.</param>
    /// <param name="stroke">Stroke colour.</param>
    /// <param name="width">Stroke width, pixels.</param>
    public void Circle(SKPoint centre, float radius, SKColor fill, SKColor stroke, float width) => _items.Add(new CircleItem(centre, radius, fill, stroke, width));

    /// <summary>Adds a filled rectangle.</summary>
    /// <param name="rect">Rectangle, pixels.</param>
    /// <param name="fill">Fill colour.</param>
    /// <param name="stroke">Stroke colour, or null.</param>
    public void Rectangle(SKRect rect, SKColor fill, SKColor? stroke = null) => _items.Add(new RectangleItem(rect, fill, stroke));

    /// <summary>Adds a text (baseline at <paramref name="at"/>), optionally with a light halo for legibility on the map.</summary>
    /// <param name="at">Anchor point on the baseline, pixels.</param>
    /// <param name="text">Text.</param>
    /// <param name="size">Font size, pixels.</param>
    /// <param name="colour">Colour.</param>
    /// <param name="anchor">Horizontal placement.</param>
    /// <param name="halo">True for a halo behind the glyphs.</param>
    /// <param name="rotationDegrees">Rotation about the anchor, degrees clockwise (−90 for a vertical axis label).</param>
    public void Text(SKPoint at, string text, float size, SKColor colour, TextAnchor anchor = TextAnchor.Start, bool halo = false, float rotationDegrees = 0) =>
        _items.Add(new TextItem(at, text, size, colour, anchor, halo, rotationDegrees));
}
