using Electrostat.Fem.Problem;
using Electrostat.Fem.Solving;
using Electrostat.Meshing;
using Electrostat.Meshing.Input;
using static Electrostat.Fem.Tests.Support.Problems;

namespace Electrostat.Fem.Tests.Verification;

/// <summary>Checks on meshes made by the project's own quality mesher (not structured test meshes).</summary>
public class MesherIntegrationTests
{
    private const int CylinderA = 1, CylinderB = 2, InteriorArc = 3, ExteriorArc = 4;

    private static List<(double X, double Y)> Circle(double cx, double cy, double r, int n) =>
        Enumerable.Range(0, n).Select(k => (cx + r * Math.Cos(2 * Math.PI * k / n), cy + r * Math.Sin(2 * Math.PI * k / n))).ToList();

    [Fact]
    public void TwoParallelCylinders_InOpenSpace_PlanarKelvin()
    {
        // Two parallel cylinders of radius a, centres d apart, in open space: C' = πε0 / arccosh(d/(2a)) between them
        // (Smythe, Static and Dynamic Electricity, 3rd ed., §4.13). The open space is the planar Kelvin image of the
        // exterior of a circle (Freeman and Lowther 1989): same permittivity, matched protected arcs.
        double a = 1e-3, d = 4e-3, radius = 8e-3;
        int arcN = 96;
        var g = new PlanarGraph();
        g.AddPolygon(Circle(-d / 2, 0, a, 256), CylinderA);
        g.AddPolygon(Circle(d / 2, 0, a, 256), CylinderB);
        g.AddPolygon(Circle(0, 0, radius, arcN), InteriorArc);
        double cx = 3 * radius;
        g.AddPolygon(Circle(cx, 0, radius, arcN), ExteriorArc);
        g.AddVertex(cx, 0);
        g.AddHole(-d / 2, 0);
        g.AddHole(d / 2, 0);
        g.AddRegion(new RegionSeed(0, 2.5e-3, 0));
        g.AddRegion(new RegionSeed(cx + 0.5 * radius, 0, 1));
        var result = Mesher.Generate(g, new MeshOptions
        {
            ProtectedTags = new HashSet<int> { InteriorArc, ExteriorArc },
            SizeFunction = (x, y) => 0.8e-4 + 0.15 * Math.Max(0, Math.Min(Math.Abs(Math.Sqrt((x + d / 2) * (x + d / 2) + y * y) - a), Math.Abs(Math.Sqrt((x - d / 2) * (x - d / 2) + y * y) - a))),
        });
        var mesh = result.Mesh;
        var p = new ElectrostaticProblem
        {
            Mesh = mesh,
            Conductors = [ConductorDefinition.Fixed("A", 1), ConductorDefinition.Fixed("B", 0)],
            Materials = new Dictionary<int, RegionMaterial> { [0] = RegionMaterial.Vacuum, [1] = RegionMaterial.Vacuum },
            Boundaries = new Dictionary<int, BoundaryRole> { [CylinderA] = On(0), [CylinderB] = On(1) },
            OpenBoundary = new KelvinOpenBoundary(InteriorArc, ExteriorArc, 1, radius, 0, 0, cx, 0),
        };
        var solver = new FieldSolver(p);
        var cm = solver.ComputeCapacitanceMatrix();
        double exact = Math.PI * Eps0 / Math.Acosh(d / (2 * a));
        double mutual = cm.Mutual(0, 1);
        Assert.True(Math.Abs(mutual / exact - 1) < 2e-3, $"mutual {mutual:E6}, exact {exact:E6}, rel {mutual / exact - 1:E3}, {mesh.TriangleCount} triangles");
        // No net flux escapes a 2D open boundary with a free point at infinity: row sums vanish.
        Assert.True(Math.Abs(cm.ToEnclosure(0)) < 1e-6 * cm.Maxwell[0, 0]);
        Assert.True(cm.PassesPhysicsChecks, string.Join(" ", cm.Violations));
    }

    [Fact]
    public void IsolatedSphere_Axisymmetric_OnMesherOutput()
    {
        // C = 4πε0·a (Griffiths, Introduction to Electrodynamics, §2.5.4) on a quality mesh: half sphere of radius a
        // in the (r, z) half plane, outer arc at R = 2a, the Kelvin image half disk of radius R about (0, 3R) with
        // ε·R²/ρ'² (Freeman and Lowther 1989). Both arcs protected so their vertices match.
        double a = 0.02, radius = 0.04, zc = 3 * radius;
        const int sphere = 1, axis = 2;
        int n = 90;
        var g = new PlanarGraph();
        List<(double X, double Y)> HalfCircle(double cz, double r) =>
            Enumerable.Range(0, n + 1).Select(k =>
            {
                double al = -Math.PI / 2 + Math.PI * k / n;
                return (k == 0 || k == n ? 0.0 : r * Math.Cos(al), cz + r * Math.Sin(al));
            }).ToList();
        int Chain(List<(double X, double Y)> pts, int tag)
        {
            int first = g.AddVertex(pts[0].X, pts[0].Y), prev = first;
            for (int k = 1; k < pts.Count; k++)
            {
                int v = g.AddVertex(pts[k].X, pts[k].Y);
                g.AddSegment(prev, v, tag);
                prev = v;
            }
            return first;
        }
        // Interior: sphere arc (a), outer arc (R), and the two axis pieces between them.
        int s0 = Chain(HalfCircle(0, a), sphere);
        int o0 = Chain(HalfCircle(0, radius), InteriorArc);
        g.AddSegment(o0, s0, axis);                 // (0, −R) to (0, −a)
        g.AddSegment(s0 + n, o0 + n, axis);         // (0, a) to (0, R)
        // Exterior image half disk: arc and its axis diameter through the centre vertex.
        int e0 = Chain(HalfCircle(zc, radius), ExteriorArc);
        int centre = g.AddVertex(0, zc);
        g.AddSegment(e0, centre, axis + 10);
        g.AddSegment(centre, e0 + n, axis + 10);
        g.AddRegion(new RegionSeed(0.03, 0, 0));
        g.AddRegion(new RegionSeed(0.01, zc, 1));
        var mesh = Mesher.Generate(g, new MeshOptions
        {
            ProtectedTags = new HashSet<int> { InteriorArc, ExteriorArc },
            MaxEdgeLengthMetres = 1.5e-3,
        }).Mesh;
        var p = new ElectrostaticProblem
        {
            Mesh = mesh,
            Symmetry = ProblemSymmetry.Axisymmetric,
            Conductors = [ConductorDefinition.Fixed("sphere", 1)],
            Materials = new Dictionary<int, RegionMaterial> { [0] = RegionMaterial.Vacuum, [1] = RegionMaterial.Vacuum },
            Boundaries = new Dictionary<int, BoundaryRole> { [sphere] = On(0), [axis] = Natural, [axis + 10] = Natural },
            OpenBoundary = new KelvinOpenBoundary(InteriorArc, ExteriorArc, 1, radius, 0, 0, 0, zc),
        };
        var sol = new FieldSolver(p).Solve();
        double exact = 4 * Math.PI * Eps0 * a;
        double c = sol.Conductors[0].ChargeCoulombs;
        Assert.True(Math.Abs(c / exact - 1) < 5e-3, $"C = {c:E6}, exact {exact:E6}, rel {c / exact - 1:E3}, {mesh.TriangleCount} triangles");
    }
}
