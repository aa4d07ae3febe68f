using System.Globalization;

namespace Electrostat.Geometry.Quantities;

/// <summary>The unit symbols the design file understands, with their SI factors.</summary>
/// <remarks>
/// Symbols are case-sensitive (mV and MV differ). Field units are any potential unit over any length unit ("kV/mm").
/// Charge may also be given per length ("nC/m"), which planar designs read as charge per metre of depth.
/// Factors: 1 in = 25.4 mm and 1 mil = 0.001 in exactly (international inch, 1959 agreement, NIST SP 811 appendix B).
/// </remarks>
public static class UnitTable
{
    private static readonly Dictionary<string, double> LengthUnits = new(StringComparer.Ordinal)
    {
        ["m"] = 1.0, ["cm"] = 1e-2, ["mm"] = 1e-3, ["um"] = 1e-6, ["µm"] = 1e-6, ["μm"] = 1e-6, ["nm"] = 1e-9,
        ["in"] = 0.0254, ["mil"] = 0.0254e-3,
    };

    private static readonly Dictionary<string, double> PotentialUnits = new(StringComparer.Ordinal)
    {
        ["V"] = 1.0, ["mV"] = 1e-3, ["kV"] = 1e3, ["MV"] = 1e6,
    };

    private static readonly Dictionary<string, double> ChargeUnits = new(StringComparer.Ordinal)
    {
        ["C"] = 1.0, ["mC"] = 1e-3, ["uC"] = 1e-6, ["µC"] = 1e-6, ["μC"] = 1e-6, ["nC"] = 1e-9, ["pC"] = 1e-12, ["fC"] = 1e-15,
    };

    private static readonly Dictionary<string, double> AngleUnits = new(StringComparer.Ordinal)
    {
        ["deg"] = Math.PI / 180, ["°"] = Math.PI / 180, ["rad"] = 1.0,
    };

    /// <summary>The length unit names accepted for the design's <c>units</c> key.</summary>
    public static IReadOnlyList<string> DesignLengthUnits { get; } = ["m", "mm", "um", "in", "mil", "cm"];

    /// <summary>Every bare symbol that is a unit (parameters may not use these names).</summary>
    public static IEnumerable<string> AllSymbols =>
        LengthUnits.Keys.Concat(PotentialUnits.Keys).Concat(ChargeUnits.Keys).Concat(AngleUnits.Keys);

    /// <summary>Metres per unit of a length symbol, or null when the symbol is not a length unit.</summary>
    public static double? LengthMetres(string symbol) => LengthUnits.TryGetValue(symbol, out double f) ? f : null;

    /// <summary>
    /// Parses a unit symbol of any kind into its kind and the factor that converts a value to SI.
    /// Returns false when the text is not a known unit.
    /// </summary>
    public static bool TryParse(string text, out QuantityKind kind, out double factorToSi)
    {
        ArgumentNullException.ThrowIfNull(text);
        string t = text.Replace(" ", "", StringComparison.Ordinal);
        kind = QuantityKind.Dimensionless;
        factorToSi = 1;
        if (LengthUnits.TryGetValue(t, out double f)) { kind = QuantityKind.Length; factorToSi = f; return true; }
        if (PotentialUnits.TryGetValue(t, out f)) { kind = QuantityKind.Potential; factorToSi = f; return true; }
        if (ChargeUnits.TryGetValue(t, out f)) { kind = QuantityKind.Charge; factorToSi = f; return true; }
        if (AngleUnits.TryGetValue(t, out f)) { kind = QuantityKind.Angle; factorToSi = f; return true; }
        int slash = t.IndexOf('/', StringComparison.Ordinal);
        if (slash > 0 && LengthUnits.TryGetValue(t[(slash + 1)..], out double per))
        {
            string num = t[..slash];
            if (PotentialUnits.TryGetValue(num, out f)) { kind = QuantityKind.Field; factorToSi = f / per; return true; }
            if (ChargeUnits.TryGetValue(num, out f)) { kind = QuantityKind.Charge; factorToSi = f / per; return true; }
        }
        return false;
    }

    /// <summary>Examples of accepted units for a kind, for error messages.</summary>
    public static string ExamplesFor(QuantityKind kind) => kind switch
    {
        QuantityKind.Length => "m, cm, mm, um, in, mil",
        QuantityKind.Potential => "V, mV, kV, MV",
        QuantityKind.Field => "V/m, kV/mm, kV/cm, MV/m, V/mil",
        QuantityKind.Charge => "C, uC, nC, pC (or per length, e.g. nC/m, in planar designs)",
        QuantityKind.Angle => "deg, rad",
        _ => "none (a plain number)",
    };

    /// <summary>Lower-case English name of a kind, for messages.</summary>
    public static string NameOf(QuantityKind kind) => kind switch
    {
        QuantityKind.Length => "length",
        QuantityKind.Potential => "potential",
        QuantityKind.Field => "field strength",
        QuantityKind.Charge => "charge",
        QuantityKind.Angle => "angle",
        _ => "plain number",
    };

    /// <summary>Formats an SI value with a readable unit for summaries (e.g. 0.0015 m → "1.5 mm").</summary>
    public static string Format(double siValue, QuantityKind kind)
    {
        var c = CultureInfo.InvariantCulture;
        double a = Math.Abs(siValue);
        return kind switch
        {
            QuantityKind.Length => a >= 1 || a == 0 ? string.Create(c, $"{siValue:G6} m") : a >= 1e-3 ? string.Create(c, $"{siValue * 1e3:G6} mm") : string.Create(c, $"{siValue * 1e6:G6} um"),
            QuantityKind.Potential => a >= 1e3 ? string.Create(c, $"{siValue / 1e3:G6} kV") : string.Create(c, $"{siValue:G6} V"),
            QuantityKind.Field => string.Create(c, $"{siValue / 1e6:G6} kV/mm"),
            QuantityKind.Charge => string.Create(c, $"{siValue:G6} C"),
            QuantityKind.Angle => string.Create(c, $"{siValue * 180 / Math.PI:G6} deg"),
            _ => siValue.ToString("G6", c),
        };
    }
}
