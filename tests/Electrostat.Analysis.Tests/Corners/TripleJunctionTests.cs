using Electrostat.Analysis.Corners;
using Electrostat.Analysis.Pipeline;
using Electrostat.Analysis.Tests.Adaptivity;

namespace Electrostat.Analysis.Tests.Corners;

public class TripleJunctionTests
{
    [Fact]
    public void ObtuseDielectricContact_IsReportedWithTheWedgeExponent()
    {
        // εr 4 meeting the electrode at 135° (vacuum 45°): λ from ε1 cot(λα1) = −ε2 cot(λα2) (Meixner 1972) ≈ 0.806.
        var outcome = SolvePipeline.Run(AdaptiveTestSupport.Load("geometries/validation/triple-junction.json"), AccuracyLevel.Coarse);
        var junctions = outcome.Analysis.SingularCorners.Where(c => c.Kind == SingularPointKind.TripleJunction).ToList();
        Assert.Equal(2, junctions.Count);
        double lambda = WedgeExponent.Smallest([(0.75 * Math.PI, 4.0), (0.25 * Math.PI, 1.0)]);
        foreach (var j in junctions)
        {
            Assert.Equal(0.010, Math.Abs(j.Location.X), 9);
            Assert.Equal(0.010, j.Location.Y, 9);
            Assert.Equal(lambda - 1, j.FieldExponent, 4); // the sampled angles are located to 1e-12 rad
            Assert.Equal(180, j.FieldSideAngleDegrees, 3);
            Assert.Contains("Triple junction of 'electrode'", j.Warning, StringComparison.Ordinal);
            Assert.Equal(0, j.SuggestedFilletRadiusMetres);
        }
        // Their discs are left out of the peaks, like corners: no peak sits closer than the report distance.
        foreach (var p in outcome.Adaptive.Levels[^1].Peaks)
        {
            foreach (var j in junctions)
                Assert.True(Math.Sqrt(Math.Pow(p.XMetres - j.Location.X, 2) + Math.Pow(p.YMetres - j.Location.Y, 2)) >= j.ReportDistanceMetres * (1 - 1e-9));
        }
    }

    [Theory]
    [InlineData("geometries/hv-electrode-over-plate.json")]
    [InlineData("geometries/feedthrough-axisymmetric.json")]
    public void RightAngledOrEmbeddedContacts_AreNotJunctionWarnings(string file)
    {
        // The HV example's spacer meets the plates at 90° (λ = 1: regular); the feedthrough's junctions are inside
        // fillets. Neither may be flagged.
        var outcome = SolvePipeline.Run(AdaptiveTestSupport.Load(file), AccuracyLevel.Coarse);
        Assert.DoesNotContain(outcome.Analysis.SingularCorners, c => c.Kind == SingularPointKind.TripleJunction);
    }
}
