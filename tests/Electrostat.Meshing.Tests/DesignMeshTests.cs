using Electrostat.Geometry.Loading;
using Electrostat.Meshing.Designs;

namespace Electrostat.Meshing.Tests;

public class DesignMeshTests
{
    private static string GeometriesFolder()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !Directory.Exists(Path.Combine(dir.FullName, "geometries"))) dir = dir.Parent;
        Assert.NotNull(dir);
        return Path.Combine(dir!.FullName, "geometries");
    }

    public static IEnumerable<object[]> Examples() =>
        Directory.GetFiles(GeometriesFolder(), "*.json", SearchOption.AllDirectories)
            .Select(f => Path.GetRelativePath(GeometriesFolder(), f))
            .Where(f => !f.StartsWith("invalid", StringComparison.Ordinal))
            .Order(StringComparer.Ordinal)
            .Select(f => new object[] { f });

    [Theory]
    [MemberData(nameof(Examples))]
    public void Example_MeshesValidatesAndMeetsBound(string file)
    {
        var load = DesignLoader.Load(Path.Combine(GeometriesFolder(), file));
        Assert.False(load.HasErrors, string.Join("; ", load.Errors));
        var design = load.Design!;
        var (input, result) = DesignMesher.Generate(design, new MeshOptions { MaxEdgeLengthMetres = design.Bounds.Diagonal / 40 });
        var report = input.Validate(result);
        Assert.True(report.IsValid, report.ToString());
        Assert.All(result.SkippedTriangles, s => Assert.Equal(Output.SkipCause.SmallInputAngle, s.Reason));
        // Every conductor that borders the domain has a tag, and every tag is used by some mesh edge.
        var used = result.Mesh.SegmentTag.ToHashSet();
        Assert.All(input.Tags.Tags, t => Assert.Contains(t.Tag, used));
        Assert.Contains(input.Tags.Tags, t => t.Kind == BoundaryKind.Conductor);
        // Region attributes used by triangles all have a meaning.
        var attrs = input.Regions.Select(r => r.Attribute).ToHashSet();
        Assert.All(result.Mesh.TriangleRegion.Distinct(), a => Assert.Contains(a, attrs));
    }
}
