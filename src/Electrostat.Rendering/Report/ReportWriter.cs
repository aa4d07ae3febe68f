using System.Globalization;
using System.Text;
using Electrostat.Analysis;
using Electrostat.Analysis.HotSpots;
using Electrostat.Analysis.Results;
using Electrostat.Fem.Problem;
using Electrostat.Rendering.Charts;
using Electrostat.Rendering.Drawing;
using Electrostat.Rendering.FieldMaps;

namespace Electrostat.Rendering.Report;

/// <summary>
/// Writes the figures of a solved design and the self-contained report.html (images inlined as data URIs, no
/// network resources, print-friendly) into an output folder. Every file is written atomically (temporary file in
/// the same folder, then rename).
/// </summary>
/// <remarks>
/// Files: <c>field-map.png</c>, <c>field-map.svg</c>, <c>hot-spot-1.png</c> … (zoomed insets),
/// <c>surface-field-&lt;conductor&gt;.png</c>, <c>report.html</c>. Numbers in the tables carry their exact SI value in a
/// <c>data-si</c> attribute (round-trip format), so tools and tests can compare them with results.json.
/// </remarks>
public static class ReportWriter
{
    /// <summary>Writes every figure and report.html into <paramref name="folder"/> (created if missing).</summary>
    /// <param name="folder">Output folder.</param>
    /// <param name="input">The solved design and its analysis.</param>
    /// <param name="options">Options; null for defaults.</param>
    /// <returns>The files written.</returns>
    public static ReportFiles Write(string folder, ReportInput input, ReportOptions? options = null)
    {
        ArgumentException.ThrowIfNullOrEmpty(folder);
        ArgumentNullException.ThrowIfNull(input);
        options ??= new ReportOptions();
        Directory.CreateDirectory(folder);
        var figures = ReportFigures.Render(input, options);

        string mapPng = Path.Combine(folder, "field-map.png");
        AtomicFile.WriteAllBytes(mapPng, figures.MapPng);
        string? mapSvg = null;
        if (options.WriteSvg)
        {
            mapSvg = Path.Combine(folder, "field-map.svg");
            AtomicFile.WriteAllText(mapSvg, figures.Map.Svg());
        }
        var insets = new List<string>();
        foreach (var (rank, png) in figures.Insets)
        {
            string p = Path.Combine(folder, string.Create(CultureInfo.InvariantCulture, $"hot-spot-{rank}.png"));
            AtomicFile.WriteAllBytes(p, png);
            insets.Add(p);
        }
        var plots = new List<string>();
        foreach (var (name, png) in figures.SurfacePlots)
        {
            string p = Path.Combine(folder, "surface-field-" + SafeFileName(name) + ".png");
            AtomicFile.WriteAllBytes(p, png);
            plots.Add(p);
        }
        string html = Path.Combine(folder, "report.html");
        AtomicFile.WriteAllText(html, BuildHtml(input, figures));
        return new ReportFiles(html, mapPng, mapSvg, insets, plots);
    }

    /// <summary>The report page as text (figures rendered and inlined).</summary>
    /// <param name="input">The solved design and its analysis.</param>
    /// <param name="options">Options; null for defaults.</param>
    public static string BuildHtml(ReportInput input, ReportOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(input);
        return BuildHtml(input, ReportFigures.Render(input, options ?? new ReportOptions()));
    }

