using System.Diagnostics;
using System.Globalization;

namespace Electrostat.Bench;

/// <summary>Process measurements shared by the suites: peak memory, load average and the median of repeats.</summary>
internal static class BenchProcess
{
    /// <summary>Resets the peak resident set size (Linux proc(5): writing 5 to clear_refs); elsewhere the peak stays cumulative.</summary>
    public static void ResetPeak()
    {
        try
        {
            File.WriteAllText("/proc/self/clear_refs", "5");
        }
        catch (IOException)
        {
        }
        catch (UnauthorizedAccessException)
        {
        }
    }

    /// <summary>Peak resident set (VmHWM) in MB on Linux; the peak working set elsewhere.</summary>
    public static double PeakMegabytes()
    {
        try
        {
            foreach (string line in File.ReadLines("/proc/self/status"))
            {
                if (line.StartsWith("VmHWM:", StringComparison.Ordinal))
                    return double.Parse(line[6..].Trim().Split(' ')[0], CultureInfo.InvariantCulture) / 1024.0;
            }
        }
        catch (IOException)
        {
        }
        return Process.GetCurrentProcess().PeakWorkingSet64 / (1024.0 * 1024.0);
    }

    /// <summary>The 1-minute load average (Linux), or "n/a".</summary>
    public static string LoadAverage()
    {
        try
        {
            return File.ReadAllText("/proc/loadavg").Split(' ')[0];
        }
        catch (IOException)
        {
            return "n/a";
        }
    }

    /// <summary>The median of the values.</summary>
    public static double Median(IEnumerable<double> values)
    {
        var s = values.Order().ToArray();
        return s.Length % 2 == 1 ? s[s.Length / 2] : 0.5 * (s[s.Length / 2 - 1] + s[s.Length / 2]);
    }
}
