using Electrostat.Analysis.Pipeline;
using Electrostat.Fem.Problem;

namespace Electrostat.Cli.Sweeps;

/// <summary>
/// The figures a sweep records for each case, by name. Names are also the goal grammar's subjects:
/// <c>peak[MATERIAL]</c> (V/m), <c>margin[MATERIAL]</c> and <c>margin</c> (the smallest over materials with a
/// breakdown field), <c>clearance[A,B]</c> and <c>clearance</c> (the smallest, m), <c>capacitance[A,B]</c> (Maxwell
/// entry; F/m per metre of depth for planar designs, F for axisymmetric, as in results.json) and <c>enhancement</c> (the
/// field enhancement factor E_max/(ΔV/d) of the most stressed gap).
/// </summary>
internal static class CaseMetrics
{
    /// <summary>Extracts the figures of a solved case, SI units.</summary>
    public static Dictionary<string, double?> From(SolveOutcome o)
    {
        var m = new Dictionary<string, double?>(StringComparer.Ordinal);
        foreach (var p in o.Adaptive.Levels[^1].Peaks) m[$"peak[{p.MaterialName}]"] = p.FieldVoltsPerMetre;
        double? minMargin = null;
        foreach (var mm in o.Analysis.Margins.Materials)
        {
            m[$"margin[{mm.MaterialName}]"] = mm.Margin;
            if (mm.Margin is double x) minMargin = minMargin is double y ? Math.Min(x, y) : x;
        }
        if (o.Analysis.Margins.Materials.Count > 0) m["margin"] = minMargin;
        double? minClear = null;
        foreach (var c in o.Analysis.Clearances.Pairs)
        {
            m[$"clearance[{c.ConductorA},{c.ConductorB}]"] = c.DistanceMetres;
            minClear = minClear is double y ? Math.Min(y, c.DistanceMetres) : c.DistanceMetres;
        }
        if (o.Analysis.Clearances.Pairs.Count > 0) m["clearance"] = minClear;
        if (o.Analysis.FieldEnhancement is { } fe) m["enhancement"] = fe.Factor;
        if (o.Adaptive.Capacitance is { } cap)
            for (int i = 0; i < cap.Count; i++)
                for (int j = 0; j < cap.Count; j++) m[$"capacitance[{cap.TerminalNames[i]},{cap.TerminalNames[j]}]"] = cap.Maxwell[i, j];
        return m;
    }

    /// <summary>SI unit of a metric name; <paramref name="planar"/> selects F/m or F for capacitance.</summary>
    public static string Unit(string name, bool planar) => name switch
    {
        _ when name.StartsWith("peak", StringComparison.Ordinal) => "V/m",
        _ when name.StartsWith("margin", StringComparison.Ordinal) || name == "enhancement" => "1",
        _ when name.StartsWith("clearance", StringComparison.Ordinal) => "m",
        _ => planar ? "F/m" : "F",
    };

    /// <summary>True for a planar outcome (capacitance per metre of depth).</summary>
    public static bool IsPlanar(SolveOutcome o) => o.Adaptive.Built.Problem.Symmetry == ProblemSymmetry.Planar;
}