    private static string BuildHtml(ReportInput input, ReportFigures figures)
    {
        var ctx = input.Context;
        var design = ctx.Design;
        var a = input.Analysis;
        var unit = design.Units;
        var h = new Html();
        string title = design.Title ?? (design.SourcePath is string sp ? Path.GetFileNameWithoutExtension(sp) : "design");
        bool planar = ctx.Solution.Problem.Symmetry == ProblemSymmetry.Planar;

        h.Raw("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\">\n");
        h.Raw("<title>").Text("Electrostat report: " + title).Raw("</title>\n<style>\n").Raw(Css).Raw("</style>\n</head>\n<body>\n");
        h.Raw("<header class=\"masthead\"><div class=\"kicker\">Electrostat field report</div><h1>").Text(title).Raw("</h1>");
        h.Raw("<div class=\"meta\">").Text($"{(planar ? "planar" : "axisymmetric")} · units {unit.Symbol} · {ctx.Mesh.TriangleCount:N0} triangles").Raw("</div></header>\n");
        h.Raw("<aside class=\"caution\" id=\"caution-banner\"><strong>High voltage: review required.</strong> ")
            .Text("These results are a design aid, not a certification. Have high-voltage designs reviewed by a qualified person; local codes, standards and licensed practice take precedence.")
            .Raw(" See section 12.</aside>\n");

        // 1. Verdict
        h.Section(1, "verdict", "Verdict");
        string verdictClass = a.Verdict switch { CheckVerdict.Pass => "pass", CheckVerdict.Fail => "fail", _ => "none" };
        string verdictText = a.Verdict switch { CheckVerdict.Pass => "PASS", CheckVerdict.Fail => "FAIL", _ => "NOT CHECKED" };
        h.Raw($"<div class=\"verdict {verdictClass}\" id=\"verdict\">").Text(verdictText).Raw("</div>\n<ul class=\"summary\">");
        h.Raw("<li>").Text($"Breakdown margins: {Verdict(a.Margins.Verdict)}").Raw("</li>");
        foreach (var m in a.Margins.Materials.Where(m => m.Margin is not null))
            h.Raw("<li>").Text($"{m.MaterialName}: margin {Num(m.Margin!.Value)}{(m.RequiredMargin is double r ? $" (required {Num(r)})" : "")} — {Verdict(m.Verdict)}").Raw("</li>");
        h.Raw("<li>").Text($"Clearances: {Verdict(a.Clearances.Verdict)}").Raw("</li>");
        h.Raw("<li>").Text(input.Levels.Count > 0 ? $"Adaptive refinement: {(input.Converged ? "converged" : "not converged")} ({input.StopReason})" : input.StopReason ?? "").Raw("</li>");
        h.Raw("<li>").Text($"Estimated relative field error (energy norm, recovery estimate): {Num(a.EstimatedRelativeFieldError * 100)} %").Raw("</li></ul>\n");
        h.EndSection();

        // 2. Design summary
        h.Section(2, "design", "Design summary and parameters");
        h.Raw("<table class=\"kv\">");
        h.Row("Source", design.SourcePath ?? "(text)");
        h.Row("Symmetry", planar ? $"planar, depth {Num(design.DepthMetres / unit.Metres)} {unit.Symbol}" : "axisymmetric (x = r, y = z)");
        h.Row("Length unit", unit.Symbol);
        h.Row("Accuracy level", input.AccuracyName ?? "—");
        if (double.IsFinite(input.TotalSeconds)) h.Row("Computation time", $"{Num(input.TotalSeconds)} s");
        h.Raw("</table>\n");
        if (design.Parameters.Count > 0)
        {
            h.Raw("<h3>Parameters</h3><table><thead><tr><th>name</th><th>value</th></tr></thead><tbody>");
            foreach (var kv in design.Parameters.OrderBy(k => k.Key, StringComparer.Ordinal)) h.Raw("<tr><td>").Text(kv.Key).Raw("</td><td class=\"n\">").Text(Num(kv.Value)).Raw("</td></tr>");
            h.Raw("</tbody></table>\n");
        }
        h.Raw("<h3>Materials</h3><table><thead><tr><th>material</th><th>relative permittivity</th><th>breakdown field (kV/mm)</th></tr></thead><tbody>");
        foreach (var m in design.Materials.Values.OrderBy(m => m.Name, StringComparer.Ordinal))
            h.Raw("<tr><td>").Text(m.Name).Raw("</td><td class=\"n\">").Text(Num(m.RelativePermittivity)).Raw("</td><td class=\"n\">").Text(m.BreakdownFieldVoltsPerMetre is double e ? Num(e * 1e-6) : "—").Raw("</td></tr>");
        h.Raw("</tbody></table>\n<h3>Conductors</h3><table><thead><tr><th>conductor</th><th>potential</th><th>kind</th></tr></thead><tbody>");
        for (int i = 0; i < design.Conductors.Count; i++)
        {
            var c = design.Conductors[i];
            double v = ctx.ConductorPotentialVolts(i);
            h.Raw("<tr><td>").Text(c.Name).Raw($"</td><td class=\"n\" data-si=\"{R(v)}\">").Text(double.IsNaN(v) ? "—" : Labels.Volts(v)).Raw("</td><td>").Text(c.IsFloating ? "floating" : "fixed potential").Raw("</td></tr>");
        }
        h.Raw("</tbody></table>\n");
        h.EndSection();

        // 3. Field map
        h.Section(3, "field-map-section", "Field map and hot spots");
        h.Raw("<figure class=\"map\"><div class=\"map-wrap\"><img id=\"field-map\" alt=\"field map\" src=\"data:image/png;base64,").Raw(Convert.ToBase64String(figures.MapPng)).Raw("\"></div>");
        h.Raw("<div class=\"readout\" id=\"readout\" data-potential-volts=\"\" data-field-volts-per-metre=\"\">Move the pointer over the map to read the coordinates, potential and |E|.</div>");
        h.Raw("<figcaption>").Text($"|E| shaded in viridis ({(figures.Map.LogScale ? "logarithmic" : "linear")} scale, {Num(figures.Map.ColourMinVoltsPerMetre * 1e-6)} to {Num(figures.Map.ColourMaxVoltsPerMetre * 1e-6)} kV/mm); white lines are equipotentials every {(figures.Map.LevelsVolts.Count > 1 ? Labels.Volts(figures.Map.LevelsVolts[1] - figures.Map.LevelsVolts[0]) : "—")}; numbered circles are the hot spots of section 4.").Raw("</figcaption></figure>\n");
        h.Raw("<script type=\"application/json\" id=\"readout-data\">").Raw(figures.ReadoutJson).Raw("</script>\n");
        if (figures.Insets.Count > 0)
        {
            h.Raw("<h3>Top hot spots, zoomed</h3><div class=\"insets\">");
            foreach (var (rank, png) in figures.Insets)
                h.Raw($"<figure><img class=\"inset\" alt=\"hot spot {rank}\" src=\"data:image/png;base64,").Raw(Convert.ToBase64String(png)).Raw($"\"><figcaption>Hot spot {rank}</figcaption></figure>");
            h.Raw("</div>\n");
        }
        if (figures.SurfacePlots.Count > 0)
        {
            h.Raw("<h3>Surface field along each conductor</h3>");
            foreach (var (name, png) in figures.SurfacePlots)
                h.Raw("<figure><img class=\"plot\" alt=\"surface field ").Text(name).Raw("\" src=\"data:image/png;base64,").Raw(Convert.ToBase64String(png)).Raw("\"></figure>\n");
        }
        h.EndSection();

        // 4. Hot spots
        h.Section(4, "hot-spots", "Hot spots");
        h.Raw("<table id=\"hot-spot-table\"><thead><tr><th>#</th><th>x</th><th>y</th><th>|E| (kV/mm)</th><th>material</th><th>where</th><th>nearest feature</th><th>margin</th><th>note</th></tr></thead><tbody>");
        foreach (var s in a.HotSpots)
        {
            h.Raw($"<tr><td class=\"n\">{s.Rank}</td><td class=\"n\" data-si=\"{R(s.XMetres)}\">").Text(Num(s.XMetres / unit.Metres)).Raw($"</td><td class=\"n\" data-si=\"{R(s.YMetres)}\">").Text(Num(s.YMetres / unit.Metres))
                .Raw($"</td><td class=\"n\" data-si=\"{R(s.FieldVoltsPerMetre)}\">").Text(Num(s.FieldKilovoltsPerMillimetre)).Raw("</td><td>").Text(s.MaterialName ?? "—").Raw("</td><td>").Text(Kind(s.Kind))
                .Raw("</td><td>").Text($"{s.NearestFeature} ({Num(s.NearestFeatureDistanceMetres / unit.Metres)} {unit.Symbol})").Raw("</td><td class=\"n\">").Text(s.Margin is double mg ? Num(mg) : "—")
                .Raw("</td><td>").Text(s.NearSingularCorner ? "near a singular corner or junction: mesh-dependent" : "").Raw("</td></tr>");
        }
        h.Raw("</tbody></table>\n");
        h.Raw("<p class=\"note\">").Text($"Coordinates in {unit.Symbol}{(planar ? "" : " (x = r, y = z)")}. Field values are recovered nodal values on the side of the named material.").Raw("</p>");
        if (a.FieldEnhancement is { } fe)
        {
            h.Raw("<p id=\"field-enhancement\">").Text($"Field enhancement factor f = E_max / (ΔV/d) = {Num(fe.Factor)} (utilisation factor η = {Num(fe.Utilisation)}): the peak of {Num(fe.PeakFieldVoltsPerMetre * 1e-6)} kV/mm in {fe.PeakMaterial} against the mean field {Num(fe.MeanGapFieldVoltsPerMetre * 1e-6)} kV/mm of the most stressed gap, {fe.ConductorA} – {fe.ConductorB} ({Labels.Volts(fe.VoltageDifferenceVolts)} across {Num(fe.GapMetres / unit.Metres)} {unit.Symbol}). f = 1 is a uniform field; singular corners and junctions are excluded.").Raw("</p>");
        }
        h.EndSection();

        // 5. Margins
        h.Section(5, "margins", "Breakdown margins per material");
        h.Raw("<table id=\"margin-table\"><thead><tr><th>material</th><th>breakdown (kV/mm)</th><th>peak |E| (kV/mm)</th><th>at</th><th>margin</th><th>required</th><th>verdict</th><th>at singular point (kV/mm)</th></tr></thead><tbody>");
        foreach (var m in a.Margins.Materials)
        {
            h.Raw("<tr><td>").Text(m.MaterialName).Raw($"</td><td class=\"n\" data-si=\"{R(m.BreakdownFieldVoltsPerMetre)}\">").Text(m.BreakdownFieldVoltsPerMetre is double b ? Num(b * 1e-6) : "—")
                .Raw($"</td><td class=\"n\" data-si=\"{R(m.PeakFieldVoltsPerMetre)}\">").Text(Num(m.PeakFieldKilovoltsPerMillimetre)).Raw("</td><td>").Text($"({Num(m.PeakXMetres / unit.Metres)}, {Num(m.PeakYMetres / unit.Metres)})")
                .Raw($"</td><td class=\"n\" data-si=\"{R(m.Margin)}\">").Text(m.Margin is double mg ? Num(mg) : "—").Raw("</td><td class=\"n\">").Text(m.RequiredMargin is double rq ? Num(rq) : "—")
                .Raw($"</td><td class=\"v {VerdictClass(m.Verdict)}\">").Text(Verdict(m.Verdict)).Raw("</td><td class=\"n\">").Text(m.SingularCornerFieldVoltsPerMetre is double sc ? Num(sc * 1e-6) : "—").Raw("</td></tr>");
        }
        h.Raw("</tbody></table>\n<p class=\"note\">Margin = breakdown field ÷ peak field in that material. Values at sharp re-entrant corners and singular triple junctions grow with mesh refinement and are listed separately.</p>");
        h.EndSection();

        // 6. Clearances
        h.Section(6, "clearances", "Clearances");
        h.Raw("<table id=\"clearance-table\"><thead><tr><th>between</th><th>ΔV</th><th>distance</th><th>required</th><th>verdict</th><th>PCB table</th></tr></thead><tbody>");
        foreach (var p in a.Clearances.Pairs)
        {
            h.Raw("<tr><td>").Text($"{p.ConductorA} – {p.ConductorB}").Raw($"</td><td class=\"n\" data-si=\"{R(p.VoltageDifferenceVolts)}\">").Text(Labels.Volts(p.VoltageDifferenceVolts))
                .Raw($"</td><td class=\"n\" data-si=\"{R(p.DistanceMetres)}\">").Text($"{Num(p.DistanceMetres / unit.Metres)} {unit.Symbol}").Raw("</td><td class=\"n\">").Text(p.RequiredMetres is double rq ? $"{Num(rq / unit.Metres)} {unit.Symbol}" : "—")
                .Raw($"</td><td class=\"v {VerdictClass(p.Verdict)}\">").Text(Verdict(p.Verdict)).Raw("</td><td>").Text(p.PcbRequiredMetres is double pr ? $"{Num(pr / unit.Metres)} {unit.Symbol}: {Verdict(p.PcbVerdict)}" : "—").Raw("</td></tr>");
        }
        h.Raw("</tbody></table>\n");
        if (a.Clearances.PcbCaution is string caution) h.Raw("<p class=\"note\">").Text(caution).Raw("</p>");
        h.EndSection();

        // 7. Capacitance
        h.Section(7, "capacitance", "Capacitance matrix");
        if (input.Capacitance is { } cap)
        {
            string cu = planar ? "pF/m" : "pF";
            // The reference of the row sums: the enclosure wall, or infinity in open space (free, so zero, when planar).
            bool open = design.Enclosure.IsOpen;
            string reference = open ? "infinity" : "the enclosure";
            string rowSums = open && planar
                ? "in planar open space infinity is free, so the charges sum to zero and every row sum (capacitance to infinity) is zero."
                : $"capacitance to {reference} = row sum.";
            h.Raw("<p class=\"note\">").Text(planar
                ? $"Per metre of depth (planar). Maxwell matrix: Q_i = Σ_j C_ij V_j{(open ? "" : $" with {reference} at 0 V")}; off-diagonal entries are negative. Mutual capacitance C_ij(mutual) = −C_ij; {rowSums}"
                : $"Totals for the body of revolution. Maxwell matrix: Q_i = Σ_j C_ij V_j with {reference} at 0 V; off-diagonal entries are negative. Mutual capacitance = −C_ij; {rowSums}").Raw("</p>");
            h.Raw($"<h3>Maxwell matrix ({cu})</h3><table id=\"capacitance-table\"><thead><tr><th></th>");
            foreach (var n in cap.TerminalNames) h.Raw("<th>").Text(n).Raw("</th>");
            h.Raw("</tr></thead><tbody>");
            for (int i = 0; i < cap.Count; i++)
            {
                h.Raw("<tr><th>").Text(cap.TerminalNames[i]).Raw("</th>");
                for (int j = 0; j < cap.Count; j++) h.Raw($"<td class=\"n\" data-si=\"{R(cap.Maxwell[i, j])}\">").Text(Num(cap.Maxwell[i, j] * 1e12)).Raw("</td>");
                h.Raw("</tr>");
            }
            string to = open ? "infinity" : "enclosure";
            h.Raw($"</tbody></table>\n<h3>Mutual and to-{to} capacitances ({cu})</h3><table id=\"mutual-table\"><thead><tr><th>terminal</th><th>to {to}</th>");
            foreach (var n in cap.TerminalNames) h.Raw("<th>").Text("to " + n).Raw("</th>");
            h.Raw("</tr></thead><tbody>");
            for (int i = 0; i < cap.Count; i++)
            {
                h.Raw("<tr><th>").Text(cap.TerminalNames[i]).Raw($"</th><td class=\"n\" data-si=\"{R(cap.ToEnclosure(i))}\">").Text(Num(cap.ToEnclosure(i) * 1e12)).Raw("</td>");
                for (int j = 0; j < cap.Count; j++) h.Raw($"<td class=\"n\">").Text(i == j ? "—" : Num(cap.Mutual(i, j) * 1e12)).Raw("</td>");
                h.Raw("</tr>");
            }
            h.Raw("</tbody></table>\n");
            h.Raw("<p class=\"note\">").Text($"Symmetry error {Num(cap.SymmetryError)}, energy cross-check mismatch {Num(cap.EnergyMismatch)}; physics checks {(cap.PassesPhysicsChecks ? "passed" : "FAILED: " + string.Join("; ", cap.Violations))}.").Raw("</p>");
        }
        else
        {
            h.Raw("<p>No capacitance matrix was computed (no terminal conductors).</p>");
        }
        h.EndSection();

        // 8. Energy and forces
        h.Section(8, "forces", "Energy and forces");
        var f = a.Forces;
        h.Raw("<table class=\"kv\">");
        h.Row("Field energy", f.PerMetreOfDepth ? $"{Num(f.EnergyJoules)} J/m (total over the depth {Num(f.TotalEnergyJoules)} J)" : $"{Num(f.EnergyJoules)} J");
        h.Raw("</table>\n<table id=\"force-table\"><thead><tr><th>conductor</th>");
        h.Raw(f.PerMetreOfDepth ? "<th>F<sub>x</sub> (N/m)</th><th>F<sub>y</sub> (N/m)</th><th>|F| (N/m)</th>" : "<th>F<sub>z</sub> (N)</th>");
        h.Raw("</tr></thead><tbody>");
        foreach (var fc in f.Forces)
        {
            h.Raw("<tr><td>").Text(fc.ConductorName).Raw("</td>");
            if (f.PerMetreOfDepth)
                h.Raw($"<td class=\"n\" data-si=\"{R(fc.ForceXNewtons)}\">").Text(Num(fc.ForceXNewtons)).Raw($"</td><td class=\"n\" data-si=\"{R(fc.ForceYNewtons)}\">").Text(Num(fc.ForceYNewtons)).Raw("</td><td class=\"n\">").Text(Num(fc.MagnitudeNewtons)).Raw("</td>");
            else
                h.Raw($"<td class=\"n\" data-si=\"{R(fc.ForceYNewtons)}\">").Text(Num(fc.ForceYNewtons)).Raw("</td>");
            h.Raw("</tr>");
        }
        h.Raw("</tbody></table>\n<p class=\"note\">Forces from the Maxwell stress tensor integrated over a layer of elements around each conductor.</p>");
        h.EndSection();

        // 9. Convergence
        h.Section(9, "convergence", "Convergence history and error estimates");
        if (input.Levels.Count > 0)
        {
            var mats = input.Levels.SelectMany(l => l.Peaks.Select(p => p.MaterialName)).Distinct(StringComparer.Ordinal).ToList();
            h.Raw("<table id=\"convergence-table\"><thead><tr><th>level</th><th>triangles</th><th>vertices</th><th>estimated error η</th><th>CG iterations</th><th>time (s)</th>");
            foreach (var m in mats) h.Raw("<th>").Text($"peak in {m} (kV/mm)").Raw("</th>");
            h.Raw("</tr></thead><tbody>");
            foreach (var l in input.Levels)
            {
                h.Raw($"<tr><td class=\"n\">{l.Index}</td><td class=\"n\">{l.Triangles}</td><td class=\"n\">{l.Vertices}</td><td class=\"n\">").Text(Num(l.EstimatedEnergyError)).Raw($"</td><td class=\"n\">{l.Iterations}</td><td class=\"n\">").Text(Num(l.TotalSeconds)).Raw("</td>");
                foreach (var m in mats)
                {
                    var p = l.Peaks.FirstOrDefault(q => q.MaterialName == m);
                    h.Raw("<td class=\"n\">").Text(p is null ? "—" : Num(p.FieldVoltsPerMetre * 1e-6)).Raw("</td>");
                }
                h.Raw("</tr>");
            }
            h.Raw("</tbody></table>\n");
        }
        h.Raw("<p>").Text(input.Levels.Count > 0 ? $"{(input.Converged ? "Converged" : "Not converged")}: {input.StopReason}." : input.StopReason ?? "").Raw("</p>");
        if (input.PeakErrors.Count > 0)
        {
            h.Raw("<table id=\"error-table\"><thead><tr><th>quantity</th><th>value</th><th>extrapolated</th><th>estimated relative error</th><th>method</th></tr></thead><tbody>");
            foreach (var kv in input.PeakErrors.OrderBy(k => k.Key, StringComparer.Ordinal))
                h.Raw("<tr><td>").Text($"peak |E| in {kv.Key} (kV/mm)").Raw("</td><td class=\"n\">").Text(Num(kv.Value.Value * 1e-6)).Raw("</td><td class=\"n\">").Text(Num(kv.Value.Extrapolated * 1e-6))
                    .Raw("</td><td class=\"n\">").Text(double.IsNaN(kv.Value.RelativeError) ? "unknown" : Num(kv.Value.RelativeError * 100) + " %").Raw("</td><td>").Text(kv.Value.Method).Raw("</td></tr>");
            h.Raw("</tbody></table>\n");
        }
        h.Raw("<p>").Text($"Recovery-based estimate of the relative energy-norm error of the field (Zienkiewicz–Zhu): {Num(a.EstimatedRelativeFieldError * 100)} %.").Raw("</p>");
        h.EndSection();

        // 10. Mesh statistics
        h.Section(10, "mesh", "Mesh statistics");
        var stats = MeshStatistics.Of(ctx.Mesh);
        h.Raw("<table class=\"kv\" id=\"mesh-table\">");
        h.Row("Vertices", stats.Vertices.ToString("N0", CultureInfo.InvariantCulture));
        h.Row("Triangles", stats.Triangles.ToString("N0", CultureInfo.InvariantCulture));
        h.Row("Smallest angle", $"{Num(stats.MinAngleDegrees)}°");
        h.Row("Triangles with an angle below 20°", stats.BelowTwentyDegrees.ToString(CultureInfo.InvariantCulture));
        h.Row("Shortest / longest edge", $"{Num(stats.MinEdgeMetres / unit.Metres)} / {Num(stats.MaxEdgeMetres / unit.Metres)} {unit.Symbol}");
        var sr = ctx.Solution.Report;
        h.Row("Linear solver", $"{sr.Unknowns:N0} unknowns, {sr.Iterations} iterations ({sr.Preconditioner}), relative residual {Num(sr.RelativeResidual)}");
        h.Raw("</table>\n");
        h.EndSection();

        // 11. Warnings
        h.Section(11, "warnings", "Warnings");
        var warnings = input.Warnings.Concat(a.Warnings).ToList();
        if (warnings.Count == 0) h.Raw("<p>None.</p>");
        else
        {
            h.Raw("<ul class=\"warnings\">");
            foreach (var w in warnings) h.Raw("<li>").Text(w).Raw("</li>");
            h.Raw("</ul>");
        }
        h.EndSection();

        // 12. Caution
        h.Section(12, "caution", "Caution");
        h.Raw("<div class=\"caution big\"><p><strong>High-voltage designs need review by a qualified person.</strong></p>");
        h.Raw("<p>Local codes, standards and licensed practice take precedence over anything in this report. These results are a design aid, not a certification: they come from a numerical model whose geometry, material data and boundary conditions are only as good as the design file, and breakdown depends on surface condition, humidity, pressure, contamination and time, which this model does not include.</p></div>");
        h.EndSection();

        h.Raw("<footer>Generated by Electrostat.</footer>\n<script>\n").Raw(Script).Raw("</script>\n</body>\n</html>\n");
        return h.ToString();
    }

