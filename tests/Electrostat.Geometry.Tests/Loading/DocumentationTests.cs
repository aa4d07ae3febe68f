using Electrostat.Geometry.Loading;

namespace Electrostat.Geometry.Tests.Loading;

/// <summary>The complete example in docs/design-file.md must stay a valid design.</summary>
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
}
