namespace Electrostat.Cli.Sweeps;

/// <summary>Combines the sweep.json files of shards (<c>sweep --shard k/N</c>) into the report of the whole sweep.</summary>
internal static class SweepMerge
{
    /// <summary>Reads DIR/sweep.json of every folder and joins them; checks that they belong to one sweep and cover
    /// every case exactly once.</summary>
    /// <exception cref="UsageException">Missing files, shards of different sweeps, duplicate or missing cases.</exception>
    public static SweepReport Merge(IReadOnlyList<string> dirs)
    {
        if (dirs.Count == 0) throw new UsageException("--merge needs the output folders of the shards, e.g. --merge shard-1 shard-2 --out all");
        var parts = new List<SweepReport>();
        foreach (var d in dirs)
        {
            string file = Directory.Exists(d) ? Path.Combine(d, "sweep.json") : d;
            if (!File.Exists(file)) throw new UsageException($"--merge: no sweep.json in \"{d}\" (did that shard finish?)");
            try
            {
                parts.Add(SweepFiles.Read(file));
            }
            catch (Exception e) when (e is System.Text.Json.JsonException or KeyNotFoundException or InvalidOperationException or FormatException)
            {
                throw new UsageException($"--merge: {file} is not a readable sweep.json ({e.Message})", e);
            }
        }
        var first = parts[0];
        foreach (var (p, d) in parts.Zip(dirs))
        {
            bool same = p.DesignPath == first.DesignPath && p.Accuracy == first.Accuracy && p.TotalCases == first.TotalCases
                && p.Axes.SequenceEqual(first.Axes) && p.Planar == first.Planar && p.RequiredMargin == first.RequiredMargin
                && p.FixedOverrides.Count == first.FixedOverrides.Count
                && p.FixedOverrides.All(kv => first.FixedOverrides.TryGetValue(kv.Key, out var v) && v == kv.Value);
            if (!same) throw new UsageException($"--merge: \"{d}\" belongs to a different sweep than \"{dirs[0]}\" (design, --vary, --steps, --set or --accuracy differ)");
        }
        var byIndex = new SortedDictionary<int, SweepCase>();
        foreach (var (p, d) in parts.Zip(dirs))
            foreach (var c in p.Cases)
                if (!byIndex.TryAdd(c.Index, c)) throw new UsageException($"--merge: case {c.Index} appears twice (again in \"{d}\"); give each shard once");
        var missing = Enumerable.Range(0, first.TotalCases).Where(i => !byIndex.ContainsKey(i)).ToList();
        if (missing.Count > 0)
            throw new UsageException($"--merge: {missing.Count} of {first.TotalCases} cases are missing (first: {string.Join(", ", missing.Take(5))}); run the missing shards and merge again");
        return first with { Shard = null, Cases = byIndex.Values.ToList() };
    }
}
