using System.Globalization;
using Electrostat.Analysis;
using Electrostat.Analysis.Pipeline;
using Electrostat.Analysis.Results;
using Electrostat.Fem.Problem;

namespace Electrostat.Cli.Commands;

/// <summary>The concise human summary printed by <c>electrostat solve</c> (fields in kV/mm, lengths in mm).</summary>
internal static class SolveSummary
{
    public static void Write(SolveOutcome o, string designPath, string outDir, TextWriter w)
    {
        var c = CultureInfo.InvariantCulture;
        var a = o.Adaptive;
        var an = o.Analysis;
        bool planar = a.Built.Problem.Symmetry == ProblemSymmetry.Planar;
        static string Mm(double m) => (m * 1e3).ToString("G4", CultureInfo.InvariantCulture);
        static string Pct(double? x) => x is double v && double.IsFinite(v) ? (v * 100).ToString("0.###", CultureInfo.InvariantCulture) + " %" : "n/a";

        w.WriteLine($"design     {designPath}{(o.Design.Title is null ? "" : "  (" + o.Design.Title + ")")}");
        w.WriteLine(string.Create(c, $"verdict    {Word(an.Verdict)}"));
        w.WriteLine(string.Create(c, $"mesh       {a.Mesh.Mesh.TriangleCount} triangles after {a.Levels.Count} levels; {(a.Converged ? a.StopReason : "NOT CONVERGED: " + a.StopReason.Replace("not converged: ", "", StringComparison.Ordinal))}; {o.TotalSeconds:F2} s"));
        w.WriteLine("peak field per material (error estimate; singular corners and junctions excluded)");
        foreach (var p in a.Levels[^1].Peaks)
        {
            var e = a.PeakErrors.GetValueOrDefault(p.MaterialName);
            w.WriteLine(string.Create(c, $"  {p.MaterialName,-20} {p.FieldVoltsPerMetre * 1e-6,10:G5} kV/mm  +/- {Pct(e?.RelativeError)}  at ({Mm(p.XMetres)}, {Mm(p.YMetres)}) mm{(p.OnConductorSurface ? " on a conductor" : "")}"));
        }
        if (an.FieldEnhancement is { } fe)
        {
            w.WriteLine(string.Create(c, $"field enhancement factor {fe.Factor:G4} (utilisation {fe.Utilisation:G3}): peak {fe.PeakFieldVoltsPerMetre * 1e-6:G5} kV/mm over the mean {fe.MeanGapFieldVoltsPerMetre * 1e-6:G5} kV/mm of gap {fe.ConductorA} - {fe.ConductorB} ({Mm(fe.GapMetres)} mm)"));
        }
        if (an.Margins.Materials.Count > 0)
        {
            w.WriteLine("breakdown margins");
            foreach (var m in an.Margins.Materials)
            {
                string margin = m.Margin is double x ? x.ToString("G3", c) : "-";
                string req = m.RequiredMargin is double r ? r.ToString("G3", c) : "-";
                w.WriteLine(string.Create(c, $"  {m.MaterialName,-20} margin {margin,-8} required {req,-6} {Word(m.Verdict)}"));
            }
        }
        if (an.Clearances.Pairs.Count > 0)
        {
            w.WriteLine("clearances");
            foreach (var p in an.Clearances.Pairs)
            {
                string req = p.RequiredMetres is double r ? Mm(r) + " mm" : "-";
                w.WriteLine(string.Create(c, $"  {p.ConductorA + " - " + p.ConductorB,-32} {Mm(p.DistanceMetres),8} mm  required {req,-10} {Word(p.Verdict)}"));
            }
        }
        if (a.Capacitance is { } cap)
        {
            string unit = planar ? "pF/m" : "pF";
            w.WriteLine($"capacitance matrix (Maxwell, {unit}; +/- estimated error of the diagonal)");
            for (int i = 0; i < cap.Count; i++)
            {
                var row = string.Join(" ", Enumerable.Range(0, cap.Count).Select(j => (cap.Maxwell[i, j] * 1e12).ToString("G5", c).PadLeft(11)));
                w.WriteLine(string.Create(c, $"  {cap.TerminalNames[i],-20} {row}   +/- {Pct(a.CapacitanceErrors?[i, i].RelativeError)}"));
            }
            if (planar) w.WriteLine(string.Create(c, $"  (per metre of depth; totals over the {Mm(o.Design.DepthMetres)} mm depth are in results.json)"));
        }
        foreach (var s in o.Warnings.Concat(an.Warnings)) w.WriteLine("warning: " + s);
        w.WriteLine($"results    {outDir}{Path.DirectorySeparatorChar}results.json (+ hotspots.csv, convergence.csv, surface-field-*.csv)");
        w.WriteLine($"report     {outDir}{Path.DirectorySeparatorChar}report.html (+ field-map.png/.svg, hot-spot-*.png, surface-field-*.png)");
        w.WriteLine("caution    " + ResultsJsonWriter.Caution);
    }

    private static string Word(CheckVerdict v) => v switch
    {
        CheckVerdict.Pass => "PASS",
        CheckVerdict.Fail => "FAIL",
        _ => "not checked",
    };
}
