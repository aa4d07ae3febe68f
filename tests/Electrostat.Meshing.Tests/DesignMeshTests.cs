using Electrostat.Geometry.Loading;
using Electrostat.Meshing.Designs;

namespace Electrostat.Meshing.Tests;

public class DesignMeshTests
{
    public static IEnumerable<object[]> Examples() =>
        Directory.GetFiles(RepoPaths.Geometries, "*.json", SearchOption.AllDirectories)
            .Select(f => Path.GetRelativePath(RepoPaths.Geometries, f))
            .Where(f => !f.StartsWith("invalid", StringComparison.Ordinal))
            .Order(StringComparer.Ordinal)
            .Select(f => new object[] { f });

    [Theory]
    [MemberData(nameof(Examples))]
    public void Example_MeshesValidatesAndMeetsBound(string file)
    {
        var load = DesignLoader.Load(Path.Combine(RepoPaths.Geometries, file));
        Assert.False(load.HasErrors, string.Join("; ", load.Errors));
        var design = load.Design!;
        var (input, result) = DesignMesher.Generate(design, new MeshOptions { MaxEdgeLengthMetres = design.Bounds.Diagonal / 40 });
        var report = input.Validate(result);
        Assert.True(report.IsValid, report.ToString());
        // Only genuine small input angles, and in open space the protected truncation circles (never split), may leave
        // triangles below the bound.
        Assert.All(result.SkippedTriangles, s => Assert.True(s.Reason == Output.SkipCause.SmallInputAngle
            || (input.OpenSpace is not null && s.Reason == Output.SkipCause.ProtectedSegment), $"{s.Reason}"));
        // Every conductor that borders the domain has a tag, and every tag is used by some mesh edge.
        var used = result.Mesh.SegmentTag.ToHashSet();
        Assert.All(input.Tags.Tags, t => Assert.Contains(t.Tag, used));
        Assert.Contains(input.Tags.Tags, t => t.Kind == BoundaryKind.Conductor);
        // Region attributes used by triangles all have a meaning (the open-space image disc is the only extra one).
        var attrs = input.Regions.Select(r => r.Attribute).ToHashSet();
        if (input.OpenSpace is { } open) attrs.Add(open.ImageRegion);
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

public class OpenSpaceMeshTests
{
    private const string LinePair = """
    {
      "units": "mm", "symmetry": "planar", "enclosure": { "open": true, "margin": 10 },
      "conductors": [
        { "name": "a", "potential": 1, "shape": { "type": "circle", "center": [-5, 0], "radius": 1 } },
        { "name": "b", "potential": 0, "shape": { "type": "circle", "center": [5, 0], "radius": 1 } } ]
    }
    """;

    private const string Ball = """
    {
      "units": "mm", "symmetry": "axisymmetric", "enclosure": { "open": true, "radius": 30 },
      "conductors": [ { "name": "ball", "potential": 1,
        "shape": { "type": "path", "start": [0, -10], "segments": [ { "arc_center": [0, 0], "sweep": 180 } ] } } ]
    }
    """;

    /// <summary>Vertices on a circle of radius r about (cx, cy), as angles in ascending order.</summary>
    private static double[] AnglesOn(TriangleMesh m, double cx, double cy, double r)
    {
        var list = new List<double>();
        for (int v = 0; v < m.VertexCount; v++)
        {
            double d = Math.Sqrt((m.X[v] - cx) * (m.X[v] - cx) + (m.Y[v] - cy) * (m.Y[v] - cy));
            if (Math.Abs(d - r) < 1e-9 * r) list.Add(Math.Atan2(m.Y[v] - cy, m.X[v] - cx));
        }
        list.Sort();
        return list.ToArray();
    }

    [Theory]
    [InlineData(LinePair, 64)]
    [InlineData(Ball, 33)]
    public void TruncationCircleAndImage_CarryTheSameVertices_EvenAfterRefinement(string text, int circleVertices)
    {
        var design = DesignLoader.LoadFromText(text).Design!;
        var (input, mesh) = DesignMesher.Create(design);
        var open = Assert.IsType<OpenSpaceImage>(input.OpenSpace);
        Assert.DoesNotContain(input.Regions, r => r.Attribute == open.ImageRegion);
        // Refine every triangle touching either circle: protected segments must not be split.
        var before = mesh.Export().Mesh;
        var near = Enumerable.Range(0, before.TriangleCount).Where(t => Enumerable.Range(0, 3).Any(i =>
        {
            int v = before.Triangles[3 * t + i];
            double d1 = Math.Sqrt((before.X[v] - open.CenterX) * (before.X[v] - open.CenterX) + (before.Y[v] - open.CenterY) * (before.Y[v] - open.CenterY));
            double d2 = Math.Sqrt((before.X[v] - open.ImageCenterX) * (before.X[v] - open.ImageCenterX) + (before.Y[v] - open.ImageCenterY) * (before.Y[v] - open.ImageCenterY));
            return Math.Abs(d1 - open.RadiusMetres) < 1e-9 || Math.Abs(d2 - open.RadiusMetres) < 1e-9;
        })).ToList();
        mesh.RefineTriangles(near);
        var result = mesh.Export();
        Assert.True(input.Validate(result).IsValid, input.Validate(result).ToString());
        var m = result.Mesh;
        Assert.True(m.TriangleCount > before.TriangleCount);
        var inner = AnglesOn(m, open.CenterX, open.CenterY, open.RadiusMetres);
        var image = AnglesOn(m, open.ImageCenterX, open.ImageCenterY, open.RadiusMetres);
        // 64 chords per full turn (a half circle has 32 chords, 33 vertices).
        Assert.Equal(circleVertices, inner.Length);
        Assert.Equal(inner.Length, image.Length);
        for (int k = 0; k < inner.Length; k++) Assert.Equal(inner[k], image[k], 1e-12);
        // The image centre (the point at infinity) is a vertex, and the image disc's area is that of its chord polygon.
        Assert.Contains(Enumerable.Range(0, m.VertexCount), v => Math.Abs(m.X[v] - open.ImageCenterX) + Math.Abs(m.Y[v] - open.ImageCenterY) < 1e-12);
        // 64 (or 32 for the half disc) isosceles triangles of apex angle 2π/64 from the centre.
        double polygon = 0.5 * (circleVertices == 64 ? 64 : 32) * open.RadiusMetres * open.RadiusMetres * Math.Sin(2 * Math.PI / 64);
        double area = Enumerable.Range(0, m.TriangleCount).Where(t => m.TriangleRegion[t] == open.ImageRegion).Sum(t =>
        {
            int a = m.Triangles[3 * t], b = m.Triangles[3 * t + 1], c = m.Triangles[3 * t + 2];
            return 0.5 * Math.Abs((m.X[b] - m.X[a]) * (m.Y[c] - m.Y[a]) - (m.X[c] - m.X[a]) * (m.Y[b] - m.Y[a]));
        });
        Assert.Equal(polygon, area, polygon * 1e-9);
    }
}
