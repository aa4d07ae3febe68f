using Electrostat.Fem.Problem;
using Electrostat.Fem.Solving;
using Electrostat.Fem.Tests.Support;
using static Electrostat.Fem.Tests.Support.Problems;

namespace Electrostat.Fem.Tests.Capacitance;

public class CapacitanceMatrixTests
{
    /// <summary>
    /// Three rectangular electrodes (holes) in a grounded box with two dielectrics: conductor k is the hole whose cells
    /// return k. Conductor 2 floats with a given charge when <paramref name="floatingCharge"/> is set.
    /// </summary>
    private static ElectrostaticProblem ThreeElectrodes(double? floatingCharge = null)
    {
        static int Hole(int i, int j) =>
            i is >= 4 and < 8 && j is >= 4 and < 6 ? 0 :
            i is >= 12 and < 14 && j is >= 3 and < 9 ? 1 :
            i is >= 18 and < 26 && j is >= 8 and < 9 ? 2 : -1;
        var mesh = StructuredMeshes.Rectangle(0, 0.03, 0, 0.012, 30, 12, region: (_, y) => y < 0.005 ? 1 : 2, hole: Hole);
        var conductors = new List<ConductorDefinition> { ConductorDefinition.Fixed("A", 100), ConductorDefinition.Fixed("B", -40) };
        conductors.Add(floatingCharge is double q ? ConductorDefinition.Floating("C", q) : ConductorDefinition.Fixed("C", 25));
        return new ElectrostaticProblem
        {
            Mesh = mesh,
            Conductors = conductors,
            DepthMetres = 0.2,
            Materials = new Dictionary<int, RegionMaterial> { [1] = RegionMaterial.Dielectric(4.4), [2] = RegionMaterial.Vacuum },
            Boundaries = new Dictionary<int, BoundaryRole>
            {
                [10] = On(0), [11] = On(1), [12] = On(2),
                [StructuredMeshes.Bottom] = Enclosure(), [StructuredMeshes.Top] = Enclosure(),
                [StructuredMeshes.Left] = Natural, [StructuredMeshes.Right] = Enclosure(),
            },
        };
    }

    [Fact]
    public void MultiElectrode_MaxwellMatrixInvariants()
    {
        // Maxwell capacitance matrix properties: symmetric (reciprocity), C_ii > 0, C_ij ≤ 0, row sums ≥ 0,
        // positive definite (Smythe, Static and Dynamic Electricity, 3rd ed., §2.15–2.16).
        var solver = new FieldSolver(ThreeElectrodes());
        var cm = solver.ComputeCapacitanceMatrix();
        Assert.Equal(3, cm.Count);
        Assert.True(cm.PassesPhysicsChecks, string.Join(" ", cm.Violations));
        // Reciprocity holds to solver accuracy because the discrete matrix is the Schur complement of K.
        Assert.True(cm.SymmetryError < 1e-7, $"symmetry error {cm.SymmetryError:E2}");
        Assert.True(cm.EnergyMismatch < 1e-8, $"energy mismatch {cm.EnergyMismatch:E2}");
        Assert.All(cm.Eigenvalues, e => Assert.True(e > 0));
        for (int i = 0; i < 3; i++)
        {
            Assert.True(cm.ToEnclosure(i) > 0);
            for (int j = 0; j < 3; j++)
            {
                if (i != j) Assert.True(cm.Mutual(i, j) > 0);
            }
        }
        Assert.Equal(1, cm.TotalFarads(0, 1) / (cm.Maxwell[0, 1] * 0.2), 14);
        // One shared matrix and preconditioner: only the first column pays assembly and setup.
        Assert.True(cm.ColumnReports[0].AssemblySeconds > 0);
        Assert.All(cm.ColumnReports.Skip(1), r => Assert.Equal(0, r.AssemblySeconds));

        // Superposition: the design solve's charges and energy equal C·V and ½VᵀCV.
        var sol = solver.Solve();
        var v = new[] { 100.0, -40.0, 25.0 };
        var q = cm.Charges(v);
        for (int i = 0; i < 3; i++) Assert.Equal(1, sol.Conductors[i].ChargeCoulombs / q[i], 7);
        Assert.Equal(1, sol.EnergyJoules / cm.Energy(v), 7);
        Assert.Equal(1, sol.Conductors.Sum(c => c.EnergyShareJoules) / sol.EnergyJoules, 7);
        Assert.Equal(1, sol.TotalChargeCoulombs(0) / (sol.Conductors[0].ChargeCoulombs * 0.2), 12);
        Assert.Equal(1, sol.TotalEnergyJoules / (sol.EnergyJoules * 0.2), 12);
    }

