namespace Electrostat.Geometry.Loading;

/// <summary>Did-you-mean suggestions by Levenshtein edit distance (Levenshtein 1966, dynamic programming over prefixes).</summary>
internal static class Suggestions
{
    public static int EditDistance(string a, string b)
    {
        var prev = new int[b.Length + 1];
        var cur = new int[b.Length + 1];
        for (int j = 0; j <= b.Length; j++) prev[j] = j;
        for (int i = 1; i <= a.Length; i++)
        {
            cur[0] = i;
            for (int j = 1; j <= b.Length; j++)
            {
                int cost = char.ToLowerInvariant(a[i - 1]) == char.ToLowerInvariant(b[j - 1]) ? 0 : 1;
                cur[j] = Math.Min(Math.Min(cur[j - 1] + 1, prev[j] + 1), prev[j - 1] + cost);
            }
            (prev, cur) = (cur, prev);
        }
        return prev[b.Length];
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
