using System.Globalization;

namespace Electrostat.Rendering.Drawing;

/// <summary>Short engineering labels for printed quantities (invariant culture).</summary>
public static class Labels
{
    /// <summary>A potential with a unit that keeps it short: "250 V", "1.5 kV", "−12 kV".</summary>
    /// <param name="volts">Potential, volts.</param>
    public static string Volts(double volts)
    {
        double a = Math.Abs(volts);
        if (a >= 1e6) return Number(volts / 1e6) + " MV";
        if (a >= 1e3) return Number(volts / 1e3) + " kV";
        if (a >= 1 || a == 0) return Number(volts) + " V";
        return Number(volts * 1e3) + " mV";
    }

    /// <summary>A number with up to four significant digits and no trailing zeros.</summary>
    /// <param name="value">Value.</param>
    public static string Number(double value)
    {
        if (value == 0) return "0";
        string s = value.ToString("G4", CultureInfo.InvariantCulture);
        return s.Contains('E', StringComparison.Ordinal) ? value.ToString("0.###E+0", CultureInfo.InvariantCulture) : s;
    }
}
