using Electrostat.Fem.Elements;
using Electrostat.Fem.Problem;
using Electrostat.Fem.Solving;
using Electrostat.Fem.Tests.Support;
using static Electrostat.Fem.Tests.Support.Problems;

namespace Electrostat.Fem.Tests.Verification;

public class ConvergenceTests
{
    [Fact]
    public void Coax_CapacitanceConvergesAsHSquared_EnergyNormAsH()
    {
        // A priori P1 estimates (Ciarlet, The Finite Element Method for Elliptic Problems, 1978, Thm 3.2.2; Strang and
        // Fix 1973, §3.4): the energy-norm error is O(h) and the energy (hence capacitance) error O(h²); halving h
        // divides them by about 2 and 4. Measured on the coax, whose exact potential is V·ln(b/r)/ln(b/a).
        double a = 1.0, b = 3.0, v = 1.0;
        double exactC = 2 * Math.PI * Eps0 / Math.Log(b / a);
        var cErr = new List<double>();
        var eErr = new List<double>();
        foreach (int n in new[] { 6, 12, 24, 48 })
        {
            var mesh = StructuredMeshes.Annulus(a, b, n, 4 * n);
            var p = Make(mesh, [ConductorDefinition.Fixed("inner", v)], new() { [1] = On(0), [2] = Enclosure() });
            var sol = new FieldSolver(p, new FieldSolverOptions { RelativeTolerance = 1e-12 }).Solve();
            cErr.Add(Math.Abs(sol.Conductors[0].ChargeCoulombs / v - exactC) / exactC);
            // ‖∇(u − u_h)‖² integrated with the 7-point rule; ∇u = −V/(ln(b/a)·r²)·(x, y).
            double e2 = 0;
            for (int t = 0; t < mesh.TriangleCount; t++)
            {
                int i0 = mesh.Triangles[3 * t], i1 = mesh.Triangles[3 * t + 1], i2 = mesh.Triangles[3 * t + 2];
                double gx = -sol.FieldXVoltsPerMetre[t], gy = -sol.FieldYVoltsPerMetre[t];
                e2 += KelvinWeight.Rule7((x, y) =>
                {
                    double s = -v / (Math.Log(b / a) * (x * x + y * y));
                    double dx = s * x - gx, dy = s * y - gy;
                    return dx * dx + dy * dy;
                }, mesh.X[i0], mesh.Y[i0], mesh.X[i1], mesh.Y[i1], mesh.X[i2], mesh.Y[i2]);
            }
            eErr.Add(Math.Sqrt(e2));
        }
        for (int k = 1; k < cErr.Count; k++)
        {
            double rc = cErr[k - 1] / cErr[k], re = eErr[k - 1] / eErr[k];
            Assert.InRange(rc, 3.5, 4.5);
            Assert.InRange(re, 1.8, 2.2);
        }
    }

    [Fact]
    public void Iterations_StayNearlyFlatUnderRefinement()
    {
        // Multigrid preconditioning gives h-independent CG iteration counts (Trottenberg, Oosterlee and Schüller,
        // Multigrid, 2001, ch. 1): refining the trough 8× must not multiply the iterations.
        var its = new List<int>();
        foreach (int n in new[] { 32, 64, 128, 256 })
        {
            var mesh = StructuredMeshes.Rectangle(0, 1, 0, 1, n, n, crissCross: false);
            var p = Make(mesh, [ConductorDefinition.Fixed("lid", 1)], new()
            {
                [StructuredMeshes.Top] = On(0), [StructuredMeshes.Bottom] = Enclosure(),
                [StructuredMeshes.Left] = Natural, [StructuredMeshes.Right] = Natural,
            });
            var sol = new FieldSolver(p).Solve();
            Assert.True(sol.Report.Converged);
            its.Add(sol.Report.Iterations);
        }
        Assert.True(its[^1] <= its[0] + 6 && its[^1] <= 20, $"iterations {string.Join(", ", its)}");
    }
}
