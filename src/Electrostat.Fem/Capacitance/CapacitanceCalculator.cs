using System.Diagnostics;
using System.Globalization;
using Electrostat.Fem.Assembly;
using Electrostat.Fem.Solving;
using MathNet.Numerics.LinearAlgebra;

namespace Electrostat.Fem.Capacitance;

/// <summary>Builds the Maxwell capacitance matrix: one solve per conductor on a shared matrix and preconditioner.</summary>
internal static class CapacitanceCalculator
{
    /// <summary>
    /// Relative tolerance of the sign checks, as a fraction of the largest diagonal entry. P1 elements keep the
    /// discrete maximum principle only on meshes without badly obtuse angles, so tiny sign violations are rounding or
    /// mesh artefacts, not physics; 1e-6 is far above solver noise and far below engineering significance.
    /// </summary>
    private const double SignTolerance = 1e-6;

    public static CapacitanceMatrixResult Compute(FieldSolver solver)
    {
        var cp = solver.Compiled;
        int n = cp.ConductorCount;
        if (n == 0) throw new FieldProblemException("The problem has no conductors other than the enclosure, so it has no capacitance matrix: add a conductor.");
        var sys = solver.AllFixedSystem();
        var raw = new double[n, n];
        var reportArray = new SolveReport[n];
        double energyMismatch = 0;
        var v = new double[cp.TerminalCount];
        var noCharge = new double[n];
        var design = solver.LastDesignSolution;
        int derived = SuperposedColumn(cp, design, out double vRef, out double[] vt);
        var columns = derived >= 0 ? new double[n][] : null;
        void Measure(int j, double[] phi, SolveReport report, Stopwatch sw)
        {
            var q = SystemAssembler.TerminalCharges(cp, phi, includeVolumeCharge: false);
            for (int i = 0; i < n; i++) raw[i, j] = q[i];
            double w = SystemAssembler.Energy(cp, phi);
            energyMismatch = Math.Max(energyMismatch, q[j] != 0 ? Math.Abs(2 * w - q[j]) / Math.Abs(q[j]) : (w == 0 ? 0 : double.PositiveInfinity));
            reportArray[j] = report with { SolveSeconds = report.SolveSeconds + sw.Elapsed.TotalSeconds };
        }
        for (int j = 0; j < n; j++)
        {
            if (j == derived) continue;
            var sw = Stopwatch.StartNew();
            Array.Clear(v);
            v[j] = 1.0;
            var b = SystemAssembler.RightHandSide(cp, sys.Map, v, noCharge, includeVolumeCharge: false);
            var u = new double[sys.Map.DofCount];
            var report = sys.Solve(b, u, sw.Elapsed.TotalSeconds);
            sw.Restart();
            var phi = SystemAssembler.Expand(sys.Map, u, v);
            if (columns is not null) columns[j] = phi;
            Measure(j, phi, report, sw);
        }
        if (derived >= 0)
        {
            // φ_design = V_ref + Σ_k (V_k − V_ref)·φ_k (linearity; floating conductors enter with their solved
            // potentials, because the Dirichlet problem with those terminal values has the design field as its
            // solution), solved here for the one column not computed.
            var sw = Stopwatch.StartNew();
            var phiDesign = design!.PotentialVolts;
            var phi = new double[phiDesign.Length];
            double scale = 1 / (vt[derived] - vRef);
            for (int i = 0; i < phi.Length; i++)
            {
                double s = phiDesign[i] - vRef;
                for (int j = 0; j < n; j++)
                {
                    if (j != derived) s -= (vt[j] - vRef) * columns![j][i];
                }
                phi[i] = s * scale;
            }
            var report = design.Report with
            {
                Iterations = 0,
                AssemblySeconds = 0,
                PreconditionerSetupSeconds = 0,
                SolveSeconds = 0,
                Preconditioner = "superposition of the design solution",
            };
            Measure(derived, phi, report, sw);
        }
        var reports = reportArray.ToList();

        var maxwell = new double[n, n];
        double maxDiag = 0, maxAsym = 0;
        for (int i = 0; i < n; i++)
        {
            maxDiag = Math.Max(maxDiag, Math.Abs(raw[i, i]));
            for (int j = 0; j < n; j++)
            {
                maxwell[i, j] = 0.5 * (raw[i, j] + raw[j, i]);
                maxAsym = Math.Max(maxAsym, Math.Abs(raw[i, j] - raw[j, i]));
            }
        }
        double symmetryError = maxDiag > 0 ? maxAsym / maxDiag : 0;

        var names = cp.Problem.Conductors.Select(c => c.Name).ToArray();
        var dense = Matrix<double>.Build.DenseOfArray(maxwell);
        var eig = dense.Evd(MathNet.Numerics.LinearAlgebra.Symmetricity.Symmetric).EigenValues.Select(z => z.Real).Order().ToArray();
        var violations = Check(maxwell, names, eig, maxDiag, cp.HasEnclosure || (cp.InfinityNode >= 0 && cp.Symmetry == Problem.ProblemSymmetry.Axisymmetric));
        for (int j = 0; j < n; j++)
        {
            if (!reports[j].Converged)
            {
                violations.Insert(0, string.Format(CultureInfo.InvariantCulture, "The solve for column {0} ('{1}') did not converge (relative residual {2:E2} after {3} iterations); the matrix is not trustworthy.", j, names[j], reports[j].RelativeResidual, reports[j].Iterations));
            }
        }
        var reduced = Reduce(cp, maxwell, names);
        return new CapacitanceMatrixResult(cp.Symmetry, cp.Problem.DepthMetres, names, raw, maxwell, symmetryError, energyMismatch, reports, reduced, eig, violations);
    }

