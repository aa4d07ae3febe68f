namespace Electrostat.Geometry.Materials;

/// <summary>
/// A built-in material with typical figures, for starting a design. The values are typical, not rated: see
/// <see cref="MaterialPresets.Caution"/>.
/// </summary>
/// <param name="Name">Name used in design files (lower case, e.g. "transformer-oil").</param>
/// <param name="Description">What the preset stands for (composition, state, conditions of the figures).</param>
/// <param name="RelativePermittivity">Typical relative permittivity εr at power frequency (dimensionless).</param>
/// <param name="BreakdownFieldVoltsPerMetre">Typical breakdown field strength, V/m, under the conditions named in
/// <paramref name="Description"/>.</param>
/// <param name="Source">Where the figures come from (handbook or standard); "(from memory)" marks values quoted from memory.</param>
public sealed record MaterialPreset(string Name, string Description, double RelativePermittivity, double BreakdownFieldVoltsPerMetre, string Source);
