namespace Electrostat.Analysis.Margins;

/// <summary>The breakdown margin of one material: E_breakdown / E_peak in that material.</summary>
/// <param name="MaterialName">Material name.</param>
/// <param name="BreakdownFieldVoltsPerMetre">Breakdown field from the design, V/m; null when not given (then not checked).</param>
/// <param name="PeakFieldVoltsPerMetre">Largest recovered |E| in the material outside the report distance of singular corners, V/m.</param>
/// <param name="PeakXMetres">x (or r) of the peak, metres.</param>
/// <param name="PeakYMetres">y (or z) of the peak, metres.</param>
/// <param name="Margin">E_breakdown / E_peak (dimensionless), or null without a breakdown field.</param>
/// <param name="RequiredMargin">Required margin (per-material override or <c>checks.min_margin</c>), or null.</param>
/// <param name="Verdict">Pass or fail against the requirement; not checked without a breakdown field or requirement.</param>
/// <param name="SingularCornerFieldVoltsPerMetre">Largest field at the report distance of a singular corner lying in this
/// material, V/m (reported separately from the peak, which excludes it); null when no singular corner touches the material.</param>
public sealed record MaterialMargin(
    string MaterialName,
    double? BreakdownFieldVoltsPerMetre,
    double PeakFieldVoltsPerMetre,
    double PeakXMetres,
    double PeakYMetres,
    double? Margin,
    double? RequiredMargin,
    CheckVerdict Verdict,
    double? SingularCornerFieldVoltsPerMetre)
{
    /// <summary>Peak |E| in kV/mm (for printing).</summary>
    public double PeakFieldKilovoltsPerMillimetre => PeakFieldVoltsPerMetre * 1e-6;
}
