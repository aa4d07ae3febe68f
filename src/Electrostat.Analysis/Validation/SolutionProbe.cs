using Electrostat.Analysis.Pipeline;

namespace Electrostat.Analysis.Validation;

/// <summary>Reads validation quantities out of a solved design: capacitances, peaks, point potentials, conductor
/// potentials and singular-field exponents. SI units.</summary>
public static class SolutionProbe
{
    /// <summary>Maxwell capacitance entry between two named terminals (F/m planar, F axisymmetric) and its estimate.</summary>
    /// <param name="outcome">A solve outcome.</param>
    /// <param name="row">Terminal name of the row.</param>
    /// <param name="column">Terminal name of the column.</param>
    public static ValidationMeasurement Maxwell(SolveOutcome outcome, string row, string column)
    {
        ArgumentNullException.ThrowIfNull(outcome);
        var cap = outcome.Adaptive.Capacitance ?? throw new InvalidOperationException("The design has no capacitance matrix.");
        int i = IndexOf(cap.TerminalNames, row), j = IndexOf(cap.TerminalNames, column);
        double est = outcome.Adaptive.CapacitanceErrors?[i, j].RelativeError ?? double.NaN;
        return new ValidationMeasurement(cap.Maxwell[i, j], est);
    }

    /// <summary>Mutual capacitance −C_ij between two named terminals (F/m planar, F axisymmetric) and its estimate; in
    /// planar open space (row sums zero) this is the line capacitance of a two-conductor line.</summary>
    /// <param name="outcome">A solve outcome.</param>
    /// <param name="first">Terminal name.</param>
    /// <param name="second">Another terminal name.</param>
    public static ValidationMeasurement Mutual(SolveOutcome outcome, string first, string second)
    {
        var m = Maxwell(outcome, first, second);
        return m with { Value = -m.Value };
    }

    /// <summary>
    /// Line capacitance of a two-conductor line carrying equal and opposite charges, from the 2×2 Maxwell matrix:
    /// (C11 C22 − C12²) / (C11 + C22 + 2 C12). The estimate is the largest of the three entries' estimates.
    /// </summary>
    /// <param name="outcome">A solve outcome with exactly two terminals.</param>
    public static ValidationMeasurement LineCapacitance(SolveOutcome outcome)
    {
        ArgumentNullException.ThrowIfNull(outcome);
        var cap = outcome.Adaptive.Capacitance ?? throw new InvalidOperationException("The design has no capacitance matrix.");
        if (cap.Count != 2) throw new InvalidOperationException("A line capacitance needs exactly two terminals.");
        var m = cap.Maxwell;
        double value = (m[0, 0] * m[1, 1] - m[0, 1] * m[0, 1]) / (m[0, 0] + m[1, 1] + 2 * m[0, 1]);
        double est = double.NaN;
        if (outcome.Adaptive.CapacitanceErrors is { } e)
            est = Math.Max(e[0, 0].RelativeError, Math.Max(e[1, 1].RelativeError, e[0, 1].RelativeError));
        return new ValidationMeasurement(value, est);
    }

    /// <summary>The highest peak |E| over all materials (V/m) and its estimate.</summary>
    /// <param name="outcome">A solve outcome.</param>
    public static ValidationMeasurement PeakField(SolveOutcome outcome)
    {
        ArgumentNullException.ThrowIfNull(outcome);
        var best = outcome.Adaptive.PeakErrors.Values.MaxBy(p => p.Value)
            ?? throw new InvalidOperationException("The design has no peak field.");
        return new ValidationMeasurement(best.Value, best.RelativeError);
    }

    /// <summary>The field enhancement factor f = E_max/(ΔV/d) and the estimate of its peak (d is exact).</summary>
    /// <param name="outcome">A solve outcome.</param>
    public static ValidationMeasurement FieldEnhancementFactor(SolveOutcome outcome)
    {
        ArgumentNullException.ThrowIfNull(outcome);
        var fe = outcome.Analysis.FieldEnhancement ?? throw new InvalidOperationException("The design has no gap at a potential difference.");
        var peak = outcome.Adaptive.PeakErrors.GetValueOrDefault(fe.PeakMaterial);
        return new ValidationMeasurement(fe.Factor, peak?.RelativeError ?? double.NaN);
    }

