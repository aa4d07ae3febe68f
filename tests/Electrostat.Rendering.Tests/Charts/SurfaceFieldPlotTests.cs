using Electrostat.Analysis;
using Electrostat.Rendering.Charts;
using Electrostat.Rendering.Drawing;
using Electrostat.Rendering.Tests.Support;

namespace Electrostat.Rendering.Tests.Charts;

public class SurfaceFieldPlotTests
{
    [Fact]
    public void CoaxInnerSurface_PlotsTheClosedFormFieldWithBreakdownGuides()
    {
        // On r = a: |E| = V/(a ln(b/a)) (Griffiths, Introduction to Electrodynamics, §2.3) = 0.3107 kV/mm.
        var ctx = Designs.CoaxContext();
        var report = DesignAnalyzer.Analyze(ctx);
        var profile = report.SurfaceProfiles.Single(p => p.ConductorName == "inner");
        var chart = SurfaceFieldPlot.Build(profile, report.Margins, ctx.Design);
        double exact = Designs.CoaxV / (Designs.CoaxA * Math.Log(Designs.CoaxB / Designs.CoaxA)) * 1e-6;
        var series = Assert.Single(chart.Series);
        Assert.All(series.Y, y => Assert.InRange(y, exact * 0.97, exact * 1.03));
        // Arc length runs once round the circle: 2πa = 12.57 mm (polygonal, so a little less).
        Assert.InRange(series.X.Max(), 2 * Math.PI * 2 * 0.99, 2 * Math.PI * 2);
        Assert.Equal("arc length (mm)", chart.XLabel);
        Assert.Equal("|E| (kV/mm)", chart.YLabel);
        // Breakdown 3 kV/mm and, with a required margin of 1, the same limit line.
        Assert.Equal([3.0, 3.0], chart.Guides.Select(g => g.Y));
        var png = PngPainter.Encode(LineChartRenderer.Render(chart));
        Assert.True(png.Length > 1000);
    }

    [Fact]
    public void LineChart_PlacesPointsOnTheirAxes()
    {
        // A line from (0, 0) to (10, 5) with a guide at 5: the guide and the line's end share one pixel row.
        var chart = new LineChart
        {
            Title = "t", XLabel = "x (mm)", YLabel = "y (V)",
            Series = [new ChartSeries("s", [0, 10], [0, 5])],
            Guides = [new ChartGuide("g", 5)],
        };
        using var bitmap = PngPainter.Paint(LineChartRenderer.Render(chart));
        // The guide colour (first guide palette entry) appears on the top gridline row of the plot, and the series
        // colour near the top-right corner of the plot area.
        int guideRow = -1;
        for (int y = 0; y < bitmap.Height && guideRow < 0; y++)
        {
            for (int x = bitmap.Width / 2; x < bitmap.Width / 2 + 16; x++)
            {
                var c = bitmap.GetPixel(x, y);
                if (c.Red - c.Green > 50) guideRow = y;
            }
        }
        Assert.True(guideRow > 0);
        bool seriesNear = Enumerable.Range(guideRow - 3, 7).Select(y => bitmap.GetPixel(bitmap.Width - 22, y)).Any(c => c.Blue - c.Red > 50);
        Assert.True(seriesNear, "the series should reach the guide's row at the right end");
    }
}
