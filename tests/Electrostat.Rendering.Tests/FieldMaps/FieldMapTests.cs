using Electrostat.Analysis;
using Electrostat.Rendering.Colour;
using Electrostat.Rendering.FieldMaps;
using Electrostat.Rendering.Tests.Support;
using SkiaSharp;

namespace Electrostat.Rendering.Tests.FieldMaps;

public class FieldMapTests
{
    private static readonly FieldMapOptions Plain = new() { LabelEquipotentials = false, HotSpotMarkers = false, Shading = FieldShading.PerElement };

    // Line pixels: the white equipotential over viridis. Every viridis colour has one dark channel (its smallest
    // channel stays below MaxDarkChannel), so a pixel whose smallest channel is well above that is part of a line
    // (or a label, switched off here). The weight of a pixel is how far its smallest channel rises above the map.
    private static readonly int MaxDarkChannel = Enumerable.Range(0, 1001).Select(i => Viridis.At(i / 1000.0)).Max(c => Math.Min(c.Red, Math.Min(c.Green, c.Blue)));

    private static int Whiteness(SKColor c) => Math.Min(c.Red, Math.Min(c.Green, c.Blue)) - MaxDarkChannel;

    private static bool IsLinePixel(SKColor c) => Whiteness(c) > 20;

    private static List<double> LineCentres(Func<int, SKColor> pixel, int from, int to)
    {
        var centres = new List<double>();
        int i = from;
        while (i <= to)
        {
            if (!IsLinePixel(pixel(i))) { i++; continue; }
            double sw = 0, s = 0;
            while (i <= to && IsLinePixel(pixel(i)))
            {
                double w = Whiteness(pixel(i));
                sw += w; s += w * (i + 0.5);
                i++;
            }
            centres.Add(s / sw);
        }
        return centres;
    }

    [Fact]
    public void ParallelPlates_EquipotentialsAreEvenlySpacedRowsAtTheExpectedPixels()
    {
        // Uniform field between plates: φ = V·y/d, so the level c lies on y = d·c/V (Griffiths, Introduction to
        // Electrodynamics, §2.5, parallel-plate capacitor). P1 reproduces a linear potential exactly.
        const double v = 10e3, d = 4e-3;
        var ctx = Designs.Plates();
        var map = FieldMapRenderer.Render(ctx, [], Plain);
        Assert.Equal([1e3, 2e3, 3e3, 4e3, 5e3, 6e3, 7e3, 8e3, 9e3], map.LevelsVolts);
        var f = map.Frame;
        foreach (var seg in map.Equipotentials)
        {
            double expected = f.PixelY(d * seg.LevelVolts / v);
            Assert.InRange(f.PixelY(seg.Y0), expected - 1, expected + 1);
            Assert.InRange(f.PixelY(seg.Y1), expected - 1, expected + 1);
        }

        // The picture itself: scan two pixel columns of the gap and find the line rows.
        using var bitmap = Drawing.PngPainter.Paint(map.Sketch);
        foreach (double xMetres in new[] { 2.7e-3, 7.3e-3 })
        {
            int col = (int)f.PixelX(xMetres);
            int top = (int)Math.Ceiling(f.PixelY(d)) + 2, bottom = (int)Math.Floor(f.PixelY(0)) - 2;
            var rows = LineCentres(j => bitmap.GetPixel(col, j), top, bottom);
            var expected = map.LevelsVolts.Select(c => f.PixelY(d * c / v)).OrderBy(p => p).ToList();
            Assert.Equal(expected.Count, rows.Count);
            for (int k = 0; k < rows.Count; k++) Assert.InRange(rows[k], expected[k] - 1, expected[k] + 1);
            // Evenly spaced: every gap equals d/9·scale within 1 px.
            double spacing = d / 10 * f.PixelsPerMetre;
            for (int k = 1; k < rows.Count; k++) Assert.InRange(rows[k] - rows[k - 1], spacing - 1, spacing + 1);
        }
    }

