using System.Runtime.CompilerServices;

namespace Electrostat.Meshing.Predicates;

/// <summary>
/// Exact floating-point expansion arithmetic after J. R. Shewchuk, "Adaptive Precision Floating-Point Arithmetic
/// and Fast Robust Geometric Predicates", Discrete &amp; Computational Geometry 18:305-363, 1997 (§2).
/// </summary>
/// <remarks>
/// An expansion is a sum of doubles, stored in order of increasing magnitude with no two components overlapping,
/// that represents a real number exactly. Zero components are eliminated, so the sign of a non-empty expansion is
/// the sign of its last (largest) component. Two_Product uses a fused multiply-add, which yields the exact rounding
/// error of a*b (the role of Shewchuk's Dekker split); this is exact unless the product over- or underflows.
/// </remarks>
internal static class ExpansionArithmetic
{
    /// <summary>x + y == a + b exactly (Shewchuk 1997, Theorem 7, Two-Sum).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static void TwoSum(double a, double b, out double x, out double y)
    {
        x = a + b;
        double bVirtual = x - a;
        double aVirtual = x - bVirtual;
        double bRoundoff = b - bVirtual;
        double aRoundoff = a - aVirtual;
        y = aRoundoff + bRoundoff;
    }

    /// <summary>x + y == a - b exactly (Two-Diff).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static void TwoDiff(double a, double b, out double x, out double y)
    {
        x = a - b;
        double bVirtual = a - x;
        double aVirtual = x + bVirtual;
        double bRoundoff = bVirtual - b;
        double aRoundoff = a - aVirtual;
        y = aRoundoff + bRoundoff;
    }

    /// <summary>x + y == a + b exactly when |a| ≥ |b| (Theorem 6, Fast-Two-Sum).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static void FastTwoSum(double a, double b, out double x, out double y)
    {
        x = a + b;
        double bVirtual = x - a;
        y = b - bVirtual;
    }

    /// <summary>x + y == a * b exactly (Two-Product, error term by fused multiply-add).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static void TwoProduct(double a, double b, out double x, out double y)
    {
        x = a * b;
        y = Math.FusedMultiplyAdd(a, b, -x);
    }

    /// <summary>h = e + b (Grow-Expansion with zero elimination, Theorem 10). Returns the length of h.</summary>
    public static int GrowExpansion(ReadOnlySpan<double> e, double b, Span<double> h)
    {
        double q = b;
        int k = 0;
        for (int i = 0; i < e.Length; i++)
        {
            TwoSum(q, e[i], out q, out double hh);
            if (hh != 0.0) h[k++] = hh;
        }
        if (q != 0.0 || k == 0) h[k++] = q;
        return k;
    }

    /// <summary>h = e + f (Expansion-Sum built from Grow-Expansion, Theorem 12). h must not alias e or f; scratch must be as long as h.</summary>
    public static int Sum(ReadOnlySpan<double> e, ReadOnlySpan<double> f, Span<double> h, Span<double> scratch)
    {
        // Alternate between two buffers so that each growth step reads one and writes the other.
        Span<double> src = scratch;
        Span<double> dst = h;
        if ((f.Length & 1) == 0) { src = h; dst = scratch; }
        e.CopyTo(src);
        int len = e.Length;
        if (len == 0) { src[0] = 0.0; len = 1; }
        for (int i = 0; i < f.Length; i++)
        {
            len = GrowExpansion(src[..len], f[i], dst);
            Span<double> t = src; src = dst; dst = t;
        }
        if (!Unsafe.AreSame(ref src[0], ref h[0])) src[..len].CopyTo(h);
        return len;
    }

    /// <summary>h = e * b (Scale-Expansion with zero elimination, Theorem 19). h needs 2·|e| entries.</summary>
    public static int Scale(ReadOnlySpan<double> e, double b, Span<double> h)
    {
        int k = 0;
        TwoProduct(e[0], b, out double q, out double hh);
        if (hh != 0.0) h[k++] = hh;
        for (int i = 1; i < e.Length; i++)
        {
            TwoProduct(e[i], b, out double p1, out double p0);
            TwoSum(q, p0, out double sum, out hh);
            if (hh != 0.0) h[k++] = hh;
            FastTwoSum(p1, sum, out q, out hh);
            if (hh != 0.0) h[k++] = hh;
        }
        if (q != 0.0 || k == 0) h[k++] = q;
        return k;
    }

    /// <summary>h = e * f by scaling e by each component of f and summing. h needs 2·|e|·|f| entries.</summary>
    public static int Multiply(ReadOnlySpan<double> e, ReadOnlySpan<double> f, Span<double> h)
    {
        int cap = 2 * e.Length * f.Length;
        Span<double> part = cap <= 1024 ? stackalloc double[2 * e.Length] : new double[2 * e.Length];
        Span<double> acc = cap <= 1024 ? stackalloc double[cap] : new double[cap];
        Span<double> scratch = cap <= 1024 ? stackalloc double[cap] : new double[cap];
        int accLen = 1;
        acc[0] = 0.0;
        for (int j = 0; j < f.Length; j++)
        {
            int pl = Scale(e, f[j], part);
            accLen = Sum(acc[..accLen], part[..pl], h, scratch);
            h[..accLen].CopyTo(acc);
        }
        acc[..accLen].CopyTo(h);
        return accLen;
    }

    /// <summary>Negates an expansion in place.</summary>
    public static void Negate(Span<double> e)
    {
        for (int i = 0; i < e.Length; i++) e[i] = -e[i];
    }

    /// <summary>Sign (-1, 0, +1) of an expansion with zero elimination: the sign of its largest component.</summary>
    public static int Sign(ReadOnlySpan<double> e) => Math.Sign(e[^1]);
}
