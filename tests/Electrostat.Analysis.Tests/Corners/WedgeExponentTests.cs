using Electrostat.Analysis.Corners;

namespace Electrostat.Analysis.Tests.Corners;

public class WedgeExponentTests
{
    [Theory]
    [InlineData(270.0)]
    [InlineData(360.0)]
    [InlineData(180.0)]
    [InlineData(90.0)]
    public void OneMaterial_IsPiOverTheAngle(double degrees)
    {
        // |E| ~ r^(π/β − 1) at a conductor corner with field angle β (Jackson, Classical Electrodynamics, §2.11).
        double beta = degrees * Math.PI / 180;
        Assert.Equal(Math.PI / beta, WedgeExponent.Smallest([(beta, 1.0)]), 10);
        // Split into two sectors of the same permittivity: nothing changes.
        Assert.Equal(Math.PI / beta, WedgeExponent.Smallest([(0.3 * beta, 2.5), (0.7 * beta, 2.5)]), 10);
    }

    [Theory]
    [InlineData(4.0, 1.0)]
    [InlineData(1.0, 10.0)]
    public void InterfaceNormalToAFlatConductor_IsRegular(double eps1, double eps2)
    {
        // A dielectric meeting a flat electrode at 90°: the uniform normal field solves both sectors, λ = 1.
        Assert.Equal(1.0, WedgeExponent.Smallest([(Math.PI / 2, eps1), (Math.PI / 2, eps2)]), 10);
    }

    [Fact]
    public void ObtuseDenserWedgeOnAFlatConductor_IsSingular_AcuteIsNot()
    {
        // A solid of εr 4 on a flat electrode, contact angle α1 measured in the solid, gas in the other π − α1. The
        // two-sector form of the transfer equation is ε1 cot(λα1) = −ε2 cot(λα2) (Meixner 1972), checked here on the
        // roots. At α1 = 135° the field at the junction is infinite (λ < 1): in the limit ε1 → ∞ the solid becomes a
        // Dirichlet–Neumann wedge with λ = π/(2α1) = 2/3. At α1 = 45° it vanishes (λ > 1).
        double a1 = 3 * Math.PI / 4, a2 = Math.PI / 4;
        double obtuse = WedgeExponent.Smallest([(a1, 4.0), (a2, 1.0)]);
        Assert.InRange(obtuse, 2.0 / 3, 0.999);
        Assert.Equal(0, 4.0 / Math.Tan(obtuse * a1) + 1.0 / Math.Tan(obtuse * a2), 9);
        Assert.Equal(2.0 / 3, WedgeExponent.Smallest([(a1, 1e8), (a2, 1.0)]), 5);
        double acute = WedgeExponent.Smallest([(a2, 4.0), (a1, 1.0)]);
        Assert.True(acute > 1.0, $"λ = {acute}");
        Assert.Equal(0, 4.0 / Math.Tan(acute * a2) + 1.0 / Math.Tan(acute * a1), 9);
    }

    [Fact]
    public void RejectsEmptyOrNonPositiveSectors()
    {
        Assert.Throws<ArgumentException>(() => WedgeExponent.Smallest([]));
        Assert.Throws<ArgumentException>(() => WedgeExponent.Smallest([(0.0, 1.0)]));
        Assert.Throws<ArgumentException>(() => WedgeExponent.Smallest([(1.0, -1.0)]));
    }
}