    [Fact]
    public void Coax_ContourRadiiFollowTheLogarithmicLaw()
    {
        // φ(r) = V ln(b/r)/ln(b/a)  ⇒  the level c lies on r = a·(b/a)^(1 − c/V) (Griffiths, Introduction to
        // Electrodynamics, §2.3, field of a long charged cylinder).
        const double a = Designs.CoaxA, b = Designs.CoaxB, v = Designs.CoaxV;
        var ctx = Designs.CoaxContext();
        var map = FieldMapRenderer.Render(ctx, [], Plain);
        Assert.NotEmpty(map.LevelsVolts);
        double ppm = map.Frame.PixelsPerMetre;
        foreach (var seg in map.Equipotentials)
        {
            double r = a * Math.Pow(b / a, 1 - seg.LevelVolts / v);
            Assert.InRange(Math.Sqrt(seg.X0 * seg.X0 + seg.Y0 * seg.Y0) * ppm, r * ppm - 1, r * ppm + 1);
            Assert.InRange(Math.Sqrt(seg.X1 * seg.X1 + seg.Y1 * seg.Y1) * ppm, r * ppm - 1, r * ppm + 1);
        }

        // In the image: along the row through the axis, right of the inner conductor, the lines sit at the radii.
        using var bitmap = Drawing.PngPainter.Paint(map.Sketch);
        var f = map.Frame;
        int row = (int)f.PixelY(0);
        int from = (int)Math.Ceiling(f.PixelX(a)) + 2, to = (int)Math.Floor(f.PixelX(b)) - 2;
        var cols = LineCentres(i => bitmap.GetPixel(i, row), from, to);
        var expected = map.LevelsVolts.Select(c => f.PixelX(a * Math.Pow(b / a, 1 - c / v))).OrderBy(p => p).ToList();
        Assert.Equal(expected.Count, cols.Count);
        for (int k = 0; k < cols.Count; k++) Assert.InRange(cols[k], expected[k] - 1, expected[k] + 1);
    }

    [Fact]
    public void ColourBar_ExtremesEqualTheFieldMinimumAndMaximum()
    {
        var ctx = Designs.CoaxContext();
        var map = FieldMapRenderer.Render(ctx, [], Plain);
        double min = double.MaxValue, max = 0;
        for (int t = 0; t < ctx.Mesh.TriangleCount; t++)
        {
            min = Math.Min(min, ctx.Solution.FieldMagnitude(t));
            max = Math.Max(max, ctx.Solution.FieldMagnitude(t));
        }
        Assert.Equal(min, map.ColourMinVoltsPerMetre);
        Assert.Equal(max, map.ColourMaxVoltsPerMetre);
        // Peak over median is about 3 here (|E| ∝ 1/r from r = 2 to 10 mm), so the automatic scale is linear.
        Assert.False(map.LogScale);
        // Closed form bounds the extremes: |E| = V/(r ln(b/a)) runs from V/(b ln 5) to V/(a ln 5) (Griffiths §2.3);
        // element values are averages over triangles, so they lie inside and near these ends.
        double eA = Designs.CoaxV / (Designs.CoaxA * Math.Log(5)), eB = Designs.CoaxV / (Designs.CoaxB * Math.Log(5));
        Assert.InRange(max, 0.9 * eA, eA * 1.01);
        Assert.InRange(min, eB * 0.99, 1.1 * eB);

        // The bar's top and bottom rows carry the ends of the colour map.
        using var bitmap = Drawing.PngPainter.Paint(map.Sketch);
        var f = map.Frame;
        float mapRight = (float)f.PixelX(Designs.CoaxB), mapTop = (float)f.PixelY(Designs.CoaxB), mapBottom = (float)f.PixelY(-Designs.CoaxB);
        int barX = (int)(mapRight + 22 + 9);
        AssertClose(Viridis.At(1), bitmap.GetPixel(barX, (int)(mapTop + 18) + 1));
        AssertClose(Viridis.At(0), bitmap.GetPixel(barX, (int)(mapBottom - 4) - 2));
    }

    [Fact]
    public void HotSpotMarkers_SitAtTheReportedCoordinates()
    {
        var ctx = Designs.CoaxContext();
        var report = DesignAnalyzer.Analyze(ctx);
        Assert.NotEmpty(report.HotSpots);
        var map = FieldMapRenderer.Render(ctx, report.HotSpots, new FieldMapOptions { LabelEquipotentials = false });
        Assert.Equal(report.HotSpots.Select(h => h.Rank), map.Markers.Select(m => m.Rank));
        using var bitmap = Drawing.PngPainter.Paint(map.Sketch);
        var f = map.Frame;
        foreach (var (h, m) in report.HotSpots.Zip(map.Markers))
        {
            // The marker maps back to the hot spot within one pixel.
            Assert.InRange(f.DesignX(m.PixelX), h.XMetres - 1 / f.PixelsPerMetre, h.XMetres + 1 / f.PixelsPerMetre);
            Assert.InRange(f.DesignY(m.PixelY), h.YMetres - 1 / f.PixelsPerMetre, h.YMetres + 1 / f.PixelsPerMetre);
        }
        // The top marker's red ring is drawn round that pixel (radius 9 px): check the ring on four sides.
        var top = map.Markers[^1];
        foreach (var (dx, dy) in new[] { (9, 0), (-9, 0), (0, 9), (0, -9) })
        {
            var c = bitmap.GetPixel((int)Math.Floor(top.PixelX + dx), (int)Math.Floor(top.PixelY + dy));
            Assert.True(c.Red > 150 && c.Green < 110 && c.Blue < 110, $"ring pixel at ({dx},{dy}) is {c}");
        }
    }

