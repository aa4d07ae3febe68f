using Electrostat.Analysis.Clearance;
using Electrostat.Analysis.Tests.Support;
using Electrostat.Geometry.Shapes;

namespace Electrostat.Analysis.Tests.Clearance;

public class ClearanceTests
{
    private const string TwoCircles = """
    {
      "units": "mm", "symmetry": "planar",
      "enclosure": { "shape": { "type": "rectangle", "min": [-50, -50], "max": [50, 50] }, "potential": 0 },
      "conductors": [
        { "name": "a", "potential": "1 kV", "shape": { "type": "circle", "center": [-10, 3], "radius": 4 } },
        { "name": "b", "potential": "-1 kV", "shape": { "type": "circle", "center": [12, -5], "radius": 6 } },
        { "name": "c", "potential": "0 V", "shape": { "type": "rectangle", "min": [20, 20], "max": [30, 25] } }
      ],
      "checks": { "min_clearance": "5 mm", "pairs": [ { "between": ["a", "b"], "min_clearance": "20 mm" } ] }
    }
    """;

    [Fact]
    public void CircleCircle_MatchesCentreDistanceMinusRadii()
    {
        // Two disjoint circles: the gap is |c1 − c2| − r1 − r2, on the line of centres (elementary geometry).
        var design = SolvedDesign.Load(TwoCircles);
        var report = ClearanceAnalyzer.Analyze(design, k => design.Conductors[k].PotentialVolts!.Value);
        var ab = report.Pairs.Single(p => p.ConductorA == "a" && p.ConductorB == "b");
        double centres = Math.Sqrt(22.0 * 22.0 + 8.0 * 8.0);
        Assert.Equal((centres - 10) * 1e-3, ab.DistanceMetres, 12);
        Assert.Equal(2000, ab.VoltageDifferenceVolts, 9);
        // The closest point on a lies on its circle towards b's centre.
        var towardB = new Point2(-10e-3 + 4e-3 * 22 / centres, 3e-3 - 4e-3 * 8 / centres);
        Assert.True(ab.PointA.DistanceTo(towardB) < 1e-12);
        Assert.True(Math.Abs(ab.PointA.DistanceTo(ab.PointB) - ab.DistanceMetres) < 1e-15);
    }

    [Fact]
    public void CircleRectangleAndWall_MatchClosedForm_ChecksUseDesignValues()
    {
        var design = SolvedDesign.Load(TwoCircles);
        var report = ClearanceAnalyzer.Analyze(design, k => design.Conductors[k].PotentialVolts!.Value);
        // b (centre (12,-5), r 6) to rectangle c: nearest rectangle point is the corner (20, 20): distance to centre minus r.
        var bc = report.Pairs.Single(p => p.ConductorA == "b" && p.ConductorB == "c");
        Assert.Equal((Math.Sqrt(8.0 * 8 + 25.0 * 25) - 6) * 1e-3, bc.DistanceMetres, 12);
        // a to the grounded wall: nearest wall is x = −50: 40 − 4 = 36 mm.
        var aw = report.Pairs.Single(p => p.ConductorA == "a" && p.ConductorB == ConductorOutline.EnclosureName);
        Assert.Equal(36e-3, aw.DistanceMetres, 12);
        // c and the wall are both at 0 V: no pair.
        Assert.DoesNotContain(report.Pairs, p => p.ConductorA == "c" && p.ConductorB == ConductorOutline.EnclosureName);
        // Pair rule (20 mm) fails for a–b (gap ≈ 13.4 mm); design value 5 mm passes for the others.
        Assert.Equal(20e-3, report.Pairs.Single(p => p.ConductorB == "b" && p.ConductorA == "a").RequiredMetres!.Value, 12);
        Assert.Equal(CheckVerdict.Fail, report.Pairs.Single(p => p.ConductorA == "a" && p.ConductorB == "b").Verdict);
        Assert.Equal(CheckVerdict.Pass, bc.Verdict);
        Assert.Equal(CheckVerdict.Fail, report.Verdict);
    }