    /// <summary>
    /// The column that can be taken from the design solution by superposition, or −1: the design must have been
    /// solved on this problem and converged, carry no volume charge (whose particular solution is not a combination of
    /// the columns), and have one reference potential V_ref for the enclosure and the point at infinity. Returns the
    /// terminal farthest from V_ref (best conditioned) and every terminal's design potential.
    /// </summary>
    private static int SuperposedColumn(CompiledProblem cp, FieldSolution? design, out double vRef, out double[] vt)
    {
        var problem = cp.Problem;
        int n = cp.ConductorCount;
        vRef = 0;
        vt = new double[n];
        if (design is null || !ReferenceEquals(design.Problem, problem) || !design.Report.Converged) return -1;
        if (problem.Materials.Values.Any(m => m.ChargeDensityCoulombsPerCubicMetre != 0)) return -1;
        var walls = problem.Boundaries.Values.OfType<Problem.EnclosureBoundary>().Select(e => e.PotentialVolts).Distinct().ToList();
        if (walls.Count > 1) return -1;
        bool infinityHeld = problem.OpenBoundary is not null && problem.Symmetry == Problem.ProblemSymmetry.Axisymmetric;
        if (walls.Count == 1) vRef = walls[0];
        if (infinityHeld)
        {
            double vInf = problem.OpenBoundary!.PotentialAtInfinityVolts;
            if (walls.Count == 1 && vInf != vRef) return -1;
            vRef = vInf;
        }
        int best = -1;
        double bestGap = 0;
        for (int k = 0; k < n; k++)
        {
            var def = problem.Conductors[k];
            vt[k] = def.IsFloating ? design.Conductors[k].PotentialVolts : def.PotentialVolts;
            if (!double.IsFinite(vt[k])) return -1;
            double gap = Math.Abs(vt[k] - vRef);
            if (gap > bestGap) { bestGap = gap; best = k; }
        }
        return best;
    }

    private static List<string> Check(double[,] c, string[] names, double[] eig, double maxDiag, bool hasReference)
    {
        int n = names.Length;
        double tol = SignTolerance * maxDiag;
        var bad = new List<string>();
        var inv = CultureInfo.InvariantCulture;
        for (int i = 0; i < n; i++)
        {
            if (!(c[i, i] > 0)) bad.Add(string.Format(inv, "C[{0},{0}] of '{1}' is {2:E4}, not positive.", i, names[i], c[i, i]));
            double row = 0;
            for (int j = 0; j < n; j++)
            {
                row += c[i, j];
                if (i != j && c[i, j] > tol) bad.Add(string.Format(inv, "C[{0},{1}] between '{2}' and '{3}' is {4:E4} > 0 (should be <= 0).", i, j, names[i], names[j], c[i, j]));
            }
            if (row < -tol) bad.Add(string.Format(inv, "The row sum of '{0}' (its capacitance to the enclosure) is {1:E4} < 0.", names[i], row));
        }
        // Without an enclosure or infinity reference, the row sums vanish and the matrix is only semi-definite.
        if (hasReference && eig.Length > 0 && !(eig[0] > tol * 1e-3))
        {
            bad.Add(string.Format(inv, "The matrix is not positive definite (smallest eigenvalue {0:E4}).", eig[0]));
        }
        return bad;
    }

    private static ReducedCapacitance? Reduce(CompiledProblem cp, double[,] c, string[] names)
    {
        var conductors = cp.Problem.Conductors;
        var fl = Enumerable.Range(0, conductors.Count).Where(k => conductors[k].IsFloating).ToArray();
        if (fl.Length == 0) return null;
        var dr = Enumerable.Range(0, conductors.Count).Where(k => !conductors[k].IsFloating).ToArray();
        var cff = Matrix<double>.Build.Dense(fl.Length, fl.Length, (i, j) => c[fl[i], fl[j]]);
        var caf = Matrix<double>.Build.Dense(dr.Length, fl.Length, (i, j) => c[dr[i], fl[j]]);
        var caa = Matrix<double>.Build.Dense(dr.Length, dr.Length, (i, j) => c[dr[i], dr[j]]);
        var qf = Vector<double>.Build.Dense(fl.Length, i => conductors[fl[i]].ChargeCoulombs);
        // C_ff is SPD whenever the floating conductors see any reference, so Cholesky applies.
        var chol = cff.Cholesky();
        var schur = caa - caf * chol.Solve(caf.Transpose());
        var offset = caf * chol.Solve(qf);
        return new ReducedCapacitance(dr.Select(k => names[k]).ToArray(), dr, schur.ToArray(), offset.ToArray());
    }
}
