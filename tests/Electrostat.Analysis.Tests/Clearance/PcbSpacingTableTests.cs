using Electrostat.Analysis.Clearance;

namespace Electrostat.Analysis.Tests.Clearance;

public class PcbSpacingTableTests
{
    // Reference rows of IPC-2221B Table 6-1 (values from memory, cross-checked with public reproductions of the
    // table; one forum reproduction notes that A5 and A7 differ only in the 251-300 V row, which these rows reflect).
    [Theory]
    [InlineData("B1", 10, 0.05)]
    [InlineData("B2", 10, 0.1)]
    [InlineData("A6", 25, 0.25)]
    [InlineData("B2", 48, 0.6)]
    [InlineData("B3", 100, 1.5)]
    [InlineData("B4", 120, 0.4)]
    [InlineData("B2", 160, 1.25)]
    [InlineData("B3", 240, 6.4)]
    [InlineData("A5", 280, 0.4)]
    [InlineData("A7", 280, 0.8)]
    [InlineData("B2", 400, 2.5)]
    [InlineData("A6", 500, 1.5)]
    public void MinimumSpacing_TableRows_MatchIpc2221B(string column, double volts, double expectedMillimetres)
    {
        Assert.True(PcbSpacingTable.TryParseCategory(column, out var category));
        Assert.Equal(expectedMillimetres * 1e-3, PcbSpacingTable.MinimumSpacingMetres(category, volts), 12);
    }

    // Above 500 V IPC-2221B Table 6-1 gives millimetres per volt (B1 0.0025, B2 0.005, B3 0.025, B4..A7 0.00305).
    [Theory]
    [InlineData("B1", 1000, 2.5)]
    [InlineData("B2", 1000, 5.0)]
    [InlineData("B3", 2000, 50.0)]
    [InlineData("A5", 1000, 3.05)]
    public void MinimumSpacing_Above500V_UsesPerVoltRule(string column, double volts, double expectedMillimetres)
    {
        Assert.True(PcbSpacingTable.TryParseCategory(column, out var category));
        Assert.Equal(expectedMillimetres * 1e-3, PcbSpacingTable.MinimumSpacingMetres(category, volts), 12);
    }

    [Fact]
    public void MinimumSpacing_NegativeVoltage_UsesMagnitude()
    {
        Assert.Equal(
            PcbSpacingTable.MinimumSpacingMetres(SpacingCategory.B2ExternalUncoatedBelow3050m, 160),
            PcbSpacingTable.MinimumSpacingMetres(SpacingCategory.B2ExternalUncoatedBelow3050m, -160));
    }

    [Fact]
    public void MinimumSpacing_NonMonotoneNowhere_WithinEachColumn()
    {
        // A spacing table must never ask for less spacing at a higher voltage (common practice sanity check).
        foreach (SpacingCategory c in Enum.GetValues<SpacingCategory>())
        {
            double previous = 0;
            for (double v = 0; v <= 3000; v += 0.5)
            {
                double s = PcbSpacingTable.MinimumSpacingMetres(c, v);
                Assert.True(s >= previous, $"{c} at {v} V");
                previous = s;
            }
        }
    }

    [Theory]
    [InlineData("b2")]
    [InlineData(" A7 ")]
    public void TryParseCategory_AcceptsCaseAndSpace(string code) => Assert.True(PcbSpacingTable.TryParseCategory(code, out _));

    [Theory]
    [InlineData("")]
    [InlineData("C1")]
    public void TryParseCategory_RejectsUnknown(string code) => Assert.False(PcbSpacingTable.TryParseCategory(code, out _));
}