    [Theory]
    [InlineData(null, 0.0)]
    [InlineData(2e-10, 0.0)]
    [InlineData(null, 30.0)]
    [InlineData(-1e-10, -12.5)]
    public void AfterADesignSolve_OneColumnComesBySuperposition_AndTheMatrixIsUnchanged(double? floatingCharge, double wallVolts)
    {
        // φ_design = V_ref + Σ (V_k − V_ref)·φ_k for a linear problem without volume charge (superposition), so the
        // column of the terminal farthest from the wall potential needs no solve. The matrix must equal the one
        // computed from N solves, with a floating conductor (at its solved potential) and with the wall at ≠ 0 V.
        ElectrostaticProblem Problem()
        {
            var p = ThreeElectrodes(floatingCharge);
            var roles = p.Boundaries.ToDictionary(kv => kv.Key, kv => kv.Value is EnclosureBoundary ? Enclosure(wallVolts) : kv.Value);
            return p with { Boundaries = roles };
        }
        var reference = new FieldSolver(Problem()).ComputeCapacitanceMatrix();
        var solver = new FieldSolver(Problem());
        solver.Solve();
        var reused = solver.ComputeCapacitanceMatrix();
        Assert.Equal(1, reused.ColumnReports.Count(r => r.Preconditioner.StartsWith("superposition", StringComparison.Ordinal)));
        Assert.Equal(1, reused.ColumnReports.Count(r => r.Iterations == 0));
        for (int i = 0; i < 3; i++)
        {
            for (int j = 0; j < 3; j++)
            {
                double scale = Math.Sqrt(reference.Maxwell[i, i] * reference.Maxwell[j, j]);
                Assert.True(Math.Abs(reused.Maxwell[i, j] - reference.Maxwell[i, j]) < 1e-7 * scale,
                    $"C[{i},{j}] {reused.Maxwell[i, j]:E8} against {reference.Maxwell[i, j]:E8}");
            }
        }
        Assert.True(reused.EnergyMismatch < 1e-7, $"energy mismatch {reused.EnergyMismatch:E2}");
        Assert.True(reused.SymmetryError < 1e-7, $"symmetry error {reused.SymmetryError:E2}");
    }

    [Fact]
    public void VolumeCharge_KeepsEveryColumnSolved()
    {
        // With a volume charge the design field is not a combination of the columns: no superposition.
        var p = ThreeElectrodes();
        p = p with { Materials = new Dictionary<int, RegionMaterial> { [1] = RegionMaterial.Dielectric(4.4) with { ChargeDensityCoulombsPerCubicMetre = 1e-4 }, [2] = RegionMaterial.Vacuum } };
        var solver = new FieldSolver(p);
        solver.Solve();
        var cm = solver.ComputeCapacitanceMatrix();
        Assert.All(cm.ColumnReports, r => Assert.True(r.Iterations > 0));
    }

    [Fact]
    public void FloatingConductor_ReducedMatrixPredictsTheDesignSolve()
    {
        // Eliminating a floating conductor at its charge by the Schur complement must reproduce what the DOF-merged
        // design solve computes directly: Q_a = C_red·V_a + offset, and V_f = C_ff⁻¹(Q_f − C_fa·V_a).
        double qf = 2e-10;
        var solver = new FieldSolver(ThreeElectrodes(qf));
        var sol = solver.Solve();
        var cm = solver.ComputeCapacitanceMatrix();
        Assert.True(cm.PassesPhysicsChecks, string.Join(" ", cm.Violations));
        var red = cm.Reduced!;
        Assert.Equal([0, 1], red.TerminalIndices);
        double[] va = [100, -40];
        for (int i = 0; i < 2; i++)
        {
            double predicted = red.Matrix[i, 0] * va[0] + red.Matrix[i, 1] * va[1] + red.ChargeOffset[i];
            Assert.Equal(1, sol.Conductors[i].ChargeCoulombs / predicted, 7);
        }
        double vf = (qf - cm.Maxwell[2, 0] * va[0] - cm.Maxwell[2, 1] * va[1]) / cm.Maxwell[2, 2];
        Assert.Equal(1, sol.Conductors[2].PotentialVolts / vf, 7);
        // The floating conductor's reaction charge equals the charge it was given.
        Assert.Equal(1, sol.Conductors[2].ChargeCoulombs / qf, 7);
    }

    [Fact]
    public void UnchargedFloatingConductor_LeavesTheOthersConsistent()
    {
        // With Q_f = 0 the reduced matrix is symmetric, positive definite, and is the capacitance the driven
        // conductors see; it must also keep the Maxwell sign pattern (an uncharged conductor only couples them).
        var cm = new FieldSolver(ThreeElectrodes(0)).ComputeCapacitanceMatrix();
        var r = cm.Reduced!.Matrix;
        Assert.Equal(1, r[0, 1] / r[1, 0], 12);
        Assert.True(r[0, 0] > 0 && r[1, 1] > 0 && r[0, 1] < 0);
        Assert.True(r[0, 0] + r[0, 1] >= 0 && r[1, 1] + r[1, 0] >= 0);
        Assert.All(cm.Reduced.ChargeOffset, o => Assert.Equal(0, o));
        // Eliminating a conductor can only lower the self capacitances (Schur complement of an SPD matrix).
        Assert.True(r[0, 0] <= cm.Maxwell[0, 0] && r[1, 1] <= cm.Maxwell[1, 1]);
    }
}
