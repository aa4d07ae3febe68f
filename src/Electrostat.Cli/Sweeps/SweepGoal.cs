using System.Globalization;
using System.Text.RegularExpressions;

namespace Electrostat.Cli.Sweeps;

/// <summary>
/// A goal for <c>sweep --goal</c>: <c>SUBJECT OP NUMBER [UNIT]</c>, e.g. <c>margin &gt;= 2</c>,
/// <c>peak[air] &lt;= 5 kV/mm</c>, <c>clearance[hv,gnd] &gt;= 8 mm</c>, <c>capacitance[tx,rx] &gt;= -0.5 pF</c>.
/// Subjects are the metric names of <see cref="CaseMetrics"/>; OP is one of &gt;=, &lt;=, &gt;, &lt;. Without a unit the
/// number is in kV/mm (peak), mm (clearance), pF or pF/m (capacitance), or plain (margin).
/// </summary>
/// <param name="Text">The goal as written.</param>
/// <param name="Subject">Metric name, e.g. "margin[air]".</param>
/// <param name="Operator">"&gt;=", "&lt;=", "&gt;" or "&lt;".</param>
/// <param name="ThresholdSi">Threshold in SI units (V/m, m, F or F/m, or dimensionless).</param>
internal sealed partial record SweepGoal(string Text, string Subject, string Operator, double ThresholdSi)
{
    /// <summary>The goal grammar, for usage and error messages.</summary>
    public const string Grammar =
        "SUBJECT OP NUMBER [UNIT], SUBJECT one of margin, margin[MATERIAL], peak[MATERIAL], clearance, clearance[A,B], " +
        "capacitance[A,B], enhancement; OP one of >= <= > <; e.g. \"margin >= 2\", \"peak[air] <= 5 kV/mm\", \"clearance >= 8 mm\"";

    [GeneratedRegex(@"^\s*(?<s>margin|peak|clearance|capacitance|enhancement)(?<b>\[[^\]]+\])?\s*(?<op>>=|<=|>|<)\s*(?<n>[-+0-9.eE]+)\s*(?<u>\S*)\s*$")]
    private static partial Regex Pattern();

    /// <summary>Parses a goal.</summary>
    /// <exception cref="UsageException">The text does not follow the grammar.</exception>
    public static SweepGoal Parse(string text)
    {
        var m = Pattern().Match(text);
        if (!m.Success || !double.TryParse(m.Groups["n"].Value, NumberStyles.Float, CultureInfo.InvariantCulture, out double n))
            throw new UsageException($"--goal \"{text}\" is not understood; write {Grammar}");
        string s = m.Groups["s"].Value, b = m.Groups["b"].Value, u = m.Groups["u"].Value;
        if (s == "peak" && b.Length == 0) throw new UsageException($"--goal \"{text}\": name the material, e.g. peak[air] <= 5 kV/mm");
        if (s == "enhancement" && b.Length > 0) throw new UsageException($"--goal \"{text}\": enhancement takes no brackets (it is the design's field enhancement factor)");
        if (s == "capacitance" && b.Length == 0) throw new UsageException($"--goal \"{text}\": name the two terminals, e.g. capacitance[tx,rx]");
        double factor = (s, u) switch
        {
            ("margin", "") => 1,
            ("enhancement", "") => 1,
            ("peak", "" or "kV/mm") => 1e6,
            ("peak", "V/m") => 1,
            ("peak", "MV/m") => 1e6,
            ("peak", "kV/cm") => 1e5,
            ("clearance", "" or "mm") => 1e-3,
            ("clearance", "m") => 1,
            ("clearance", "cm") => 1e-2,
            ("clearance", "um") => 1e-6,
            ("capacitance", "" or "pF" or "pF/m") => 1e-12,
            ("capacitance", "nF" or "nF/m") => 1e-9,
            ("capacitance", "fF" or "fF/m") => 1e-15,
            ("capacitance", "F" or "F/m") => 1,
            _ => throw new UsageException($"--goal \"{text}\": unit \"{u}\" does not fit {s}"),
        };
        string subject = s + (b.Length == 0 ? "" : "[" + string.Join(",", b[1..^1].Split(',').Select(x => x.Trim())) + "]");
        return new SweepGoal(text.Trim(), subject, m.Groups["op"].Value, n * factor);
    }

    /// <summary>The subject's value in a case (clearances are looked up in either order), or null when absent.</summary>
    public double? Value(SweepCase c)
    {
        if (!c.Ok) return null;
        if (c.Metrics.TryGetValue(Subject, out var v)) return v;
        int open = Subject.IndexOf('[', StringComparison.Ordinal);
        if (open > 0 && Subject.StartsWith("clearance", StringComparison.Ordinal))
        {
            var parts = Subject[(open + 1)..^1].Split(',');
            if (parts.Length == 2 && c.Metrics.TryGetValue($"clearance[{parts[1]},{parts[0]}]", out v)) return v;
        }
        return null;
    }

    /// <summary>True when the case meets the goal; null when the case failed or lacks the subject.</summary>
    public bool? Meets(SweepCase c) => Value(c) is not double v ? null : Operator switch
    {
        ">=" => v >= ThresholdSi,
        "<=" => v <= ThresholdSi,
        ">" => v > ThresholdSi,
        _ => v < ThresholdSi,
    };
}
