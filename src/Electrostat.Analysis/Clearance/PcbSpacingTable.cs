namespace Electrostat.Analysis.Clearance;

/// <summary>
/// Minimum electrical conductor spacing for printed boards after IPC-2221B, "Generic Standard on Printed Board
/// Design", Table 6-1 "Electrical Conductor Spacing".
/// </summary>
/// <remarks>
/// The values below are reproduced from memory of IPC-2221B Table 6-1 and agree with the widely circulated
/// reproductions of that table; they have not been checked against a licensed copy of the standard. Users must
/// confirm every figure against the current edition of the standard (and any product safety standard, which takes
/// precedence) before relying on it. The voltage is the DC or AC peak voltage between the conductors. Above 500 V
/// the table gives a per-volt figure; we apply it to the whole voltage, as the standard's note does.
/// </remarks>
public static class PcbSpacingTable
{
    /// <summary>Citation printed beside every lookup.</summary>
    public const string Source = "IPC-2221B Table 6-1 (Electrical Conductor Spacing), values reproduced from memory; confirm against the current standard";

    // Upper voltage of each row (inclusive), volts.
    private static readonly double[] RowUpperVolts = [15, 30, 50, 100, 150, 170, 250, 300, 500];

    // Minimum spacing in millimetres: rows as RowUpperVolts, columns B1, B2, B3, B4, A5, A6, A7.
    private static readonly double[,] SpacingMillimetres =
    {
        { 0.05, 0.1, 0.1, 0.05, 0.13, 0.13, 0.13 },   // 0-15 V
        { 0.05, 0.1, 0.1, 0.05, 0.13, 0.25, 0.13 },   // 16-30 V
        { 0.1, 0.6, 0.6, 0.13, 0.13, 0.4, 0.13 },     // 31-50 V
        { 0.1, 0.6, 1.5, 0.13, 0.13, 0.5, 0.13 },     // 51-100 V
        { 0.2, 0.6, 3.2, 0.4, 0.4, 0.8, 0.4 },        // 101-150 V
        { 0.2, 1.25, 3.2, 0.4, 0.4, 0.8, 0.4 },       // 151-170 V
        { 0.2, 1.25, 6.4, 0.4, 0.4, 0.8, 0.4 },       // 171-250 V
        { 0.2, 1.25, 12.5, 0.4, 0.4, 0.8, 0.8 },      // 251-300 V
        { 0.25, 2.5, 12.5, 0.8, 0.8, 1.5, 0.8 },      // 301-500 V
    };

    // Above 500 V: millimetres per volt, columns B1..A7.
    private static readonly double[] MillimetresPerVoltAbove500 = [0.0025, 0.005, 0.025, 0.00305, 0.00305, 0.00305, 0.00305];

    /// <summary>
    /// The minimum spacing for a voltage difference in a category.
    /// </summary>
    /// <param name="category">The spacing category (table column).</param>
    /// <param name="peakVolts">DC or AC peak voltage between the conductors, volts (sign ignored).</param>
    /// <returns>Minimum spacing in metres.</returns>
    public static double MinimumSpacingMetres(SpacingCategory category, double peakVolts)
    {
        if (!double.IsFinite(peakVolts))
            throw new ArgumentOutOfRangeException(nameof(peakVolts), peakVolts, "The voltage must be finite.");
        int column = (int)category;
        if (column < 0 || column >= MillimetresPerVoltAbove500.Length)
            throw new ArgumentOutOfRangeException(nameof(category), category, "Unknown spacing category.");
        double volts = Math.Abs(peakVolts);
        for (int row = 0; row < RowUpperVolts.Length; row++)
        {
            // Rows are whole-volt bands (0-15, 16-30, ...): a fractional voltage between bands belongs to the
            // higher band, which is the conservative reading.
            if (volts <= RowUpperVolts[row])
                return SpacingMillimetres[row, column] * 1e-3;
        }
        return MillimetresPerVoltAbove500[column] * volts * 1e-3;
    }

    /// <summary>
    /// Parses a category name as written in a design file: the column code ("B1" .. "A7"), case-insensitive.
    /// </summary>
    /// <param name="text">The code, e.g. "B2".</param>
    /// <param name="category">The parsed category.</param>
    /// <returns>True when the code names a column of the table.</returns>
    public static bool TryParseCategory(string text, out SpacingCategory category)
    {
        category = default;
        if (string.IsNullOrWhiteSpace(text)) return false;
        switch (text.Trim().ToUpperInvariant())
        {
            case "B1": category = SpacingCategory.B1InternalConductors; return true;
            case "B2": category = SpacingCategory.B2ExternalUncoatedBelow3050m; return true;
            case "B3": category = SpacingCategory.B3ExternalUncoatedAbove3050m; return true;
            case "B4": category = SpacingCategory.B4ExternalPolymerCoated; return true;
            case "A5": category = SpacingCategory.A5ExternalConformalCoated; return true;
            case "A6": category = SpacingCategory.A6ComponentLeadUncoated; return true;
            case "A7": category = SpacingCategory.A7ComponentLeadConformalCoated; return true;
            default: return false;
        }
    }
}
