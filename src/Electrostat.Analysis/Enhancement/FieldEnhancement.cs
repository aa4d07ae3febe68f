namespace Electrostat.Analysis.Enhancement;

/// <summary>
/// The field enhancement factor of a design: its highest field over the mean field of its most stressed gap,
/// f = E_max / (ΔV/d) (the reciprocal of Schwaiger's utilisation factor η = E_mean/E_max; Kuffel, Zaengl and Kuffel,
/// High Voltage Engineering: Fundamentals, 2nd ed., §4.2, from memory). f = 1 for a uniform field; for a two-electrode
/// arrangement it is exactly the textbook factor, e.g. (b − a)/(a·ln(b/a)) for coaxial cylinders and b/a for
/// concentric spheres. SI units.
/// </summary>
/// <remarks>
/// The most stressed gap is the pair of conductors (the enclosure wall counts as one) with the largest ΔV/d, d their
/// shortest straight clearance. The peak excludes singular corners, like the margins. In a multi-electrode design the
/// peak may sit in another gap than the one named: the factor then still bounds how far the worst field exceeds the
/// worst average field.
/// </remarks>
/// <param name="PeakFieldVoltsPerMetre">Highest |E| over all materials (singular corners excluded), V/m.</param>
/// <param name="PeakMaterial">Material where that peak sits.</param>
/// <param name="PeakXMetres">Peak location x, metres.</param>
/// <param name="PeakYMetres">Peak location y, metres.</param>
/// <param name="ConductorA">First conductor of the most stressed gap (or "enclosure").</param>
/// <param name="ConductorB">Second conductor of the gap.</param>
/// <param name="VoltageDifferenceVolts">|ΔV| across the gap, volts.</param>
/// <param name="GapMetres">Shortest clearance d across the gap, metres.</param>
public sealed record FieldEnhancement(
    double PeakFieldVoltsPerMetre,
    string PeakMaterial,
    double PeakXMetres,
    double PeakYMetres,
    string ConductorA,
    string ConductorB,
    double VoltageDifferenceVolts,
    double GapMetres)
{
    /// <summary>Mean field of the gap, ΔV/d, V/m.</summary>
    public double MeanGapFieldVoltsPerMetre => VoltageDifferenceVolts / GapMetres;

    /// <summary>Field enhancement factor f = E_max/(ΔV/d) (dimensionless, ≥ 1 for a two-electrode gap).</summary>
    public double Factor => PeakFieldVoltsPerMetre / MeanGapFieldVoltsPerMetre;

    /// <summary>Utilisation factor η = 1/f (Schwaiger).</summary>
    public double Utilisation => 1 / Factor;
}
