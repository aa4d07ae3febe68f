using Electrostat.Fem.Problem;
using Electrostat.Meshing;
using Electrostat.Meshing.Input;

namespace Electrostat.Bench;

/// <summary>
/// A "solve" suite design meshed by the project's own mesher (mesh time not counted): a 20 mm × 10 mm grounded box,
/// a dielectric slab (εr = 3.8) over its lower 3 mm, and two round electrodes (radius 1.5 mm, at +500 V and −500 V)
/// above it. <paramref name="maxEdgeMetres"/> sets the element size everywhere.
/// </summary>
internal static class SolveBenchMeshedProblem
{
    public static ElectrostaticProblem Create(double maxEdgeMetres)
    {
        const int box = 1, slabTop = 2, electrodeA = 3, electrodeB = 4;
        var g = new PlanarGraph();
        int v0 = g.AddVertex(0, 0), v1 = g.AddVertex(0.02, 0), v2 = g.AddVertex(0.02, 0.003), v3 = g.AddVertex(0.02, 0.01);
        int v4 = g.AddVertex(0, 0.01), v5 = g.AddVertex(0, 0.003);
        g.AddSegment(v0, v1, box);
        g.AddSegment(v1, v2, box);
        g.AddSegment(v2, v3, box);
        g.AddSegment(v3, v4, box);
        g.AddSegment(v4, v5, box);
        g.AddSegment(v5, v0, box);
        g.AddSegment(v5, v2, slabTop);
        g.AddPolygon(Circle(0.006, 0.0065, 0.0015, 180), electrodeA);
        g.AddPolygon(Circle(0.014, 0.0065, 0.0015, 180), electrodeB);
        g.AddHole(0.006, 0.0065);
        g.AddHole(0.014, 0.0065);
        g.AddRegion(new RegionSeed(0.01, 0.0015, 1));
        g.AddRegion(new RegionSeed(0.01, 0.009, 2));
        var mesh = Mesher.Generate(g, new MeshOptions { MaxEdgeLengthMetres = maxEdgeMetres }).Mesh;
        return new ElectrostaticProblem
        {
            Mesh = mesh,
            Conductors = [ConductorDefinition.Fixed("A", 500), ConductorDefinition.Fixed("B", -500)],
            Materials = new Dictionary<int, RegionMaterial> { [1] = RegionMaterial.Dielectric(3.8), [2] = RegionMaterial.Vacuum },
            Boundaries = new Dictionary<int, BoundaryRole>
            {
                [box] = new EnclosureBoundary(), [slabTop] = new NaturalBoundary(),
                [electrodeA] = new ConductorBoundary(0), [electrodeB] = new ConductorBoundary(1),
            },
        };
    }

    private static List<(double X, double Y)> Circle(double cx, double cy, double r, int n) =>
        Enumerable.Range(0, n).Select(k => (cx + r * Math.Cos(2 * Math.PI * k / n), cy + r * Math.Sin(2 * Math.PI * k / n))).ToList();
}
