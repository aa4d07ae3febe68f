using Electrostat.Fem.Problem;
using Electrostat.Fem.Solving;
using Electrostat.Fem.Tests.Support;
using static Electrostat.Fem.Tests.Support.Problems;

namespace Electrostat.Fem.Tests.Verification;

public class ClosedFormTests
{
    private static FieldSolution SolveCoax(double a, double b, int nr, int nth, double offset, double v)
    {
        var mesh = StructuredMeshes.Annulus(a, b, nr, nth, offset, geometric: true);
        var p = Make(mesh, [ConductorDefinition.Fixed("inner", v)], new() { [1] = On(0), [2] = Enclosure() });
        return new FieldSolver(p).Solve();
    }

    [Fact]
    public void CoaxialCylinders_CapacitancePerMetre()
    {
        // C' = 2πε/ln(b/a): Griffiths, Introduction to Electrodynamics, 4th ed., Problem 4.23 / Example 2.12 (coax line).
        double a = 1e-3, b = 4e-3, v = 100;
        var sol = SolveCoax(a, b, 48, 1024, 0, v);
        Assert.True(sol.Report.Converged);
        double exact = 2 * Math.PI * Eps0 / Math.Log(b / a);
        double c = sol.Conductors[0].ChargeCoulombs / v;
        Assert.True(Math.Abs(c / exact - 1) < 1e-4, $"C' = {c:E8}, exact {exact:E8}, rel {c / exact - 1:E3}");
        // Energy ½CV² agrees with the field energy (reaction charges are energy-consistent).
        Assert.Equal(1.0, 0.5 * c * v * v / sol.EnergyJoules, 8);
        // Gauss: the enclosure carries the opposite charge.
        Assert.Equal(-1.0, sol.EnclosureChargeCoulombs / sol.Conductors[0].ChargeCoulombs, 8);
    }

    [Fact]
    public void EccentricCoax_CapacitancePerMetre()
    {
        // C' = 2πε / arccosh((a² + b² − D²)/(2ab)) for a cylinder of radius a offset by D inside one of radius b
        // (Smythe, Static and Dynamic Electricity, 3rd ed., §4.13; the same result follows from the two-line-charge
        // image construction).
        double a = 1e-3, b = 4e-3, d = 1.2e-3, v = 10;
        var sol = SolveCoax(a, b, 48, 1024, d, v);
        Assert.True(sol.Report.Converged);
        double exact = 2 * Math.PI * Eps0 / Math.Acosh((a * a + b * b - d * d) / (2 * a * b));
        double c = sol.Conductors[0].ChargeCoulombs / v;
        Assert.True(Math.Abs(c / exact - 1) < 1e-4, $"C' = {c:E8}, exact {exact:E8}, rel {c / exact - 1:E3}");
    }

    [Fact]
    public void TwoDielectricLayersInSeries_FieldsAndCapacitance()
    {
        // Plates at y = 0 (0 V) and y = d1 + d2 (V), layers εr1 below y = d1 and εr2 above; the sides are symmetry
        // planes, so the field is exactly uniform in each layer: continuity of D gives
        // E_k = V/(εr_k·(d1/εr1 + d2/εr2)) and C' = ε0·w/(d1/εr1 + d2/εr2) (Griffiths §4.4.1, Problem 4.21).
        double w = 2e-3, d1 = 1e-3, d2 = 3e-3, e1 = 4.0, e2 = 1.5, v = 1000;
        var mesh = StructuredMeshes.Rectangle(0, w, 0, d1 + d2, 4, 16, region: (_, y) => y < d1 ? 1 : 2);
        var p = Make(mesh, [ConductorDefinition.Fixed("top", v)],
            new() { [StructuredMeshes.Bottom] = Enclosure(), [StructuredMeshes.Top] = On(0), [StructuredMeshes.Left] = Natural, [StructuredMeshes.Right] = Natural },
            new() { [1] = RegionMaterial.Dielectric(e1), [2] = RegionMaterial.Dielectric(e2) });
        var sol = new FieldSolver(p).Solve();
        double s = d1 / e1 + d2 / e2;
        for (int t = 0; t < mesh.TriangleCount; t++)
        {
            double expected = v / ((mesh.TriangleRegion[t] == 1 ? e1 : e2) * s);
            Assert.Equal(0, sol.FieldXVoltsPerMetre[t] / expected, 7);
            Assert.Equal(-1, sol.FieldYVoltsPerMetre[t] / expected, 7);
        }
        double c = sol.Conductors[0].ChargeCoulombs / v;
        Assert.Equal(1, c / (Eps0 * w / s), 8);
    }

