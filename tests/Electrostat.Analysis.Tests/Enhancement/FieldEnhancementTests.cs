using Electrostat.Analysis.Clearance;
using Electrostat.Analysis.Enhancement;
using Electrostat.Analysis.Margins;
using Electrostat.Analysis.Pipeline;
using Electrostat.Analysis.Tests.Adaptivity;
using Electrostat.Geometry.Shapes;

namespace Electrostat.Analysis.Tests.Enhancement;

public class FieldEnhancementTests
{
    private static MaterialMargin Peak(string material, double field) =>
        new(material, null, field, 0, 0, null, null, CheckVerdict.NotChecked, null);

    private static ClearancePair Gap(string a, string b, double volts, double metres) =>
        new(a, b, volts, metres, new Point2(0, 0), new Point2(metres, 0), null, CheckVerdict.NotChecked, null, CheckVerdict.NotChecked);

    [Fact]
    public void HighestPeak_OverTheMostStressedGap()
    {
        // Gaps: 10 kV over 5 mm (2 kV/mm) and 1 kV over 0.2 mm (5 kV/mm, the most stressed); peak 7.5 kV/mm in oil.
        var margins = new MarginReport([Peak("air", 3e6), Peak("oil", 7.5e6)]);
        var clearances = new ClearanceReport([Gap("hv", "enclosure", -1e4, 5e-3), Gap("hv", "sense", 1e3, 2e-4)], null, null);
        var fe = FieldEnhancementCalculator.Compute(margins, clearances)!;
        Assert.Equal("oil", fe.PeakMaterial);
        Assert.Equal(("hv", "sense"), (fe.ConductorA, fe.ConductorB));
        Assert.Equal(5e6, fe.MeanGapFieldVoltsPerMetre, 6);
        Assert.Equal(1.5, fe.Factor, 12);
        Assert.Equal(1 / 1.5, fe.Utilisation, 12);
    }

    [Fact]
    public void NoGapOrNoField_GivesNone()
    {
        var clearances = new ClearanceReport([Gap("a", "b", 1, 1e-3)], null, null);
        Assert.Null(FieldEnhancementCalculator.Compute(new MarginReport([Peak("air", 0)]), clearances));
        Assert.Null(FieldEnhancementCalculator.Compute(new MarginReport([Peak("air", 1e6)]), new ClearanceReport([], null, null)));
    }

    [Fact]
    public void LayeredPlates_FactorIsTheVacuumLayersShareOfTheStress()
    {
        // Two-layer plates (d1 = 0.4 mm of εr 4 under d2 = 0.6 mm of vacuum, 1 V): D is uniform, so the vacuum carries
        // E = V/(d1/4 + d2) (layers in series, Griffiths ch. 4) against the mean V/(d1 + d2):
        // f = (d1 + d2)/(d1/4 + d2) = 1/0.7. A single dielectric would give exactly 1.
        var design = AdaptiveTestSupport.Load("geometries/validation/layered-plate-capacitor.json");
        var outcome = SolvePipeline.Run(design, AccuracyLevel.Coarse);
        var fe = outcome.Analysis.FieldEnhancement!;
        Assert.Equal(1 / 0.7, fe.Factor, 1e-3 / 0.7);
    }
}