    private static string Num(double v) => double.IsNaN(v) ? "—" : Labels.Number(v);

    private static string R(double? v) => v is double d && double.IsFinite(d) ? d.ToString("R", CultureInfo.InvariantCulture) : "";

    private static string Verdict(CheckVerdict v) => v switch { CheckVerdict.Pass => "pass", CheckVerdict.Fail => "FAIL", _ => "not checked" };

    private static string VerdictClass(CheckVerdict v) => v switch { CheckVerdict.Pass => "pass", CheckVerdict.Fail => "fail", _ => "none" };

    private static string Kind(HotSpotKind k) => k.ToString();

    private static string SafeFileName(string name)
    {
        var sb = new StringBuilder();
        foreach (char ch in name) sb.Append(char.IsAsciiLetterOrDigit(ch) || ch == '-' || ch == '_' ? ch : '_');
        return sb.Length == 0 ? "conductor" : sb.ToString();
    }

    private const string Css = """
        :root { --ink: #1f2429; --muted: #5b6670; --rule: #d5dbe1; --accent: #1d5c7a; --pass: #1b7a3d; --fail: #b3261e; --warn-bg: #fff4d6; --warn-edge: #c98a00; }
        * { box-sizing: border-box; }
        body { font: 14px/1.45 "DejaVu Sans", Verdana, sans-serif; color: var(--ink); margin: 0 auto; max-width: 1080px; padding: 24px 28px 48px; background: #fff; }
        .masthead { border-bottom: 3px solid var(--accent); padding-bottom: 10px; margin-bottom: 14px; }
        .kicker { text-transform: uppercase; letter-spacing: .12em; font-size: 11px; color: var(--accent); }
        h1 { margin: 4px 0 2px; font-size: 26px; }
        .meta { color: var(--muted); font-size: 12px; }
        section { margin: 26px 0; page-break-inside: avoid; }
        h2 { font-size: 18px; border-bottom: 1px solid var(--rule); padding-bottom: 4px; }
        h2 .no { display: inline-block; min-width: 2em; color: var(--accent); }
        h3 { font-size: 14px; margin: 18px 0 6px; }
        table { border-collapse: collapse; margin: 6px 0 10px; font-size: 13px; }
        th, td { border-bottom: 1px solid var(--rule); padding: 4px 10px 4px 0; text-align: left; vertical-align: top; }
        thead th { border-bottom: 2px solid var(--ink); font-weight: 600; }
        td.n { text-align: right; font-variant-numeric: tabular-nums; }
        table.kv th { font-weight: normal; color: var(--muted); }
        .v.pass { color: var(--pass); } .v.fail { color: var(--fail); font-weight: 700; }
        .verdict { display: inline-block; font-size: 28px; font-weight: 700; padding: 6px 22px; border: 3px solid; letter-spacing: .08em; }
        .verdict.pass { color: var(--pass); } .verdict.fail { color: var(--fail); } .verdict.none { color: var(--muted); }
        .caution { background: var(--warn-bg); border-left: 6px solid var(--warn-edge); padding: 10px 14px; margin: 10px 0; }
        .caution.big { font-size: 15px; }
        figure { margin: 10px 0; }
        figure img { max-width: 100%; height: auto; border: 1px solid var(--rule); }
        .map-wrap { position: relative; display: inline-block; cursor: crosshair; }
        .readout { font-family: "DejaVu Sans Mono", monospace; font-size: 13px; background: #f3f5f7; padding: 6px 10px; margin-top: 4px; min-height: 1.6em; }
        .insets { display: flex; flex-wrap: wrap; gap: 12px; }
        .insets figure { flex: 1 1 300px; }
        figcaption, .note { color: var(--muted); font-size: 12px; }
        ul.warnings li { margin-bottom: 4px; }
        footer { margin-top: 40px; color: var(--muted); font-size: 11px; border-top: 1px solid var(--rule); padding-top: 8px; }
        @media print {
          body { max-width: none; padding: 0; font-size: 11px; }
          .readout { display: none; }
          section { page-break-inside: avoid; }
          a { color: inherit; text-decoration: none; }
        }
        """;