    [Fact]
    public void RectangleRectangle_DiagonalAndFacing_MatchClosedForm()
    {
        // Axis-aligned rectangles: facing edges give the coordinate gap; diagonal placement gives the corner–corner
        // distance sqrt(dx² + dy²) (elementary geometry).
        var design = SolvedDesign.Load("""
        {
          "units": "mm", "symmetry": "planar",
          "enclosure": { "shape": { "type": "rectangle", "min": [-100, -100], "max": [100, 100] }, "potential": 0 },
          "conductors": [
            { "name": "p", "potential": 100, "shape": { "type": "rectangle", "min": [0, 0], "max": [10, 5] } },
            { "name": "q", "potential": 200, "shape": { "type": "rectangle", "min": [13, 9], "max": [20, 15] } },
            { "name": "r", "potential": 300, "shape": { "type": "rectangle", "min": [2, -8], "max": [8, -2.5] } }
          ]
        }
        """);
        var report = ClearanceAnalyzer.Analyze(design, k => design.Conductors[k].PotentialVolts!.Value, SpacingCategory.B2ExternalUncoatedBelow3050m);
        Assert.Equal(5e-3, report.Pairs.Single(p => p.ConductorA == "p" && p.ConductorB == "q").DistanceMetres, 12);
        Assert.Equal(2.5e-3, report.Pairs.Single(p => p.ConductorA == "p" && p.ConductorB == "r").DistanceMetres, 12);
        var qr = report.Pairs.Single(p => p.ConductorA == "q" && p.ConductorB == "r");
        Assert.Equal(Math.Sqrt(5.0 * 5 + 11.5 * 11.5) * 1e-3, qr.DistanceMetres, 12);
        // PCB check: 100 V between p and q → IPC-2221B Table 6-1, B2, 51–100 V row: 0.6 mm (from memory, see PcbSpacingTable).
        var pq = report.Pairs.Single(p => p.ConductorA == "p" && p.ConductorB == "q");
        Assert.Equal(0.6e-3, pq.PcbRequiredMetres!.Value, 12);
        Assert.Equal(CheckVerdict.Pass, pq.PcbVerdict);
        Assert.Equal(CheckVerdict.NotChecked, pq.Verdict); // no min_clearance in the design
        Assert.NotNull(report.PcbCaution);
    }

    [Fact]
    public void ArcAndLinePieces_AgreeWithDenseSampling()
    {
        // Exact closed forms against brute force: the minimum over 4000 × 4000 sample pairs can only be larger than
        // the exact minimum, and by at most the sampling step (Lipschitz bound), so |exact − sampled| ≤ step.
        var rng = new Random(12345);
        for (int trial = 0; trial < 60; trial++)
        {
            var a = RandomPiece(rng);
            var b = RandomPiece(rng);
            var oa = new ConductorOutline("a", 0, 1, [a]);
            var ob = new ConductorOutline("b", 1, 0, [b]);
            var (exact, pa, pb) = oa.DistanceTo(ob);
            Assert.True(Math.Abs(pa.DistanceTo(pb) - exact) < 1e-12);
            double sampled = double.PositiveInfinity;
            const int n = 1500;
            var sb = Enumerable.Range(0, n + 1).Select(j => b.PointAt((double)j / n)).ToArray();
            for (int i = 0; i <= n; i++)
            {
                var p = a.PointAt((double)i / n);
                foreach (var q in sb) sampled = Math.Min(sampled, p.DistanceTo(q));
            }
            double step = (a.Length + b.Length) / n;
            Assert.True(exact <= sampled + 1e-12, $"trial {trial}: exact {exact} above sampled {sampled}");
            Assert.True(sampled - exact <= step, $"trial {trial}: exact {exact}, sampled {sampled}, step {step}");
        }
    }

    private static CurveSegment RandomPiece(Random rng)
    {
        double Next(double lo, double hi) => lo + (hi - lo) * rng.NextDouble();
        if (rng.Next(2) == 0)
            return new LineSegment(new Point2(Next(-1, 1), Next(-1, 1)), new Point2(Next(-1, 1), Next(-1, 1)));
        return new ArcSegment(new Point2(Next(-1, 1), Next(-1, 1)), Next(0.1, 1), Next(-Math.PI, Math.PI), Next(-2 * Math.PI, 2 * Math.PI));
    }
}
