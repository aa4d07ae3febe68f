using Electrostat.Fem.Elements;
using Electrostat.Fem.Problem;

namespace Electrostat.Fem.Tests.Elements;

public class P1TriangleTests
{
    private static readonly double[] Tri = [0.3, 0.1, 1.2, 0.4, 0.5, 1.3];

    [Fact]
    public void Stiffness_RowsSumToZero_AndIsSymmetric()
    {
        // Constants are in the kernel of the Laplacian: K·1 = 0 for any permittivity tensor.
        Span<double> k = stackalloc double[9];
        var eps = new PermittivityTensor(2.0, 0.3, 1.5);
        P1Triangle.Stiffness(Tri[0], Tri[1], Tri[2], Tri[3], Tri[4], Tri[5], eps, 0.7, k);
        for (int i = 0; i < 3; i++)
        {
            Assert.Equal(0, k[3 * i] + k[3 * i + 1] + k[3 * i + 2], 12);
            for (int j = 0; j < 3; j++) Assert.Equal(k[3 * i + j], k[3 * j + i], 14);
        }
    }

    [Fact]
    public void Stiffness_LinearField_GivesExactEnergy()
    {
        // Patch test: for φ = gx·x + gy·y, φᵀKφ = W·(g·εg) exactly (the P1 space contains linear functions).
        Span<double> k = stackalloc double[9];
        var eps = new PermittivityTensor(2.0, 0.3, 1.5);
        double w = P1Triangle.Weight(ProblemSymmetry.Planar, Tri[0], Tri[1], Tri[2], Tri[3], Tri[4], Tri[5]);
        P1Triangle.Stiffness(Tri[0], Tri[1], Tri[2], Tri[3], Tri[4], Tri[5], eps, w, k);
        double gx = 0.7, gy = -1.9;
        double[] phi = [gx * Tri[0] + gy * Tri[1], gx * Tri[2] + gy * Tri[3], gx * Tri[4] + gy * Tri[5]];
        double e = 0;
        for (int i = 0; i < 3; i++)
            for (int j = 0; j < 3; j++) e += phi[i] * k[3 * i + j] * phi[j];
        double expected = w * (eps.Xx * gx * gx + 2 * eps.Xy * gx * gy + eps.Yy * gy * gy);
        Assert.Equal(expected, e, 12);
        var (ex, ey) = P1Triangle.Field(Tri[0], Tri[1], Tri[2], Tri[3], Tri[4], Tri[5], phi[0], phi[1], phi[2]);
        Assert.Equal(-gx, ex, 12);
        Assert.Equal(-gy, ey, 12);
    }

    [Fact]
    public void AxisymmetricWeight_IsExactRWeightedArea()
    {
        // ∫_T 2πr dA = 2π·A·r̄ (Pappus' centroid theorem); compare with the 7-point rule, exact for linear integrands.
        double w = P1Triangle.Weight(ProblemSymmetry.Axisymmetric, Tri[0], Tri[1], Tri[2], Tri[3], Tri[4], Tri[5]);
        double q = KelvinWeight.Rule7((r, _) => 2 * Math.PI * r, Tri[0], Tri[1], Tri[2], Tri[3], Tri[4], Tri[5]);
        Assert.Equal(q, w, 13);
    }

    [Theory]
    [InlineData(ProblemSymmetry.Planar)]
    [InlineData(ProblemSymmetry.Axisymmetric)]
    public void ChargeLoad_MatchesQuadratureOfShapeFunctions(ProblemSymmetry symmetry)
    {
        // f_i = ∫ρ N_i w dA; N_1 on the triangle is the barycentric coordinate, a linear function we can integrate
        // with the 7-point rule (exact up to degree 5).
        Span<double> f = stackalloc double[3];
        double rho = 2.5;
        P1Triangle.AddChargeLoad(symmetry, Tri[0], Tri[1], Tri[2], Tri[3], Tri[4], Tri[5], rho, f);
        double twoA = P1Triangle.TwiceArea(Tri[0], Tri[1], Tri[2], Tri[3], Tri[4], Tri[5]);
        double N1(double x, double y) => ((Tri[2] * Tri[5] - Tri[4] * Tri[3]) + (Tri[3] - Tri[5]) * x + (Tri[4] - Tri[2]) * y) / twoA;
        double wt(double x) => symmetry == ProblemSymmetry.Planar ? 1 : 2 * Math.PI * x;
        double expected = KelvinWeight.Rule7((x, y) => rho * N1(x, y) * wt(x), Tri[0], Tri[1], Tri[2], Tri[3], Tri[4], Tri[5]);
        Assert.Equal(expected, f[0], 13);
    }

    [Fact]
    public void Rule7_IntegratesQuinticMonomialsExactly()
    {
        // ∫ over the unit right triangle of x^a y^b = a! b! / (a + b + 2)! (a standard Beta-function identity).
        static double Fact(int n) => n <= 1 ? 1 : n * Fact(n - 1);
        for (int a = 0; a <= 5; a++)
        {
            for (int b = 0; a + b <= 5; b++)
            {
                double exact = Fact(a) * Fact(b) / Fact(a + b + 2);
                double q = KelvinWeight.Rule7((x, y) => Math.Pow(x, a) * Math.Pow(y, b), 0, 0, 1, 0, 0, 1);
                Assert.Equal(exact, q, 12);
            }
        }
    }

    [Fact]
    public void KelvinWeight_MatchesClosedFormOnAFanTriangleAtTheCentre()
    {
        // With vertices at the centre and on the arc ρ = R at angles α1, α2 (polar angle from the equator), the
        // exact integral is ∫∫ 2π ρcosα·R²/ρ² ρ dρ dα over the straight-edged triangle. For a thin fan the chord
        // differs from the arc; use the exact straight-edge bound ρ ≤ R cos(Δ/2)/cos(α − ᾱ):
        // W = 2πR² ∫ cos α · R cos(Δ/2)/cos(α − ᾱ) dα.
        double r = 1.3, a1 = 0.2, a2 = 0.45, mid = 0.5 * (a1 + a2), half = 0.5 * (a2 - a1);
        double w = KelvinWeight.Axisymmetric(0, 0, r * Math.Cos(a1), r * Math.Sin(a1), r * Math.Cos(a2), r * Math.Sin(a2), 0, r);
        // 1D Gauss–Legendre-free check: midpoint sum with many points converges to the integral.
        int n = 200_000;
        double s = 0;
        for (int i = 0; i < n; i++)
        {
            double al = a1 + (a2 - a1) * (i + 0.5) / n;
            s += Math.Cos(al) * r * Math.Cos(half) / Math.Cos(al - mid);
        }
        s *= (a2 - a1) / n * 2 * Math.PI * r * r;
        Assert.Equal(s, w, 6);
    }
}
