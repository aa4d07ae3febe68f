namespace Electrostat.Cli.Sweeps;

/// <summary>The grid of a sweep: every combination of the axes' values, numbered with the first axis varying slowest,
/// and the deterministic shard subsets of it.</summary>
internal static class SweepPlan
{
    /// <summary>All cases of the grid, in index order.</summary>
    public static List<(int Index, IReadOnlyDictionary<string, double> Parameters)> Cases(IReadOnlyList<SweepAxis> axes)
    {
        var values = axes.Select(a => a.Values()).ToList();
        int total = values.Aggregate(1, (n, v) => checked(n * v.Length));
        var result = new List<(int, IReadOnlyDictionary<string, double>)>(total);
        for (int index = 0; index < total; index++)
        {
            var p = new Dictionary<string, double>(StringComparer.Ordinal);
            int rest = index;
            for (int k = axes.Count - 1; k >= 0; k--)
            {
                p[axes[k].Name] = values[k][rest % values[k].Length];
                rest /= values[k].Length;
            }
            result.Add((index, p));
        }
        return result;
    }

    /// <summary>Shard k of n (1-based): the cases whose index is congruent to k-1 modulo n. Round-robin rather than
    /// blocks, so every shard gets a similar mix of cheap and expensive parameter values.</summary>
    public static List<(int Index, IReadOnlyDictionary<string, double> Parameters)> Shard(
        List<(int Index, IReadOnlyDictionary<string, double> Parameters)> all, int k, int n) =>
        all.Where(c => c.Index % n == k - 1).ToList();

    /// <summary>Parses "k/N" with 1 ≤ k ≤ N.</summary>
    /// <exception cref="UsageException">Malformed.</exception>
    public static (int K, int N) ParseShard(string text)
    {
        var parts = text.Split('/');
        if (parts.Length == 2 && int.TryParse(parts[0], System.Globalization.CultureInfo.InvariantCulture, out int k)
            && int.TryParse(parts[1], System.Globalization.CultureInfo.InvariantCulture, out int n) && n >= 1 && k >= 1 && k <= n)
            return (k, n);
        throw new UsageException($"--shard expects k/N with 1 <= k <= N, e.g. --shard 3/10, got \"{text}\"");
    }
}
