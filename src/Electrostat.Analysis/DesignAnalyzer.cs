using System.Globalization;
using Electrostat.Analysis.Clearance;
using Electrostat.Analysis.Corners;
using Electrostat.Analysis.Enhancement;
using Electrostat.Analysis.Forces;
using Electrostat.Analysis.HotSpots;
using Electrostat.Analysis.Margins;
using Electrostat.Analysis.Surface;

namespace Electrostat.Analysis;

/// <summary>
/// The single entry point of the analysis layer: from a solved design to an <see cref="AnalysisReport"/> (hot spots,
/// surface profiles, margins, clearances, singular corners, energy and forces, field enhancement factor).
/// </summary>
/// <remarks>
/// Usage: <c>var report = DesignAnalyzer.Analyze(new AnalysisContext(design, meshInput.Tags, meshInput.Regions, solution));</c>.
/// Each part is also available on its own (<see cref="HotSpotFinder"/>, <see cref="SurfaceFieldProfiler"/>,
/// <see cref="MarginChecker"/>, <see cref="ClearanceAnalyzer"/>, <see cref="SingularCornerDetector"/>,
/// <see cref="ForceCalculator"/>, <see cref="Recovery.FieldRecovery"/>).
/// </remarks>
public static class DesignAnalyzer
{
    /// <summary>Runs every analysis.</summary>
    /// <param name="context">The solved design.</param>
    /// <param name="options">Options; null for defaults.</param>
    /// <param name="measuredPeaks">The final adaptive level's peaks, which the margins then use (see
    /// <see cref="MarginChecker"/>); null to take them from the recovered field.</param>
    public static AnalysisReport Analyze(AnalysisContext context, AnalysisOptions? options = null, IReadOnlyList<Adaptivity.MaterialPeak>? measuredPeaks = null)
    {
        ArgumentNullException.ThrowIfNull(context);
        options ??= new AnalysisOptions();
        var corners = SingularCornerDetector.Detect(context);
        var hotSpots = HotSpotFinder.Find(context, corners, options.HotSpots);
        var profiles = SurfaceFieldProfiler.Profile(context);
        var margins = MarginChecker.Check(context, corners, measuredPeaks);
        var clearances = ClearanceAnalyzer.Analyze(context, options.PcbSpacingCategory);
        var forces = ForceCalculator.Compute(context);
        var warnings = new List<string>();
        warnings.AddRange(corners.Select(c => c.Warning));
        var inv = CultureInfo.InvariantCulture;
        foreach (var m in margins.Materials)
        {
            if (m.BreakdownFieldVoltsPerMetre is null && m.PeakFieldVoltsPerMetre > 0)
                warnings.Add(string.Format(inv, "Material '{0}' has no breakdown field: its margin is not checked (peak {1:G4} kV/mm).", m.MaterialName, m.PeakFieldKilovoltsPerMillimetre));
        }
        if (clearances.PcbCaution is not null) warnings.Add(clearances.PcbCaution);
        var enhancement = FieldEnhancementCalculator.Compute(margins, clearances);
        return new AnalysisReport(hotSpots, profiles, margins, clearances, corners, forces, context.Recovered.EstimatedRelativeError, warnings, enhancement);
    }
}
