using Electrostat.Analysis.HotSpots;
using Electrostat.Analysis.Tests.Support;
using Electrostat.Geometry.Loading;

namespace Electrostat.Analysis.Tests;

public class ExampleDesignAnalysisTests
{
    private static AnalysisReport Analyze(string relative, out AnalysisContext context)
    {
        var load = DesignLoader.Load(Path.Combine(RepoPaths.Geometries, relative));
        Assert.False(load.HasErrors, string.Join("\n", load.Errors));
        context = SolvedDesign.Solve(load.Design!);
        return DesignAnalyzer.Analyze(context);
    }

    [Fact]
    public void HvElectrodeOverPlate_ReportsTriplePointsCornersAndForces()
    {
        var report = Analyze("hv-electrode-over-plate.json", out var ctx);
        Assert.InRange(report.HotSpots.Count, 2, 10);
        // The bar is rounded (tangent fillets): any singular corner can only be on the plate, one per sharp plate corner.
        Assert.DoesNotContain(report.SingularCorners, c => c.ConductorName == "hv_bar");
        Assert.Equal(Electrostat.Analysis.Corners.SingularCornerDetector.FindCornerPoints(ctx.Design).Count, report.SingularCorners.Count);
        Assert.Equal(report.SingularCorners.Count, report.Warnings.Count(w => w.Contains("Sharp corner", StringComparison.Ordinal)));
        // Where the epoxy spacer meets the bar and the plate there are vertices with both air and epoxy around them.
        Assert.Contains(Enumerable.Range(0, ctx.Mesh.VertexCount), v => HotSpotFinder.KindOf(ctx, v) == HotSpotKind.TriplePoint);
        // Margins: both materials have breakdown fields and requirements, so both are checked.
        Assert.All(report.Margins.Materials, m => Assert.NotEqual(CheckVerdict.NotChecked, m.Verdict));
        // bar–plate and bar–wall clearances: 10 mm gap to the plate (bar bottom at y = 10, plate top at y = 0).
        var barPlate = report.Clearances.Pairs.Single(p => p.ConductorA == "hv_bar" && p.ConductorB == "base_plate");
        Assert.Equal(10e-3, barPlate.DistanceMetres, 12);
        // The bar is pulled towards the grounded plate (down), with no net sideways force for a symmetric design.
        var bar = report.Forces.Forces.Single(f => f.ConductorName == "hv_bar");
        Assert.True(bar.ForceYNewtons < 0);
        // On the default (coarse) mesh the one-layer stress integral leaves a spurious sideways part of about 7%
        // (measured); the bound documents that accuracy rather than a physical value.
        Assert.True(Math.Abs(bar.ForceXNewtons) < 0.1 * Math.Abs(bar.ForceYNewtons), $"{bar}");
        Assert.True(report.EstimatedRelativeFieldError is > 0 and < 0.5);
    }

    [Theory]
    [InlineData("capacitive-sensor-pcb.json")]
    [InlineData("feedthrough-axisymmetric.json")]
    [InlineData("validation/coaxial-cylinders.json")]
    [InlineData("validation/concentric-spheres.json")]
    [InlineData("validation/layered-plate-capacitor.json")]
    public void ExampleDesigns_AnalyseWithoutError(string relative)
    {
        var report = Analyze(relative, out _);
        Assert.NotEmpty(report.HotSpots);
        Assert.NotEmpty(report.SurfaceProfiles);
        Assert.All(report.HotSpots, h => Assert.True(h.FieldVoltsPerMetre > 0 && double.IsFinite(h.FieldVoltsPerMetre)));
        Assert.All(report.Clearances.Pairs, p => Assert.True(p.DistanceMetres >= 0));
    }
}
