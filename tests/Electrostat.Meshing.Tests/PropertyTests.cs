using CsCheck;
using Electrostat.Meshing.Input;
using Electrostat.Meshing.Output;

namespace Electrostat.Meshing.Tests;

/// <summary>
/// Random inputs must give meshes that pass every invariant of <see cref="MeshResult.Validate"/> and meet the angle
/// bound, apart from triangles the mesher reports as next to small input angles. The bound that Delaunay refinement
/// can guarantee is about 20.7° in theory (Ruppert 1995; Shewchuk 2002) and about 33° in practice; 28° is the default.
/// </summary>
public class PropertyTests
{
    /// <summary>
    /// Star-shaped polygon about (cx, cy): vertex i at angle 2π(i + 0.8·jitter[i])/n and radius radii[i], so consecutive
    /// angles differ by less than π for n ≥ 4 and the polygon is simple with (cx, cy) in its kernel.
    /// </summary>
    private static List<(double, double)> Star(double cx, double cy, double[] jitter, double[] radii)
    {
        int n = jitter.Length;
        var pts = new List<(double, double)>();
        for (int i = 0; i < n; i++)
        {
            double a = 2 * Math.PI * (i + 0.8 * jitter[i]) / n;
            pts.Add((cx + radii[i] * Math.Cos(a), cy + radii[i] * Math.Sin(a)));
        }
        return pts;
    }

    private static void AssertGood(MeshResult r, IReadOnlyDictionary<int, double>? areas = null, double tol = 1e-9)
    {
        var rep = r.Validate(areas, tol);
        Assert.True(rep.IsValid, rep.ToString());
        foreach (var s in r.SkippedTriangles)
            Assert.True(s.Reason is SkipCause.SmallInputAngle or SkipCause.TinyFeature, $"triangle {s.Triangle} at {s.MinAngleDegrees:F2}° left for {s.Reason}");
    }

    [Fact]
    public void RandomStarPolygonsWithHoles_ValidAndBounded()
    {
        // Outer: 8 to 25 vertices at radius 0.6 to 1 (every edge stays beyond radius 0.45); hole: 4 to 9 vertices within
        // radius 0.3; the region seed sits at radius 0.4, between them.
        var gen = Gen.Select(Gen.Double[0, 1].Array[8, 25], Gen.Double[0.6, 1.0].Array[25], Gen.Double[0, 1].Array[4, 9], Gen.Double[0.1, 0.3].Array[9], Gen.Double[0.01, 0.5]);
        gen.Sample((ang, rad, hang, hrad, h) =>
        {
            var g = new PlanarGraph();
            var outer = Star(0, 0, ang, rad);
            var hole = Star(0, 0, hang, hrad);
            g.AddPolygon(outer, 1);
            g.AddPolygon(hole, 2);
            g.AddHole(0, 0);
            // A region seed just inside the first outer edge, between the outer polygon and the hole.
            g.AddRegion(new RegionSeed(0.4, 0, 5));
            var r = Mesher.Generate(g, new MeshOptions { MaxEdgeLengthMetres = h });
            double area = Math.Abs(TestGraphs.PolygonArea(outer)) - Math.Abs(TestGraphs.PolygonArea(hole));
            AssertGood(r, new Dictionary<int, double> { [5] = area });
            return true;
        }, iter: 40);
    }

    [Fact]
    public void HighestAllowedBound_Terminates_ValidAndBounded()
    {
        // 33.5° is above what Ruppert's proof covers (about 20.7°); termination here is an observed property that the
        // skip rules and off-centres must keep. A budget far above the expected size turns a runaway into a failure.
        var gen = Gen.Select(Gen.Double[0, 1].Array[8, 25], Gen.Double[0.6, 1.0].Array[25], Gen.Double[0, 1].Array[4, 9], Gen.Double[0.1, 0.3].Array[9]);
        gen.Sample((ang, rad, hang, hrad) =>
        {
            var g = new PlanarGraph();
            g.AddPolygon(Star(0, 0, ang, rad), 1);
            g.AddPolygon(Star(0, 0, hang, hrad), 2);
            g.AddHole(0, 0);
            var r = Mesher.Generate(g, new MeshOptions { MinAngleDegrees = 33.5, MaxEdgeLengthMetres = 0.1, MaxTriangles = 200_000 });
            AssertGood(r);
            return r.SkippedTriangles.Count == r.Quality.BelowBoundCount;
        }, iter: 20);
    }

    [Fact]
    public void AngleBoundAbove33_5_Rejected()
    {
        Assert.Throws<ArgumentException>(() => Mesher.Generate(TestGraphs.SquareWithHole(), new MeshOptions { MinAngleDegrees = 34 }));
    }

    [Fact]
    public void CocircularPoints_ValidAndFullBound()
    {
        // Regular polygons: all vertices (nearly) on one circle, the classic degenerate Delaunay input.
        foreach (int n in new[] { 8, 33, 128, 500 })
        {
            var g = new PlanarGraph();
            g.AddPolygon(TestGraphs.Circle(0, 0, 1, n), 1);
            g.AddPolygon(TestGraphs.Circle(0, 0, 0.5, n, 0.1), 2);
            var r = Mesher.Generate(g);
            AssertGood(r);
            Assert.True(r.Quality.MinAngleDegrees >= 28, $"n={n}: {r.Quality.MinAngleDegrees}");
        }
    }

