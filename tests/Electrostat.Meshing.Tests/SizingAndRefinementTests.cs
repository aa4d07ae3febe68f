using Electrostat.Meshing.Input;
using Electrostat.Meshing.Output;

namespace Electrostat.Meshing.Tests;

public class SizingAndRefinementTests
{
    private static double LongestEdge(TriangleMesh m, int t)
    {
        double best = 0;
        for (int k = 0; k < 3; k++)
        {
            int a = m.Triangles[3 * t + k], b = m.Triangles[3 * t + (k + 1) % 3];
            best = Math.Max(best, Math.Sqrt((m.X[a] - m.X[b]) * (m.X[a] - m.X[b]) + (m.Y[a] - m.Y[b]) * (m.Y[a] - m.Y[b])));
        }
        return best;
    }

    private static (double X, double Y) Centroid(TriangleMesh m, int t)
    {
        int a = m.Triangles[3 * t], b = m.Triangles[3 * t + 1], c = m.Triangles[3 * t + 2];
        return ((m.X[a] + m.X[b] + m.X[c]) / 3, (m.Y[a] + m.Y[b] + m.Y[c]) / 3);
    }

    /// <summary>50 mm × 10 mm bar with 0.1 mm corner fillets (6 chords each) centred in a 200 mm × 100 mm box.</summary>
    private static PlanarGraph FilletedBar()
    {
        var g = new PlanarGraph();
        g.AddPolygon(TestGraphs.Rect(-0.1, -0.05, 0.1, 0.05), 1);
        const double r = 0.1e-3, hx = 0.025, hy = 0.005;
        var pts = new List<(double, double)>();
        (double cx, double cy, double a0)[] corners = { (hx - r, -hy + r, -Math.PI / 2), (hx - r, hy - r, 0), (-hx + r, hy - r, Math.PI / 2), (-hx + r, -hy + r, Math.PI) };
        foreach (var (cx, cy, a0) in corners)
            for (int i = 0; i <= 6; i++)
            {
                double a = a0 + Math.PI / 2 * i / 6;
                pts.Add((cx + r * Math.Cos(a), cy + r * Math.Sin(a)));
            }
        g.AddPolygon(pts, 2);
        g.AddHole(0, 0);
        return g;
    }

    [Fact]
    public void FilletGrading_NearElementsTwentyTimesSmaller_NeighbourRatioBounded()
    {
        var r = Mesher.Generate(FilletedBar(), new MeshOptions { MaxEdgeLengthMetres = 0.01 });
        Assert.True(r.Validate().IsValid);
        var m = r.Mesh;
        double near = 0, far = 0;
        int nNear = 0, nFar = 0;
        for (int t = 0; t < m.TriangleCount; t++)
        {
            var (x, y) = Centroid(m, t);
            double dCorner = Math.Sqrt(Math.Pow(Math.Abs(x) - 0.025, 2) + Math.Pow(Math.Abs(y) - 0.005, 2));
            if (dCorner < 0.3e-3) { near += LongestEdge(m, t); nNear++; }
            if (Math.Abs(x) > 0.075 || Math.Abs(y) > 0.035) { far += LongestEdge(m, t); nFar++; }
        }
        Assert.True(nNear > 0 && nFar > 0);
        double ratio = (far / nFar) / (near / nNear);
        Assert.True(ratio >= 20, $"far/near element size ratio {ratio:F1}");

        // Law of sines: in a triangle with all angles ≥ θ, the longest edge is at most 1/sin θ times any other edge,
        // so two triangles sharing an edge e both have longest edges in [e, e/sin θ]: their ratio is ≤ 1/sin θ.
        double bound = 1 / Math.Sin(28 * Math.PI / 180) * (1 + 1e-9);
        var owner = new Dictionary<(int, int), int>();
        double worst = 1;
        for (int t = 0; t < m.TriangleCount; t++)
            for (int k = 0; k < 3; k++)
            {
                int a = m.Triangles[3 * t + k], b = m.Triangles[3 * t + (k + 1) % 3];
                if (owner.TryGetValue((b, a), out int other))
                    worst = Math.Max(worst, Math.Max(LongestEdge(m, t) / LongestEdge(m, other), LongestEdge(m, other) / LongestEdge(m, t)));
                else owner[(a, b)] = t;
            }
        Assert.True(worst <= bound, $"neighbour size ratio {worst:F3} exceeds {bound:F3}");
    }

