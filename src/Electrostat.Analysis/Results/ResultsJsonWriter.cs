using System.Text;
using System.Text.Json;
using Electrostat.Analysis.Adaptivity;
using Electrostat.Analysis.HotSpots;
using Electrostat.Analysis.Pipeline;
using Electrostat.Fem.Problem;

namespace Electrostat.Analysis.Results;

/// <summary>
/// Writes a <see cref="SolveOutcome"/> as results.json, schema "electrostat-results" version
/// <see cref="SchemaVersion"/>, documented in docs/results.md. Every number is SI with its unit in the key name
/// (<c>_V_per_m</c>, <c>_m</c>, <c>_s</c>, ...) or in a <c>unit</c> key beside it (capacitances and charges, whose
/// unit depends on planar versus axisymmetric). Numbers that do not exist are written as null, never NaN.
/// </summary>
public static class ResultsJsonWriter
{
    /// <summary>Version of the results.json schema; bump on any incompatible change.</summary>
    public const int SchemaVersion = 1;

    /// <summary>The caution printed and stored with every result.</summary>
    public const string Caution =
        "Results are design aids computed from an idealised 2D model, not a certification. High-voltage designs need " +
        "review by a qualified person; local codes and standards take precedence over these figures.";

    /// <summary>Serialises the outcome to UTF-8 JSON text (indented).</summary>
    /// <param name="outcome">The outcome.</param>
    /// <param name="designPath">The design file path as given by the user (recorded, not opened).</param>
    /// <returns>The JSON text.</returns>
    public static string Write(SolveOutcome outcome, string designPath)
    {
        ArgumentNullException.ThrowIfNull(outcome);
        using var stream = new MemoryStream();
        using (var w = new Utf8JsonWriter(stream, new JsonWriterOptions { Indented = true }))
        {
            WriteRoot(w, outcome, designPath);
        }
        return Encoding.UTF8.GetString(stream.ToArray());
    }

