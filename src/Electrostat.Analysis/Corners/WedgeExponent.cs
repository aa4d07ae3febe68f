namespace Electrostat.Analysis.Corners;

/// <summary>
/// The leading exponent λ of the potential near the tip of a wedge of field region bounded by a conductor on both
/// sides and filled by sectors of different permittivity: φ − V ∝ r^λ, so |E| ∝ r^(λ−1), infinite at the tip when
/// λ &lt; 1. SI-free (angles in radians, relative permittivities).
/// </summary>
/// <remarks>
/// <para>In each sector the separable solution is f(θ) = A sin λθ + B cos λθ; across an interface f and the normal flux
/// ε·f′ are continuous, and f = 0 on both conductor faces (Meixner, "The behavior of electromagnetic fields at edges",
/// IEEE Trans. Antennas Propag. 20(4), 1972, for dielectric wedges; the transfer form below is the standard one).
/// Carrying (f, ε f′/λ) through a sector of angle α and permittivity ε is the rotation
/// f ← f cos λα + (g/ε) sin λα, g ← −ε f sin λα + g cos λα, with g = ε f′/λ. Starting from (0, 1) on the first face,
/// λ is an eigenvalue when f = 0 on the last face; the smallest positive root is found by scanning and bisection.</para>
/// <para>Checks: one sector of angle β gives π/β (Jackson, Classical Electrodynamics, §2.11); a straight conductor
/// surface cut by an interface normal to it gives λ = 1 for any permittivities (no singularity at a right-angled
/// contact); equal permittivities reduce to π/(Σα).</para>
/// </remarks>
public static class WedgeExponent
{
    /// <summary>The smallest positive λ, or NaN when none lies below <paramref name="upperBound"/>.</summary>
    /// <param name="sectors">The sectors from one conductor face to the other: angle (radians, &gt; 0) and relative
    /// permittivity (&gt; 0) each.</param>
    /// <param name="upperBound">Largest λ searched (default 4).</param>
    public static double Smallest(IReadOnlyList<(double AngleRadians, double RelativePermittivity)> sectors, double upperBound = 4)
    {
        ArgumentNullException.ThrowIfNull(sectors);
        if (sectors.Count == 0) throw new ArgumentException("At least one sector is needed.", nameof(sectors));
        foreach (var (a, e) in sectors)
        {
            if (!(a > 0) || !(e > 0)) throw new ArgumentException("Sector angles and permittivities must be positive.", nameof(sectors));
        }
        double total = sectors.Sum(s => s.AngleRadians);
        // Roots are at least π/(total · max ε/min ε)-ish apart; a step of a hundredth of π/total never skips the first.
        double step = 0.01 * Math.PI / total;
        double lo = 1e-9, flo = End(sectors, lo);
        for (double hi = step; hi <= upperBound + step; hi += step)
        {
            double fhi = End(sectors, hi);
            if (fhi == 0) return hi;
            if (Math.Sign(fhi) != Math.Sign(flo))
            {
                for (int k = 0; k < 200 && hi - lo > 1e-15 * hi; k++)
                {
                    double mid = 0.5 * (lo + hi);
                    double fm = End(sectors, mid);
                    if (Math.Sign(fm) == Math.Sign(flo)) { lo = mid; flo = fm; }
                    else hi = mid;
                }
                return 0.5 * (lo + hi);
            }
            lo = hi;
            flo = fhi;
        }
        return double.NaN;
    }

    /// <summary>f on the last face for a given λ, starting from f = 0, εf′/λ = 1 on the first.</summary>
    private static double End(IReadOnlyList<(double AngleRadians, double RelativePermittivity)> sectors, double lambda)
    {
        double f = 0, g = 1;
        foreach (var (alpha, eps) in sectors)
        {
            double c = Math.Cos(lambda * alpha), s = Math.Sin(lambda * alpha);
            double nf = f * c + g / eps * s;
            double ng = -eps * f * s + g * c;
            f = nf;
            g = ng;
        }
        return f;
    }
}
