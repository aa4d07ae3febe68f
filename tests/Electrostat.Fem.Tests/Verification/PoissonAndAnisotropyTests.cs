using Electrostat.Fem.Problem;
using Electrostat.Fem.Solving;
using Electrostat.Fem.Tests.Support;
using static Electrostat.Fem.Tests.Support.Problems;

namespace Electrostat.Fem.Tests.Verification;

public class PoissonAndAnisotropyTests
{
    [Fact]
    public void UniformChargeBetweenGroundedCylinders_Planar()
    {
        // −ε∇²φ = ρ in a ≤ r ≤ b with φ(a) = φ(b) = 0 has φ = −ρr²/(4ε) + A ln r + B (the radial Poisson equation,
        // Jackson, Classical Electrodynamics, 3rd ed., §1.7); Gauss's law makes the charges induced on the two
        // conductors add up to −ρ·π(b² − a²) per metre.
        double a = 0.01, b = 0.03, rho = 1e-6, eps = Eps0 * 2.0;
        var mesh = StructuredMeshes.Annulus(a, b, 48, 256);
        var p = Make(mesh, [ConductorDefinition.Fixed("inner", 0)], new() { [1] = On(0), [2] = Enclosure() },
            new() { [0] = new RegionMaterial(PermittivityTensor.Isotropic(2.0), rho) });
        var sol = new FieldSolver(p).Solve();
        double k = -rho / (4 * eps);
        double aa = -k * (b * b - a * a) / Math.Log(b / a);
        double bb = -k * a * a - aa * Math.Log(a);
        double peak = 0, worst = 0;
        for (int i = 0; i < mesh.VertexCount; i++)
        {
            double r = Math.Sqrt(mesh.X[i] * mesh.X[i] + mesh.Y[i] * mesh.Y[i]);
            double exact = k * r * r + aa * Math.Log(r) + bb;
            peak = Math.Max(peak, Math.Abs(exact));
            worst = Math.Max(worst, Math.Abs(sol.PotentialVolts[i] - exact));
        }
        Assert.True(worst < 2e-3 * peak, $"worst {worst:E3} V of peak {peak:E3} V");
        double total = sol.Conductors[0].ChargeCoulombs + sol.EnclosureChargeCoulombs;
        double free = rho * Math.PI * (b * b - a * a);
        Assert.True(Math.Abs(total / -free - 1) < 2e-3, $"induced {total:E6} vs −ρ·area {-free:E6}");
    }

    [Fact]
    public void UniformChargeBetweenGroundedSpheres_Axisymmetric()
    {
        // −ε∇²φ = ρ in a ≤ ρ ≤ b (spherical shell), φ = 0 on both spheres: φ = −ρρ²/(6ε) + A/ρ + B (Jackson §1.7);
        // the induced charges add up to −ρ·(4π/3)(b³ − a³). Exercises the exact axisymmetric load vector.
        double a = 0.01, b = 0.02, rho = 1e-6;
        var mesh = StructuredMeshes.HalfAnnulusRz(a, b, 32, 128);
        var p = Make(mesh, [ConductorDefinition.Fixed("inner", 0)], new() { [1] = On(0), [2] = Enclosure(), [3] = Natural },
            new() { [0] = new RegionMaterial(PermittivityTensor.Isotropic(1.0), rho) }, ProblemSymmetry.Axisymmetric);
        var sol = new FieldSolver(p).Solve();
        double k = -rho / (6 * Eps0);
        // φ(a) = φ(b) = 0: k a² + A/a + B = 0, k b² + A/b + B = 0.
        double aa = k * (b * b - a * a) / (1 / a - 1 / b);
        double bb = -k * a * a - aa / a;
        double peak = 0, worst = 0;
        for (int i = 0; i < mesh.VertexCount; i++)
        {
            double r = Math.Sqrt(mesh.X[i] * mesh.X[i] + mesh.Y[i] * mesh.Y[i]);
            double exact = k * r * r + aa / r + bb;
            peak = Math.Max(peak, Math.Abs(exact));
            worst = Math.Max(worst, Math.Abs(sol.PotentialVolts[i] - exact));
        }
        Assert.True(worst < 3e-3 * peak, $"worst {worst:E3} V of peak {peak:E3} V");
        double total = sol.Conductors[0].ChargeCoulombs + sol.EnclosureChargeCoulombs;
        double free = rho * 4 * Math.PI / 3 * (b * b * b - a * a * a);
        Assert.True(Math.Abs(total / -free - 1) < 3e-3, $"induced {total:E6} vs −ρ·volume {-free:E6}");
    }

    [Fact]
    public void DiagonalTensor_OnlyTheNormalPermittivityMatters()
    {
        // Between parallel plates (symmetry planes at the sides) the field is normal to the plates, so with
        // ε = diag(εxx, εyy) the capacitance is ε0·εyy·w/d whatever εxx is (D = ε·E componentwise).
        double w = 2e-3, d = 1e-3, v = 5;
        var mesh = StructuredMeshes.Rectangle(0, w, 0, d, 6, 4, crissCross: false);
        var p = Make(mesh, [ConductorDefinition.Fixed("top", v)], new()
        {
            [StructuredMeshes.Bottom] = Enclosure(), [StructuredMeshes.Top] = On(0),
            [StructuredMeshes.Left] = Natural, [StructuredMeshes.Right] = Natural,
        }, new() { [0] = new RegionMaterial(new PermittivityTensor(7.0, 0, 2.5)) });
        var sol = new FieldSolver(p).Solve();
        Assert.Equal(1, sol.Conductors[0].ChargeCoulombs / v / (Eps0 * 2.5 * w / d), 9);
    }
}