    [Fact]
    public void SameInput_GivesTheSameBytes()
    {
        // Deterministic output: same PNG bytes and SVG text for the same input (one machine; fonts are fixed files).
        var ctx = Designs.Plates();
        var report = DesignAnalyzer.Analyze(ctx);
        var first = FieldMapRenderer.Render(ctx, report.HotSpots, new FieldMapOptions { MeshOverlay = true });
        var second = FieldMapRenderer.Render(ctx, report.HotSpots, new FieldMapOptions { MeshOverlay = true });
        Assert.Equal(first.Png(), second.Png());
        Assert.Equal(first.Svg(), second.Svg());
        // The SVG is well-formed XML with the raster layer and vector lines.
        var svg = System.Xml.Linq.XDocument.Parse(first.Svg());
        Assert.Equal("svg", svg.Root!.Name.LocalName);
        Assert.Contains(svg.Root.Elements(), e => e.Name.LocalName == "image");
        Assert.Contains(svg.Root.Elements(), e => e.Name.LocalName == "path");
    }

    [Fact]
    public void LogScale_PerElementColourFollowsTheLogarithmOfTheElementField()
    {
        // t = ln(|E_T| / min) / ln(max / min) for the triangle under the pixel; sample pixel centres across the gap
        // on a 30° ray (clear of labels, which are off, and of the axis-aligned markers, which are off).
        var ctx = Designs.CoaxContext();
        var map = FieldMapRenderer.Render(ctx, [], Plain with { LogScale = true });
        using var raster = Drawing.PngPainter.Paint(map.Sketch, rasterOnly: true);
        var f = map.Frame;
        double lnSpan = Math.Log(map.ColourMaxVoltsPerMetre / map.ColourMinVoltsPerMetre);
        int checkedPixels = 0;
        for (double r = 2.3e-3; r < 9.7e-3; r += 0.25e-3)
        {
            double x = r * Math.Cos(Math.PI / 6), y = r * Math.Sin(Math.PI / 6);
            int px = (int)Math.Floor(f.PixelX(x)), py = (int)Math.Floor(f.PixelY(y));
            // The triangle under the pixel centre.
            double cx = f.DesignX(px + 0.5), cy = f.DesignY(py + 0.5);
            int t = TriangleAt(ctx, cx, cy);
            if (t < 0 || NearEdge(ctx, t, cx, cy, 1.5 / f.PixelsPerMetre)) continue;
            double expectedT = Math.Log(ctx.Solution.FieldMagnitude(t) / map.ColourMinVoltsPerMetre) / lnSpan;
            AssertClose(Viridis.At(expectedT), raster.GetPixel(px, py));
            checkedPixels++;
        }
        Assert.True(checkedPixels >= 10, $"only {checkedPixels} pixels checked");
    }

    private static int TriangleAt(AnalysisContext ctx, double x, double y)
    {
        var m = ctx.Mesh;
        for (int t = 0; t < m.TriangleCount; t++)
        {
            if (Barycentric(ctx, t, x, y).Min() >= 0) return t;
        }
        return -1;
    }

    private static double[] Barycentric(AnalysisContext ctx, int t, double x, double y)
    {
        var m = ctx.Mesh;
        int a = m.Triangles[3 * t], b = m.Triangles[3 * t + 1], c = m.Triangles[3 * t + 2];
        double det = (m.X[b] - m.X[a]) * (m.Y[c] - m.Y[a]) - (m.X[c] - m.X[a]) * (m.Y[b] - m.Y[a]);
        double l1 = ((x - m.X[a]) * (m.Y[c] - m.Y[a]) - (m.X[c] - m.X[a]) * (y - m.Y[a])) / det;
        double l2 = ((m.X[b] - m.X[a]) * (y - m.Y[a]) - (x - m.X[a]) * (m.Y[b] - m.Y[a])) / det;
        return [1 - l1 - l2, l1, l2];
    }

    // True when the point is within distance d of an edge of triangle t (a pixel there may mix two triangles).
    private static bool NearEdge(AnalysisContext ctx, int t, double x, double y, double d)
    {
        var m = ctx.Mesh;
        for (int i = 0; i < 3; i++)
        {
            int a = m.Triangles[3 * t + i], b = m.Triangles[3 * t + (i + 1) % 3];
            double ex = m.X[b] - m.X[a], ey = m.Y[b] - m.Y[a];
            double dist = Math.Abs(ex * (y - m.Y[a]) - ey * (x - m.X[a])) / Math.Sqrt(ex * ex + ey * ey);
            if (dist < d) return true;
        }
        return false;
    }

    private static void AssertClose(SKColor expected, SKColor actual)
    {
        Assert.True(Math.Abs(expected.Red - actual.Red) <= 4 && Math.Abs(expected.Green - actual.Green) <= 4 && Math.Abs(expected.Blue - actual.Blue) <= 4,
            $"expected {expected}, got {actual}");
    }
}
