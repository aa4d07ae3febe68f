using Electrostat.Analysis.Pipeline;
using Electrostat.Analysis.Tests.Adaptivity;
using Electrostat.Fem.Problem;
using Electrostat.Meshing.Designs;

namespace Electrostat.Analysis.Tests.Pipeline;

/// <summary>Open space through the whole pipeline: the Kelvin image is solved but never reported.</summary>
public class OpenSpacePipelineTests
{
    [Fact]
    public void OpenDesign_GetsTheKelvinBoundary_WithNoRoleOnTheCircles()
    {
        var design = AdaptiveTestSupport.Load("geometries/validation/isolated-sphere.json");
        var (input, result) = DesignMesher.Generate(design);
        var built = DesignProblemBuilder.Build(design, input, result.Mesh);
        var kelvin = Assert.IsType<KelvinOpenBoundary>(built.Problem.OpenBoundary);
        var image = input.OpenSpace!;
        Assert.Equal(image.ImageRegion, kelvin.ExteriorRegion);
        Assert.Equal(design.Enclosure.PotentialVolts, kelvin.PotentialAtInfinityVolts);
        Assert.False(built.Problem.Boundaries.ContainsKey(kelvin.InteriorArcTag));
        Assert.False(built.Problem.Boundaries.ContainsKey(kelvin.ExteriorArcTag));
        // The image region has the background's permittivity but no design meaning.
        Assert.True(built.Problem.Materials.ContainsKey(image.ImageRegion));
        Assert.DoesNotContain(built.Regions, r => r.Attribute == image.ImageRegion);
    }

    [Fact]
    public void OpenLinePair_ChargesSumToZero_AndNothingIsReportedFromTheImage()
    {
        var design = AdaptiveTestSupport.Load("geometries/validation/two-wire-open.json");
        var outcome = SolvePipeline.Run(design, AccuracyLevel.Coarse);
        var open = design.Enclosure.Open!;
        bool Inside(double x, double y) =>
            Math.Sqrt((x - open.Center.X) * (x - open.Center.X) + (y - open.Center.Y) * (y - open.Center.Y)) <= open.RadiusMetres * (1 + 1e-9);
        // Planar open space leaves infinity free: no net flux leaves, so each row of the Maxwell matrix sums to ~0.
        var cap = outcome.Adaptive.Capacitance!;
        for (int i = 0; i < 2; i++) Assert.True(Math.Abs(cap.ToEnclosure(i)) < 1e-6 * cap.Maxwell[i, i], $"row {i} sums to {cap.ToEnclosure(i):E3}");
        // Peaks and hot spots come from the design side only.
        Assert.All(outcome.Adaptive.Levels.SelectMany(l => l.Peaks), p => Assert.True(Inside(p.XMetres, p.YMetres), $"peak at ({p.XMetres}, {p.YMetres})"));
        Assert.NotEmpty(outcome.Analysis.HotSpots);
        Assert.All(outcome.Analysis.HotSpots, h => Assert.True(Inside(h.XMetres, h.YMetres), $"hot spot at ({h.XMetres}, {h.YMetres})"));
        Assert.All(outcome.Analysis.HotSpots, h => Assert.True(double.IsFinite(h.MergeRadiusMetres)));
        // The truncation circle is no conductor: the only clearance is between the wires (10 mm centres, radius 1 mm).
        var pair = Assert.Single(outcome.Analysis.Clearances.Pairs);
        Assert.Equal(["left", "right"], new[] { pair.ConductorA, pair.ConductorB }.Order());
        Assert.Equal(8e-3, pair.DistanceMetres, 9);
    }

    [Fact]
    public void CircleCloseToTheBody_IsCutFinerThanTheGap_SoThePeakStillConverges()
    {
        // An isolated sphere (a = 10 mm, 1 V) inside a truncation circle only 0.3 mm away. The circle is never refined,
        // so its chords must not exceed the gap; with 1 mm chords the peak came out 7 % high against an estimate of
        // 0.9 %. Reference: E(a) = V/a = 100 V/m, C = 4πε0a (Griffiths, ch. 2).
        var text = File.ReadAllText(Path.Combine(RepoPaths.Geometries, "validation", "isolated-sphere.json"))
            .Replace("\"margin\": 15, \"center\": [0, 0]", "\"radius\": 10.3, \"center\": [0, 0]", StringComparison.Ordinal);
        Assert.Contains("\"radius\": 10.3", text, StringComparison.Ordinal);
        var design = Electrostat.Geometry.Loading.DesignLoader.LoadFromText(text).Design!;
        var input = DesignGraphBuilder.Build(design);
        int circleChords = input.Graph.Segments.Count(g => g.Tag == input.OpenSpace!.InteriorTag);
        Assert.True(circleChords >= Math.PI * 10.3 / 0.3, $"{circleChords} chords on a half circle of 10.3 mm facing a 0.3 mm gap");
        var outcome = SolvePipeline.Run(design);
        var peak = outcome.Adaptive.PeakErrors["vacuum"];
        double error = Math.Abs(peak.Value / 100 - 1);
        Assert.True(error < 0.01, $"peak {peak.Value:G6} V/m");
        Assert.True(peak.RelativeError >= error, $"estimate {peak.RelativeError:P2} below the true error {error:P2}");
        double c = outcome.Adaptive.Capacitance!.Maxwell[0, 0];
        Assert.True(Math.Abs(c / (4 * Math.PI * 8.8541878128e-12 * 0.01) - 1) < 0.005, $"C = {c:E6}");
    }

    [Fact]
    public void TheAnswerDoesNotDependOnWhereTheCircleIs()
    {
        // The Kelvin map is exact for any truncation radius (Freeman and Lowther 1989): C of the isolated sphere
        // (4πε0a, Griffiths ch. 2) must come out the same with the circle at 2a and at 5a, up to discretisation.
        string text = File.ReadAllText(Path.Combine(RepoPaths.Geometries, "validation", "isolated-sphere.json"));
        double C(double radiusMm)
        {
            var t = text.Replace("\"margin\": 15", FormattableString.Invariant($"\"radius\": {radiusMm}"), StringComparison.Ordinal);
            var design = Electrostat.Geometry.Loading.DesignLoader.LoadFromText(t).Design!;
            return SolvePipeline.Run(design).Adaptive.Capacitance!.Maxwell[0, 0];
        }
        double exact = 4 * Math.PI * 8.8541878128e-12 * 0.01;
        double near = C(20), far = C(50);
        Assert.True(Math.Abs(near / exact - 1) < 0.005, $"R = 2a: C = {near:E6}");
        Assert.True(Math.Abs(far / exact - 1) < 0.005, $"R = 5a: C = {far:E6}");
        Assert.True(Math.Abs(near / far - 1) < 0.003, $"C changes by {near / far - 1:P3} between R = 2a and 5a");
    }
}