    /// <summary>The potential of a design conductor (volts), e.g. a floating one; no estimate.</summary>
    /// <param name="outcome">A solve outcome.</param>
    /// <param name="conductorName">Design conductor name.</param>
    public static ValidationMeasurement ConductorPotential(SolveOutcome outcome, string conductorName)
    {
        ArgumentNullException.ThrowIfNull(outcome);
        var conductors = outcome.Design.Conductors;
        int k = -1;
        for (int i = 0; i < conductors.Count; i++) if (conductors[i].Name == conductorName) k = i;
        if (k < 0) throw new InvalidOperationException($"No conductor named '{conductorName}'.");
        var context = new AnalysisContext(outcome.Design, outcome.MeshInput, outcome.Adaptive.Solution);
        return new ValidationMeasurement(context.ConductorPotentialVolts(k), double.NaN);
    }

    /// <summary>The P1 potential at a point (volts), by linear interpolation in the triangle containing it; no estimate.</summary>
    /// <param name="outcome">A solve outcome.</param>
    /// <param name="xMetres">x, metres.</param>
    /// <param name="yMetres">y, metres.</param>
    public static ValidationMeasurement PotentialAt(SolveOutcome outcome, double xMetres, double yMetres)
    {
        ArgumentNullException.ThrowIfNull(outcome);
        var sol = outcome.Adaptive.Solution;
        if (sol.Mesh.TryLocate(xMetres, yMetres, out int t, out double l0, out double l1, out double l2))
        {
            var tri = sol.Mesh.Triangles;
            var p = sol.PotentialVolts;
            return new ValidationMeasurement(l0 * p[tri[3 * t]] + l1 * p[tri[3 * t + 1]] + l2 * p[tri[3 * t + 2]], double.NaN);
        }
        throw new InvalidOperationException($"The point ({xMetres}, {yMetres}) m is outside the mesh.");
    }

    /// <summary>
    /// The field ratio |E(r/2)| / |E(r)| of a singular corner, from a least-squares fit of log|E*| against log r of
    /// the recovered field at distances r0·2^k (k = 0 … steps) along a ray from the corner: returns 2^(−slope).
    /// For |E| ~ r^(π/α − 1) at a corner of field-region angle α, this is 2^(1 − π/α) (Jackson, Classical
    /// Electrodynamics, 3rd ed., §2.11). No estimate.
    /// </summary>
    /// <param name="outcome">A solve outcome.</param>
    /// <param name="cornerX">Corner x, metres.</param>
    /// <param name="cornerY">Corner y, metres.</param>
    /// <param name="directionX">Ray direction x (normalised here).</param>
    /// <param name="directionY">Ray direction y.</param>
    /// <param name="smallestDistanceMetres">r0, metres (raised to six local element sizes when the mesh is coarser).</param>
    /// <param name="steps">Number of doublings beyond r0.</param>
    public static ValidationMeasurement CornerFieldRatio(SolveOutcome outcome, double cornerX, double cornerY, double directionX, double directionY,
        double smallestDistanceMetres, int steps)
    {
        ArgumentNullException.ThrowIfNull(outcome);
        var context = new AnalysisContext(outcome.Design, outcome.MeshInput, outcome.Adaptive.Solution);
        var recovered = context.Recovered;
        // The recovered field within a few elements of a singular vertex is smeared (the patch spans the singularity),
        // so the first probe stays at least six element sizes away from the corner, whatever the caller asked.
        double localSize = LongestEdgeAt(outcome.Adaptive.Solution.Mesh, cornerX, cornerY);
        smallestDistanceMetres = Math.Max(smallestDistanceMetres, 6 * localSize);
        double norm = Math.Sqrt(directionX * directionX + directionY * directionY);
        double ux = directionX / norm, uy = directionY / norm;
        double sx = 0, sy = 0, sxx = 0, sxy = 0;
        int n = 0;
        for (int k = 0; k <= steps; k++)
        {
            double r = smallestDistanceMetres * Math.Pow(2, k);
            if (!recovered.TryEvaluate(cornerX + r * ux, cornerY + r * uy, out double ex, out double ey, out _))
                throw new InvalidOperationException($"The probe point at r = {r} m is outside the mesh.");
            double lx = Math.Log(r), ly = Math.Log(Math.Sqrt(ex * ex + ey * ey));
            sx += lx; sy += ly; sxx += lx * lx; sxy += lx * ly; n++;
        }
        double slope = (n * sxy - sx * sy) / (n * sxx - sx * sx);
        return new ValidationMeasurement(Math.Pow(2, -slope), double.NaN);
    }

