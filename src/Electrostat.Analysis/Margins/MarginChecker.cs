using Electrostat.Analysis.Adaptivity;
using Electrostat.Analysis.Corners;

namespace Electrostat.Analysis.Margins;

/// <summary>
/// Breakdown margin per material: margin = E_breakdown / E_peak, with E_peak the largest recovered |E| in the material.
/// </summary>
/// <remarks>
/// Field values closer to a singular corner than its report distance are left out of E_peak (the exact field is
/// infinite there, so any number would be a property of the mesh); the corner's field at the report distance is
/// given separately. A material without a breakdown field, or without a required margin, is "not checked", never
/// passing. The requirement is the material's own <c>min_margin</c> if given, else the design's
/// (<see cref="Geometry.Model.DesignChecks.MarginFor"/>).
/// <para>When the adaptive loop's peaks are given (<c>solve</c> does), E_peak is taken from them, so that the margin,
/// the reported peak with its error estimate and the field enhancement factor are one number; the recovered field is
/// the fallback for a material without a measured peak and for a single solve.</para>
/// </remarks>
public static class MarginChecker
{
    /// <summary>Computes the margins.</summary>
    /// <param name="context">The analysis context.</param>
    /// <param name="corners">Singular corners (from <see cref="SingularCornerDetector.Detect"/>).</param>
    /// <param name="measuredPeaks">The final adaptive level's peak per material (singular corners excluded), or null
    /// to take the peaks from the recovered field.</param>
    public static MarginReport Check(AnalysisContext context, IReadOnlyList<SingularCorner> corners, IReadOnlyList<MaterialPeak>? measuredPeaks = null)
    {
        ArgumentNullException.ThrowIfNull(context);
        ArgumentNullException.ThrowIfNull(corners);
        var rec = context.Recovered;
        var mesh = context.Mesh;
        var peaks = new Dictionary<string, (double Field, double X, double Y)>();
        var order = new List<string>();
        foreach (var region in context.Regions.Values.OrderBy(r => r.Attribute))
        {
            if (!peaks.ContainsKey(region.Material.Name))
            {
                peaks[region.Material.Name] = (0, double.NaN, double.NaN);
                order.Add(region.Material.Name);
            }
        }
        for (int v = 0; v < mesh.VertexCount; v++)
        {
            double x = mesh.X[v], y = mesh.Y[v];
            bool excluded = false;
            foreach (var c in corners)
            {
                double dx = x - c.Location.X, dy = y - c.Location.Y;
                if (dx * dx + dy * dy < c.ReportDistanceMetres * c.ReportDistanceMetres) { excluded = true; break; }
            }
            if (excluded) continue;
            for (int s = rec.SideStart[v]; s < rec.SideStart[v + 1]; s++)
            {
                var material = context.MaterialOfRegion(rec.SideRegion[s]);
                if (material is null) continue;
                double e = rec.SideMagnitude(s);
                if (e > peaks[material.Name].Field) peaks[material.Name] = (e, x, y);
            }
        }
        if (measuredPeaks is not null)
        {
            foreach (var p in measuredPeaks)
            {
                if (peaks.ContainsKey(p.MaterialName)) peaks[p.MaterialName] = (p.FieldVoltsPerMetre, p.XMetres, p.YMetres);
            }
        }

        var list = new List<MaterialMargin>();
        foreach (string name in order)
        {
            var material = context.Regions.Values.First(r => r.Material.Name == name).Material;
            var (peak, px, py) = peaks[name];
            double? breakdown = material.BreakdownFieldVoltsPerMetre;
            double? margin = breakdown is double eb && peak > 0 ? eb / peak : breakdown is not null ? double.PositiveInfinity : null;
            double? required = context.Design.Checks.MarginFor(name);
            var verdict = margin is double m && required is double q ? (m >= q ? CheckVerdict.Pass : CheckVerdict.Fail) : CheckVerdict.NotChecked;
            double? cornerField = corners.Where(c => c.MaterialName == name && c.FieldAtReportDistanceVoltsPerMetre is not null)
                .Select(c => c.FieldAtReportDistanceVoltsPerMetre!.Value).DefaultIfEmpty(double.NaN).Max();
            if (cornerField is double cf && double.IsNaN(cf)) cornerField = null;
            list.Add(new MaterialMargin(name, breakdown, peak, px, py, margin, required, verdict, cornerField));
        }
        return new MarginReport(list);
    }
}
