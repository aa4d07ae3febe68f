using Electrostat.Analysis.Pipeline;

namespace Electrostat.Analysis.Validation;

/// <summary>
/// The registry of validation cases: every case's design file (under geometries/validation/), published reference
/// value, source and tolerance. The dimensions here repeat those of the design files (which name the same sources in
/// their header comments): change both together.
/// </summary>
/// <remarks>
/// Tolerances: 0.5 % for capacitances of smooth cases (the default accuracy level's target), 1 % for peak fields (a
/// point value converges more slowly than an energy), the reference's own stated accuracy plus 0.5 % where the
/// reference is an approximation (microstrip), and 3 % for fitted corner exponents (a least-squares slope over four
/// doublings of distance, where the next term of the corner expansion is still a few per cent at the outer point).
/// </remarks>
public static class ValidationSuite
{
    private const double Mm = 1e-3;

    /// <summary>Every case, in table order.</summary>
    public static IReadOnlyList<ValidationCase> Cases { get; } = Build();

    /// <summary>The distinct design files the cases read, in first-use order.</summary>
    public static IReadOnlyList<string> DesignFiles { get; } = Cases.SelectMany(c => c.DesignFiles).Distinct().ToArray();

    private static ValidationCase[] Build()
    {
        const string griffithsCh2 = "Griffiths, Introduction to Electrodynamics, ch. 2 (Gauss's law)";
        const string rwv = "Ramo, Whinnery & Van Duzer, Fields and Waves in Communication Electronics (image line charges)";
        const string capTol = "default accuracy target 0.5 %";
        const string smythe2 = "Smythe, Static and Dynamic Electricity, ch. 5 (bispherical image series; from memory)";
        const string peakTol = "point value: 1 %";
        var list = new List<ValidationCase>
        {
            new("Coaxial cylinders b/a = 5: C'", griffithsCh2, ["coaxial-cylinders.json"],
                ReferenceFormulas.CoaxCapacitancePerMetre(2 * Mm, 10 * Mm), "pF/m", 1e12, 0.005, capTol, true,
                o => SolutionProbe.Maxwell(o[0], "inner", "inner")),
            new("Coaxial cylinders: peak |E| at r = a", griffithsCh2, ["coaxial-cylinders.json"],
                ReferenceFormulas.CoaxPeakField(2 * Mm, 10 * Mm, 1), "V/m", 1, 0.01, peakTol, true,
                o => SolutionProbe.PeakField(o[0])),
            new("Coaxial cylinders: field enhancement factor (b − a)/(a ln(b/a))", griffithsCh2 + " with f = E_max/(V/d)", ["coaxial-cylinders.json"],
                ReferenceFormulas.CoaxFieldEnhancementFactor(2 * Mm, 10 * Mm), "", 1, 0.01, peakTol, true,
                o => SolutionProbe.FieldEnhancementFactor(o[0])),
            new("Eccentric coax (a, b, c) = (2, 10, 3) mm: C'", "Smythe, Static and Dynamic Electricity, ch. 4 (arccosh form)",
                ["eccentric-coax.json"], ReferenceFormulas.EccentricCoaxCapacitancePerMetre(2 * Mm, 10 * Mm, 3 * Mm), "pF/m", 1e12,
                0.005, capTol, true, o => SolutionProbe.Maxwell(o[0], "inner", "inner")),
            new("Two-wire line d/a = 10 in a grounded circle R = 50h: C'", rwv + "; circle by its image charges", ["two-wire-line.json"],
                ReferenceFormulas.TwoWireInGroundedCirclePerMetre(1 * Mm, 10 * Mm, 250 * Mm), "pF/m", 1e12, 0.005,
                capTol + "; the circle's images (+0.035 %) are in the reference", true, o => SolutionProbe.LineCapacitance(o[0])),
            new("Wire over ground h/a = 5 in a grounded half circle R = 50h: C'", rwv + "; circle by its image charges", ["wire-over-ground.json"],
                2 * ReferenceFormulas.TwoWireInGroundedCirclePerMetre(1 * Mm, 10 * Mm, 250 * Mm), "pF/m", 1e12, 0.005,
                capTol + "; the circle's images (+0.035 %) are in the reference", true, o => SolutionProbe.Maxwell(o[0], "wire", "wire")),
            new("Image method: C'(wire over ground, h) / (2 C'(two-wire, 2h))", "image method (exact identity)",
                ["wire-over-ground.json", "two-wire-line.json"], 1.0, "", 1, 0.005, "two discretisations of 0.5 % each, same sign", false,
                o =>
                {
                    var w = SolutionProbe.Maxwell(o[0], "wire", "wire");
                    var t = SolutionProbe.LineCapacitance(o[1]);
                    return new ValidationMeasurement(w.Value / (2 * t.Value), w.EstimatedRelativeError + t.EstimatedRelativeError);
                }),
            new("Two-layer plates (εr 4 | 1) in series: C'", "Griffiths, Introduction to Electrodynamics, ch. 4 (dielectric layers)",
                ["layered-plate-capacitor.json"], ReferenceFormulas.LayeredPlatesCapacitancePerMetre(10 * Mm, (0.4 * Mm, 4), (0.6 * Mm, 1)),
                "pF/m", 1e12, 0.005, capTol, true, o => SolutionProbe.Maxwell(o[0], "upper_plate", "upper_plate")),
            new("Concentric spheres b/a = 4 (axisymmetric): C", griffithsCh2, ["concentric-spheres.json"],
                ReferenceFormulas.ConcentricSpheresCapacitance(5 * Mm, 20 * Mm), "pF", 1e12, 0.005, capTol, true,
                o => SolutionProbe.Maxwell(o[0], "inner", "inner")),
            new("Concentric spheres: peak |E| at r = a", griffithsCh2, ["concentric-spheres.json"],
                ReferenceFormulas.ConcentricSpheresPeakField(5 * Mm, 20 * Mm, 1), "V/m", 1, 0.01, peakTol, true,
                o => SolutionProbe.PeakField(o[0])),
            new("Concentric spheres: field enhancement factor b/a", griffithsCh2 + " with f = E_max/(V/d)", ["concentric-spheres.json"],
                ReferenceFormulas.ConcentricSpheresFieldEnhancementFactor(5 * Mm, 20 * Mm), "", 1, 0.01, peakTol, true,
                o => SolutionProbe.FieldEnhancementFactor(o[0])),
            new("Isolated sphere in open space (axisymmetric, Kelvin open boundary): C", griffithsCh2, ["isolated-sphere.json"],
                ReferenceFormulas.IsolatedSphereCapacitance(10 * Mm), "pF", 1e12, 0.005, capTol, true,
                o => SolutionProbe.Maxwell(o[0], "sphere", "sphere")),
            new("Isolated sphere: peak |E| at r = a", griffithsCh2, ["isolated-sphere.json"],
                ReferenceFormulas.IsolatedSpherePeakField(10 * Mm, 1), "V/m", 1, 0.01, peakTol, true,
                o => SolutionProbe.PeakField(o[0])),
            new("Two equal spheres d/a = 3 in open space: c11", smythe2, ["two-spheres-open.json"],
                ReferenceFormulas.TwoEqualSpheresCoefficients(10 * Mm, 30 * Mm).Self, "pF", 1e12, 0.005, capTol, true,
                o => SolutionProbe.Maxwell(o[0], "upper", "upper")),
            new("Two equal spheres d/a = 3 in open space: c12", smythe2, ["two-spheres-open.json"],
                ReferenceFormulas.TwoEqualSpheresCoefficients(10 * Mm, 30 * Mm).Mutual, "pF", 1e12, 0.005, capTol, true,
                o => SolutionProbe.Maxwell(o[0], "upper", "lower")),
            new("Two-wire line d/a = 10 in open space (planar, Kelvin open boundary): C'", rwv, ["two-wire-open.json"],
                ReferenceFormulas.TwoWireCapacitancePerMetre(1 * Mm, 10 * Mm), "pF/m", 1e12, 0.005, capTol, true,
                o => SolutionProbe.Mutual(o[0], "left", "right")),
        };
        const double trough = 100 * Mm;
        foreach (var (x, y) in new[] { (0.5, 0.5), (0.25, 0.5), (0.5, 0.25), (0.5, 0.75), (0.75, 0.75) })
        {
            list.Add(new ValidationCase($"Square trough, lid at 1 V: φ at ({x:0.##}L, {y:0.##}L)",
                "Griffiths, Introduction to Electrodynamics, §3.3.1 (Fourier series" + (x == 0.5 && y == 0.5 ? "; centre = V/4)" : ")"),
                ["rectangular-trough.json"], ReferenceFormulas.TroughPotential(x, y, 1), "V", 1, 0.005, "0.5 % of the point value", false,
                o => SolutionProbe.PotentialAt(o[0], x * trough, y * trough)));
        }
        const string hj = "Hammerstad & Jensen, IEEE MTT-S Digest 1980, pp. 407-409";
        const string hjTol = "H-J accuracy 0.2 % (εeff) + 0.03 % (Z0), far box at 30h ~0.1 %, discretisation 0.5 %";
        list.Add(new ValidationCase("Microstrip w/h = 1, εr = 4.4: C'", hj, ["microstrip-w1.json"],
            ReferenceFormulas.MicrostripCapacitancePerMetre(1, 4.4), "pF/m", 1e12, 0.01, hjTol, false,
            o => Doubled(SolutionProbe.Maxwell(o[0], "strip", "strip"))));
        list.Add(new ValidationCase("Microstrip w/h = 2, εr = 4.4: C'", hj, ["microstrip-w2.json"],
            ReferenceFormulas.MicrostripCapacitancePerMetre(2, 4.4), "pF/m", 1e12, 0.01, hjTol, false,
            o => Doubled(SolutionProbe.Maxwell(o[0], "strip", "strip"))));
        list.Add(new ValidationCase("Stripline w/b = 1, zero thickness: C'",
            "Cohn, IRE Trans. MTT 2(2), 1954 (exact, K(k')/K(k) by AGM)", ["stripline.json"],
            ReferenceFormulas.StriplineCapacitancePerMetre(2 * Mm, 2 * Mm), "pF/m", 1e12, 0.006,
            capTol + "; strip thickness 1e-4 b adds ~0.05 %", false,
            o => { var q = SolutionProbe.Maxwell(o[0], "strip", "strip"); return new ValidationMeasurement(4 * q.Value, q.EstimatedRelativeError); }));
        const string jackson = "Jackson, Classical Electrodynamics, 3rd ed., §2.11 (fields near corners)";
        const string cornerTol = "slope of |E*| fitted over four doublings of r from 0.05 mm or six local element sizes, whichever is larger";
        list.Add(new ValidationCase("90° conductor corner: |E(r/2)|/|E(r)| = 2^(1/3)", jackson, ["corner-90.json"],
            Math.Pow(2, 1.0 / 3), "", 1, 0.03,
            "exponent of φ − V fitted over four doublings of r from 0.05 mm or two local element sizes (the mesh at this corner is too coarse for the recovered field)", false,
            o => SolutionProbe.CornerFieldRatioFromPotential(o[0], 1, 10 * Mm, 10 * Mm, 1, 1, 0.05 * Mm, 4)));
        list.Add(new ValidationCase("Knife edge: |E(r/2)|/|E(r)| = 2^(1/2)", jackson, ["knife-edge.json"],
            Math.Sqrt(2), "", 1, 0.03, cornerTol,
            false, o => SolutionProbe.CornerFieldRatio(o[0], 20 * Mm, 0, 1, 0, 0.05 * Mm, 4)));
        double junctionLambda = Corners.WedgeExponent.Smallest([(0.75 * Math.PI, 4.0), (0.25 * Math.PI, 1.0)]);
        list.Add(new ValidationCase("Triple junction, εr 4 meeting an electrode at 135°: |E(r/2)|/|E(r)| = 2^(1−λ)",
            "Meixner, IEEE Trans. Antennas Propag. 20(4), 1972 (dielectric-wedge edge condition; λ solved by bisection)", ["triple-junction.json"],
            Math.Pow(2, 1 - junctionLambda), "", 1, 0.03,
            "exponent of φ − V fitted along the junction's bisector over four doublings of r from 0.05 mm or two local element sizes", false,
            o => SolutionProbe.CornerFieldRatioFromPotential(o[0], 1, 10 * Mm, 10 * Mm, 0, -1, 0.05 * Mm, 4)));
        list.Add(new ValidationCase("Floating conductor midway between plates: potential",
            "Griffiths, Introduction to Electrodynamics, §3.1.6 (uniqueness; symmetry gives V/2)", ["floating-midplane.json"],
            0.5, "V", 1, 0.005, "0.5 % (discretisation of an unsymmetric mesh)", false,
            o => SolutionProbe.ConductorPotential(o[0], "floater")));
        return list.ToArray();
    }

    private static ValidationMeasurement Doubled(ValidationMeasurement half) => half with { Value = 2 * half.Value };
}
