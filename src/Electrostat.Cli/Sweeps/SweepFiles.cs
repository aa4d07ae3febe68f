using System.Globalization;
using System.Text;
using System.Text.Json;
using Electrostat.Analysis.Results;

namespace Electrostat.Cli.Sweeps;

/// <summary>sweep.csv and sweep.json: writing, and reading back sweep.json for <c>--merge</c>. Numbers are SI and written
/// in round-trip form, so a merge reproduces the unsharded files exactly.</summary>
internal static class SweepFiles
{
    /// <summary>Schema name and version of sweep.json.</summary>
    public const string Schema = "electrostat-sweep";

    /// <summary>sweep.csv: one row per case; columns case, the varied parameters, status, verdict, the metrics (SI units in the header), error.</summary>
    public static string Csv(SweepReport r)
    {
        var c = CultureInfo.InvariantCulture;
        var metrics = r.MetricNames();
        var sb = new StringBuilder();
        var head = new List<string> { "case" };
        head.AddRange(r.Axes.Select(a => a.Name));
        head.Add("status");
        head.Add("verdict");
        head.AddRange(metrics.Select(m => $"{m} ({CaseMetrics.Unit(m, r.Planar)})"));
        head.Add("error");
        sb.AppendJoin(',', head.Select(Quote)).Append('\n');
        foreach (var k in r.Cases)
        {
            var row = new List<string> { k.Index.ToString(c) };
            row.AddRange(r.Axes.Select(a => k.Parameters.TryGetValue(a.Name, out double v) ? v.ToString("R", c) : ""));
            row.Add(k.Status);
            row.Add(k.Verdict ?? "");
            row.AddRange(metrics.Select(m => k.Metrics.TryGetValue(m, out var v) && v is double x && double.IsFinite(x) ? x.ToString("R", c) : ""));
            row.Add(k.Error ?? "");
            sb.AppendJoin(',', row.Select(Quote)).Append('\n');
        }
        return sb.ToString();
    }

    private static string Quote(string s) =>
        s.IndexOfAny([',', '"', '\n', '\r']) < 0 ? s : "\"" + s.Replace("\"", "\"\"", StringComparison.Ordinal) + "\"";

    /// <summary>sweep.json (indented UTF-8).</summary>
    public static string Json(SweepReport r)
    {
        using var stream = new MemoryStream();
        using (var w = new Utf8JsonWriter(stream, new JsonWriterOptions { Indented = true }))
        {
            w.WriteStartObject();
            w.WriteString("schema", Schema);
            w.WriteNumber("schema_version", 1);
            w.WriteString("caution", ResultsJsonWriter.Caution);
            w.WriteString("design", r.DesignPath);
            w.WriteString("accuracy", r.Accuracy);
            w.WriteBoolean("planar", r.Planar);
            if (r.RequiredMargin is double rm) w.WriteNumber("required_margin", rm);
            else w.WriteNull("required_margin");
            w.WriteStartObject("set");
            foreach (var (k, v) in r.FixedOverrides.OrderBy(p => p.Key, StringComparer.Ordinal)) w.WriteString(k, v);
            w.WriteEndObject();
            w.WriteStartArray("axes");
            foreach (var a in r.Axes)
            {
                w.WriteStartObject();
                w.WriteString("name", a.Name);
                w.WriteNumber("from", a.From);
                w.WriteNumber("to", a.To);
                w.WriteNumber("steps", a.Steps);
                w.WriteEndObject();
            }
            w.WriteEndArray();
            w.WriteNumber("total_cases", r.TotalCases);
            if (r.Shard is null) w.WriteNull("shard");
            else w.WriteString("shard", r.Shard);
            w.WriteStartObject("units");
            foreach (var m in r.MetricNames()) w.WriteString(m, CaseMetrics.Unit(m, r.Planar));
            w.WriteEndObject();
            if (r.Goal is { } g && r.GoalResult is { } gr)
            {
                w.WriteStartObject("goal");
                w.WriteString("text", g.Text);
                w.WriteString("subject", g.Subject);
                w.WriteString("operator", g.Operator);
                w.WriteNumber("threshold_si", g.ThresholdSi);
                w.WriteString("seek", r.LargestWanted ? "largest" : "smallest");
                w.WriteBoolean("found", gr.Found);
                if (gr.Value is double v) w.WriteNumber("value", v);
                else w.WriteNull("value");
                WriteEvidence(w, "meeting_case", gr.Meeting, g, r.Axes[0].Name);
                WriteEvidence(w, "failing_case", gr.Failing, g, r.Axes[0].Name);
                w.WriteString("message", gr.Message);
                w.WriteStartArray("warnings");
                foreach (var s in gr.Warnings) w.WriteStringValue(s);
                w.WriteEndArray();
                w.WriteEndObject();
            }
            w.WriteStartArray("cases");
            foreach (var k in r.Cases)
            {
                w.WriteStartObject();
                w.WriteNumber("index", k.Index);
                w.WriteStartObject("parameters");
                foreach (var a in r.Axes)
                    if (k.Parameters.TryGetValue(a.Name, out double pv)) w.WriteNumber(a.Name, pv);
                w.WriteEndObject();
                w.WriteString("status", k.Status);
                w.WriteString("verdict", k.Verdict);
                w.WriteStartObject("metrics");
                foreach (var (name, value) in k.Metrics)
                {
                    if (value is double x && double.IsFinite(x)) w.WriteNumber(name, x);
                    else w.WriteNull(name);
                }
                w.WriteEndObject();
                w.WriteString("error", k.Error);
                w.WriteNumber("seconds", k.Seconds);
                w.WriteEndObject();
            }
            w.WriteEndArray();
            w.WriteEndObject();
        }
        return Encoding.UTF8.GetString(stream.ToArray());
    }

