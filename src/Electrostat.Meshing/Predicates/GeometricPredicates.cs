using System.Runtime.CompilerServices;

namespace Electrostat.Meshing.Predicates;

/// <summary>
/// Robust orientation and in-circle predicates: a floating-point filter with an exact expansion-arithmetic fallback,
/// after J. R. Shewchuk, "Adaptive Precision Floating-Point Arithmetic and Fast Robust Geometric Predicates",
/// Discrete &amp; Computational Geometry 18:305-363, 1997. Every geometric decision of the mesher goes through here.
/// </summary>
/// <remarks>
/// Sign convention (stated once, here):
/// <list type="bullet">
/// <item><see cref="Orient2D"/> is positive if a, b, c are in counter-clockwise order, negative if clockwise,
/// zero if collinear. Its magnitude approximates twice the signed area of triangle abc.</item>
/// <item><see cref="InCircle"/> is positive if d lies strictly inside the circle through a, b, c, negative if
/// strictly outside, zero if cocircular, provided a, b, c are counter-clockwise (the sign flips otherwise).</item>
/// </list>
/// The sign of the returned value is always exact; the magnitude is the filtered floating-point estimate, or the
/// largest component of the exact expansion when the filter could not decide. The filter bounds are Shewchuk's
/// "A" bounds (ccwerrboundA, iccerrboundA); when the estimate is not certified the determinant is evaluated exactly
/// from Two-Diff differences (no rounding anywhere), rather than through Shewchuk's intermediate B/C stages.
/// Exactness needs every intermediate product to stay within the normal double range: this holds when every
/// coordinate is zero or has magnitude between about 1e-50 and 1e50 (products of four coordinate differences and
/// their error terms then stay above 1e-300 and below 1e300). Outside that range a sign may be wrong.
/// </remarks>
public static class GeometricPredicates
{
    /// <summary>Unit roundoff of IEEE double, 2^-53 (Shewchuk's epsilon).</summary>
    private const double Epsilon = 1.1102230246251565e-16;
    private const double CcwErrBoundA = (3.0 + 16.0 * Epsilon) * Epsilon;
    private const double IccErrBoundA = (10.0 + 96.0 * Epsilon) * Epsilon;

    /// <summary>Orientation of (a, b, c): positive counter-clockwise, negative clockwise, zero collinear. Coordinates in any consistent unit.</summary>
    /// <param name="ax">x of a.</param>
    /// <param name="ay">y of a.</param>
    /// <param name="bx">x of b.</param>
    /// <param name="by">y of b.</param>
    /// <param name="cx">x of c.</param>
    /// <param name="cy">y of c.</param>
    /// <returns>A value with the exact sign of the determinant | ax-cx ay-cy ; bx-cx by-cy |.</returns>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static double Orient2D(double ax, double ay, double bx, double by, double cx, double cy)
    {
        double detLeft = (ax - cx) * (by - cy);
        double detRight = (ay - cy) * (bx - cx);
        double det = detLeft - detRight;
        double detSum = Math.Abs(detLeft) + Math.Abs(detRight);
        if (Math.Abs(det) >= CcwErrBoundA * detSum) return det;
        return Orient2DExact(ax, ay, bx, by, cx, cy);
    }

    /// <summary>In-circle test of d against the circle through a, b, c (counter-clockwise): positive inside, negative outside, zero cocircular.</summary>
    /// <param name="ax">x of a.</param>
    /// <param name="ay">y of a.</param>
    /// <param name="bx">x of b.</param>
    /// <param name="by">y of b.</param>
    /// <param name="cx">x of c.</param>
    /// <param name="cy">y of c.</param>
    /// <param name="dx">x of d.</param>
    /// <param name="dy">y of d.</param>
    /// <returns>A value with the exact sign of the lifted 3×3 determinant.</returns>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static double InCircle(double ax, double ay, double bx, double by, double cx, double cy, double dx, double dy)
    {
        double adx = ax - dx, ady = ay - dy;
        double bdx = bx - dx, bdy = by - dy;
        double cdx = cx - dx, cdy = cy - dy;
        double bdxcdy = bdx * cdy, cdxbdy = cdx * bdy;
        double alift = adx * adx + ady * ady;
        double cdxady = cdx * ady, adxcdy = adx * cdy;
        double blift = bdx * bdx + bdy * bdy;
        double adxbdy = adx * bdy, bdxady = bdx * ady;
        double clift = cdx * cdx + cdy * cdy;
        double det = alift * (bdxcdy - cdxbdy) + blift * (cdxady - adxcdy) + clift * (adxbdy - bdxady);
        double permanent = (Math.Abs(bdxcdy) + Math.Abs(cdxbdy)) * alift
                         + (Math.Abs(cdxady) + Math.Abs(adxcdy)) * blift
                         + (Math.Abs(adxbdy) + Math.Abs(bdxady)) * clift;
        if (Math.Abs(det) > IccErrBoundA * permanent) return det;
        return InCircleExact(ax, ay, bx, by, cx, cy, dx, dy);
    }

