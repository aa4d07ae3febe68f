using Electrostat.Analysis.Validation;
using Electrostat.Fem.Elements;

namespace Electrostat.Analysis.Tests.Validation;

public class ReferenceFormulasTests
{
    private const double Eps0 = PhysicalConstants.VacuumPermittivity;

    [Fact]
    public void Trough_CentreIsQuarterOfLid()
    {
        // Superposition of the four rotated problems sums to V everywhere, so the centre is V/4 (Griffiths §3.3.1).
        Assert.Equal(0.25, ReferenceFormulas.TroughPotential(0.5, 0.5, 1), 12);
    }

    [Fact]
    public void Trough_FourRotationsSumToLidPotential()
    {
        // The same superposition at an off-centre point: φ(x,y) + φ(y,1−x) + φ(1−x,1−y) + φ(1−y,x) = V.
        double x = 0.3, y = 0.2;
        double sum = ReferenceFormulas.TroughPotential(x, y, 1) + ReferenceFormulas.TroughPotential(y, 1 - x, 1)
                   + ReferenceFormulas.TroughPotential(1 - x, 1 - y, 1) + ReferenceFormulas.TroughPotential(1 - y, x, 1);
        Assert.Equal(1.0, sum, 12);
    }

    [Fact]
    public void WireOverGround_IsTwiceTwoWireAtDoubleSpacing()
    {
        // Image method: the plane is the mid-plane of the two-wire line.
        Assert.Equal(2 * ReferenceFormulas.TwoWireCapacitancePerMetre(1e-3, 10e-3), ReferenceFormulas.WireOverGroundCapacitancePerMetre(1e-3, 5e-3), tolerance: 1e-24);
    }

    [Fact]
    public void EccentricCoax_WithoutOffsetIsCoax()
    {
        // arccosh((a² + b²)/(2ab)) = ln(b/a) (Smythe ch. 4 reduces to Griffiths ch. 2).
        Assert.Equal(ReferenceFormulas.CoaxCapacitancePerMetre(2e-3, 10e-3), ReferenceFormulas.EccentricCoaxCapacitancePerMetre(2e-3, 10e-3, 0), tolerance: 1e-24);
    }

    [Fact]
    public void Stripline_WideStripApproachesPlatesPlusFourEdgeFringes()
    {
        // For w ≫ b the exact result tends to C'/ε = 4w/b + 8 ln2 / π (parallel plates on both sides plus the fringing
        // of two edges on two sides; Cohn 1954, wide-strip limit, from memory). The correction decays like exp(−πw/b).
        double b = 1e-3, w = 5e-3;
        double c = ReferenceFormulas.StriplineCapacitancePerMetre(w, b) / Eps0;
        Assert.Equal(4 * w / b + 8 * Math.Log(2) / Math.PI, c, 6);
    }

    [Fact]
    public void Microstrip_AirLineImpedanceAtUnitWidth()
    {
        // Hammerstad and Jensen 1980: Z0 of the air-filled line at w/h = 1 is about 126.5 Ω (from memory), i.e.
        // C' = 1/(c0 Z0) ≈ 26.4 pF/m; and with εr the capacitance scales by εeff, which lies between (εr+1)/2 and εr.
        double cAir = ReferenceFormulas.MicrostripCapacitancePerMetre(1, 1);
        double z0 = 1 / (ReferenceFormulas.SpeedOfLightMetresPerSecond * cAir);
        Assert.InRange(z0, 126.0, 127.0);
        double ratio = ReferenceFormulas.MicrostripCapacitancePerMetre(1, 4.4) / cAir;
        Assert.InRange(ratio, (4.4 + 1) / 2, 4.4);
    }

    [Fact]
    public void TwoSpheres_LimitsOfTheSeries()
    {
        double a = 0.01;
        double isolated = 4 * Math.PI * Eps0 * a;
        // Far apart each sphere is isolated: c11 → 4πε0a, and c12 → −4πε0a·(a/d) (the first image term, Smythe ch. 5).
        var far = ReferenceFormulas.TwoEqualSpheresCoefficients(a, 1000 * a);
        Assert.Equal(1, far.Self / isolated, 5);
        Assert.Equal(-1e-3, far.Mutual / isolated, 6);
        // Touching spheres at one potential hold 2(c11 + c12) = 8πε0a·ln 2 (Maxwell's result for two touching equal
        // spheres; Smythe ch. 5, from memory); the alternating series approaches it as d → 2a.
        var touching = ReferenceFormulas.TwoEqualSpheresCoefficients(a, 2 * a * (1 + 1e-8));
        Assert.Equal(8 * Math.PI * Eps0 * a * Math.Log(2), 2 * (touching.Self + touching.Mutual), 1e-4 * isolated);
        // Symmetric and physical: c11 > 0 > c12 and c11 + c12 > 0 (capacitance to infinity).
        var mid = ReferenceFormulas.TwoEqualSpheresCoefficients(a, 3 * a);
        Assert.True(mid.Self > 0 && mid.Mutual < 0 && mid.Self + mid.Mutual > 0);
    }

    [Fact]
    public void TwoWireInACircle_TendsToTheOpenLine_AndMatchesTheSmallImageEstimate()
    {
        double a = 1e-3, d = 10e-3, h = d / 2;
        double open = ReferenceFormulas.TwoWireCapacitancePerMetre(a, d);
        // A circle far away changes nothing (to (h/R)² = 1e-8); at R = 50h the images add about 2(h/R)²/arccosh(h/a).
        Assert.Equal(1, ReferenceFormulas.TwoWireInGroundedCirclePerMetre(a, d, 1e4 * h) / open, 7);
        double r = 50 * h;
        double rise = ReferenceFormulas.TwoWireInGroundedCirclePerMetre(a, d, r) / open - 1;
        // The first-order estimate leaves out terms of relative size L/arccosh(h/a) ≈ 4e-4.
        Assert.Equal(2 * (h / r) * (h / r) / Math.Acosh(h / a), rise, 1e-6);
    }
}