    private static void WriteRoot(Utf8JsonWriter w, SolveOutcome o, string designPath)
    {
        var d = o.Design;
        var a = o.Adaptive;
        var an = o.Analysis;
        bool planar = a.Built.Problem.Symmetry == ProblemSymmetry.Planar;
        string capUnit = planar ? "F/m" : "F";
        string chargeUnit = planar ? "C/m" : "C";

        w.WriteStartObject();
        w.WriteString("schema", "electrostat-results");
        w.WriteNumber("schema_version", SchemaVersion);
        w.WriteString("generator", "electrostat " + typeof(ResultsJsonWriter).Assembly.GetName().Version?.ToString(3));
        w.WriteString("caution", Caution);

        w.WriteStartObject("design");
        w.WriteString("path", designPath);
        w.WriteString("title", d.Title);
        w.WriteString("symmetry", planar ? "planar" : "axisymmetric");
        Num(w, "depth_m", planar ? d.DepthMetres : null);
        w.WriteString("outer_boundary", d.Enclosure.IsOpen ? "open" : "enclosure");
        Num(w, "open_radius_m", d.Enclosure.Open?.RadiusMetres);
        w.WriteEndObject();

        w.WriteString("verdict", Verdict(an.Verdict));

        w.WriteStartObject("accuracy");
        w.WriteString("level", o.Accuracy.Name);
        Num(w, "relative_tolerance", o.Accuracy.RelativeTolerance);
        w.WriteNumber("max_triangles", a.Levels.Count == 0 ? 0 : o.Accuracy.MaxTriangles);
        w.WriteBoolean("converged", a.Converged);
        w.WriteString("stop_reason", a.StopReason);
        w.WriteString("error_method", "three-level extrapolation with safety factor 1.25, never below the two-step change; two-level change x3 otherwise (docs/results.md)");
        Num(w, "field_energy_norm_relative_error_zz", an.EstimatedRelativeFieldError);
        w.WriteEndObject();

        w.WriteStartObject("mesh");
        w.WriteNumber("triangles", a.Mesh.Mesh.TriangleCount);
        w.WriteNumber("vertices", a.Mesh.Mesh.VertexCount);
        Num(w, "min_angle_deg", a.Mesh.Quality.MinAngleDegrees);
        w.WriteEndObject();

        w.WriteStartObject("timing");
        Num(w, "total_s", o.TotalSeconds);
        Num(w, "adaptive_loop_s", a.TotalSeconds);
        Num(w, "final_level_solve_s", a.FinalSolveSeconds);
        Num(w, "adapt_overhead", a.AdaptOverhead);
        w.WriteEndObject();

        w.WriteStartArray("convergence");
        foreach (var l in a.Levels)
        {
            w.WriteStartObject();
            w.WriteNumber("level", l.Index);
            w.WriteNumber("triangles", l.Triangles);
            w.WriteNumber("vertices", l.Vertices);
            w.WriteStartObject("peak_field_V_per_m");
            foreach (var p in l.Peaks) Num(w, p.MaterialName, p.FieldVoltsPerMetre);
            w.WriteEndObject();
            w.WriteString("capacitance_unit", capUnit);
            Matrix(w, "capacitance", l.Capacitance);
            Num(w, "energy_error_estimate", l.EstimatedEnergyError);
            w.WriteNumber("cg_iterations", l.Iterations);
            Num(w, "mesh_s", l.MeshSeconds);
            Num(w, "solve_s", l.SolveSeconds);
            Num(w, "estimate_s", l.EstimateSeconds);
            w.WriteEndObject();
        }
        w.WriteEndArray();

        w.WriteStartArray("peaks");
        foreach (var p in a.Levels[^1].Peaks)
        {
            var e = a.PeakErrors.GetValueOrDefault(p.MaterialName);
            w.WriteStartObject();
            w.WriteString("material", p.MaterialName);
            Num(w, "field_V_per_m", p.FieldVoltsPerMetre);
            Num(w, "field_kV_per_mm", p.FieldVoltsPerMetre * 1e-6);
            Num(w, "x_m", p.XMetres);
            Num(w, "y_m", p.YMetres);
            w.WriteBoolean("on_conductor_surface", p.OnConductorSurface);
            Num(w, "estimated_relative_error", e?.RelativeError);
            Num(w, "extrapolated_field_V_per_m", e?.Extrapolated);
            w.WriteString("error_method", e?.Method ?? "none");
            w.WriteEndObject();
        }
        w.WriteEndArray();

        w.WriteStartArray("excluded_singular_points");
        foreach (var x in a.Exclusions)
        {
            w.WriteStartObject();
            w.WriteString("label", x.Label);
            Num(w, "x_m", x.XMetres);
            Num(w, "y_m", x.YMetres);
            Num(w, "radius_m", x.RadiusMetres);
            w.WriteEndObject();
        }
        w.WriteEndArray();

        w.WriteStartArray("conductors");
        foreach (var c in a.Solution.Conductors)
        {
            w.WriteStartObject();
            w.WriteString("name", c.Name);
            w.WriteBoolean("floating", c.IsFloating);
            Num(w, "potential_V", c.PotentialVolts);
            w.WriteString("charge_unit", chargeUnit);
            Num(w, "charge", c.ChargeCoulombs);
            w.WriteEndObject();
        }
        w.WriteEndArray();

        w.WriteStartObject("capacitance");
        if (a.Capacitance is { } cap)
        {
            w.WriteString("unit", capUnit);
            w.WriteString("convention", "Maxwell matrix: C_ij = charge on i with j at 1 V and all others, the enclosure and infinity at 0 V; mutual = -C_ij; to enclosure = row sum");
            w.WriteStartArray("terminals");
            foreach (var n in cap.TerminalNames) w.WriteStringValue(n);
            w.WriteEndArray();
            Matrix(w, "maxwell", cap.Maxwell);
            if (a.CapacitanceErrors is { } ce)
            {
                var rel = new double[cap.Count, cap.Count];
                for (int i = 0; i < cap.Count; i++)
                    for (int j = 0; j < cap.Count; j++) rel[i, j] = ce[i, j].RelativeError;
                Matrix(w, "estimated_relative_error", rel);
            }
            if (planar)
            {
                Num(w, "depth_m", d.DepthMetres);
                var tot = new double[cap.Count, cap.Count];
                for (int i = 0; i < cap.Count; i++)
                    for (int j = 0; j < cap.Count; j++) tot[i, j] = cap.TotalFarads(i, j);
                Matrix(w, "maxwell_total_F", tot);
            }
            Num(w, "symmetry_error", cap.SymmetryError);
            Num(w, "energy_mismatch", cap.EnergyMismatch);
        }
        w.WriteEndObject();

        w.WriteStartArray("margins");
        foreach (var m in an.Margins.Materials)
        {
            w.WriteStartObject();
            w.WriteString("material", m.MaterialName);
            Num(w, "breakdown_field_V_per_m", m.BreakdownFieldVoltsPerMetre);
            Num(w, "peak_field_V_per_m", m.PeakFieldVoltsPerMetre);
            Num(w, "peak_x_m", m.PeakXMetres);
            Num(w, "peak_y_m", m.PeakYMetres);
            Num(w, "margin", m.Margin);
            Num(w, "required_margin", m.RequiredMargin);
            w.WriteString("verdict", Verdict(m.Verdict));
            Num(w, "singular_corner_field_V_per_m", m.SingularCornerFieldVoltsPerMetre);
            w.WriteEndObject();
        }
        w.WriteEndArray();

        if (an.FieldEnhancement is { } fe)
        {
            w.WriteStartObject("field_enhancement");
            Num(w, "factor", fe.Factor);
            Num(w, "utilisation", fe.Utilisation);
            Num(w, "peak_field_V_per_m", fe.PeakFieldVoltsPerMetre);
            w.WriteString("peak_material", fe.PeakMaterial);
            Num(w, "peak_x_m", fe.PeakXMetres);
            Num(w, "peak_y_m", fe.PeakYMetres);
            w.WriteString("gap_conductor_a", fe.ConductorA);
            w.WriteString("gap_conductor_b", fe.ConductorB);
            Num(w, "gap_voltage_difference_V", fe.VoltageDifferenceVolts);
            Num(w, "gap_m", fe.GapMetres);
            Num(w, "mean_gap_field_V_per_m", fe.MeanGapFieldVoltsPerMetre);
            w.WriteEndObject();
        }
        else
        {
            w.WriteNull("field_enhancement");
        }

        w.WriteStartArray("clearances");
        foreach (var c in an.Clearances.Pairs)
        {
            w.WriteStartObject();
            w.WriteString("conductor_a", c.ConductorA);
            w.WriteString("conductor_b", c.ConductorB);
            Num(w, "voltage_difference_V", c.VoltageDifferenceVolts);
            Num(w, "distance_m", c.DistanceMetres);
            Num(w, "point_a_x_m", c.PointA.X);
            Num(w, "point_a_y_m", c.PointA.Y);
            Num(w, "point_b_x_m", c.PointB.X);
            Num(w, "point_b_y_m", c.PointB.Y);
            Num(w, "required_m", c.RequiredMetres);
            w.WriteString("verdict", Verdict(c.Verdict));
            Num(w, "pcb_required_m", c.PcbRequiredMetres);
            w.WriteString("pcb_verdict", Verdict(c.PcbVerdict));
            w.WriteEndObject();
        }
        w.WriteEndArray();
        w.WriteString("pcb_spacing_caution", an.Clearances.PcbCaution);

        w.WriteStartArray("hotspots");
        foreach (var h in an.HotSpots)
        {
            w.WriteStartObject();
            w.WriteNumber("rank", h.Rank);
            Num(w, "x_m", h.XMetres);
            Num(w, "y_m", h.YMetres);
            Num(w, "field_V_per_m", h.FieldVoltsPerMetre);
            Num(w, "field_kV_per_mm", h.FieldKilovoltsPerMillimetre);
            w.WriteString("material", h.MaterialName);
            w.WriteString("kind", Kind(h.Kind));
            w.WriteString("nearest_feature", h.NearestFeature);
            Num(w, "nearest_feature_distance_m", h.NearestFeatureDistanceMetres);
            Num(w, "margin", h.Margin);
            w.WriteBoolean("near_singular_corner", h.NearSingularCorner);
            w.WriteEndObject();
        }
        w.WriteEndArray();

        w.WriteStartArray("singular_corners");
        foreach (var c in an.SingularCorners)
        {
            w.WriteStartObject();
            w.WriteString("kind", c.Kind == Corners.SingularPointKind.TripleJunction ? "triple_junction" : "corner");
            w.WriteString("conductor", c.ConductorName);
            Num(w, "x_m", c.Location.X);
            Num(w, "y_m", c.Location.Y);
            Num(w, "field_side_angle_deg", c.FieldSideAngleDegrees);
            Num(w, "field_exponent", c.FieldExponent);
            Num(w, "report_distance_m", c.ReportDistanceMetres);
            Num(w, "field_at_report_distance_V_per_m", c.FieldAtReportDistanceVoltsPerMetre);
            Num(w, "suggested_fillet_radius_m", c.Kind == Corners.SingularPointKind.TripleJunction ? null : c.SuggestedFilletRadiusMetres);
            w.WriteString("material", c.MaterialName);
            w.WriteBoolean("resolved_by_mesh", c.ResolvedByMesh);
            w.WriteString("warning", c.Warning);
            w.WriteEndObject();
        }
        w.WriteEndArray();

        w.WriteStartObject("energy");
        w.WriteBoolean("per_metre_of_depth", an.Forces.PerMetreOfDepth);
        Num(w, "energy_J_or_J_per_m", an.Forces.EnergyJoules);
        Num(w, "total_energy_J", an.Forces.TotalEnergyJoules);
        w.WriteEndObject();

        w.WriteStartArray("forces");
        foreach (var f in an.Forces.Forces)
        {
            w.WriteStartObject();
            w.WriteString("conductor", f.ConductorName);
            w.WriteString("unit", an.Forces.PerMetreOfDepth ? "N/m" : "N");
            Num(w, "force_x", f.ForceXNewtons);
            Num(w, "force_y", f.ForceYNewtons);
            w.WriteEndObject();
        }
        w.WriteEndArray();

        w.WriteStartArray("surface_field_files");
        foreach (var p in an.SurfaceProfiles) w.WriteStringValue(SurfaceFileName(p.ConductorName));
        w.WriteEndArray();

        w.WriteStartArray("warnings");
        foreach (var s in o.Warnings.Concat(an.Warnings)) w.WriteStringValue(s);
        w.WriteEndArray();
        w.WriteEndObject();
    }

