using System.Globalization;

namespace Electrostat.Cli.Sweeps;

/// <summary>One varied parameter: <paramref name="Steps"/> evenly spaced values from <paramref name="From"/> to
/// <paramref name="To"/> inclusive, in the design's own units for that parameter (as with <c>--set</c>).</summary>
internal sealed record SweepAxis(string Name, double From, double To, int Steps)
{
    /// <summary>The values, first to last; exact at both ends.</summary>
    public double[] Values()
    {
        var v = new double[Steps];
        for (int i = 0; i < Steps; i++) v[i] = Steps == 1 ? From : i == Steps - 1 ? To : From + (To - From) * i / (Steps - 1);
        return v;
    }

    /// <summary>Parses "name=from..to".</summary>
    /// <exception cref="UsageException">Malformed text.</exception>
    public static SweepAxis Parse(string text, int steps)
    {
        int eq = text.IndexOf('=', StringComparison.Ordinal);
        int dots = text.IndexOf("..", StringComparison.Ordinal);
        var c = CultureInfo.InvariantCulture;
        if (eq > 0 && dots > eq
            && double.TryParse(text[(eq + 1)..dots], NumberStyles.Float, c, out double from)
            && double.TryParse(text[(dots + 2)..], NumberStyles.Float, c, out double to)
            && double.IsFinite(from) && double.IsFinite(to))
        {
            if (from == to && steps > 1) throw new UsageException($"--vary {text}: the range is empty; give two different ends");
            return new SweepAxis(text[..eq].Trim(), from, to, steps);
        }
        throw new UsageException($"--vary expects name=from..to with plain numbers in the parameter's own unit, e.g. --vary gap=2..10, got \"{text}\"");
    }
}