    /// <summary>
    /// The field ratio |E(r/2)| / |E(r)| of a singular corner from the potential instead of the field: a least-squares
    /// fit of log|φ(r) − V| against log r at r0·2^k (k = 0 … steps) along a ray, with V the corner's conductor potential,
    /// gives the exponent λ of φ − V ~ r^λ, and since E = −∇φ ~ r^(λ−1) the ratio is 2^(1−λ) (Jackson, Classical
    /// Electrodynamics, 3rd ed., §2.11). The P1 potential is resolved two elements from the corner, where the
    /// recovered field is not yet. No estimate.
    /// </summary>
    /// <param name="outcome">A solve outcome.</param>
    /// <param name="conductorPotentialVolts">Potential of the conductor owning the corner, volts.</param>
    /// <param name="cornerX">Corner x, metres.</param>
    /// <param name="cornerY">Corner y, metres.</param>
    /// <param name="directionX">Ray direction x (normalised here).</param>
    /// <param name="directionY">Ray direction y.</param>
    /// <param name="smallestDistanceMetres">r0, metres (raised to two local element sizes when the mesh is coarser).</param>
    /// <param name="steps">Number of doublings beyond r0.</param>
    public static ValidationMeasurement CornerFieldRatioFromPotential(SolveOutcome outcome, double conductorPotentialVolts, double cornerX, double cornerY,
        double directionX, double directionY, double smallestDistanceMetres, int steps)
    {
        ArgumentNullException.ThrowIfNull(outcome);
        double localSize = LongestEdgeAt(outcome.Adaptive.Solution.Mesh, cornerX, cornerY);
        smallestDistanceMetres = Math.Max(smallestDistanceMetres, 2 * localSize);
        double norm = Math.Sqrt(directionX * directionX + directionY * directionY);
        double ux = directionX / norm, uy = directionY / norm;
        double sx = 0, sy = 0, sxx = 0, sxy = 0;
        int n = 0;
        for (int k = 0; k <= steps; k++)
        {
            double r = smallestDistanceMetres * Math.Pow(2, k);
            double phi = PotentialAt(outcome, cornerX + r * ux, cornerY + r * uy).Value;
            double lx = Math.Log(r), ly = Math.Log(Math.Abs(phi - conductorPotentialVolts));
            sx += lx; sy += ly; sxx += lx * lx; sxy += lx * ly; n++;
        }
        double lambda = (n * sxy - sx * sy) / (n * sxx - sx * sx);
        return new ValidationMeasurement(Math.Pow(2, 1 - lambda), double.NaN);
    }

    /// <summary>The longest edge of the triangles touching the mesh vertex nearest to a point, metres.</summary>
    private static double LongestEdgeAt(Meshing.TriangleMesh mesh, double x, double y)
    {
        int nearest = 0;
        double best = double.MaxValue;
        for (int v = 0; v < mesh.VertexCount; v++)
        {
            double d = (mesh.X[v] - x) * (mesh.X[v] - x) + (mesh.Y[v] - y) * (mesh.Y[v] - y);
            if (d < best) { best = d; nearest = v; }
        }
        double longest = 0;
        var tri = mesh.Triangles;
        for (int t = 0; t < mesh.TriangleCount; t++)
        {
            int a = tri[3 * t], b = tri[3 * t + 1], c = tri[3 * t + 2];
            if (a != nearest && b != nearest && c != nearest) continue;
            longest = Math.Max(longest, Math.Max(Length(mesh, a, b), Math.Max(Length(mesh, b, c), Length(mesh, c, a))));
        }
        return longest;
    }

    private static double Length(Meshing.TriangleMesh mesh, int a, int b) =>
        Math.Sqrt((mesh.X[a] - mesh.X[b]) * (mesh.X[a] - mesh.X[b]) + (mesh.Y[a] - mesh.Y[b]) * (mesh.Y[a] - mesh.Y[b]));

    private static int IndexOf(IReadOnlyList<string> names, string name)
    {
        for (int i = 0; i < names.Count; i++) if (names[i] == name) return i;
        throw new InvalidOperationException($"No terminal named '{name}' (terminals: {string.Join(", ", names)}).");
    }
}
