namespace Electrostat.Analysis.Validation;

/// <summary>
/// The complete elliptic integral of the first kind, K(k) = ∫₀^{π/2} dθ / √(1 − k² sin²θ), with k the modulus
/// (not the parameter m = k²), by the arithmetic–geometric mean.
/// </summary>
/// <remarks>
/// Method: K(k) = π / (2 · AGM(1, k')), k' = √(1 − k²) (Abramowitz and Stegun, Handbook of Mathematical Functions,
/// §17.6, the process of the arithmetic–geometric mean). The mean converges quadratically, so a handful of steps
/// reach double precision; the loop stops when the two means agree to a few ulps. Used by the stripline reference
/// (Cohn 1954), which needs K(k) and K(k') for k near 0 and near 1.
/// </remarks>
public static class CompleteEllipticIntegral
{
    /// <summary>K(k) for 0 ≤ k &lt; 1 (dimensionless).</summary>
    /// <param name="modulus">The modulus k.</param>
    /// <returns>K(k).</returns>
    public static double FirstKind(double modulus)
    {
        if (!(modulus >= 0 && modulus < 1))
            throw new ArgumentOutOfRangeException(nameof(modulus), modulus, "The modulus k must satisfy 0 <= k < 1.");
        double complementary = Math.Sqrt((1 - modulus) * (1 + modulus));
        return Math.PI / (2 * ArithmeticGeometricMean(1, complementary));
    }

    /// <summary>K(k') from the modulus k, with k' = √(1 − k²), computed without cancellation for small k.</summary>
    /// <param name="modulus">The modulus k, 0 &lt; k ≤ 1.</param>
    /// <returns>K(√(1 − k²)).</returns>
    public static double FirstKindOfComplement(double modulus)
    {
        if (!(modulus > 0 && modulus <= 1))
            throw new ArgumentOutOfRangeException(nameof(modulus), modulus, "The modulus k must satisfy 0 < k <= 1.");
        // AGM(1, k) directly: the complement of the complement is k itself, so no 1 − k'² is ever formed.
        return Math.PI / (2 * ArithmeticGeometricMean(1, modulus));
    }

    /// <summary>The arithmetic–geometric mean of two positive numbers.</summary>
    /// <param name="a">First number, &gt; 0.</param>
    /// <param name="b">Second number, &gt; 0.</param>
    /// <returns>AGM(a, b).</returns>
    public static double ArithmeticGeometricMean(double a, double b)
    {
        if (!(a > 0 && b > 0)) throw new ArgumentOutOfRangeException(nameof(a), "Both arguments must be positive.");
        for (int i = 0; i < 64 && Math.Abs(a - b) > 4 * double.Epsilon + 4e-16 * a; i++)
        {
            double next = 0.5 * (a + b);
            b = Math.Sqrt(a * b);
            a = next;
        }
        return 0.5 * (a + b);
    }
}
