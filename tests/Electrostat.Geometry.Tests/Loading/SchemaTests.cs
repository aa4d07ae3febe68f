using Newtonsoft.Json.Linq;
using NJsonSchema;

namespace Electrostat.Geometry.Tests.Loading;

/// <summary>The JSON Schema (docs/design-file.schema.json) accepts every example and rejects malformed keys.</summary>
public class SchemaTests
{
    private static readonly string SchemaPath = Path.Combine(RepoPaths.Root, "docs", "design-file.schema.json");

    private static JToken Parse(string text) =>
        JToken.Parse(text, new JsonLoadSettings { CommentHandling = CommentHandling.Ignore });

    public static TheoryData<string> Examples() => new(RepoPaths.ExampleDesigns().Select(p => Path.GetRelativePath(RepoPaths.Geometries, p)));

    [Theory]
    [MemberData(nameof(Examples))]
    public async Task Example_ValidatesAgainstSchemaAndReferencesIt(string file)
    {
        var schema = await JsonSchema.FromFileAsync(SchemaPath);
        string text = await File.ReadAllTextAsync(Path.Combine(RepoPaths.Geometries, file));
        var json = Parse(text);
        var errors = schema.Validate(json);
        Assert.True(errors.Count == 0, string.Join("\n", errors.Select(e => $"{e.Path}: {e.Kind}")));
        string expected = Path.GetRelativePath(Path.GetDirectoryName(Path.Combine(RepoPaths.Geometries, file))!, SchemaPath).Replace('\\', '/');
        Assert.Equal(expected, (string?)json["$schema"]);
        Assert.StartsWith("//", text, StringComparison.Ordinal); // every example opens with a comment header
    }

    [Fact]
    public async Task BaseDesignOfMalformedTable_Validates()
    {
        var schema = await JsonSchema.FromFileAsync(SchemaPath);
        Assert.Empty(schema.Validate(Parse(DesignTexts.Base)));
    }

    [Theory]
    [InlineData("\"potential\": \"10 kV\"", "\"potental\": \"10 kV\"")] // unknown key
    [InlineData("\"type\": \"circle\"", "\"type\": \"circel\"")] // unknown shape type
    [InlineData("\"symmetry\": \"planar\"", "\"symmetry\": \"flat\"")]
    [InlineData("\"radius\": 5", "\"radius\": [5]")]
    public async Task MalformedDesign_IsRejectedBySchema(string old, string replacement)
    {
        var schema = await JsonSchema.FromFileAsync(SchemaPath);
        Assert.NotEmpty(schema.Validate(Parse(DesignTexts.With((old, replacement)))));
    }
}
