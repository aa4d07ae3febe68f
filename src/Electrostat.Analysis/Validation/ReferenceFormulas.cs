using Electrostat.Fem.Elements;

namespace Electrostat.Analysis.Validation;

/// <summary>
/// Closed-form and published reference values used by the validation suite. SI units: metres, volts, F/m (per metre
/// of depth for planar cases), F (axisymmetric totals), V/m. The source of each formula is named on the method.
/// </summary>
public static class ReferenceFormulas
{
    /// <summary>Speed of light in vacuum, m/s (exact, SI 2019).</summary>
    public const double SpeedOfLightMetresPerSecond = 299_792_458.0;

    private static double Eps0 => PhysicalConstants.VacuumPermittivity;

    /// <summary>Coaxial cylinders: C' = 2πε0εr / ln(b/a), F/m (Griffiths, Introduction to Electrodynamics, ch. 2).</summary>
    /// <param name="innerRadiusMetres">a, metres.</param>
    /// <param name="outerRadiusMetres">b, metres.</param>
    /// <param name="relativePermittivity">εr.</param>
    public static double CoaxCapacitancePerMetre(double innerRadiusMetres, double outerRadiusMetres, double relativePermittivity = 1) =>
        2 * Math.PI * Eps0 * relativePermittivity / Math.Log(outerRadiusMetres / innerRadiusMetres);

    /// <summary>Coaxial cylinders: peak field V / (a ln(b/a)) at the inner surface, V/m (Gauss's law).</summary>
    /// <param name="innerRadiusMetres">a, metres.</param>
    /// <param name="outerRadiusMetres">b, metres.</param>
    /// <param name="voltageVolts">Potential difference, volts.</param>
    public static double CoaxPeakField(double innerRadiusMetres, double outerRadiusMetres, double voltageVolts) =>
        voltageVolts / (innerRadiusMetres * Math.Log(outerRadiusMetres / innerRadiusMetres));

    /// <summary>Eccentric coax: C' = 2πε0 / arccosh((a² + b² − c²)/(2ab)), F/m (Smythe, Static and Dynamic
    /// Electricity, ch. 4, two circular cylinders; section from memory).</summary>
    /// <param name="innerRadiusMetres">a, metres.</param>
    /// <param name="outerRadiusMetres">b, metres.</param>
    /// <param name="offsetMetres">Distance between the axes c, metres.</param>
    public static double EccentricCoaxCapacitancePerMetre(double innerRadiusMetres, double outerRadiusMetres, double offsetMetres)
    {
        double a = innerRadiusMetres, b = outerRadiusMetres, c = offsetMetres;
        return 2 * Math.PI * Eps0 / Math.Acosh((a * a + b * b - c * c) / (2 * a * b));
    }

    /// <summary>Two-wire line in open space: C' = πε0 / arccosh(d/(2a)), F/m (Ramo, Whinnery and Van Duzer, Fields
    /// and Waves in Communication Electronics, table of transmission lines; table number from memory).</summary>
    /// <param name="wireRadiusMetres">a, metres.</param>
    /// <param name="centreSpacingMetres">d, metres.</param>
    public static double TwoWireCapacitancePerMetre(double wireRadiusMetres, double centreSpacingMetres) =>
        Math.PI * Eps0 / Math.Acosh(centreSpacingMetres / (2 * wireRadiusMetres));

    /// <summary>Wire over a ground plane: C' = 2πε0 / arccosh(h/a), F/m (image method; same source as
    /// <see cref="TwoWireCapacitancePerMetre"/>). Exactly twice the two-wire value at spacing 2h.</summary>
    /// <param name="wireRadiusMetres">a, metres.</param>
    /// <param name="heightMetres">Height of the wire's centre above the plane h, metres.</param>
    public static double WireOverGroundCapacitancePerMetre(double wireRadiusMetres, double heightMetres) =>
        2 * Math.PI * Eps0 / Math.Acosh(heightMetres / wireRadiusMetres);