    [Fact]
    public void ConcentricSpheres_Axisymmetric_CapacitanceAndPeakField()
    {
        // C = 4πε·ab/(b − a), E(a) = V·b/(a(b − a)) (Griffiths, Introduction to Electrodynamics, Example 2.11 and
        // Problem 2.47-type spherical capacitor).
        double a = 0.01, b = 0.03, v = 1000;
        var mesh = StructuredMeshes.HalfAnnulusRz(a, b, 64, 256);
        var p = Make(mesh, [ConductorDefinition.Fixed("sphere", v)], new() { [1] = On(0), [2] = Enclosure(), [3] = Natural }, symmetry: ProblemSymmetry.Axisymmetric);
        var sol = new FieldSolver(p).Solve();
        Assert.True(sol.Report.Converged);
        double exact = 4 * Math.PI * Eps0 * a * b / (b - a);
        double c = sol.Conductors[0].ChargeCoulombs / v;
        Assert.True(Math.Abs(c / exact - 1) < 2e-4, $"C = {c:E8}, exact {exact:E8}, rel {c / exact - 1:E3}");
        // The P1 field is constant per element: next to the sphere it is the secant slope of φ ∝ 1/ρ across the first
        // radial layer, i.e. the exact field at ρ = √(a(a + h)). So the element peak must match that, and the surface
        // peak V·b/(a(b − a)) to first order in h/a.
        double h = (b - a) / 64;
        double best = Enumerable.Range(0, mesh.TriangleCount).Max(sol.FieldMagnitude);
        double secant = v * a * b / ((b - a) * a * (a + h));
        Assert.True(Math.Abs(best / secant - 1) < 1e-3, $"element peak {best:E6} vs secant {secant:E6}");
        double peak = v * b / (a * (b - a));
        Assert.True(Math.Abs(best / peak - 1) < h / a, $"peak {best:E6} vs V·b/(a(b−a)) = {peak:E6}");
    }

    [Fact]
    public void RectangularTrough_MatchesFourierSeries()
    {
        // Square 0 ≤ x, y ≤ L, top at V, other sides 0: φ = (4V/π) Σ_{n odd} sin(nπx/L) sinh(nπy/L)/(n sinh(nπ))
        // (Griffiths, Introduction to Electrodynamics, §3.3.1, separation of variables in Cartesian coordinates);
        // the centre is V/4 exactly by superposing the four rotations of the problem.
        double l = 1, v = 1;
        int n = 64;
        double h = l / n;
        // The corners belong to the grounded sides; the top conductor stops one edge short of each corner, the
        // only change a mesh can make to the ideal, discontinuous corner.
        var mesh = StructuredMeshes.Rectangle(0, l, 0, l, n, n,
            sideTag: (x, _, side) => side == StructuredMeshes.Top && (x < h || x > l - h) ? 99 : side);
        var p = Make(mesh, [ConductorDefinition.Fixed("lid", v)], new()
        {
            [StructuredMeshes.Top] = On(0), [99] = Natural,
            [StructuredMeshes.Bottom] = Enclosure(), [StructuredMeshes.Left] = Enclosure(), [StructuredMeshes.Right] = Enclosure(),
        });
        var sol = new FieldSolver(p, new FieldSolverOptions { RelativeTolerance = 1e-12 }).Solve();
        static double Series(double x, double y)
        {
            double s = 0;
            for (int k = 1; k < 400; k += 2) s += Math.Sin(k * Math.PI * x) * Math.Exp(k * Math.PI * (y - 1)) * (1 - Math.Exp(-2 * k * Math.PI * y)) / (1 - Math.Exp(-2 * k * Math.PI)) / k;
            return 4 / Math.PI * s;
        }
        Assert.Equal(0.25, Series(0.5, 0.5), 10);
        foreach (var (px, py) in new[] { (0.5, 0.5), (0.25, 0.5), (0.5, 0.25), (0.75, 0.75), (0.5, 0.875) })
        {
            int node = Enumerable.Range(0, mesh.VertexCount).First(i => Math.Abs(mesh.X[i] - px) < 1e-12 && Math.Abs(mesh.Y[i] - py) < 1e-12);
            double err = Math.Abs(sol.PotentialVolts[node] - Series(px, py));
            // O(h²) interior accuracy: h² = 2.4e-4; allow a modest constant.
            Assert.True(err < 1e-3, $"φ({px}, {py}) = {sol.PotentialVolts[node]:F6}, series {Series(px, py):F6}");
        }
    }

    [Fact]
    public void FloatingPlateMidway_TakesHalfTheVoltage()
    {
        // A thin uncharged plate on the mid-plane between plates at V and 0 sits at V/2 by the antisymmetry
        // φ(x, d − y) = V − φ(x, y) of the problem (the criss-cross mesh keeps that symmetry exactly).
        double v = 10;
        var mesh = StructuredMeshes.Rectangle(0, 4, 0, 2, 16, 8,
            interiorTag: (x, y) => Math.Abs(y - 1) < 1e-9 && x > 1 && x < 3 ? 50 : -1);
        var p = Make(mesh, [ConductorDefinition.Fixed("top", v), ConductorDefinition.Floating("plate")], new()
        {
            [StructuredMeshes.Top] = On(0), [50] = On(1), [StructuredMeshes.Bottom] = Enclosure(),
            [StructuredMeshes.Left] = Natural, [StructuredMeshes.Right] = Natural,
        });
        var sol = new FieldSolver(p, new FieldSolverOptions { RelativeTolerance = 1e-12 }).Solve();
        Assert.Equal(v / 2, sol.Conductors[1].PotentialVolts, 8);
        Assert.Equal(0, sol.Conductors[1].ChargeCoulombs / sol.Conductors[0].ChargeCoulombs, 8);
    }
}
