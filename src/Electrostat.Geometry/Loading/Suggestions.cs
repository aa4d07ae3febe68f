namespace Electrostat.Geometry.Loading;

/// <summary>Did-you-mean suggestions by edit distance (dynamic programming over prefixes).</summary>
internal static class Suggestions
{
    /// <summary>
    /// Optimal-string-alignment distance: insertions, deletions, substitutions and swaps of neighbours each cost 1
    /// (Damerau 1964 extension of Levenshtein's distance; case-insensitive), because swapped letters are a common typo.
    /// </summary>
    public static int EditDistance(string a, string b)
    {
        var d = new int[a.Length + 1, b.Length + 1];
        for (int i = 0; i <= a.Length; i++) d[i, 0] = i;
        for (int j = 0; j <= b.Length; j++) d[0, j] = j;
        for (int i = 1; i <= a.Length; i++)
        {
            for (int j = 1; j <= b.Length; j++)
            {
                char ca = char.ToLowerInvariant(a[i - 1]), cb = char.ToLowerInvariant(b[j - 1]);
                int cost = ca == cb ? 0 : 1;
                int v = Math.Min(Math.Min(d[i - 1, j] + 1, d[i, j - 1] + 1), d[i - 1, j - 1] + cost);
                if (i > 1 && j > 1 && ca == char.ToLowerInvariant(b[j - 2]) && char.ToLowerInvariant(a[i - 2]) == cb)
                    v = Math.Min(v, d[i - 2, j - 2] + 1);
                d[i, j] = v;
            }
        }
        return d[a.Length, b.Length];
    }

    /// <summary>The closest candidate within a distance of about a third of the word, or null.</summary>
    public static string? Closest(string word, IEnumerable<string> candidates)
    {
        string? best = null;
        int bestDistance = int.MaxValue;
        foreach (var c in candidates)
        {
            int d = EditDistance(word, c);
            if (d < bestDistance) { best = c; bestDistance = d; }
        }
        int allowed = Math.Max(1, (word.Length + 2) / 3);
        return bestDistance <= allowed ? best : null;
    }

    /// <summary>"did you mean 'x'?" or a list of the valid choices.</summary>
    public static string Hint(string word, IReadOnlyCollection<string> candidates)
    {
        var c = Closest(word, candidates);
        if (c is not null) return $"did you mean '{c}'?";
        return candidates.Count == 0 ? "remove it" : "expected one of: " + string.Join(", ", candidates.Select(x => $"'{x}'"));
    }
}