    /// <summary>
    /// The two-wire line of <see cref="TwoWireCapacitancePerMetre"/> inside a grounded circle of radius R centred
    /// between the wires: each line charge ±λ at ±h has its image ∓λ at ±R²/h (the image of a line charge in a grounded
    /// circular cylinder; Smythe, Static and Dynamic Electricity, ch. 4, from memory), which lowers the wires' potential
    /// by λ/(2πε0)·L with L = ln((R²/h + h)/(R²/h − h)): C' = πε0 / (arccosh(h/a) − L), F/m. Second-order terms in
    /// (a/h)² (h/R)² are left out.
    /// </summary>
    /// <param name="wireRadiusMetres">a, metres.</param>
    /// <param name="centreSpacingMetres">d = 2h, metres.</param>
    /// <param name="circleRadiusMetres">R ≫ h, metres.</param>
    public static double TwoWireInGroundedCirclePerMetre(double wireRadiusMetres, double centreSpacingMetres, double circleRadiusMetres)
    {
        double h = 0.5 * centreSpacingMetres, image = circleRadiusMetres * circleRadiusMetres / h;
        return Math.PI * Eps0 / (Math.Acosh(h / wireRadiusMetres) - Math.Log((image + h) / (image - h)));
    }

    /// <summary>Parallel plates with dielectric layers in series: C' = ε0 w / Σ(d_i/εr_i), F/m (Griffiths,
    /// Introduction to Electrodynamics, ch. 4).</summary>
    /// <param name="widthMetres">Plate width w, metres.</param>
    /// <param name="layers">Each layer's thickness (metres) and relative permittivity.</param>
    public static double LayeredPlatesCapacitancePerMetre(double widthMetres, params (double ThicknessMetres, double RelativePermittivity)[] layers)
    {
        ArgumentNullException.ThrowIfNull(layers);
        double s = 0;
        foreach (var (d, er) in layers) s += d / er;
        return Eps0 * widthMetres / s;
    }

    /// <summary>Field enhancement factor of coaxial cylinders, f = E(a)/(V/(b − a)) = (b − a)/(a·ln(b/a)) (from the
    /// Gauss's-law field E(r) = V/(r·ln(b/a)), Griffiths ch. 2; the factor's definition as in Kuffel, Zaengl and Kuffel,
    /// High Voltage Engineering: Fundamentals, §4.2, from memory).</summary>
    /// <param name="innerRadiusMetres">a, metres.</param>
    /// <param name="outerRadiusMetres">b, metres.</param>
    public static double CoaxFieldEnhancementFactor(double innerRadiusMetres, double outerRadiusMetres) =>
        (outerRadiusMetres - innerRadiusMetres) / (innerRadiusMetres * Math.Log(outerRadiusMetres / innerRadiusMetres));

    /// <summary>Field enhancement factor of concentric spheres, f = E(a)/(V/(b − a)) = b/a (same sources).</summary>
    /// <param name="innerRadiusMetres">a, metres.</param>
    /// <param name="outerRadiusMetres">b, metres.</param>
    public static double ConcentricSpheresFieldEnhancementFactor(double innerRadiusMetres, double outerRadiusMetres) =>
        outerRadiusMetres / innerRadiusMetres;

    /// <summary>Isolated sphere in open space: C = 4πε0 a, F (Griffiths, Introduction to Electrodynamics, ch. 2; the
    /// b → ∞ limit of <see cref="ConcentricSpheresCapacitance"/>).</summary>
    /// <param name="radiusMetres">a, metres.</param>
    public static double IsolatedSphereCapacitance(double radiusMetres) => 4 * Math.PI * Eps0 * radiusMetres;

