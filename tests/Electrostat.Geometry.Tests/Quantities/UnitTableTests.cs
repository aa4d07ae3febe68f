using Electrostat.Geometry.Quantities;

namespace Electrostat.Geometry.Tests.Quantities;

public class UnitTableTests
{
    [Theory]
    // 1 in = 25.4 mm exactly, 1 mil = 0.001 in (international inch; NIST SP 811, appendix B).
    [InlineData("in", QuantityKind.Length, 0.0254)]
    [InlineData("mil", QuantityKind.Length, 2.54e-5)]
    [InlineData("um", QuantityKind.Length, 1e-6)]
    [InlineData("mm", QuantityKind.Length, 1e-3)]
    [InlineData("kV", QuantityKind.Potential, 1e3)]
    [InlineData("mV", QuantityKind.Potential, 1e-3)]
    [InlineData("MV", QuantityKind.Potential, 1e6)]
    [InlineData("kV/mm", QuantityKind.Field, 1e6)]
    [InlineData("kV/cm", QuantityKind.Field, 1e5)]
    [InlineData("V/mil", QuantityKind.Field, 1 / 2.54e-5)]
    [InlineData("nC", QuantityKind.Charge, 1e-9)]
    [InlineData("pC/mm", QuantityKind.Charge, 1e-9)]
    [InlineData("deg", QuantityKind.Angle, Math.PI / 180)]
    public void Parses(string symbol, QuantityKind kind, double factor)
    {
        Assert.True(UnitTable.TryParse(symbol, out var k, out double f));
        Assert.Equal(kind, k);
        Assert.Equal(factor, f, factor * 1e-14);
    }

    [Theory]
    [InlineData("kW")]
    [InlineData("KV")]
    [InlineData("mm/kV")]
    [InlineData("")]
    public void Rejects(string symbol) => Assert.False(UnitTable.TryParse(symbol, out _, out _));
}
