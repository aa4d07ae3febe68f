using Electrostat.Fem.Problem;
using Electrostat.Fem.Solving;
using Electrostat.Fem.Tests.Support;
using static Electrostat.Fem.Tests.Support.Problems;

namespace Electrostat.Fem.Tests.Verification;

public class OpenBoundaryTests
{
    /// <summary>
    /// Sphere of radius a in open space: the interior half ring a ≤ ρ ≤ R (region 0) plus the Kelvin image half disk
    /// of radius R about (0, zc) (region 1), with equal angular divisions on both arcs.
    /// </summary>
    private static ElectrostaticProblem IsolatedSphere(double a, double radius, int nr, int nalpha, int nrExterior)
    {
        double zc = 3 * radius;
        var interior = StructuredMeshes.HalfAnnulusRz(a, radius, nr, nalpha, geometric: true);
        var exterior = StructuredMeshes.HalfAnnulusRz(0, radius, nrExterior, nalpha, zc, region: 1, tagOffset: 10);
        var mesh = StructuredMeshes.Union(interior, exterior);
        return new ElectrostaticProblem
        {
            Mesh = mesh,
            Symmetry = ProblemSymmetry.Axisymmetric,
            Conductors = [ConductorDefinition.Fixed("sphere", 1.0)],
            Materials = new Dictionary<int, RegionMaterial> { [0] = RegionMaterial.Vacuum, [1] = RegionMaterial.Vacuum },
            Boundaries = new Dictionary<int, BoundaryRole> { [1] = On(0), [3] = Natural, [13] = Natural },
            OpenBoundary = new KelvinOpenBoundary(2, 12, 1, radius, 0, 0, 0, zc),
        };
    }

    [Fact]
    public void IsolatedSphere_CapacitanceIsFourPiEpsA()
    {
        // C = 4πε0·a for an isolated sphere (Griffiths, Introduction to Electrodynamics, Problem 2.43 / §2.5.4),
        // with the outer circle at only 2a: the Kelvin image carries the rest of space
        // (Freeman and Lowther, IEEE Trans. Magn. 25(5), 1989).
        double a = 0.05;
        var solver = new FieldSolver(IsolatedSphere(a, 2 * a, 24, 96, 24));
        var sol = solver.Solve();
        Assert.True(sol.Report.Converged);
        double exact = 4 * Math.PI * Eps0 * a;
        double c = sol.Conductors[0].ChargeCoulombs / 1.0;
        Assert.True(Math.Abs(c / exact - 1) < 5e-3, $"C = {c:E6}, exact {exact:E6}, rel {c / exact - 1:E3}");
        // All the flux ends at infinity.
        Assert.Equal(-1, sol.InfinityChargeCoulombs / sol.Conductors[0].ChargeCoulombs, 6);
        // The capacitance matrix of the single conductor is the same number, consistent with the energy.
        var cm = solver.ComputeCapacitanceMatrix();
        Assert.Equal(1, cm.Maxwell[0, 0] / c, 9);
        Assert.True(cm.EnergyMismatch < 1e-8);
        Assert.True(cm.PassesPhysicsChecks, string.Join(" ", cm.Violations));
    }

    [Fact]
    public void IsolatedSphere_PotentialOutsideFallsAsOneOverRho()
    {
        // φ(ρ) = V·a/ρ outside a sphere at V (Griffiths §2.3); the image point at distance ρ' from the image centre
        // stands for ρ = R²/ρ', so there φ = V·a·ρ'/R², linear in ρ', which P1 elements reproduce closely.
        double a = 0.05, radius = 0.1;
        var p = IsolatedSphere(a, radius, 24, 96, 24);
        var sol = new FieldSolver(p).Solve();
        var m = p.Mesh;
        double zc = 3 * radius, worst = 0;
        for (int i = 0; i < m.VertexCount; i++)
        {
            double dz = m.Y[i] - zc;
            double rhoImage = Math.Sqrt(m.X[i] * m.X[i] + dz * dz);
            if (rhoImage > radius * 1.0001) continue; // interior piece
            worst = Math.Max(worst, Math.Abs(sol.PotentialVolts[i] - a * rhoImage / (radius * radius)));
        }
        Assert.True(worst < 5e-3, $"worst image potential error {worst:E3} V");
    }

    [Fact]
    public void MismatchedArcs_AreReportedWithTheFix()
    {
        double a = 0.05, radius = 0.1;
        var p = IsolatedSphere(a, radius, 8, 32, 8);
        var interior = StructuredMeshes.HalfAnnulusRz(a, radius, 8, 32);
        var exterior = StructuredMeshes.HalfAnnulusRz(0, radius, 8, 30, 3 * radius, region: 1, tagOffset: 10);
        var bad = p with { Mesh = StructuredMeshes.Union(interior, exterior) };
        var ex = Assert.Throws<Assembly.FieldProblemException>(() => new FieldSolver(bad));
        Assert.Contains("protected", ex.Message);
    }
}