    // Pointer readout: pixel → design point through the map frame, then bilinear interpolation of the sampled grid
    // (nearest defined sample where a cell touches a conductor or the outside).
    private const string Script = """
        (function () {
          'use strict';
          var data = document.getElementById('readout-data');
          var img = document.getElementById('field-map');
          var out = document.getElementById('readout');
          if (!data || !img || !out) return;
          var g = JSON.parse(data.textContent);
          function at(arr, i, j) { return (i < 0 || j < 0 || i >= g.nx || j >= g.ny) ? null : arr[j * g.nx + i]; }
          function sample(arr, x, y) {
            var fx = (x - g.x0) / g.step, fy = (y - g.y0) / g.step;
            var i = Math.floor(fx), j = Math.floor(fy), u = fx - i, v = fy - j;
            var c = [at(arr, i, j), at(arr, i + 1, j), at(arr, i, j + 1), at(arr, i + 1, j + 1)];
            if (c[0] !== null && c[1] !== null && c[2] !== null && c[3] !== null) {
              return (1 - u) * (1 - v) * c[0] + u * (1 - v) * c[1] + (1 - u) * v * c[2] + u * v * c[3];
            }
            var w = [(1 - u) * (1 - v), u * (1 - v), (1 - u) * v, u * v], best = null, bw = -1;
            for (var k = 0; k < 4; k++) { if (c[k] !== null && w[k] > bw) { bw = w[k]; best = c[k]; } }
            return best;
          }
          function fmt(x, digits) { return Number(x.toPrecision(digits)).toString(); }
          function volts(v) { var a = Math.abs(v); return a >= 1e3 ? fmt(v / 1e3, 5) + ' kV' : fmt(v, 5) + ' V'; }
          img.addEventListener('pointermove', function (e) {
            var r = img.getBoundingClientRect();
            var px = (e.clientX - r.left) * img.naturalWidth / r.width;
            var py = (e.clientY - r.top) * img.naturalHeight / r.height;
            var x = g.frame.minX + (px - g.frame.ox) / g.frame.ppm;
            var y = g.frame.maxY - (py - g.frame.oy) / g.frame.ppm;
            var xs = g.mirrored ? Math.abs(x) : x;
            var phi = sample(g.phi, xs, y), e2 = sample(g.e, xs, y);
            var where = 'x = ' + fmt(x / g.unit, 5) + ' ' + g.unitSymbol + ', y = ' + fmt(y / g.unit, 5) + ' ' + g.unitSymbol;
            if (phi === null) {
              out.textContent = where + ': outside the field region';
              out.setAttribute('data-potential-volts', '');
              out.setAttribute('data-field-volts-per-metre', '');
              return;
            }
            out.textContent = where + ', potential = ' + volts(phi) + ', |E| = ' + (e2 === null ? '—' : fmt(e2 * 1e-6, 4) + ' kV/mm');
            out.setAttribute('data-potential-volts', String(phi));
            out.setAttribute('data-field-volts-per-metre', e2 === null ? '' : String(e2));
            out.setAttribute('data-x-metres', String(x));
            out.setAttribute('data-y-metres', String(y));
          });
        })();
        """;
}