    /// <summary>Isolated sphere at V with infinity at 0: |E| = V/a on its surface, V/m (same source).</summary>
    /// <param name="radiusMetres">a, metres.</param>
    /// <param name="voltageVolts">Sphere potential, volts.</param>
    public static double IsolatedSpherePeakField(double radiusMetres, double voltageVolts) => voltageVolts / radiusMetres;

    /// <summary>
    /// Capacitance coefficients of two equal spheres of radius a, centres d apart, in open space (bispherical image
    /// series; Smythe, Static and Dynamic Electricity, 3rd ed., ch. 5; series from memory): with cosh β = d/(2a),
    /// c11 = 4πε0 a sinh β Σ_{n≥0} 1/sinh((2n+1)β) and c12 = −4πε0 a sinh β Σ_{n≥1} 1/sinh(2nβ), F. Summed until the
    /// terms fall below 1e-16 of the sum.
    /// </summary>
    /// <param name="radiusMetres">a, metres.</param>
    /// <param name="centreDistanceMetres">d > 2a, metres.</param>
    /// <returns>(c11, c12), F.</returns>
    public static (double Self, double Mutual) TwoEqualSpheresCoefficients(double radiusMetres, double centreDistanceMetres)
    {
        double beta = Math.Acosh(centreDistanceMetres / (2 * radiusMetres));
        double self = 0, mutual = 0;
        for (int n = 0; n < 100_000; n++)
        {
            double ts = 1 / Math.Sinh((2 * n + 1) * beta);
            double tm = n >= 1 ? 1 / Math.Sinh(2 * n * beta) : 0;
            self += ts;
            mutual += tm;
            if (ts < 1e-16 * self && (n == 0 || tm < 1e-16 * mutual)) break;
        }
        double k = 4 * Math.PI * Eps0 * radiusMetres * Math.Sinh(beta);
        return (k * self, -k * mutual);
    }

    /// <summary>Concentric spheres: C = 4πε0 ab/(b − a), F (Griffiths, Introduction to Electrodynamics, ch. 2).</summary>
    /// <param name="innerRadiusMetres">a, metres.</param>
    /// <param name="outerRadiusMetres">b, metres.</param>
    public static double ConcentricSpheresCapacitance(double innerRadiusMetres, double outerRadiusMetres) =>
        4 * Math.PI * Eps0 * innerRadiusMetres * outerRadiusMetres / (outerRadiusMetres - innerRadiusMetres);

    /// <summary>Concentric spheres: peak field V b / ((b − a) a) at the inner surface, V/m.</summary>
    /// <param name="innerRadiusMetres">a, metres.</param>
    /// <param name="outerRadiusMetres">b, metres.</param>
    /// <param name="voltageVolts">Potential difference, volts.</param>
    public static double ConcentricSpheresPeakField(double innerRadiusMetres, double outerRadiusMetres, double voltageVolts) =>
        voltageVolts * outerRadiusMetres / ((outerRadiusMetres - innerRadiusMetres) * innerRadiusMetres);

    /// <summary>
    /// Square trough 0 ≤ x, y ≤ L, three sides grounded and the side y = L at V: the separation-of-variables series
    /// φ = (4V/π) Σ_{n odd} sin(nπx/L) sinh(nπy/L) / (n sinh(nπ)) (Griffiths, Introduction to Electrodynamics, §3.3.1),
    /// volts. The ratio sinh(nπy/L)/sinh(nπ) is evaluated as exp(nπ(y/L − 1))·(1 − e^{−2nπy/L})/(1 − e^{−2nπ}) so
    /// large n never overflows; the sum stops when a term is below 1e-17 of the partial sum (for y &lt; L the terms
    /// fall geometrically).
    /// </summary>
    /// <param name="xOverL">x/L, in (0, 1).</param>
    /// <param name="yOverL">y/L, in (0, 1).</param>
    /// <param name="lidVolts">V, volts.</param>
    public static double TroughPotential(double xOverL, double yOverL, double lidVolts)
    {
        if (!(xOverL > 0 && xOverL < 1 && yOverL > 0 && yOverL < 1))
            throw new ArgumentOutOfRangeException(nameof(xOverL), "The point must lie strictly inside the trough.");
        double sum = 0;
        for (int n = 1; n < 200_001; n += 2)
        {
            double ratio = Math.Exp(n * Math.PI * (yOverL - 1)) * (1 - Math.Exp(-2 * n * Math.PI * yOverL)) / (1 - Math.Exp(-2 * n * Math.PI));
            double term = Math.Sin(n * Math.PI * xOverL) * ratio / n;
            sum += term;
            if (Math.Exp(n * Math.PI * (yOverL - 1)) / n < 1e-17 * Math.Abs(sum)) break;
        }
        return 4 * lidVolts / Math.PI * sum;
    }