    /// <summary>File name of a conductor's surface-field CSV: surface-field-NAME.csv with unsafe characters replaced.</summary>
    /// <param name="conductorName">Conductor name (or "enclosure").</param>
    public static string SurfaceFileName(string conductorName)
    {
        ArgumentNullException.ThrowIfNull(conductorName);
        var sb = new StringBuilder("surface-field-");
        foreach (char c in conductorName) sb.Append(char.IsAsciiLetterOrDigit(c) || c is '-' or '_' ? c : '_');
        return sb.Append(".csv").ToString();
    }

    /// <summary>Lower-case verdict word used in results and CSVs.</summary>
    /// <param name="v">The verdict.</param>
    public static string Verdict(CheckVerdict v) => v switch
    {
        CheckVerdict.Pass => "pass",
        CheckVerdict.Fail => "fail",
        _ => "not_checked",
    };

    private static string Kind(HotSpotKind k) => k switch
    {
        HotSpotKind.ConductorSurface => "conductor_surface",
        HotSpotKind.TriplePoint => "triple_point",
        HotSpotKind.Interface => "interface",
        _ => "volume",
    };

    private static void Num(Utf8JsonWriter w, string name, double? value)
    {
        if (value is double v && double.IsFinite(v)) w.WriteNumber(name, v);
        else w.WriteNull(name);
    }

    private static void Matrix(Utf8JsonWriter w, string name, double[,]? m)
    {
        if (m is null)
        {
            w.WriteNull(name);
            return;
        }
        w.WriteStartArray(name);
        for (int i = 0; i < m.GetLength(0); i++)
        {
            w.WriteStartArray();
            for (int j = 0; j < m.GetLength(1); j++)
            {
                if (double.IsFinite(m[i, j])) w.WriteNumberValue(m[i, j]);
                else w.WriteNullValue();
            }
            w.WriteEndArray();
        }
        w.WriteEndArray();
    }
}
