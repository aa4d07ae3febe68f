using Electrostat.Analysis.Pipeline;
using Electrostat.Analysis.Tests.Adaptivity;

namespace Electrostat.Analysis.Tests.Pipeline;

/// <summary>One peak per material across the outputs of <c>solve</c>: peaks, margins and the enhancement factor.</summary>
public class ReportedPeaksTests
{
    [Theory]
    [InlineData("geometries/hv-electrode-over-plate.json")]
    [InlineData("geometries/capacitive-sensor-pcb.json")]
    public void MarginsAndEnhancement_UseTheAdaptivePeaks(string file)
    {
        var outcome = SolvePipeline.Run(AdaptiveTestSupport.Load(file), AccuracyLevel.Coarse);
        var peaks = outcome.Adaptive.Levels[^1].Peaks.ToDictionary(p => p.MaterialName);
        Assert.NotEmpty(peaks);
        foreach (var m in outcome.Analysis.Margins.Materials)
        {
            var p = peaks[m.MaterialName];
            Assert.Equal(p.FieldVoltsPerMetre, m.PeakFieldVoltsPerMetre);
            Assert.Equal((p.XMetres, p.YMetres), (m.PeakXMetres, m.PeakYMetres));
            if (m.BreakdownFieldVoltsPerMetre is double eb) Assert.Equal(eb / p.FieldVoltsPerMetre, m.Margin!.Value, 12);
        }
        var fe = outcome.Analysis.FieldEnhancement!;
        Assert.Equal(peaks.Values.Max(p => p.FieldVoltsPerMetre), fe.PeakFieldVoltsPerMetre);
    }
}
