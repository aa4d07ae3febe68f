namespace Electrostat.Analysis.Adaptivity;

/// <summary>
/// An estimated relative error of a converging quantity from its values on the last adaptive levels.
/// </summary>
/// <remarks>
/// <para>Method (documented in docs/results.md). With the last three values q1, q2, q3 and the changes d1 = q2 − q1,
/// d2 = q3 − q2: when d1 and d2 have the same sign and |d2| &lt; |d1|, the sequence is treated as converging
/// geometrically with the observed ratio ρ = d2/d1 (Richardson extrapolation with the observed order, no assumed
/// refinement ratio: adaptive meshes have none), q∞ = q3 + d2·ρ/(1 − ρ), and the estimate is
/// F·|q∞ − q3|/|q3| with the safety factor F = 1.25 of the three-grid Grid Convergence Index (Roache, "Perspective:
/// a method for uniform reporting of grid refinement studies", J. Fluids Eng. 116:405–413, 1994).</para>
/// <para>Otherwise (non-monotone, not contracting, or fewer than three levels) the estimate falls back to
/// F·|q_last − q_previous|/|q_last| with F = 3 (the GCI's factor for two-grid studies), and
/// <see cref="Method"/> says so. With a single level no estimate exists (NaN).</para>
/// <para>The three-level estimate is never below the change over the last two steps |q3 − q1|/|q3|. Reason: adaptive
/// sequences are not the asymptotic geometric sequences Richardson assumes (the mesh at a curved electrode is limited
/// by its chords, and local refinement does not shrink every element), and on the coaxial validation case the
/// extrapolation alone under-estimated the peak-field error by a factor of three, while the two-step change bracketed it.</para>
/// </remarks>
/// <param name="Value">The last-level value (units of the quantity).</param>
/// <param name="Extrapolated">The extrapolated limit q∞, or the last value when no extrapolation was possible.</param>
/// <param name="RelativeError">Estimated relative error of <paramref name="Value"/> (dimensionless), NaN when unknown.</param>
/// <param name="Method">"richardson" or "last-change" (or "none").</param>
public sealed record ErrorEstimate(double Value, double Extrapolated, double RelativeError, string Method)
{
    /// <summary>Safety factor for the three-level extrapolation (Roache 1994).</summary>
    public const double ThreeLevelSafetyFactor = 1.25;

    /// <summary>Safety factor for the two-level fallback (Roache 1994).</summary>
    public const double TwoLevelSafetyFactor = 3.0;

    /// <summary>Estimates the error of the last value of a sequence.</summary>
    /// <param name="values">The quantity on each level, oldest first.</param>
    /// <returns>The estimate.</returns>
    public static ErrorEstimate FromSequence(IReadOnlyList<double> values)
    {
        ArgumentNullException.ThrowIfNull(values);
        int n = values.Count;
        if (n == 0) return new ErrorEstimate(double.NaN, double.NaN, double.NaN, "none");
        double q3 = values[n - 1];
        if (n == 1) return new ErrorEstimate(q3, q3, double.NaN, "none");
        double scale = Math.Abs(q3);
        if (scale == 0) return new ErrorEstimate(q3, q3, 0, "last-change");
        double q2 = values[n - 2];
        double d2 = q3 - q2;
        double lastChange = Math.Abs(d2) / scale;
        if (n >= 3)
        {
            double d1 = q2 - values[n - 3];
            if (d1 != 0 && Math.Sign(d1) == Math.Sign(d2) && Math.Abs(d2) < Math.Abs(d1))
            {
                double rho = d2 / d1;
                double limit = q3 + d2 * rho / (1 - rho);
                double rel = ThreeLevelSafetyFactor * Math.Abs(limit - q3) / scale;
                double twoStepChange = Math.Abs(q3 - values[n - 3]) / scale;
                return new ErrorEstimate(q3, limit, Math.Max(rel, twoStepChange), "richardson");
            }
        }
        return new ErrorEstimate(q3, q3, TwoLevelSafetyFactor * lastChange, "last-change");
    }
}
