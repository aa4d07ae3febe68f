using Electrostat.Analysis.Adaptivity;
using Electrostat.Meshing.Designs;

namespace Electrostat.Analysis.Tests.Adaptivity;

public class WarmStartTests
{
    [Fact]
    public void LinearPotential_IsCarriedExactlyToTheRefinedMesh()
    {
        // P1 interpolation reproduces linear functions exactly, so φ = 3x − 2y + 1 must survive refinement unchanged
        // (up to round-off) at every new vertex.
        var design = AdaptiveTestSupport.Load("geometries/validation/layered-plate-capacitor.json");
        var (_, mesh) = DesignMesher.Create(design);
        var before = mesh.Export().Mesh;
        var phi = Enumerable.Range(0, before.VertexCount).Select(i => 3 * before.X[i] - 2 * before.Y[i] + 1).ToArray();
        mesh.RefineTriangles(Enumerable.Range(0, before.TriangleCount).Where(t => t % 2 == 0).ToArray());
        var after = mesh.Export().Mesh;
        Assert.True(after.VertexCount > before.VertexCount);
        var carried = WarmStart.Interpolate(before, phi, after);
        for (int i = 0; i < after.VertexCount; i++)
        {
            Assert.Equal(3 * after.X[i] - 2 * after.Y[i] + 1, carried[i], 9);
        }
    }
}
