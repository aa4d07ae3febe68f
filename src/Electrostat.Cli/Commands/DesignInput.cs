using Electrostat.Geometry.Loading;

namespace Electrostat.Cli.Commands;

/// <summary>Shared by every command that reads a design: <c>--set name=value</c> overrides and problem printing.</summary>
internal static class DesignInput
{
    /// <summary>Turns <c>--set</c> values ("gap=2.5", "v_hv=20 kV") into parameter overrides.</summary>
    /// <exception cref="UsageException">A value without '=' or with an empty name.</exception>
    public static Dictionary<string, string> ParseOverrides(IReadOnlyList<string> sets)
    {
        var result = new Dictionary<string, string>(StringComparer.Ordinal);
        foreach (var s in sets)
        {
            int eq = s.IndexOf('=', StringComparison.Ordinal);
            if (eq <= 0 || eq == s.Length - 1)
                throw new UsageException($"--set expects name=value, got \"{s}\"");
            result[s[..eq].Trim()] = s[(eq + 1)..].Trim();
        }
        return result;
    }

    /// <summary>Loads a design; on errors prints every problem to <paramref name="stderr"/> and returns null.</summary>
    public static DesignLoadResult Load(string path, IReadOnlyDictionary<string, string> overrides, TextWriter stderr)
    {
        var result = DesignLoader.Load(path, overrides);
        if (result.HasErrors)
        {
            foreach (var p in result.Problems.OrderByDescending(p => p.Severity).ThenBy(p => p.Line)) stderr.WriteLine(p.ToString());
            int errors = result.Errors.Count();
            stderr.WriteLine($"{errors} error{(errors == 1 ? "" : "s")}: the design is not valid.");
        }
        return result;
    }
}
