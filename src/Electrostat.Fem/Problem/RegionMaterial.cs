namespace Electrostat.Fem.Problem;

/// <summary>The electrical properties of one mesh region.</summary>
/// <remarks>
/// Sign convention for the volume charge: the potential φ obeys −∇·(ε0 εr ∇φ) = ρ, with ρ in C/m³; a positive
/// charge density raises the potential around it (the field E = −∇φ points away from it).
/// </remarks>
/// <param name="Permittivity">Relative permittivity (dimensionless), isotropic or a symmetric tensor.</param>
/// <param name="ChargeDensityCoulombsPerCubicMetre">Free volume charge density ρ in C/m³ (0 for none).</param>
public sealed record RegionMaterial(PermittivityTensor Permittivity, double ChargeDensityCoulombsPerCubicMetre = 0)
{
    /// <summary>A charge-free isotropic dielectric.</summary>
    /// <param name="relativePermittivity">εr, dimensionless.</param>
    public static RegionMaterial Dielectric(double relativePermittivity) => new(PermittivityTensor.Isotropic(relativePermittivity));

    /// <summary>Vacuum (or air, to the accuracy electrostatic design needs): εr = 1.</summary>
    public static RegionMaterial Vacuum { get; } = Dielectric(1.0);
}
