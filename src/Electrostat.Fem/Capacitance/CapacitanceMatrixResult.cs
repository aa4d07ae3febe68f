using Electrostat.Fem.Problem;
using Electrostat.Fem.Solving;

namespace Electrostat.Fem.Capacitance;

/// <summary>
/// The Maxwell capacitance matrix of a design's conductors and what follows from it.
/// </summary>
/// <remarks>
/// <para>Meaning of the entries (stated once, here): with conductor j at 1 V and every other conductor, the
/// enclosure and infinity at 0 V, C_ij is the charge on conductor i. So Q = C·V for conductor potentials V measured
/// from the enclosure (or infinity). C_ii &gt; 0, C_ij ≤ 0 (i ≠ j), and the row sum Σ_j C_ij is the capacitance of
/// conductor i to the enclosure, ≥ 0. Two-terminal values for circuit models: mutual capacitance between i and j is
/// −C_ij; to-enclosure capacitance of i is the row sum. Units: F/m for planar problems (per metre of depth;
/// <see cref="TotalFarads"/> multiplies by the depth) and F for axisymmetric ones (totals over 2π).</para>
/// <para>Floating conductors. <see cref="Maxwell"/> treats every conductor as a terminal, floating ones included, so it
/// describes the structure regardless of how it is driven. When some conductors float, <see cref="Reduced"/> eliminates
/// them at their given charges Q_f by the Schur complement: Q_a = (C_aa − C_af·C_ff⁻¹·C_fa)·V_a + C_af·C_ff⁻¹·Q_f,
/// which is the matrix seen at the driven terminals.</para>
/// <para>Charges come from nodal reactions, so they share the energy's O(h²) accuracy. Each column is checked
/// against the energy: ½·C_jj must equal the field energy of solve j (<see cref="EnergyMismatch"/>).</para>
/// </remarks>
public sealed class CapacitanceMatrixResult
{
    internal CapacitanceMatrixResult(ProblemSymmetry symmetry, double depth, IReadOnlyList<string> names, double[,] raw, double[,] maxwell,
        double symmetryError, double energyMismatch, IReadOnlyList<SolveReport> reports, ReducedCapacitance? reduced,
        IReadOnlyList<double> eigenvalues, IReadOnlyList<string> violations)
    {
        Symmetry = symmetry;
        DepthMetres = depth;
        TerminalNames = names;
        RawMaxwell = raw;
        Maxwell = maxwell;
        SymmetryError = symmetryError;
        EnergyMismatch = energyMismatch;
        ColumnReports = reports;
        Reduced = reduced;
        Eigenvalues = eigenvalues;
        Violations = violations;
    }

    /// <summary>Planar (F/m) or axisymmetric (F).</summary>
    public ProblemSymmetry Symmetry { get; }

    /// <summary>Depth used by <see cref="TotalFarads"/> for planar problems, metres.</summary>
    public double DepthMetres { get; }

    /// <summary>Conductor names, in the order of the matrix rows.</summary>
    public IReadOnlyList<string> TerminalNames { get; }

    /// <summary>Number of terminals (conductors other than the enclosure).</summary>
    public int Count => TerminalNames.Count;

    /// <summary>The matrix as computed, before symmetrisation (F/m planar, F axisymmetric).</summary>
    public double[,] RawMaxwell { get; }

    /// <summary>The symmetrised Maxwell matrix (C + Cᵀ)/2 (F/m planar, F axisymmetric).</summary>
    public double[,] Maxwell { get; }

    /// <summary>max|C_ij − C_ji| / max C_ii of the raw matrix (dimensionless).</summary>
    public double SymmetryError { get; }

    /// <summary>max_j |2·W_j − C_jj| / C_jj over the columns, W_j the field energy of solve j (dimensionless).</summary>
    public double EnergyMismatch { get; }

    /// <summary>The report of each column's solve (the first carries the shared assembly and setup times).</summary>
    public IReadOnlyList<SolveReport> ColumnReports { get; }

    /// <summary>The matrix with floating conductors eliminated at their charges, or null when none floats.</summary>
    public ReducedCapacitance? Reduced { get; }

    /// <summary>Eigenvalues of <see cref="Maxwell"/>, ascending (all &gt; 0 when it is positive definite).</summary>
    public IReadOnlyList<double> Eigenvalues { get; }

    /// <summary>Failed physics checks, one readable sentence each; empty when all pass.</summary>
    public IReadOnlyList<string> Violations { get; }

    /// <summary>True when every column solve converged and the diagonal is positive, off-diagonals non-positive, row sums non-negative and the matrix positive definite (within tolerance).</summary>
    public bool PassesPhysicsChecks => Violations.Count == 0;

    /// <summary>Mutual capacitance −C_ij between conductors i ≠ j (F/m planar, F axisymmetric).</summary>
    /// <param name="i">Row conductor.</param>
    /// <param name="j">Column conductor.</param>
    public double Mutual(int i, int j)
    {
        if (i == j) throw new ArgumentException("A mutual capacitance needs two different conductors.", nameof(j));
        return -Maxwell[i, j];
    }

    /// <summary>Capacitance of conductor i to the enclosure (or infinity): the row sum Σ_j C_ij (F/m planar, F axisymmetric).</summary>
    /// <param name="i">Conductor index.</param>
    public double ToEnclosure(int i)
    {
        double s = 0;
        for (int j = 0; j < Count; j++) s += Maxwell[i, j];
        return s;
    }

    /// <summary>An entry as a total in farads: times the depth for planar problems.</summary>
    /// <param name="i">Row.</param>
    /// <param name="j">Column.</param>
    public double TotalFarads(int i, int j) => Symmetry == ProblemSymmetry.Planar ? Maxwell[i, j] * DepthMetres : Maxwell[i, j];

    /// <summary>Charges Q = C·V (C/m planar, C axisymmetric) for conductor potentials V (volts, from the enclosure).</summary>
    /// <param name="potentialsVolts">One potential per terminal.</param>
    public double[] Charges(IReadOnlyList<double> potentialsVolts)
    {
        ArgumentNullException.ThrowIfNull(potentialsVolts);
        if (potentialsVolts.Count != Count) throw new ArgumentException($"Need {Count} potentials.", nameof(potentialsVolts));
        var q = new double[Count];
        for (int i = 0; i < Count; i++)
        {
            for (int j = 0; j < Count; j++) q[i] += Maxwell[i, j] * potentialsVolts[j];
        }
        return q;
    }

    /// <summary>Energy W = ½·Vᵀ·C·V (J/m planar, J axisymmetric) for conductor potentials V (volts).</summary>
    /// <param name="potentialsVolts">One potential per terminal.</param>
    public double Energy(IReadOnlyList<double> potentialsVolts)
    {
        var q = Charges(potentialsVolts);
        double w = 0;
        for (int i = 0; i < Count; i++) w += 0.5 * q[i] * potentialsVolts[i];
        return w;
    }
}
