using Electrostat.Analysis.Clearance;
using Electrostat.Analysis.Corners;
using Electrostat.Analysis.Enhancement;
using Electrostat.Analysis.Forces;
using Electrostat.Analysis.HotSpots;
using Electrostat.Analysis.Margins;
using Electrostat.Analysis.Surface;

namespace Electrostat.Analysis;

/// <summary>Everything <see cref="DesignAnalyzer.Analyze"/> finds about a solved design. SI units.</summary>
/// <param name="HotSpots">Top local maxima of |E|, highest first.</param>
/// <param name="SurfaceProfiles">|E|, E·n and σ along each conductor surface and the enclosure wall.</param>
/// <param name="Margins">Breakdown margin per material.</param>
/// <param name="Clearances">Clearance per pair of conductors at different potentials.</param>
/// <param name="SingularCorners">Sharp re-entrant conductor corners (field singular, peak mesh-dependent).</param>
/// <param name="Forces">Energy and force per conductor.</param>
/// <param name="EstimatedRelativeFieldError">Zienkiewicz–Zhu estimate of the relative energy-norm error of the field.</param>
/// <param name="Warnings">One line per warning (singular corners first).</param>
/// <param name="FieldEnhancement">Highest field over the mean field of the most stressed gap; null without a gap.</param>
public sealed record AnalysisReport(
    IReadOnlyList<HotSpot> HotSpots,
    IReadOnlyList<SurfaceFieldProfile> SurfaceProfiles,
    MarginReport Margins,
    ClearanceReport Clearances,
    IReadOnlyList<SingularCorner> SingularCorners,
    ForceReport Forces,
    double EstimatedRelativeFieldError,
    IReadOnlyList<string> Warnings,
    FieldEnhancement? FieldEnhancement = null)
{
    /// <summary>Fail when a margin or clearance check fails; pass when at least one check passed and none failed; else not checked.</summary>
    public CheckVerdict Verdict =>
        Margins.Verdict == CheckVerdict.Fail || Clearances.Verdict == CheckVerdict.Fail ? CheckVerdict.Fail
        : Margins.Verdict == CheckVerdict.Pass || Clearances.Verdict == CheckVerdict.Pass ? CheckVerdict.Pass
        : CheckVerdict.NotChecked;
}
