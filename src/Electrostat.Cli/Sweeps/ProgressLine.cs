using System.Globalization;

namespace Electrostat.Cli.Sweeps;

/// <summary>Status lines for long runs, on stderr, only when a person is watching: never when stderr is redirected,
/// never with --json or --quiet. Thread-safe (cases finish on several threads).</summary>
internal sealed class ProgressLine
{
    private readonly TextWriter? _w;
    private readonly Lock _lock = new();
    private int _done;

    /// <summary>Creates a reporter; <paramref name="enabled"/> false makes every call a no-op.</summary>
    public ProgressLine(TextWriter stderr, bool enabled) => _w = enabled ? stderr : null;

    /// <summary>True when lines are written.</summary>
    public bool Enabled => _w is not null;

    /// <summary>Reports a finished case out of <paramref name="total"/> (0 when unknown, as in goal-seek).</summary>
    public void CaseDone(SweepCase c, int total)
    {
        if (_w is null) return;
        lock (_lock)
        {
            _done++;
            var ci = CultureInfo.InvariantCulture;
            string values = string.Join(" ", c.Parameters.Select(p => $"{p.Key}={p.Value.ToString("G6", ci)}"));
            string count = total > 0 ? $"{_done}/{total}" : _done.ToString(ci);
            _w.WriteLine(string.Create(ci, $"  case {count,-9} {values,-30} {(c.Ok ? c.Verdict : "FAILED")} ({c.Seconds:F1} s)"));
        }
    }
}
