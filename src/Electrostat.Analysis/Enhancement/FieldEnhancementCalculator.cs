using Electrostat.Analysis.Clearance;
using Electrostat.Analysis.Margins;

namespace Electrostat.Analysis.Enhancement;

/// <summary>Finds the field enhancement factor from the margins' peaks and the clearances (see <see cref="FieldEnhancement"/>).</summary>
public static class FieldEnhancementCalculator
{
    /// <summary>The factor, or null when there is no field or no gap between conductors at different potentials.</summary>
    /// <param name="margins">Peak field per material (singular corners excluded).</param>
    /// <param name="clearances">Clearances of conductor pairs at different potentials.</param>
    public static FieldEnhancement? Compute(MarginReport margins, ClearanceReport clearances)
    {
        ArgumentNullException.ThrowIfNull(margins);
        ArgumentNullException.ThrowIfNull(clearances);
        var peak = margins.Materials.Where(m => m.PeakFieldVoltsPerMetre > 0).MaxBy(m => m.PeakFieldVoltsPerMetre);
        var gap = clearances.Pairs.Where(p => p.DistanceMetres > 0 && Math.Abs(p.VoltageDifferenceVolts) > 0)
            .MaxBy(p => Math.Abs(p.VoltageDifferenceVolts) / p.DistanceMetres);
        if (peak is null || gap is null) return null;
        return new FieldEnhancement(peak.PeakFieldVoltsPerMetre, peak.MaterialName, peak.PeakXMetres, peak.PeakYMetres,
            gap.ConductorA, gap.ConductorB, Math.Abs(gap.VoltageDifferenceVolts), gap.DistanceMetres);
    }
}