    private static void WriteEvidence(Utf8JsonWriter w, string name, SweepCase? c, SweepGoal g, string axis)
    {
        if (c is null)
        {
            w.WriteNull(name);
            return;
        }
        w.WriteStartObject(name);
        w.WriteNumber("index", c.Index);
        w.WriteNumber(axis, c.Parameters[axis]);
        if (g.Value(c) is double v) w.WriteNumber("subject_value_si", v);
        else w.WriteNull("subject_value_si");
        w.WriteEndObject();
    }

    /// <summary>Reads a sweep.json written by <see cref="Json"/> (for merging shards).</summary>
    /// <exception cref="UsageException">Not a sweep.json, or a goal-seek result (which cannot be merged).</exception>
    public static SweepReport Read(string path)
    {
        using var doc = JsonDocument.Parse(File.ReadAllText(path));
        var root = doc.RootElement;
        if (root.ValueKind != JsonValueKind.Object || !root.TryGetProperty("schema", out var schema) || schema.GetString() != Schema)
            throw new UsageException($"{path} is not a sweep.json written by electrostat sweep");
        if (root.TryGetProperty("goal", out _)) throw new UsageException($"{path} is a goal-seek result; only grid sweeps (with --shard) are merged");
        var axes = root.GetProperty("axes").EnumerateArray()
            .Select(a => new SweepAxis(a.GetProperty("name").GetString()!, a.GetProperty("from").GetDouble(), a.GetProperty("to").GetDouble(), a.GetProperty("steps").GetInt32())).ToList();
        var set = root.GetProperty("set").EnumerateObject().ToDictionary(p => p.Name, p => p.Value.GetString()!, StringComparer.Ordinal);
        var cases = new List<SweepCase>();
        foreach (var k in root.GetProperty("cases").EnumerateArray())
        {
            var parameters = k.GetProperty("parameters").EnumerateObject().ToDictionary(p => p.Name, p => p.Value.GetDouble(), StringComparer.Ordinal);
            var metrics = new Dictionary<string, double?>(StringComparer.Ordinal);
            foreach (var m in k.GetProperty("metrics").EnumerateObject())
                metrics[m.Name] = m.Value.ValueKind == JsonValueKind.Number ? m.Value.GetDouble() : null;
            cases.Add(new SweepCase(k.GetProperty("index").GetInt32(), parameters, k.GetProperty("status").GetString()!,
                k.GetProperty("verdict").GetString(), metrics, k.GetProperty("error").GetString(), k.GetProperty("seconds").GetDouble()));
        }
        return new SweepReport(root.GetProperty("design").GetString()!, axes, root.GetProperty("total_cases").GetInt32(),
            root.GetProperty("shard").ValueKind == JsonValueKind.String ? root.GetProperty("shard").GetString() : null,
            root.GetProperty("planar").GetBoolean(), root.GetProperty("accuracy").GetString()!, set, cases,
            RequiredMargin: root.GetProperty("required_margin").ValueKind == JsonValueKind.Number ? root.GetProperty("required_margin").GetDouble() : null);
    }
}
