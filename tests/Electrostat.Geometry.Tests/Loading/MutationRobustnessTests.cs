using Electrostat.Geometry.Loading;

namespace Electrostat.Geometry.Tests.Loading;

/// <summary>
/// Randomly damaged designs must always come back as problems, never as an exception: a user must never see a
/// stack trace. Each case damages an example by replacing one JSON value or deleting a span of characters.
/// </summary>
public class MutationRobustnessTests
{
    private static readonly string[] Replacements =
    [
        "0", "-1", "1e300", "-1e-300", "NaN", "null", "true", "[]", "{}", "\"\"", "\"x\"", "\"1/0\"", "\"1 kV\"", "\"1 mm\"",
        "[0]", "[0, 0, 0]", "{\"type\": \"circle\"}", "\"-gap\"", "\"(\"", "\"2^2000\"", "1e-12", "\"1e-300 m\"",
    ];

    public static TheoryData<string> Examples() =>
        new(Directory.EnumerateFiles(RepoPaths.Geometries, "*.json", SearchOption.AllDirectories).Select(p => Path.GetRelativePath(RepoPaths.Geometries, p)).Order(StringComparer.Ordinal));

    [Theory]
    [MemberData(nameof(Examples))]
    public void DamagedDesign_NeverThrows(string file)
    {
        string text = File.ReadAllText(Path.Combine(RepoPaths.Geometries, file));
        var rng = new Random(file.Length * 7919 + 17);
        var valueStarts = Enumerable.Range(0, text.Length).Where(i => i > 0 && text[i - 1] == ' ' && text[i] != ' ' && (text[i - 2] == ':' || text[i - 2] == ',' || text[i - 2] == '[')).ToArray();
        for (int trial = 0; trial < 40; trial++)
        {
            string damaged;
            if (trial % 3 == 2)
            {
                int at = rng.Next(text.Length);
                damaged = text.Remove(at, Math.Min(rng.Next(1, 12), text.Length - at));
            }
            else
            {
                int at = valueStarts[rng.Next(valueStarts.Length)];
                int end = at;
                int depth = 0;
                // Replace one whole value: a string, a number or a bracketed value.
                if (text[at] == '"') { end = text.IndexOf('"', at + 1) + 1; }
                else if (text[at] is '[' or '{')
                {
                    for (end = at; end < text.Length; end++)
                    {
                        if (text[end] is '[' or '{') depth++;
                        else if (text[end] is ']' or '}') { depth--; if (depth == 0) { end++; break; } }
                    }
                }
                else { while (end < text.Length && text[end] is not (',' or ' ' or ']' or '}' or '\n')) end++; }
                damaged = string.Concat(text.AsSpan(0, at), Replacements[rng.Next(Replacements.Length)], text.AsSpan(end));
            }
            var result = DesignLoader.LoadFromText(damaged, "damaged.json");
            Assert.True(result.Design is not null || result.HasErrors, "a design without errors must be returned");
            if (result.Design is not null) _ = result.Design.Regions.DomainAreaSquareMetres;
        }
    }
}
