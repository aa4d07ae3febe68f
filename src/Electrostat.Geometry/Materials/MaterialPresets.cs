using Electrostat.Geometry.Model;

namespace Electrostat.Geometry.Materials;

/// <summary>
/// The built-in material presets: common insulating media with typical relative permittivity and breakdown field.
/// A design uses one by naming it (<c>"background": "air"</c>, <c>"material": "ptfe"</c>) or by declaring
/// <c>"materials": {"oil": {"preset": "transformer-oil", "breakdown_field": "10 kV/mm"}}</c> to override a value.
/// </summary>
/// <remarks>
/// Every figure is a typical handbook value; none is a rating. Fields are SI (V/m) inside; the table in
/// docs/design-file.md shows them in kV/mm. All values here were entered from memory of the cited sources and are
/// marked so in <see cref="MaterialPreset.Source"/>.
/// </remarks>
public static class MaterialPresets
{
    private const double KilovoltsPerMillimetre = 1e6;

    /// <summary>The caution that goes with every preset (printed by <c>electrostat materials</c> and in the docs).</summary>
    public const string Caution =
        "Preset breakdown strengths are typical handbook figures, not ratings. Breakdown depends strongly on thickness, " +
        "field uniformity, temperature, humidity, contamination, ageing and the test method (electrode shape, voltage " +
        "waveform and duration). Enter the rated value for your own material and conditions before relying on a margin.";

    /// <summary>All presets, in the order listed by <c>electrostat materials</c>.</summary>
    public static IReadOnlyList<MaterialPreset> All { get; } =
    [
        new("air", "dry air at 1 bar and 20 °C, uniform field, gap about 10 mm",
            1.0006, 3.0 * KilovoltsPerMillimetre,
            "CRC Handbook of Chemistry and Physics, permittivity of gases and dielectric strength tables (from memory); " +
            "3 kV/mm for centimetre gaps is common practice"),
        new("sf6", "sulphur hexafluoride at 1 bar absolute, uniform field",
            1.002, 8.9 * KilovoltsPerMillimetre,
            "Kuffel, Zaengl and Kuffel, High Voltage Engineering: Fundamentals, ch. 5, critical reduced field of SF6 " +
            "about 89 kV/(cm·bar) (from memory)"),
        new("transformer-oil", "new mineral insulating oil, dry and filtered",
            2.2, 12.0 * KilovoltsPerMillimetre,
            "IEC 60296 (minimum 30 kV in the IEC 60156 test with a 2.5 mm gap, i.e. 12 kV/mm) and CRC Handbook of " +
            "Chemistry and Physics, permittivity of liquids (from memory)"),
        new("ptfe", "polytetrafluoroethylene, solid sheet about 1 mm",
            2.1, 60.0 * KilovoltsPerMillimetre,
            "CRC Handbook of Chemistry and Physics, properties of polymers, dielectric strength by ASTM D149 short-time test (from memory)"),
        new("polyethylene", "low-density polyethylene, sheet about 1 mm",
            2.3, 40.0 * KilovoltsPerMillimetre,
            "CRC Handbook of Chemistry and Physics, properties of polymers, dielectric strength by ASTM D149 short-time test (from memory)"),
        new("epoxy", "filled cast epoxy resin for electrical insulation",
            4.0, 20.0 * KilovoltsPerMillimetre,
            "IEC 60243-1 short-time test figures typical of cast epoxy data sheets; Kuffel, Zaengl and Kuffel, High " +
            "Voltage Engineering: Fundamentals, ch. 6 (from memory)"),
        new("fr4", "glass-epoxy laminate (FR-4), field through the thickness, 1.6 mm board",
            4.4, 20.0 * KilovoltsPerMillimetre,
            "IPC-4101 laminate specification sheets, electric strength by IPC-TM-650 2.5.6.2; permittivity at 1 MHz (from memory)"),
        new("alumina", "96 % aluminium oxide ceramic",
            9.4, 15.0 * KilovoltsPerMillimetre,
            "CRC Handbook of Chemistry and Physics, properties of ceramics; ASTM D116 test methods for vitrified ceramics (from memory)"),
        new("glass", "borosilicate glass",
            4.6, 10.0 * KilovoltsPerMillimetre,
            "CRC Handbook of Chemistry and Physics, properties of glasses (from memory)"),
        new("vacuum", "high vacuum between clean metal electrodes, gap about 1 mm",
            1.0, 20.0 * KilovoltsPerMillimetre,
            "Latham, High Voltage Vacuum Insulation (Academic Press, 1995), breakdown fields of millimetre gaps (from memory)"),
    ];

    /// <summary>The preset of that name (exact, case-sensitive match), or null.</summary>
    /// <param name="name">Preset name, e.g. "air".</param>
    public static MaterialPreset? Find(string name)
    {
        ArgumentNullException.ThrowIfNull(name);
        foreach (var p in All)
            if (p.Name == name) return p;
        return null;
    }

    /// <summary>The preset as a design material under <paramref name="materialName"/>, with optional overrides.</summary>
    /// <param name="preset">The preset.</param>
    /// <param name="materialName">Name the design uses for it.</param>
    /// <param name="relativePermittivity">Override of εr; null keeps the preset's.</param>
    /// <param name="breakdownFieldVoltsPerMetre">Override of the breakdown field, V/m; null keeps the preset's.</param>
    public static Material ToMaterial(MaterialPreset preset, string materialName, double? relativePermittivity = null, double? breakdownFieldVoltsPerMetre = null)
    {
        ArgumentNullException.ThrowIfNull(preset);
        ArgumentNullException.ThrowIfNull(materialName);
        return new Material(materialName, relativePermittivity ?? preset.RelativePermittivity, breakdownFieldVoltsPerMetre ?? preset.BreakdownFieldVoltsPerMetre);
    }
}
