using System.Globalization;
using System.Text;
using SkiaSharp;

namespace Electrostat.Rendering.Drawing;

/// <summary>
/// Writes a <see cref="Sketch"/> as SVG: the shaded triangles as one embedded PNG (the raster layer), everything
/// else as vector elements on top.
/// </summary>
public static class SvgPainter
{
    /// <summary>The sketch as an SVG document.</summary>
    /// <param name="sketch">The sketch.</param>
    public static string Write(Sketch sketch)
    {
        ArgumentNullException.ThrowIfNull(sketch);
        var inv = CultureInfo.InvariantCulture;
        var sb = new StringBuilder();
        sb.Append(inv, $"<svg xmlns=\"http://www.w3.org/2000/svg\" width=\"{sketch.WidthPixels}\" height=\"{sketch.HeightPixels}\" viewBox=\"0 0 {sketch.WidthPixels} {sketch.HeightPixels}\">\n");
        if (sketch.Items.Any(i => i is ShadedTrianglesItem))
        {
            string png = Convert.ToBase64String(PngPainter.Encode(sketch, rasterOnly: true));
            sb.Append(inv, $"<image x=\"0\" y=\"0\" width=\"{sketch.WidthPixels}\" height=\"{sketch.HeightPixels}\" href=\"data:image/png;base64,{png}\"/>\n");
        }
        else
        {
            sb.Append(inv, $"<rect width=\"100%\" height=\"100%\" fill=\"{Hex(sketch.Background)}\"/>\n");
        }
        foreach (var item in sketch.Items)
        {
            switch (item)
            {
                case PolylineItem p:
                    sb.Append(p.Closed ? "<polygon points=\"" : "<polyline points=\"");
                    AppendPoints(sb, p.Points);
                    sb.Append(inv, $"\" fill=\"{(p.Fill is SKColor f ? Hex(f) : "none")}\"{Opacity("fill-opacity", p.Fill)} stroke=\"{(p.Stroke.Alpha > 0 ? Hex(p.Stroke) : "none")}\"{Opacity("stroke-opacity", p.Stroke)} stroke-width=\"{F(p.Width)}\" stroke-linejoin=\"round\"");
                    if (p.Dashed) sb.Append(inv, $" stroke-dasharray=\"{F(6 * p.Width)} {F(4 * p.Width)}\"");
                    sb.Append("/>\n");
                    break;
                case AreaItem a:
                    sb.Append("<path d=\"");
                    foreach (var ring in a.Rings)
                    {
                        for (int i = 0; i < ring.Length; i++) sb.Append(i == 0 ? 'M' : 'L').Append(F(ring[i].X)).Append(' ').Append(F(ring[i].Y));
                        sb.Append('Z');
                    }
                    sb.Append(inv, $"\" fill=\"{Hex(a.Fill)}\" fill-rule=\"evenodd\" stroke=\"{Hex(a.Stroke)}\" stroke-width=\"{F(a.Width)}\"/>\n");
                    break;
                case SegmentsItem g:
                    sb.Append("<path d=\"");
                    for (int i = 0; i + 1 < g.Endpoints.Length; i += 2)
                        sb.Append(inv, $"M{F(g.Endpoints[i].X)} {F(g.Endpoints[i].Y)}L{F(g.Endpoints[i + 1].X)} {F(g.Endpoints[i + 1].Y)}");
                    sb.Append(inv, $"\" fill=\"none\" stroke=\"{Hex(g.Stroke)}\"{Opacity("stroke-opacity", g.Stroke)} stroke-width=\"{F(g.Width)}\" stroke-linecap=\"round\"/>\n");
                    break;
                case CircleItem c:
                    sb.Append(inv, $"<circle cx=\"{F(c.Centre.X)}\" cy=\"{F(c.Centre.Y)}\" r=\"{F(c.Radius)}\" fill=\"{Hex(c.Fill)}\" stroke=\"{Hex(c.Stroke)}\" stroke-width=\"{F(c.Width)}\"/>\n");
                    break;
                case RectangleItem r:
                    sb.Append(inv, $"<rect x=\"{F(r.Rect.Left)}\" y=\"{F(r.Rect.Top)}\" width=\"{F(r.Rect.Width)}\" height=\"{F(r.Rect.Height)}\" fill=\"{Hex(r.Fill)}\"");
                    if (r.Stroke is SKColor s) sb.Append(inv, $" stroke=\"{Hex(s)}\"");
                    sb.Append("/>\n");
                    break;
                case TextItem t:
                    string anchor = t.Anchor switch { TextAnchor.Middle => "middle", TextAnchor.End => "end", _ => "start" };
                    sb.Append(inv, $"<text x=\"{F(t.At.X)}\" y=\"{F(t.At.Y)}\" font-family=\"{Typefaces.SvgFamily}\" font-size=\"{F(t.Size)}\" text-anchor=\"{anchor}\" fill=\"{Hex(t.Colour)}\"");
                    if (t.RotationDegrees != 0) sb.Append(inv, $" transform=\"rotate({F(t.RotationDegrees)} {F(t.At.X)} {F(t.At.Y)})\"");
                    if (t.Halo) sb.Append(" stroke=\"#ffffff\" stroke-opacity=\"0.86\" stroke-width=\"3\" paint-order=\"stroke\" stroke-linejoin=\"round\"");
                    sb.Append('>').Append(Escape(t.Text)).Append("</text>\n");
                    break;
            }
        }
        sb.Append("</svg>\n");
        return sb.ToString();
    }

    private static void AppendPoints(StringBuilder sb, SKPoint[] points)
    {
        for (int i = 0; i < points.Length; i++)
        {
            if (i > 0) sb.Append(' ');
            sb.Append(F(points[i].X)).Append(',').Append(F(points[i].Y));
        }
    }

    private static string F(float v) => v.ToString("0.##", CultureInfo.InvariantCulture);

    private static string Hex(SKColor c) => string.Create(CultureInfo.InvariantCulture, $"#{c.Red:x2}{c.Green:x2}{c.Blue:x2}");

    private static string Opacity(string attribute, SKColor? c) =>
        c is SKColor k && k.Alpha < 255 ? string.Create(CultureInfo.InvariantCulture, $" {attribute}=\"{k.Alpha / 255.0:0.###}\"") : "";

    private static string Escape(string text) =>
        text.Replace("&", "&amp;", StringComparison.Ordinal).Replace("<", "&lt;", StringComparison.Ordinal).Replace(">", "&gt;", StringComparison.Ordinal);
}