    /// <summary>Exact orientation by expansion arithmetic (no filter). Exposed for tests that compare filter and exact paths.</summary>
    /// <param name="ax">x of a.</param>
    /// <param name="ay">y of a.</param>
    /// <param name="bx">x of b.</param>
    /// <param name="by">y of b.</param>
    /// <param name="cx">x of c.</param>
    /// <param name="cy">y of c.</param>
    /// <returns>The largest component of the exact determinant (so its sign is exact).</returns>
    [MethodImpl(MethodImplOptions.NoInlining)]
    public static double Orient2DExact(double ax, double ay, double bx, double by, double cx, double cy)
    {
        Span<double> acx = stackalloc double[2];
        Span<double> acy = stackalloc double[2];
        Span<double> bcx = stackalloc double[2];
        Span<double> bcy = stackalloc double[2];
        Diff(ax, cx, acx);
        Diff(ay, cy, acy);
        Diff(bx, cx, bcx);
        Diff(by, cy, bcy);
        Span<double> left = stackalloc double[8];
        Span<double> right = stackalloc double[8];
        int ll = ExpansionArithmetic.Multiply(acx, bcy, left);
        int rl = ExpansionArithmetic.Multiply(acy, bcx, right);
        ExpansionArithmetic.Negate(right[..rl]);
        Span<double> det = stackalloc double[16];
        Span<double> scratch = stackalloc double[16];
        int dl = ExpansionArithmetic.Sum(left[..ll], right[..rl], det, scratch);
        return det[dl - 1];
    }

    /// <summary>Exact in-circle determinant by expansion arithmetic (no filter).</summary>
    /// <param name="ax">x of a.</param>
    /// <param name="ay">y of a.</param>
    /// <param name="bx">x of b.</param>
    /// <param name="by">y of b.</param>
    /// <param name="cx">x of c.</param>
    /// <param name="cy">y of c.</param>
    /// <param name="dx">x of d.</param>
    /// <param name="dy">y of d.</param>
    /// <returns>The largest component of the exact determinant (so its sign is exact).</returns>
    [MethodImpl(MethodImplOptions.NoInlining)]
    public static double InCircleExact(double ax, double ay, double bx, double by, double cx, double cy, double dx, double dy)
    {
        Span<double> adx = stackalloc double[2];
        Span<double> ady = stackalloc double[2];
        Span<double> bdx = stackalloc double[2];
        Span<double> bdy = stackalloc double[2];
        Span<double> cdx = stackalloc double[2];
        Span<double> cdy = stackalloc double[2];
        Diff(ax, dx, adx);
        Diff(ay, dy, ady);
        Diff(bx, dx, bdx);
        Diff(by, dy, bdy);
        Diff(cx, dx, cdx);
        Diff(cy, dy, cdy);

        Span<double> total = stackalloc double[1600];
        Span<double> next = stackalloc double[1600];
        Span<double> scratch = stackalloc double[1600];
        Span<double> term = stackalloc double[520];
        int totalLen = 1;
        total[0] = 0.0;
        // det = alift·(bdx·cdy − cdx·bdy) + blift·(cdx·ady − adx·cdy) + clift·(adx·bdy − bdx·ady)
        totalLen = AddTerm(total, totalLen, adx, ady, bdx, cdy, cdx, bdy, term, next, scratch);
        totalLen = AddTerm(total, totalLen, bdx, bdy, cdx, ady, adx, cdy, term, next, scratch);
        totalLen = AddTerm(total, totalLen, cdx, cdy, adx, bdy, bdx, ady, term, next, scratch);
        return total[totalLen - 1];
    }

    /// <summary>total += (px² + py²)·(q1·q2 − r1·r2), all exactly.</summary>
    private static int AddTerm(Span<double> total, int totalLen, ReadOnlySpan<double> px, ReadOnlySpan<double> py,
        ReadOnlySpan<double> q1, ReadOnlySpan<double> q2, ReadOnlySpan<double> r1, ReadOnlySpan<double> r2,
        Span<double> term, Span<double> next, Span<double> scratch)
    {
        Span<double> a = stackalloc double[8];
        Span<double> b = stackalloc double[8];
        Span<double> lift = stackalloc double[16];
        Span<double> cross = stackalloc double[16];
        Span<double> s16 = stackalloc double[16];
        int al = ExpansionArithmetic.Multiply(px, px, a);
        int bl = ExpansionArithmetic.Multiply(py, py, b);
        int liftLen = ExpansionArithmetic.Sum(a[..al], b[..bl], lift, s16);
        al = ExpansionArithmetic.Multiply(q1, q2, a);
        bl = ExpansionArithmetic.Multiply(r1, r2, b);
        ExpansionArithmetic.Negate(b[..bl]);
        int crossLen = ExpansionArithmetic.Sum(a[..al], b[..bl], cross, s16);
        int termLen = ExpansionArithmetic.Multiply(lift[..liftLen], cross[..crossLen], term);
        int len = ExpansionArithmetic.Sum(total[..totalLen], term[..termLen], next, scratch);
        next[..len].CopyTo(total);
        return len;
    }

    private static void Diff(double a, double b, Span<double> e)
    {
        ExpansionArithmetic.TwoDiff(a, b, out double hi, out double lo);
        e[0] = lo;
        e[1] = hi;
    }
}