    /// <summary>
    /// Microstrip capacitance per metre by Hammerstad and Jensen, "Accurate models for microstrip computer-aided
    /// design", IEEE MTT-S Int. Microwave Symp. Digest, 1980, pp. 407–409 (zero strip thickness): C' = εeff/(c0 Z0,air)
    /// with Z0,air = (η0/2π) ln(f(u)/u + √(1 + 4/u²)), f(u) = 6 + (2π − 6) exp(−(30.666/u)^0.7528), and
    /// εeff = (εr + 1)/2 + (εr − 1)/2 · (1 + 10/u)^(−a·b). Stated accuracy (from memory): Z0,air better than 0.03 % for
    /// u ≤ 1000, εeff better than 0.2 % for εr ≤ 128 and 0.01 ≤ u ≤ 100. F/m.
    /// </summary>
    /// <param name="widthOverHeight">u = w/h.</param>
    /// <param name="relativePermittivity">εr of the substrate.</param>
    public static double MicrostripCapacitancePerMetre(double widthOverHeight, double relativePermittivity)
    {
        double u = widthOverHeight, er = relativePermittivity;
        double eta0 = 1 / (Eps0 * SpeedOfLightMetresPerSecond);
        double f = 6 + (2 * Math.PI - 6) * Math.Exp(-Math.Pow(30.666 / u, 0.7528));
        double z0Air = eta0 / (2 * Math.PI) * Math.Log(f / u + Math.Sqrt(1 + 4 / (u * u)));
        double a = 1 + Math.Log((Math.Pow(u, 4) + Math.Pow(u / 52, 2)) / (Math.Pow(u, 4) + 0.432)) / 49
                     + Math.Log(1 + Math.Pow(u / 18.1, 3)) / 18.7;
        double b = 0.564 * Math.Pow((er - 0.9) / (er + 3), 0.053);
        double eEff = (er + 1) / 2 + (er - 1) / 2 * Math.Pow(1 + 10 / u, -a * b);
        return eEff / (SpeedOfLightMetresPerSecond * z0Air);
    }

    /// <summary>
    /// Zero-thickness stripline, exact (Cohn, "Characteristic impedance of the shielded-strip transmission line",
    /// IRE Trans. Microwave Theory Tech. 2(2), 1954): C' = 4ε0εr K(k')/K(k), k = sech(πw/2b), k' = tanh(πw/2b), F/m.
    /// </summary>
    /// <param name="widthMetres">Strip width w, metres.</param>
    /// <param name="planeSpacingMetres">Ground-plane spacing b, metres.</param>
    /// <param name="relativePermittivity">εr.</param>
    public static double StriplineCapacitancePerMetre(double widthMetres, double planeSpacingMetres, double relativePermittivity = 1)
    {
        double x = Math.PI * widthMetres / (2 * planeSpacingMetres);
        double k = 1 / Math.Cosh(x);
        // K(k') with k' = tanh x: computed as the complement of k, so no cancellation when k' is close to 1.
        return 4 * Eps0 * relativePermittivity * CompleteEllipticIntegral.FirstKindOfComplement(k) / CompleteEllipticIntegral.FirstKind(k);
    }
}