    [Fact]
    public void GradingRatio_LimitsGrowthAwayFromFeature()
    {
        // Grading is measured from input vertices: at distance d from the nearest fillet the target size is at most
        // lfs + 0.2·d, where lfs ≤ 0.1 mm (the fillet chords are shorter). Without grading, refinement may grow faster.
        var graded = Mesher.Generate(FilletedBar(), new MeshOptions { MaxEdgeLengthMetres = 0.01, GradingRatio = 1.2 });
        var free = Mesher.Generate(FilletedBar(), new MeshOptions { MaxEdgeLengthMetres = 0.01, GradingRatio = null });
        Assert.True(graded.Validate().IsValid);
        Assert.True(free.Validate().IsValid);
        Assert.True(graded.Mesh.TriangleCount > free.Mesh.TriangleCount);
        var m = graded.Mesh;
        for (int t = 0; t < m.TriangleCount; t++)
        {
            var (x, y) = Centroid(m, t);
            double d = Math.Sqrt(Math.Pow(Math.Abs(x) - 0.025, 2) + Math.Pow(Math.Abs(y) - 0.005, 2));
            // Chamfer propagation overestimates distance by ≤ 8 %; interpolation adds up to ~1.5 grid cells (200 mm / 512).
            double allowed = Math.Min(0.01, 1e-4 + 0.2 * (d * 1.09 + 0.0004 * 1.5));
            Assert.True(LongestEdge(m, t) <= allowed * 1.0000001,
                $"triangle {t} at distance {d * 1e3:F2} mm has edge {LongestEdge(m, t) * 1e3:F3} mm > {allowed * 1e3:F3} mm");
        }
    }

    [Fact]
    public void RefineTriangles_InPlace_KeepsInvariants()
    {
        var g = new PlanarGraph();
        g.AddPolygon(TestGraphs.Rect(0, 0, 1, 1), 1);
        var rm = RefinableMesh.Create(g, new MeshOptions { MaxEdgeLengthMetres = 0.1 });
        var before = rm.Export();
        var pick = Enumerable.Range(0, before.Mesh.TriangleCount).Where(t =>
        {
            var (x, y) = Centroid(before.Mesh, t);
            return (x - 0.5) * (x - 0.5) + (y - 0.5) * (y - 0.5) < 0.04;
        }).ToArray();
        double sizeBefore = pick.Average(t => LongestEdge(before.Mesh, t));
        rm.RefineTriangles(pick);
        var after = rm.Export();
        Assert.True(after.Validate(new Dictionary<int, double> { [0] = 1.0 }).IsValid);
        Assert.True(after.Mesh.TriangleCount > before.Mesh.TriangleCount);
        Assert.True(after.Quality.MinAngleDegrees >= 28);
        // Vertices are only ever added: every old vertex keeps its index and position.
        for (int v = 0; v < before.Mesh.VertexCount; v++)
        {
            Assert.Equal(before.Mesh.X[v], after.Mesh.X[v]);
            Assert.Equal(before.Mesh.Y[v], after.Mesh.Y[v]);
        }
        var nearCentre = Enumerable.Range(0, after.Mesh.TriangleCount).Where(t =>
        {
            var (x, y) = Centroid(after.Mesh, t);
            return (x - 0.5) * (x - 0.5) + (y - 0.5) * (y - 0.5) < 0.01;
        }).ToArray();
        Assert.True(nearCentre.Average(t => LongestEdge(after.Mesh, t)) < sizeBefore);
    }

    [Fact]
    public void RefineTriangles_SecondPass_RefinesTheMarkedRegionFurther()
    {
        // The same marked disc refined with one and with two passes: the second pass splits every triangle touching a
        // vertex of the first, so the region ends with more (and smaller) triangles, and the mesh stays valid.
        var g = new PlanarGraph();
        g.AddPolygon(TestGraphs.Rect(0, 0, 1, 1), 1);
        int Refined(int passes, out MeshResult result)
        {
            var rm = RefinableMesh.Create(g, new MeshOptions { MaxEdgeLengthMetres = 0.05 });
            var m = rm.Export().Mesh;
            var pick = Enumerable.Range(0, m.TriangleCount).Where(t =>
            {
                var (x, y) = Centroid(m, t);
                return (x - 0.5) * (x - 0.5) + (y - 0.5) * (y - 0.5) < 0.04;
            }).ToArray();
            rm.RefineTriangles(pick, passes);
            result = rm.Export();
            var after = result.Mesh;
            return Enumerable.Range(0, after.TriangleCount).Count(t =>
            {
                var (x, y) = Centroid(after, t);
                return (x - 0.5) * (x - 0.5) + (y - 0.5) * (y - 0.5) < 0.03;
            });
        }
        int one = Refined(1, out var r1), two = Refined(2, out var r2);
        Assert.True(r2.Validate(new Dictionary<int, double> { [0] = 1.0 }).IsValid);
        Assert.True(r2.Quality.MinAngleDegrees >= 28);
        Assert.True(two > 1.4 * one, $"inside the disc: one pass {one} triangles, two passes {two}");
        Assert.Throws<ArgumentOutOfRangeException>(() => RefinableMesh.Create(g).RefineTriangles([0], 0));
    }

