using SkiaSharp;

namespace Electrostat.Rendering.Drawing;

/// <summary>Paints a <see cref="Sketch"/> with SkiaSharp and encodes it as PNG.</summary>
public static class PngPainter
{
    /// <summary>The sketch as PNG bytes.</summary>
    /// <param name="sketch">The sketch.</param>
    /// <param name="rasterOnly">True to paint only the background and the shaded triangles (the SVG's raster layer).</param>
    public static byte[] Encode(Sketch sketch, bool rasterOnly = false)
    {
        ArgumentNullException.ThrowIfNull(sketch);
        using var bitmap = Paint(sketch, rasterOnly);
        using var image = SKImage.FromBitmap(bitmap);
        using var data = image.Encode(SKEncodedImageFormat.Png, 100);
        return data.ToArray();
    }

    /// <summary>The sketch painted into a new bitmap (RGBA, premultiplied); the caller disposes it.</summary>
    /// <param name="sketch">The sketch.</param>
    /// <param name="rasterOnly">True to paint only the background and the shaded triangles.</param>
    public static SKBitmap Paint(Sketch sketch, bool rasterOnly = false)
    {
        ArgumentNullException.ThrowIfNull(sketch);
        var bitmap = new SKBitmap(new SKImageInfo(sketch.WidthPixels, sketch.HeightPixels, SKColorType.Rgba8888, SKAlphaType.Premul));
        using var canvas = new SKCanvas(bitmap);
        canvas.Clear(sketch.Background);
        foreach (var item in sketch.Items)
        {
            if (rasterOnly && item is not ShadedTrianglesItem) continue;
            Draw(canvas, item);
        }
        canvas.Flush();
        return bitmap;
    }

    private static void Draw(SKCanvas canvas, SketchItem item)
    {
        switch (item)
        {
            case ShadedTrianglesItem s:
            {
                // No anti-aliasing: neighbouring triangles must meet without hairline seams.
                using var paint = new SKPaint { IsAntialias = false };
                using var vertices = SKVertices.CreateCopy(SKVertexMode.Triangles, s.Positions, s.Colours);
                canvas.DrawVertices(vertices, SKBlendMode.Dst, paint);
                break;
            }
            case PolylineItem p:
            {
                using var path = new SKPath();
                path.AddPoly(p.Points, p.Closed);
                if (p.Fill is SKColor fill)
                {
                    using var fp = new SKPaint { IsAntialias = true, Color = fill, Style = SKPaintStyle.Fill };
                    canvas.DrawPath(path, fp);
                }
                if (p.Stroke.Alpha > 0 && p.Width > 0)
                {
                    using var sp = StrokePaint(p.Stroke, p.Width);
                    if (p.Dashed) sp.PathEffect = SKPathEffect.CreateDash([6f * p.Width, 4f * p.Width], 0);
                    canvas.DrawPath(path, sp);
                }
                break;
            }
            case AreaItem a:
            {
                using var path = new SKPath { FillType = SKPathFillType.EvenOdd };
                foreach (var ring in a.Rings) path.AddPoly(ring, true);
                using var fp = new SKPaint { IsAntialias = true, Color = a.Fill, Style = SKPaintStyle.Fill };
                canvas.DrawPath(path, fp);
                using var sp = StrokePaint(a.Stroke, a.Width);
                canvas.DrawPath(path, sp);
                break;
            }
            case SegmentsItem g:
            {
                using var sp = StrokePaint(g.Stroke, g.Width);
                sp.StrokeCap = SKStrokeCap.Round;
                canvas.DrawPoints(SKPointMode.Lines, g.Endpoints, sp);
                break;
            }
            case CircleItem c:
            {
                using var fp = new SKPaint { IsAntialias = true, Color = c.Fill, Style = SKPaintStyle.Fill };
                canvas.DrawCircle(c.Centre, c.Radius, fp);
                using var sp = StrokePaint(c.Stroke, c.Width);
                canvas.DrawCircle(c.Centre, c.Radius, sp);
                break;
            }
            case RectangleItem r:
            {
                using var fp = new SKPaint { IsAntialias = false, Color = r.Fill, Style = SKPaintStyle.Fill };
                canvas.DrawRect(r.Rect, fp);
                if (r.Stroke is SKColor stroke)
                {
                    using var sp = StrokePaint(stroke, 1);
                    canvas.DrawRect(r.Rect, sp);
                }
                break;
            }
            case TextItem t:
            {
                using var font = new SKFont(Typefaces.Get(), t.Size);
                var align = t.Anchor switch { TextAnchor.Middle => SKTextAlign.Center, TextAnchor.End => SKTextAlign.Right, _ => SKTextAlign.Left };
                canvas.Save();
                if (t.RotationDegrees != 0) canvas.RotateDegrees(t.RotationDegrees, t.At.X, t.At.Y);
                if (t.Halo)
                {
                    using var hp = new SKPaint { IsAntialias = true, Color = new SKColor(255, 255, 255, 220), Style = SKPaintStyle.Stroke, StrokeWidth = 3, StrokeJoin = SKStrokeJoin.Round };
                    canvas.DrawText(t.Text, t.At.X, t.At.Y, align, font, hp);
                }
                using var tp = new SKPaint { IsAntialias = true, Color = t.Colour, Style = SKPaintStyle.Fill };
                canvas.DrawText(t.Text, t.At.X, t.At.Y, align, font, tp);
                canvas.Restore();
                break;
            }
            default:
                System.Diagnostics.Debug.Fail("Unknown sketch item " + item.GetType().Name);
                break;
        }
    }

    private static SKPaint StrokePaint(SKColor colour, float width) =>
        new() { IsAntialias = true, Color = colour, Style = SKPaintStyle.Stroke, StrokeWidth = width, StrokeJoin = SKStrokeJoin.Round };

    /// <summary>Width of a text in pixels with the labels' typeface.</summary>
    /// <param name="text">Text.</param>
    /// <param name="size">Font size, pixels.</param>
    public static float MeasureText(string text, float size)
    {
        using var font = new SKFont(Typefaces.Get(), size);
        return font.MeasureText(text);
    }
}