    [Fact]
    public void CollinearRuns_ValidAndFullBound()
    {
        var gen = Gen.Double[0.001, 0.999].Array[1, 40];
        gen.Sample(ts =>
        {
            var g = new PlanarGraph();
            var pts = new List<(double, double)>();
            var sorted = ts.Distinct().OrderBy(t => t).ToArray();
            pts.Add((0, 0));
            foreach (double t in sorted) pts.Add((t * 2, 0));   // collinear run along the bottom
            pts.Add((2, 0));
            pts.Add((2, 1));
            foreach (double t in sorted.Reverse()) pts.Add((t * 2, 1));
            pts.Add((0, 1));
            g.AddPolygon(pts, 1);
            var r = Mesher.Generate(g, new MeshOptions { MaxEdgeLengthMetres = 0.25 });
            AssertGood(r, new Dictionary<int, double> { [0] = 2.0 });
            return r.Quality.MinAngleDegrees >= 28 - 1e-9;
        }, iter: 25);
    }

    [Fact]
    public void TinyFeatureNextToLargeOne_ValidAndGraded()
    {
        // A 1 m square with a 10 µm square hole and a 20 µm slot cut into one side.
        var g = new PlanarGraph();
        g.AddPolygon(new List<(double, double)> { (0, 0), (0.5, 0), (0.5, 0.3), (0.50002, 0.3), (0.50002, 0), (1, 0), (1, 1), (0, 1) }, 1);
        g.AddPolygon(TestGraphs.Rect(0.3, 0.3, 0.30001, 0.30001), 2);
        g.AddHole(0.300005, 0.300005);
        var r = Mesher.Generate(g);
        AssertGood(r, new Dictionary<int, double> { [0] = 1 - 1e-10 - 0.3 * 0.00002 }, 1e-8);
        Assert.True(r.Quality.MinAngleDegrees >= 28, $"{r.Quality.MinAngleDegrees}");
    }

    [Fact]
    public void RandomTinyFeatures_ValidAndFullBound()
    {
        // A unit square with a square hole of side 1e-6 to 1e-2 m at a random place and a slit of random width cut
        // into the bottom edge: feature sizes span up to six decades next to the 1 m outline.
        var gen = Gen.Select(Gen.Double[-6, -2], Gen.Double[0.1, 0.8], Gen.Double[0.1, 0.8], Gen.Double[-6, -2], Gen.Double[0.2, 0.8]);
        gen.Sample((holeExp, hx, hy, slitExp, sx) =>
        {
            double hs = Math.Pow(10, holeExp), w = Math.Pow(10, slitExp);
            var g = new PlanarGraph();
            g.AddPolygon(new List<(double, double)> { (0, 0), (sx, 0), (sx, 0.05), (sx + w, 0.05), (sx + w, 0), (1, 0), (1, 1), (0, 1) }, 1);
            g.AddPolygon(TestGraphs.Rect(hx, hy + 0.1, hx + hs, hy + 0.1 + hs), 2);
            g.AddHole(hx + hs / 2, hy + 0.1 + hs / 2);
            var r = Mesher.Generate(g, new MeshOptions { MaxEdgeLengthMetres = 0.2, MaxTriangles = 500_000 });
            AssertGood(r, new Dictionary<int, double> { [0] = 1 - hs * hs - 0.05 * w }, 1e-8);
            return r.Quality.MinAngleDegrees >= 28;
        }, iter: 15);
    }

    [Fact]
    public void SmallInputAngle_TerminatesAndReports()
    {
        // Two segments meeting at 2°: the bound cannot be met at the apex, but refinement must stop and say so.
        var g = new PlanarGraph();
        double a = 2 * Math.PI / 180;
        g.AddPolygon(new List<(double, double)> { (0, 0), (1, 0), (Math.Cos(a), Math.Sin(a)) }, 1);
        g.AddPolygon(TestGraphs.Rect(-1, -1, 2, 2), 2);
        var r = Mesher.Generate(g);
        AssertGood(r);
        Assert.NotEmpty(r.SkippedTriangles);
        Assert.All(r.SkippedTriangles, s => Assert.Equal(SkipCause.SmallInputAngle, s.Reason));
    }

    [Fact]
    public void SameInput_SameMesh()
    {
        var g = TestGraphs.SquareWithHole();
        var o = new MeshOptions { MaxEdgeLengthMetres = 0.03 };
        var a = Mesher.Generate(g, o).Mesh;
        var b = Mesher.Generate(g, o).Mesh;
        Assert.Equal(a.X, b.X);
        Assert.Equal(a.Y, b.Y);
        Assert.Equal(a.Triangles, b.Triangles);
        Assert.Equal(a.TriangleRegion, b.TriangleRegion);
        Assert.Equal(a.SegmentVertices, b.SegmentVertices);
    }
}
