using Electrostat.Meshing.Input;

namespace Electrostat.Meshing.Tests;

/// <summary>Small input graphs shared by the tests.</summary>
internal static class TestGraphs
{
    internal static List<(double X, double Y)> Circle(double cx, double cy, double r, int n, double phase = 0)
    {
        var pts = new List<(double, double)>(n);
        for (int i = 0; i < n; i++)
        {
            double a = phase + 2 * Math.PI * i / n;
            pts.Add((cx + r * Math.Cos(a), cy + r * Math.Sin(a)));
        }
        return pts;
    }

    internal static List<(double X, double Y)> Rect(double x0, double y0, double x1, double y1) =>
        new() { (x0, y0), (x1, y0), (x1, y1), (x0, y1) };

    /// <summary>Unit square with a circular hole of radius 0.2 (40 chords) in the middle: region 1 is the square minus the hole.</summary>
    internal static PlanarGraph SquareWithHole()
    {
        var g = new PlanarGraph();
        g.AddPolygon(Rect(0, 0, 1, 1), 1);
        g.AddPolygon(Circle(0.5, 0.5, 0.2, 40), 2);
        g.AddHole(0.5, 0.5);
        g.AddRegion(new RegionSeed(0.05, 0.05, 1));
        return g;
    }

    internal static double PolygonArea(IReadOnlyList<(double X, double Y)> p)
    {
        double a = 0;
        for (int i = 0; i < p.Count; i++)
        {
            var (x0, y0) = p[i];
            var (x1, y1) = p[(i + 1) % p.Count];
            a += x0 * y1 - x1 * y0;
        }
        return 0.5 * a;
    }
}
