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

public class DesignCurveCuttingTests
{
    private const string FilletDesign = """
    {
      "units": "mm",
      "symmetry": "planar",
      "enclosure": { "shape": { "type": "rectangle", "min": [-100, -60], "max": [100, 60] }, "potential": 0 },
      "conductors": [
        { "name": "bar", "potential": "1 kV",
          "shape": { "type": "rectangle", "center": [0, 0], "width": 100, "height": 20, "corner_radius": 0.2 } }
      ]
    }
    """;

    [Fact]
    public void SmallFilletOnLargePart_GetsSeveralChordsWithinTolerance()
    {
        var load = Electrostat.Geometry.Loading.DesignLoader.LoadFromText(FilletDesign);
        Assert.False(load.HasErrors, string.Join("; ", load.Errors));
        var design = load.Design!;
        var input = DesignGraphBuilder.Build(design, new MeshOptions { MaxEdgeLengthMetres = 0.01 });
        // Graph vertices within 0.2 mm of the fillet centre (49.8, 9.8) mm lie on the top-right fillet.
        var g = input.Graph;
        int onFillet = Enumerable.Range(0, g.VertexCount).Count(v =>
            Math.Abs(Math.Sqrt(Math.Pow(g.X[v] - 0.0498, 2) + Math.Pow(g.Y[v] - 0.0098, 2)) - 0.0002) < 1e-9);
        // Quarter arc with chords of at most 15°: at least 6 chords, so at least 7 vertices.
        Assert.True(onFillet >= 7, $"only {onFillet} vertices on the fillet");
        var result = Mesher.Generate(input.Graph, new MeshOptions { MaxEdgeLengthMetres = 0.01 });
        var report = input.Validate(result);
        Assert.True(report.IsValid, report.ToString());
        Assert.True(result.Quality.MinAngleDegrees >= 28);
        // The conductor surface is tagged as conductor 0, the box as enclosure.
        Assert.Equal(BoundaryKind.Conductor, input.Tags[input.Tags.ConductorTag(0)!.Value].Kind);
        Assert.Single(input.Tags.OfKind(BoundaryKind.Enclosure));

        // Provenance: every vertex of a conductor-tagged edge traces back to conductor 0 (a Steiner point through its
        // input segment, a corner through its input vertex); interior vertices trace to nothing.
        var m = result.Mesh;
        int conductorTag = input.Tags.ConductorTag(0)!.Value;
        var onConductor = new HashSet<int>();
        for (int s = 0; s < m.SegmentCount; s++)
            if (m.SegmentTag[s] == conductorTag) { onConductor.Add(m.SegmentVertices[2 * s]); onConductor.Add(m.SegmentVertices[2 * s + 1]); }
        Assert.All(onConductor, v => Assert.Equal(SourceEntity.Conductor, input.SourceOfVertex(result, v)!.Value.Entity));
        var boundary = new HashSet<int>(m.SegmentVertices);
        Assert.All(Enumerable.Range(0, m.VertexCount).Where(v => !boundary.Contains(v)), v => Assert.Null(input.SourceOfVertex(result, v)));
    }
}
