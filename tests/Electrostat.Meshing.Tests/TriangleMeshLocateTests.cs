namespace Electrostat.Meshing.Tests;

public class TriangleMeshLocateTests
{
    // Unit square split along its diagonal: (0,0) (1,0) (1,1) and (0,0) (1,1) (0,1), both counter-clockwise.
    private static TriangleMesh Square() => new(
        [0, 1, 1, 0], [0, 0, 1, 1], [0, 1, 2, 0, 2, 3], [0, 0], [], []);

    [Fact]
    public void TryLocate_InteriorPoint_GivesBarycentricWeightsThatReproduceThePoint()
    {
        var mesh = Square();
        Assert.True(mesh.TryLocate(0.75, 0.25, out int t, out double l0, out double l1, out double l2));
        Assert.Equal(0, t);
        // Barycentric coordinates reproduce any linear function exactly (elementary geometry): x and y themselves.
        int a = mesh.Triangles[3 * t], b = mesh.Triangles[3 * t + 1], c = mesh.Triangles[3 * t + 2];
        Assert.Equal(0.75, l0 * mesh.X[a] + l1 * mesh.X[b] + l2 * mesh.X[c], 12);
        Assert.Equal(0.25, l0 * mesh.Y[a] + l1 * mesh.Y[b] + l2 * mesh.Y[c], 12);
        Assert.Equal(1.0, l0 + l1 + l2, 12);
    }

    [Fact]
    public void TryLocate_PointInSecondTriangle_IsFound()
    {
        Assert.True(Square().TryLocate(0.2, 0.7, out int t, out _, out _, out _));
        Assert.Equal(1, t);
    }

    [Fact]
    public void TryLocate_OutsidePoint_ReturnsFalse()
    {
        Assert.False(Square().TryLocate(1.5, 0.5, out int t, out _, out _, out _));
        Assert.Equal(-1, t);
    }
}
