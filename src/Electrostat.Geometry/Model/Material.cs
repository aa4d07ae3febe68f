namespace Electrostat.Geometry.Model;

/// <summary>A linear isotropic dielectric material.</summary>
/// <param name="Name">Name used in the design file.</param>
/// <param name="RelativePermittivity">Relative permittivity εr (dimensionless, &gt; 0).</param>
/// <param name="BreakdownFieldVoltsPerMetre">Field strength at which the material breaks down, V/m; null when unknown (no margin check).</param>
public sealed record Material(string Name, double RelativePermittivity, double? BreakdownFieldVoltsPerMetre)
{
    /// <summary>Permittivity of vacuum ε0, F/m (CODATA 2018 value, 8.8541878128e-12 F/m).</summary>
    public const double VacuumPermittivityFaradsPerMetre = 8.8541878128e-12;

    /// <summary>Absolute permittivity ε = εr·ε0, F/m.</summary>
    public double PermittivityFaradsPerMetre => RelativePermittivity * VacuumPermittivityFaradsPerMetre;

    /// <summary>The material used as background when a design names none: εr = 1, no breakdown field.</summary>
    public static Material Vacuum { get; } = new("vacuum", 1.0, null);
}
