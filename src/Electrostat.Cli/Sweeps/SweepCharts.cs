using System.Globalization;
using System.Net;
using System.Text;
using Electrostat.Analysis.Results;
using Electrostat.Rendering.Charts;
using Electrostat.Rendering.Drawing;

namespace Electrostat.Cli.Sweeps;

/// <summary>The sweep's pictures (SVG line charts against the first varied parameter) and its HTML summary.</summary>
internal static class SweepCharts
{
    /// <summary>Chart files by name (sweep-peak-field.svg, sweep-margin.svg, sweep-clearance.svg, sweep-capacitance.svg),
    /// each only when the sweep has such figures.</summary>
    public static Dictionary<string, string> Svgs(SweepReport r)
    {
        var files = new Dictionary<string, string>(StringComparer.Ordinal);
        var metrics = r.MetricNames();
        string x = r.Axes[0].Name;
        void Add(string file, string title, string yLabel, string prefix, double scale, IReadOnlyList<ChartGuide> guides)
        {
            var names = metrics.Where(m => m.StartsWith(prefix + "[", StringComparison.Ordinal)).ToList();
            if (names.Count == 0) return;
            var series = new List<ChartSeries>();
            foreach (var group in Groups(r))
                foreach (var n in names)
                {
                    var pts = group.Cases.OrderBy(c => c.Parameters[x]).ToList();
                    var ys = pts.Select(c => c.Metrics.TryGetValue(n, out var v) && v is double d ? d * scale : double.NaN).ToList();
                    if (ys.All(double.IsNaN)) continue;
                    series.Add(new ChartSeries(n[(prefix.Length + 1)..^1] + group.Label, pts.Select(c => c.Parameters[x]).ToList(), ys, ShowPoints: true));
                }
            if (series.Count == 0) return;
            var chart = new LineChart { Title = title, XLabel = x, YLabel = yLabel, Series = series, Guides = guides };
            files[file] = SvgPainter.Write(LineChartRenderer.Render(chart));
        }
        Add("sweep-peak-field.svg", "Peak field per material", "|E| peak (kV/mm)", "peak", 1e-6, []);
        Add("sweep-margin.svg", "Breakdown margin per material", "margin (breakdown / peak)", "margin", 1,
            r.RequiredMargin is double m ? [new ChartGuide("required margin", m)] : []);
        Add("sweep-clearance.svg", "Clearance per conductor pair", "clearance (mm)", "clearance", 1e3, []);
        Add("sweep-capacitance.svg", "Capacitance matrix entries (Maxwell)", r.Planar ? "C (pF/m)" : "C (pF)", "capacitance", 1e12, []);
        return files;
    }

    // One line per combination of the other axes' values (the first axis is the chart's x).
    private static IEnumerable<(string Label, List<SweepCase> Cases)> Groups(SweepReport r)
    {
        var c = CultureInfo.InvariantCulture;
        var others = r.Axes.Skip(1).Select(a => a.Name).ToList();
        return r.Cases.GroupBy(k => string.Join(", ", others.Select(o => k.Parameters.TryGetValue(o, out double v) ? $"{o}={v.ToString("G6", c)}" : "")))
            .Select(g => (g.Key.Length == 0 ? "" : " (" + g.Key + ")", g.ToList()));
    }

    /// <summary>sweep.html: self-contained summary with the charts inline and the case table.</summary>
    public static string Html(SweepReport r, IReadOnlyDictionary<string, string> svgs)
    {
        var c = CultureInfo.InvariantCulture;
        static string E(string s) => WebUtility.HtmlEncode(s);
        var sb = new StringBuilder();
        sb.Append("<!DOCTYPE html>\n<html lang=\"en\"><head><meta charset=\"utf-8\"><title>Sweep: ").Append(E(Path.GetFileName(r.DesignPath))).Append("</title>\n");
        sb.Append("<style>body{font-family:system-ui,sans-serif;margin:1.5em;color:#22262b}table{border-collapse:collapse;font-size:13px}" +
                  "td,th{border:1px solid #ccd;padding:2px 6px;text-align:right}th{background:#eef1f4}.err{color:#b2182b;text-align:left}" +
                  ".note{max-width:60em;font-size:13px;color:#555}</style></head><body>\n");
        sb.Append("<h1>Parameter sweep</h1>\n<p>Design <code>").Append(E(r.DesignPath)).Append("</code>, accuracy ").Append(E(r.Accuracy))
          .Append(", ").Append(r.Cases.Count.ToString(c)).Append(" cases, ").Append(r.Cases.Count(k => !k.Ok).ToString(c)).Append(" failed.</p>\n");
        if (r.GoalResult is { } g) sb.Append("<h2>Goal</h2>\n<p>").Append(E(g.Message)).Append("</p>\n");
        foreach (var (_, svg) in svgs) sb.Append("<figure>").Append(svg[(svg.IndexOf("<svg", StringComparison.Ordinal))..]).Append("</figure>\n");
        var metrics = r.MetricNames();
        sb.Append("<h2>Cases</h2>\n<table><tr><th>case</th>");
        foreach (var a in r.Axes) sb.Append("<th>").Append(E(a.Name)).Append("</th>");
        sb.Append("<th>verdict</th>");
        foreach (var m in metrics) sb.Append("<th>").Append(E($"{m} ({CaseMetrics.Unit(m, r.Planar)})")).Append("</th>");
        sb.Append("<th>error</th></tr>\n");
        foreach (var k in r.Cases)
        {
            sb.Append("<tr><td>").Append(k.Index.ToString(c)).Append("</td>");
            foreach (var a in r.Axes) sb.Append("<td>").Append(k.Parameters.TryGetValue(a.Name, out double v) ? v.ToString("G6", c) : "").Append("</td>");
            sb.Append("<td>").Append(E(k.Verdict ?? k.Status)).Append("</td>");
            foreach (var m in metrics) sb.Append("<td>").Append(k.Metrics.TryGetValue(m, out var x) && x is double d ? d.ToString("G5", c) : "").Append("</td>");
            sb.Append("<td class=\"err\">").Append(E(k.Error ?? "")).Append("</td></tr>\n");
        }
        sb.Append("</table>\n<p class=\"note\">").Append(E(ResultsJsonWriter.Caution)).Append("</p>\n</body></html>\n");
        return sb.ToString();
    }
}
