using Electrostat.Analysis.Pipeline;
using Electrostat.Geometry.Loading;
using Electrostat.Rendering.Report;

namespace Electrostat.Rendering.Tests.Report;

/// <summary>The report of a design in open space names infinity, not an enclosure, as the capacitance reference.</summary>
public class OpenSpaceReportTests
{
    [Theory]
    [InlineData("two-wire-open.json", "the charges sum to zero")]
    [InlineData("isolated-sphere.json", "with infinity at 0 V")]
    public void CapacitanceSection_NamesInfinity(string file, string phrase)
    {
        var design = DesignLoader.Load(Path.Combine(RepoPaths.Geometries, "validation", file)).Design!;
        var outcome = SolvePipeline.Run(design, AccuracyLevel.Coarse);
        string folder = Path.Combine(AppContext.BaseDirectory, "artifacts", "open-report-" + Path.GetFileNameWithoutExtension(file));
        if (Directory.Exists(folder)) Directory.Delete(folder, recursive: true);
        ReportWriter.Write(folder, ReportInput.FromOutcome(outcome));
        string html = File.ReadAllText(Path.Combine(folder, "report.html"));
        Assert.Contains("to-infinity capacitances", html, StringComparison.Ordinal);
        Assert.Contains(phrase, html, StringComparison.Ordinal);
        Assert.DoesNotContain("to enclosure", html, StringComparison.Ordinal);
    }
}
