using CsCheck;
using Electrostat.Meshing.Predicates;

namespace Electrostat.Meshing.Tests;

/// <summary>
/// Predicates against an exact big-integer reference. Near-degenerate cases follow the stress tests in
/// J. R. Shewchuk, "Adaptive Precision Floating-Point Arithmetic and Fast Robust Geometric Predicates",
/// Discrete &amp; Computational Geometry 18:305-363, 1997 (§6: points nearly on a line / circle).
/// </summary>
public class PredicateTests
{
    [Fact]
    public void Orient_SignConvention()
    {
        Assert.True(GeometricPredicates.Orient2D(0, 0, 1, 0, 0, 1) > 0);
        Assert.True(GeometricPredicates.Orient2D(0, 0, 0, 1, 1, 0) < 0);
        Assert.Equal(0, GeometricPredicates.Orient2D(0, 0, 1, 1, 2, 2));
    }

    [Fact]
    public void InCircle_SignConvention()
    {
        // Unit circle through (1,0), (0,1), (−1,0) counter-clockwise.
        Assert.True(GeometricPredicates.InCircle(1, 0, 0, 1, -1, 0, 0, 0) > 0);
        Assert.True(GeometricPredicates.InCircle(1, 0, 0, 1, -1, 0, 0, 2) < 0);
        Assert.Equal(0, GeometricPredicates.InCircle(1, 0, 0, 1, -1, 0, 0, -1));
    }

    [Fact]
    public void Orient_NearlyCollinear_MatchesExact()
    {
        // Points on a grid of ulp steps around (0.5, 0.5) against the line from (12, 12) to (24, 24):
        // the naive formula gets many of these signs wrong; the predicate must not.
        double b = 0.5;
        int naiveWrong = 0;
        for (int i = 0; i < 64; i++)
        {
            for (int j = 0; j < 64; j++)
            {
                double px = b + i * Math.Pow(2, -53), py = b + j * Math.Pow(2, -53);
                int exact = ExactReference.Orient(px, py, 12, 12, 24, 24);
                Assert.Equal(exact, Math.Sign(GeometricPredicates.Orient2D(px, py, 12, 12, 24, 24)));
                double naive = (px - 24) * (12 - 24) - (py - 24) * (12 - 24);
                if (Math.Sign(naive) != exact) naiveWrong++;
            }
        }
        Assert.True(naiveWrong > 0, "the test grid should defeat plain floating point");
    }

    [Fact]
    public void Orient_Random_NearDegenerate_MatchesExact()
    {
        var gen = Gen.Select(Gen.Double[-1e3, 1e3], Gen.Double[-1e3, 1e3], Gen.Double[-1e3, 1e3], Gen.Double[-1e3, 1e3], Gen.Double[0, 1], Gen.Int[-40, 40], Gen.Int[-60, 60]);
        gen.Sample((ax, ay, bx, by, t, perturbExp, scaleExp) =>
        {
            double s = Math.Pow(2, scaleExp);
            ax *= s; ay *= s; bx *= s; by *= s;
            // c on the line ab, perturbed by a relative amount 2^perturbExp·1e-12.
            double cx = ax + t * (bx - ax), cy = ay + t * (by - ay);
            cy += Math.Abs(by - ay + bx - ax) * 1e-12 * Math.Pow(2, perturbExp / 8.0) * (perturbExp % 2 == 0 ? 1 : -1);
            return Math.Sign(GeometricPredicates.Orient2D(ax, ay, bx, by, cx, cy)) == ExactReference.Orient(ax, ay, bx, by, cx, cy);
        }, iter: 4000);
    }

    [Fact]
    public void InCircle_Cocircular_HugeAndTiny_MatchesExact()
    {
        // Radii from 2^-160 to 2^160 (about 7e-49 to 1.5e48): the documented exact range.
        var gen = Gen.Select(Gen.Double[0, 2 * Math.PI], Gen.Double[0, 2 * Math.PI], Gen.Double[0, 2 * Math.PI], Gen.Double[0, 2 * Math.PI], Gen.Int[-160, 160], Gen.Int[-3, 3]);
        gen.Sample((t1, t2, t3, t4, scaleExp, perturb) =>
        {
            double r = Math.Pow(2, scaleExp);
            double cx = 3 * r, cy = -r;
            double ax = cx + r * Math.Cos(t1), ay = cy + r * Math.Sin(t1);
            double bx = cx + r * Math.Cos(t2), by = cy + r * Math.Sin(t2);
            double qx = cx + r * Math.Cos(t3), qy = cy + r * Math.Sin(t3);
            double dx = cx + r * Math.Cos(t4) * (1 + perturb * 1e-12), dy = cy + r * Math.Sin(t4);
            int exact = ExactReference.InCircle(ax, ay, bx, by, qx, qy, dx, dy);
            return Math.Sign(GeometricPredicates.InCircle(ax, ay, bx, by, qx, qy, dx, dy)) == exact;
        }, iter: 3000);
    }

    [Fact]
    public void InCircle_ExactGridCocircular_IsZero()
    {
        // Integer points on the circle x² + y² = 25 are exactly cocircular.
        Assert.Equal(0, GeometricPredicates.InCircle(5, 0, 3, 4, -4, 3, 0, -5));
        // Scaled by 1e-200 the points are no longer exactly representable, so compare with the exact reference.
        Assert.Equal(ExactReference.InCircle(5e-200, 0, 3e-200, 4e-200, -4e-200, 3e-200, 0, -5e-200),
            Math.Sign(GeometricPredicates.InCircle(5e-200, 0, 3e-200, 4e-200, -4e-200, 3e-200, 0, -5e-200)));
        double big = 1e60;
        Assert.Equal(ExactReference.InCircle(5 * big, 0, 3 * big, 4 * big, -4 * big, 3 * big, 0, -5 * big),
            Math.Sign(GeometricPredicates.InCircle(5 * big, 0, 3 * big, 4 * big, -4 * big, 3 * big, 0, -5 * big)));
    }

    [Fact]
    public void ExactPaths_AgreeWithReference()
    {
        // Values below 1e-50 in magnitude are set to zero: products of four such tiny differences would underflow, which
        // lies outside the predicates' documented domain (as in Shewchuk 1997, §2: exactness assumes no underflow).
        var gen = Gen.Double[-1, 1].Array[8].Select(a => a.Select(x => Math.Abs(x) < 1e-50 ? 0.0 : x).ToArray());
        gen.Sample(v =>
            Math.Sign(GeometricPredicates.Orient2DExact(v[0], v[1], v[2], v[3], v[4], v[5])) == ExactReference.Orient(v[0], v[1], v[2], v[3], v[4], v[5])
            && Math.Sign(GeometricPredicates.InCircleExact(v[0], v[1], v[2], v[3], v[4], v[5], v[6], v[7])) == ExactReference.InCircle(v[0], v[1], v[2], v[3], v[4], v[5], v[6], v[7]),
            iter: 2000);
    }
}
