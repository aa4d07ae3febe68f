using Electrostat.Rendering.Contours;
using Electrostat.Rendering.Drawing;
using SkiaSharp;

namespace Electrostat.Rendering.Charts;

/// <summary>
/// Draws a <see cref="LineChart"/>: axes with round ticks, labelled axes, the series in distinct colours, dashed
/// guides, and a legend under the plot. Our own small renderer on <see cref="Sketch"/>, so charts share the map's
/// PNG and SVG output and typeface.
/// </summary>
public static class LineChartRenderer
{
    // Distinct, colour-blind-safe series colours (the qualitative palette of Okabe and Ito, "Color Universal Design", 2008).
    private static readonly SKColor[] Palette =
    [
        new(0x00, 0x72, 0xb2), new(0xd5, 0x5e, 0x00), new(0x00, 0x9e, 0x73), new(0xcc, 0x79, 0xa7),
        new(0x56, 0xb4, 0xe9), new(0xe6, 0x9f, 0x00), new(0x00, 0x00, 0x00),
    ];

    private static readonly SKColor[] GuidePalette = [new(0xb2, 0x18, 0x2b), new(0x7b, 0x32, 0x94), new(0x8c, 0x51, 0x0a), new(0x35, 0x97, 0x8f)];
    private static readonly SKColor Ink = new(0x22, 0x26, 0x2b);
    private static readonly SKColor Grid = new(0xe3, 0xe6, 0xea);

    /// <summary>Renders the chart into a sketch (encode with <see cref="PngPainter"/> or <see cref="SvgPainter"/>).</summary>
    /// <param name="chart">The chart.</param>
    public static Sketch Render(LineChart chart)
    {
        ArgumentNullException.ThrowIfNull(chart);
        var sketch = new Sketch(chart.WidthPixels, chart.HeightPixels, SKColors.White);
        int legendRows = (chart.Series.Count + chart.Guides.Count + 1) / 2;
        float left = 70, right = chart.WidthPixels - 20, top = 34, bottom = chart.HeightPixels - 52 - 16 * legendRows;
        if (bottom < top + 40) bottom = top + 40;

        var xs = chart.Series.SelectMany(s => s.X).Where(double.IsFinite).ToList();
        var ys = chart.Series.SelectMany(s => s.Y).Where(double.IsFinite).Concat(chart.Guides.Select(g => g.Y)).Where(double.IsFinite).ToList();
        double x0 = xs.Count > 0 ? xs.Min() : 0, x1 = xs.Count > 0 ? xs.Max() : 1;
        double y0 = ys.Count > 0 ? ys.Min() : 0, y1 = ys.Count > 0 ? ys.Max() : 1;
        if (chart.YFromZero && y0 > 0) y0 = 0;
        if (!(x1 > x0)) { x0 -= 0.5; x1 += 0.5; }
        if (!(y1 > y0)) { y0 -= 0.5; y1 += 0.5; }
        double yStep = RoundSteps.Step(y1 - y0, 5);
        y1 = Math.Ceiling(y1 / yStep - 1e-9) * yStep;
        if (!chart.YFromZero || y0 < 0) y0 = Math.Floor(y0 / yStep + 1e-9) * yStep;
        float PX(double x) => (float)(left + (x - x0) / (x1 - x0) * (right - left));
        float PY(double y) => (float)(bottom - (y - y0) / (y1 - y0) * (bottom - top));

        sketch.Text(new SKPoint(left, 20), chart.Title, 14, Ink);
        foreach (double v in Ticks(y0, y1, 5))
        {
            sketch.Polyline([new(left, PY(v)), new(right, PY(v))], Grid, 1);
            sketch.Text(new SKPoint(left - 6, PY(v) + 4), Labels.Number(v), 10, Ink, TextAnchor.End);
        }
        foreach (double v in Ticks(x0, x1, 6))
        {
            sketch.Polyline([new(PX(v), top), new(PX(v), bottom)], Grid, 1);
            sketch.Text(new SKPoint(PX(v), bottom + 15), Labels.Number(v), 10, Ink, TextAnchor.Middle);
        }
        sketch.Polyline([new(left, top), new(left, bottom), new(right, bottom)], Ink, 1);
        sketch.Text(new SKPoint((left + right) / 2, bottom + 32), chart.XLabel, 11, Ink, TextAnchor.Middle);
        sketch.Text(new SKPoint(16, (top + bottom) / 2), chart.YLabel, 11, Ink, TextAnchor.Middle, rotationDegrees: -90);

        var legend = new List<(string Name, SKColor Colour, bool Dashed)>();
        for (int g = 0; g < chart.Guides.Count; g++)
        {
            var colour = GuidePalette[g % GuidePalette.Length];
            float y = PY(chart.Guides[g].Y);
            sketch.Polyline([new(left, y), new(right, y)], colour, 1.5f, dashed: true);
            legend.Add((chart.Guides[g].Name, colour, true));
        }
        for (int s = 0; s < chart.Series.Count; s++)
        {
            var series = chart.Series[s];
            var colour = Palette[s % Palette.Length];
            var run = new List<SKPoint>();
            void Flush()
            {
                if (run.Count > 1) sketch.Polyline(run.ToArray(), colour, 1.8f);
                run.Clear();
            }
            for (int i = 0; i < Math.Min(series.X.Count, series.Y.Count); i++)
            {
                if (!double.IsFinite(series.X[i]) || !double.IsFinite(series.Y[i])) { Flush(); continue; }
                var p = new SKPoint(PX(series.X[i]), PY(series.Y[i]));
                run.Add(p);
                if (series.ShowPoints) sketch.Circle(p, 3, colour, colour, 1);
            }
            Flush();
            legend.Add((series.Name, colour, false));
        }
        float colWidth = (right - left) / 2;
        for (int i = 0; i < legend.Count; i++)
        {
            float lx = left + (i % 2) * colWidth, ly = bottom + 52 + 16 * (i / 2);
            sketch.Polyline([new(lx, ly - 4), new(lx + 22, ly - 4)], legend[i].Colour, 2, dashed: legend[i].Dashed);
            sketch.Text(new SKPoint(lx + 28, ly), legend[i].Name, 11, Ink);
        }
        return sketch;
    }

    private static IEnumerable<double> Ticks(double lo, double hi, int target)
    {
        double step = RoundSteps.Step(hi - lo, target);
        for (double v = Math.Ceiling(lo / step - 1e-9) * step; v <= hi + 1e-9 * step; v += step)
            yield return Math.Abs(v) < 1e-12 * step ? 0 : v;
    }
}
