using System.Diagnostics;

namespace Electrostat.Fem.Elements;

/// <summary>
/// The element weight W = ∫_T 2πr·R²/ρ'² dA of an axisymmetric Kelvin image element, where ρ' is the distance from
/// the image centre (on the axis). See <see cref="Problem.KelvinOpenBoundary"/> for the derivation of the factor.
/// </summary>
/// <remarks>
/// The integrand is smooth except at the image centre, where it behaves like 1/ρ' (integrable). The triangle is
/// integrated in closed form when one vertex is the centre (see <see cref="FanFromCentre"/>); otherwise it is
/// split into four recursively while it is close to the centre relative to its size, and each leaf uses the
/// 7-point degree-5 rule for triangles (Strang and Fix, "An Analysis of the Finite Element Method", 1973, Table 4.1;
/// weights and points from memory, checked in the tests by integrating polynomials of degree 5 exactly).
/// </remarks>
public static class KelvinWeight
{
    private const int MaxDepth = 10;

    // Barycentric points (a, b, b) and their permutations, with weights (sum 1).
    private const double W0 = 0.225;
    private const double A1 = 0.059715871789770, B1 = 0.470142064105115, W1 = 0.132394152788506;
    private const double A2 = 0.797426985353087, B2 = 0.101286507323456, W2 = 0.125939180544827;

    /// <summary>Integrates g over the triangle with the 7-point rule (no subdivision). Exposed for tests.</summary>
    public static double Rule7(Func<double, double, double> g, double x1, double y1, double x2, double y2, double x3, double y3)
    {
        ArgumentNullException.ThrowIfNull(g);
        double area = 0.5 * Math.Abs(P1Triangle.TwiceArea(x1, y1, x2, y2, x3, y3));
        double s = W0 * g((x1 + x2 + x3) / 3, (y1 + y2 + y3) / 3);
        s += W1 * (g(A1 * x1 + B1 * x2 + B1 * x3, A1 * y1 + B1 * y2 + B1 * y3)
                 + g(B1 * x1 + A1 * x2 + B1 * x3, B1 * y1 + A1 * y2 + B1 * y3)
                 + g(B1 * x1 + B1 * x2 + A1 * x3, B1 * y1 + B1 * y2 + A1 * y3));
        s += W2 * (g(A2 * x1 + B2 * x2 + B2 * x3, A2 * y1 + B2 * y2 + B2 * y3)
                 + g(B2 * x1 + A2 * x2 + B2 * x3, B2 * y1 + A2 * y2 + B2 * y3)
                 + g(B2 * x1 + B2 * x2 + A2 * x3, B2 * y1 + B2 * y2 + A2 * y3));
        return s * area;
    }

    /// <summary>
    /// W = ∫_T 2πr·R²/((r − 0)² + (z − zc)²) dA for an axisymmetric image element, m³.
    /// </summary>
    /// <param name="r1">Vertex 1 radius, metres.</param>
    /// <param name="z1">Vertex 1 axial coordinate, metres.</param>
    /// <param name="r2">Vertex 2 radius, metres.</param>
    /// <param name="z2">Vertex 2 axial coordinate, metres.</param>
    /// <param name="r3">Vertex 3 radius, metres.</param>
    /// <param name="z3">Vertex 3 axial coordinate, metres.</param>
    /// <param name="centreZ">Axial coordinate of the image centre (which lies on the axis), metres.</param>
    /// <param name="radius">Kelvin circle radius R, metres.</param>
    public static double Axisymmetric(double r1, double z1, double r2, double z2, double r3, double z3, double centreZ, double radius)
    {
        double r2Sq = radius * radius;
        double Integrand(double r, double z)
        {
            double dz = z - centreZ;
            double rhoSq = r * r + dz * dz;
            return rhoSq > 0 ? 2 * Math.PI * r * r2Sq / rhoSq : 0;
        }
        double tol = 1e-12 * radius;
        if (Math.Abs(r1) + Math.Abs(z1 - centreZ) < tol) return FanFromCentre(r2, z2 - centreZ, r3, z3 - centreZ, r2Sq);
        if (Math.Abs(r2) + Math.Abs(z2 - centreZ) < tol) return FanFromCentre(r3, z3 - centreZ, r1, z1 - centreZ, r2Sq);
        if (Math.Abs(r3) + Math.Abs(z3 - centreZ) < tol) return FanFromCentre(r1, z1 - centreZ, r2, z2 - centreZ, r2Sq);
        return Recurse(Integrand, r1, z1 - centreZ, r2, z2 - centreZ, r3, z3 - centreZ, centreZ, 0);
    }

    /// <summary>
    /// Exact W for a triangle with one vertex at the image centre, the others at (r, z) relative to it. In polar
    /// coordinates about the centre (r = ρ cos α), 2πr·R²/ρ²·ρ dρ dα = 2πR² cos α dρ dα, and the far edge is the line
    /// ρ = p / cos(α − ψ) (p its distance, ψ its normal's angle), so
    /// W = 2πR²·p·[cos ψ·(α2 − α1) + sin ψ·ln(cos(α2 − ψ)/cos(α1 − ψ))].
    /// </summary>
    private static double FanFromCentre(double ra, double za, double rb, double zb, double r2Sq)
    {
        double a1 = Math.Atan2(za, ra), a2 = Math.Atan2(zb, rb);
        double dr = rb - ra, dz = zb - za;
        double len2 = dr * dr + dz * dz;
        double t = -(ra * dr + za * dz) / len2;
        double fr = ra + t * dr, fz = za + t * dz;
        double p = Math.Sqrt(fr * fr + fz * fz);
        double psi = Math.Atan2(fz, fr);
        double value = p * (Math.Cos(psi) * (a2 - a1) + Math.Sin(psi) * Math.Log(Math.Cos(a2 - psi) / Math.Cos(a1 - psi)));
        return 2 * Math.PI * r2Sq * Math.Abs(value);
    }

    private static double Recurse(Func<double, double, double> g, double x1, double y1, double x2, double y2, double x3, double y3, double zc, int depth)
    {
        // (x, y) here are relative to the image centre; g takes absolute coordinates.
        double cx = (x1 + x2 + x3) / 3, cy = (y1 + y2 + y3) / 3;
        double dist = Math.Sqrt(cx * cx + cy * cy);
        double diam = Math.Sqrt(Math.Max(Math.Max(Sq(x1 - x2, y1 - y2), Sq(x2 - x3, y2 - y3)), Sq(x3 - x1, y3 - y1)));
        Debug.Assert(diam > 0, "degenerate triangle");
        if (depth >= MaxDepth || dist > 5 * diam)
        {
            return Rule7((x, y) => g(x, y + zc), x1, y1, x2, y2, x3, y3);
        }
        double mx12 = 0.5 * (x1 + x2), my12 = 0.5 * (y1 + y2);
        double mx23 = 0.5 * (x2 + x3), my23 = 0.5 * (y2 + y3);
        double mx31 = 0.5 * (x3 + x1), my31 = 0.5 * (y3 + y1);
        return Recurse(g, x1, y1, mx12, my12, mx31, my31, zc, depth + 1)
             + Recurse(g, mx12, my12, x2, y2, mx23, my23, zc, depth + 1)
             + Recurse(g, mx31, my31, mx23, my23, x3, y3, zc, depth + 1)
             + Recurse(g, mx12, my12, mx23, my23, mx31, my31, zc, depth + 1);
    }

    private static double Sq(double dx, double dy) => dx * dx + dy * dy;
}
