using Electrostat.Meshing.Input;
using Electrostat.Meshing.Output;

namespace Electrostat.Meshing.Tests;

public class MesherTests
{
    [Fact]
    public void Square_NoOptions_ValidAndQuality()
    {
        var g = new PlanarGraph();
        g.AddPolygon(TestGraphs.Rect(0, 0, 2, 1), 7);
        g.AddRegion(new RegionSeed(1, 0.5, 3));
        var r = Mesher.Generate(g, new MeshOptions { MaxEdgeLengthMetres = 0.1 });
        var rep = r.Validate(new Dictionary<int, double> { [3] = 2.0 });
        Assert.True(rep.IsValid, rep.ToString());
        Assert.True(r.Quality.MinAngleDegrees >= 28, $"min angle {r.Quality.MinAngleDegrees}");
        Assert.All(r.Mesh.TriangleRegion, a => Assert.Equal(3, a));
        Assert.All(r.Mesh.SegmentTag, a => Assert.Equal(7, a));
        Assert.Empty(r.SkippedTriangles);
        // Longest edge bound: every edge ≤ 0.1 m.
        var m = r.Mesh;
        for (int t = 0; t < m.TriangleCount; t++)
            for (int k = 0; k < 3; k++)
            {
                int a = m.Triangles[3 * t + k], b = m.Triangles[3 * t + (k + 1) % 3];
                Assert.True(Math.Sqrt(Math.Pow(m.X[a] - m.X[b], 2) + Math.Pow(m.Y[a] - m.Y[b], 2)) <= 0.1 * (1 + 1e-12), $"edge {Math.Sqrt(Math.Pow(m.X[a] - m.X[b], 2) + Math.Pow(m.Y[a] - m.Y[b], 2))} at ({m.X[a]},{m.Y[a]})-({m.X[b]},{m.Y[b]}) n={m.TriangleCount}");
            }
    }

    [Fact]
    public void SquareWithHole_ValidAreaAndBound()
    {
        var g = TestGraphs.SquareWithHole();
        var r = Mesher.Generate(g, new MeshOptions { MaxEdgeLengthMetres = 0.05 });
        double hole = TestGraphs.PolygonArea(TestGraphs.Circle(0.5, 0.5, 0.2, 40));
        var rep = r.Validate(new Dictionary<int, double> { [1] = 1 - hole });
        Assert.True(rep.IsValid, rep.ToString());
        Assert.True(r.Quality.MinAngleDegrees >= 28, $"min angle {r.Quality.MinAngleDegrees}");
    }
}
