using System.Reflection;
using Electrostat.Geometry.Loading;

namespace Electrostat.Geometry.Tests.Loading;

/// <summary>docs/design-file.md stays in step with the loader: its complete example loads, and every key the loader
/// accepts is documented.</summary>
public class DocumentationTests
{
    [Fact]
    public void CompleteExampleInFormatDocument_IsValid()
    {
        string doc = File.ReadAllText(Path.Combine(RepoPaths.Root, "docs", "design-file.md"));
        int start = doc.IndexOf("```jsonc\n", StringComparison.Ordinal);
        Assert.True(start >= 0, "no ```jsonc block in docs/design-file.md");
        start += "```jsonc\n".Length;
        int end = doc.IndexOf("```", start, StringComparison.Ordinal);
        var result = DesignLoader.LoadFromText(doc[start..end], "design-file.md example");
        Assert.False(result.HasErrors, string.Join("\n", result.Problems));
        Assert.Equal(2, result.Design!.Conductors.Count);
    }

    /// <summary>Every key and keyword list of the loader (the private <c>*Keys</c>, <c>Types</c> and <c>Symmetries</c>
    /// arrays that its unknown-key checks use), found by reflection so that a key added to the code without a line in
    /// the reference fails here.</summary>
    public static IEnumerable<(string Owner, string Key)> LoaderKeys()
    {
        var types = typeof(DesignLoader).Assembly.GetTypes().Where(t => t.Namespace == typeof(DesignLoader).Namespace);
        foreach (var t in types)
        {
            foreach (var f in t.GetFields(BindingFlags.Static | BindingFlags.NonPublic | BindingFlags.Public))
            {
                if (f.FieldType != typeof(string[]) || !(f.Name.EndsWith("Keys", StringComparison.Ordinal) || f.Name is "Types" or "Symmetries")) continue;
                foreach (string key in (string[])f.GetValue(null)!) yield return ($"{t.Name}.{f.Name}", key);
            }
        }
    }

    [Fact]
    public void EveryLoaderKey_IsDocumentedInTheFormatReference()
    {
        string doc = File.ReadAllText(Path.Combine(RepoPaths.Root, "docs", "design-file.md"));
        var keys = LoaderKeys().ToList();
        Assert.True(keys.Count > 40, $"only {keys.Count} keys found: the reflection no longer sees the loader's key lists");
        Assert.Contains(keys, k => k.Key == "open"); // the newest enclosure key, as a canary for the reflection
        var missing = keys.Where(k => k.Key != "$schema" && !doc.Contains($"`{k.Key}`", StringComparison.Ordinal)
            && !doc.Contains($"\"{k.Key}\"", StringComparison.Ordinal)).ToList();
        Assert.True(missing.Count == 0, "keys the loader accepts but docs/design-file.md never names: " + string.Join(", ", missing.Select(m => $"{m.Key} ({m.Owner})")));
    }

    [Fact]
    public void EveryLoaderKey_IsInTheSchema()
    {
        string schema = File.ReadAllText(Path.Combine(RepoPaths.Root, "docs", "design-file.schema.json"));
        var missing = LoaderKeys().Where(k => !schema.Contains($"\"{k.Key}\"", StringComparison.Ordinal)).ToList();
        Assert.True(missing.Count == 0, "keys missing from docs/design-file.schema.json: " + string.Join(", ", missing.Select(m => $"{m.Key} ({m.Owner})")));
    }
}
