using System.Globalization;
using System.Text;
using Electrostat.Analysis.Pipeline;

namespace Electrostat.Analysis.Results;

/// <summary>The CSV outputs of a solve: hot spots and the convergence history (SI units in every column name).</summary>
public static class ResultsCsvWriter
{
    /// <summary>hotspots.csv: one row per hot spot, highest first.</summary>
    /// <param name="outcome">The outcome.</param>
    public static string HotSpots(SolveOutcome outcome)
    {
        ArgumentNullException.ThrowIfNull(outcome);
        var sb = new StringBuilder("rank,x_m,y_m,field_V_per_m,field_kV_per_mm,material,kind,nearest_feature,nearest_feature_distance_m,margin,near_singular_corner\n");
        foreach (var h in outcome.Analysis.HotSpots)
        {
            sb.Append(CultureInfo.InvariantCulture,
                $"{h.Rank},{h.XMetres:R},{h.YMetres:R},{h.FieldVoltsPerMetre:R},{h.FieldKilovoltsPerMillimetre:R},{Quote(h.MaterialName ?? "")},{h.Kind},{Quote(h.NearestFeature)},{h.NearestFeatureDistanceMetres:R},{(h.Margin is double m ? m.ToString("R", CultureInfo.InvariantCulture) : "")},{(h.NearSingularCorner ? "true" : "false")}\n");
        }
        return sb.ToString();
    }

    /// <summary>convergence.csv: one row per adaptive level and material peak; capacitance entries in extra columns.</summary>
    /// <param name="outcome">The outcome.</param>
    public static string Convergence(SolveOutcome outcome)
    {
        ArgumentNullException.ThrowIfNull(outcome);
        var a = outcome.Adaptive;
        var names = a.Capacitance?.TerminalNames ?? [];
        string unit = a.Built.Problem.Symmetry == Fem.Problem.ProblemSymmetry.Planar ? "F_per_m" : "F";
        var sb = new StringBuilder("level,triangles,vertices,cg_iterations,mesh_s,solve_s,estimate_s,energy_error_estimate");
        var materials = a.Levels[^1].Peaks.Select(p => p.MaterialName).ToArray();
        foreach (var m in materials) sb.Append(",peak_").Append(Safe(m)).Append("_V_per_m");
        for (int i = 0; i < names.Count; i++)
            for (int j = i; j < names.Count; j++) sb.Append(",C_").Append(Safe(names[i])).Append("__").Append(Safe(names[j])).Append('_').Append(unit);
        sb.Append('\n');
        foreach (var l in a.Levels)
        {
            sb.Append(CultureInfo.InvariantCulture, $"{l.Index},{l.Triangles},{l.Vertices},{l.Iterations},{l.MeshSeconds:F4},{l.SolveSeconds:F4},{l.EstimateSeconds:F4},{l.EstimatedEnergyError:R}");
            foreach (var m in materials)
            {
                var p = l.Peaks.FirstOrDefault(q => q.MaterialName == m);
                sb.Append(',');
                if (p is not null) sb.Append(p.FieldVoltsPerMetre.ToString("R", CultureInfo.InvariantCulture));
            }
            for (int i = 0; i < names.Count; i++)
            {
                for (int j = i; j < names.Count; j++)
                {
                    sb.Append(',');
                    if (l.Capacitance is { } c) sb.Append(c[i, j].ToString("R", CultureInfo.InvariantCulture));
                }
            }
            sb.Append('\n');
        }
        return sb.ToString();
    }

    private static string Safe(string s) => new(s.Select(c => char.IsAsciiLetterOrDigit(c) ? c : '_').ToArray());

    private static string Quote(string text) =>
        text.IndexOfAny([',', '"', '\n']) >= 0 ? "\"" + text.Replace("\"", "\"\"", StringComparison.Ordinal) + "\"" : text;
}