    [Fact]
    public void RefineToSize_MeetsNewSizeEverywhere()
    {
        var g = new PlanarGraph();
        g.AddPolygon(TestGraphs.Rect(0, 0, 1, 1), 1);
        var rm = RefinableMesh.Create(g, new MeshOptions { MaxEdgeLengthMetres = 0.2 });
        int n0 = rm.TriangleCount;
        Func<double, double, double> h = (x, y) => x < 0.5 ? 0.02 : 1.0;
        rm.RefineToSize(h);
        var r = rm.Export();
        Assert.True(r.Validate(new Dictionary<int, double> { [0] = 1.0 }).IsValid);
        Assert.True(r.Mesh.TriangleCount > 4 * n0);
        for (int t = 0; t < r.Mesh.TriangleCount; t++)
        {
            var (x, y) = Centroid(r.Mesh, t);
            Assert.True(LongestEdge(r.Mesh, t) <= Math.Min(0.2, h(x, y)) * (1 + 1e-12));
        }
    }

    [Fact]
    public void RegionSeedSize_AppliesOnlyInItsRegion()
    {
        // Unit square split at x = 0.5 into region 1 (left, limit 0.02 m) and region 2 (right, global 0.2 m).
        var g = new PlanarGraph();
        int a = g.AddVertex(0, 0), b = g.AddVertex(0.5, 0), c = g.AddVertex(1, 0), d = g.AddVertex(1, 1), e = g.AddVertex(0.5, 1), f = g.AddVertex(0, 1);
        g.AddSegment(a, b, 1); g.AddSegment(b, c, 1); g.AddSegment(c, d, 1); g.AddSegment(d, e, 1); g.AddSegment(e, f, 1); g.AddSegment(f, a, 1);
        g.AddSegment(b, e, 2);
        g.AddRegion(new RegionSeed(0.25, 0.5, 1, 0.02));
        g.AddRegion(new RegionSeed(0.75, 0.5, 2));
        var r = Mesher.Generate(g, new MeshOptions { MaxEdgeLengthMetres = 0.2, GradingRatio = null });
        Assert.True(r.Validate(new Dictionary<int, double> { [1] = 0.5, [2] = 0.5 }).IsValid);
        var m = r.Mesh;
        double maxLeft = 0, maxRight = 0;
        for (int t = 0; t < m.TriangleCount; t++)
        {
            if (m.TriangleRegion[t] == 1) maxLeft = Math.Max(maxLeft, LongestEdge(m, t));
            else maxRight = Math.Max(maxRight, LongestEdge(m, t));
        }
        Assert.True(maxLeft <= 0.02 * (1 + 1e-12), $"left {maxLeft}");
        Assert.True(maxRight > 0.05, $"right {maxRight}: the right region should stay coarse away from the interface");
    }

    [Fact]
    public void Budget_Exceeded_ThrowsClearError()
    {
        var g = new PlanarGraph();
        g.AddPolygon(TestGraphs.Rect(0, 0, 1, 1), 1);
        var ex = Assert.Throws<MeshBudgetExceededException>(() => Mesher.Generate(g, new MeshOptions { MaxEdgeLengthMetres = 0.001, MaxTriangles = 5000 }));
        Assert.Contains("5,000", ex.Message);
        Assert.Contains("budget", ex.Message);
    }

    [Fact]
    public void ProtectedSegment_GetsNoSteinerPoints()
    {
        var g = new PlanarGraph();
        int a = g.AddVertex(0, 0), b = g.AddVertex(1, 0), c = g.AddVertex(1, 1), d = g.AddVertex(0, 1);
        // Bottom edge pre-split into 10 pieces with tag 9 (protected), the rest tag 1.
        int prev = a;
        for (int i = 1; i < 10; i++) { int v = g.AddVertex(i / 10.0, 0); g.AddSegment(prev, v, 9); prev = v; }
        g.AddSegment(prev, b, 9);
        g.AddSegment(b, c, 1); g.AddSegment(c, d, 1); g.AddSegment(d, a, 1);
        var r = Mesher.Generate(g, new MeshOptions { MaxEdgeLengthMetres = 0.03, ProtectedTags = new HashSet<int> { 9 } });
        Assert.True(r.Validate(new Dictionary<int, double> { [0] = 1.0 }).IsValid);
        Assert.Equal(10, r.Mesh.SegmentTag.Count(t => t == 9));
        Assert.All(r.SkippedTriangles, s => Assert.Equal(SkipCause.ProtectedSegment, s.Reason));
    }
}
