using Electrostat.Meshing.Input;

namespace Electrostat.Meshing.Tests;

public class InputValidationTests
{
    [Fact]
    public void DuplicatePoint_NamesCoordinate()
    {
        var g = new PlanarGraph();
        g.AddPolygon(TestGraphs.Rect(0, 0, 1, 1), 1);
        g.AddVertex(1, 1);
        var ex = Assert.Throws<MeshInputException>(() => Mesher.Generate(g));
        Assert.Contains("Duplicate vertex at (1, 1)", ex.Message);
    }

    [Fact]
    public void CrossingSegments_NameCrossingPoint()
    {
        var g = new PlanarGraph();
        g.AddPolygon(TestGraphs.Rect(0, 0, 1, 1), 1);
        g.AddPolygon(TestGraphs.Rect(0.5, 0.5, 1.5, 0.7), 2);
        var ex = Assert.Throws<MeshInputException>(() => Mesher.Generate(g));
        Assert.Contains("cross at about (1, 0.5", ex.Message);
    }

    [Fact]
    public void ZeroLengthSegment_Rejected()
    {
        var g = new PlanarGraph();
        int a = g.AddVertex(0.25, 0.5);
        g.AddSegment(a, a, 1);
        var ex = Assert.Throws<MeshInputException>(() => Mesher.Generate(g));
        Assert.Contains("Zero-length segment at (0.25, 0.5)", ex.Message);
    }

    [Fact]
    public void VertexInsideSegment_Rejected()
    {
        var g = new PlanarGraph();
        g.AddPolygon(TestGraphs.Rect(0, 0, 1, 1), 1);
        int a = g.AddVertex(0.5, 0);
        int b = g.AddVertex(0.5, 0.5);
        g.AddSegment(a, b, 2);
        var ex = Assert.Throws<MeshInputException>(() => Mesher.Generate(g));
        Assert.Contains("(0.5, 0)", ex.Message);
        Assert.Contains("split the segment", ex.Message);
    }

    [Fact]
    public void OpenOutline_Rejected()
    {
        var g = new PlanarGraph();
        var p = TestGraphs.Rect(0, 0, 1, 1);
        for (int i = 0; i < 4; i++) g.AddVertex(p[i].X, p[i].Y);
        g.AddSegment(0, 1, 1); g.AddSegment(1, 2, 1); g.AddSegment(2, 3, 1);
        var ex = Assert.Throws<MeshInputException>(() => Mesher.Generate(g));
        Assert.Contains("closed", ex.Message);
    }

    [Fact]
    public void SeedOnSegment_Rejected()
    {
        var g = new PlanarGraph();
        g.AddPolygon(TestGraphs.Rect(0, 0, 1, 1), 1);
        g.AddRegion(new RegionSeed(0.5, 0, 1));
        var ex = Assert.Throws<MeshInputException>(() => Mesher.Generate(g));
        Assert.Contains("on a segment", ex.Message);
    }
}
