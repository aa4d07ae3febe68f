using Electrostat.Fem.Problem;
using Electrostat.Meshing;

namespace Electrostat.Fem.Solving;

/// <summary>
/// A solved electrostatic problem: potentials at the vertices, the field in every triangle, conductor charges,
/// energy and the solver report. Read-only: nothing here solves again.
/// </summary>
/// <remarks>
/// Units follow <see cref="Problem.ProblemSymmetry"/>: planar charges and energies are per metre of depth, axisymmetric
/// ones are totals over 2π. The field is constant per P1 triangle. Arrays are shared, not copied: do not mutate them.
/// </remarks>
public sealed class FieldSolution
{
    internal FieldSolution(ElectrostaticProblem problem, double[] potential, double[] ex, double[] ey,
        IReadOnlyList<ConductorResult> conductors, double enclosureCharge, double infinityCharge, double energy, SolveReport report)
    {
        Problem = problem;
        PotentialVolts = potential;
        FieldXVoltsPerMetre = ex;
        FieldYVoltsPerMetre = ey;
        Conductors = conductors;
        EnclosureChargeCoulombs = enclosureCharge;
        InfinityChargeCoulombs = infinityCharge;
        EnergyJoules = energy;
        Report = report;
    }

    /// <summary>The problem that was solved.</summary>
    public ElectrostaticProblem Problem { get; }

    /// <summary>The mesh.</summary>
    public TriangleMesh Mesh => Problem.Mesh;

    /// <summary>Potential at each mesh vertex, volts.</summary>
    public double[] PotentialVolts { get; }

    /// <summary>x (planar) or r (axisymmetric) component of E = −∇φ in each triangle, V/m.</summary>
    public double[] FieldXVoltsPerMetre { get; }

    /// <summary>y (planar) or z (axisymmetric) component of E = −∇φ in each triangle, V/m.</summary>
    public double[] FieldYVoltsPerMetre { get; }

    /// <summary>Region attribute of each triangle (the key of <see cref="ElectrostaticProblem.Materials"/>).</summary>
    public int[] TriangleRegion => Problem.Mesh.TriangleRegion;

    /// <summary>|E| in triangle <paramref name="triangle"/>, V/m.</summary>
    /// <param name="triangle">Triangle index.</param>
    public double FieldMagnitude(int triangle) => Math.Sqrt(FieldXVoltsPerMetre[triangle] * FieldXVoltsPerMetre[triangle] + FieldYVoltsPerMetre[triangle] * FieldYVoltsPerMetre[triangle]);

    /// <summary>Per conductor, in the order of <see cref="ElectrostaticProblem.Conductors"/>.</summary>
    public IReadOnlyList<ConductorResult> Conductors { get; }

    /// <summary>Charge on the enclosure from its nodal reactions (C/m planar, C axisymmetric); 0 without an enclosure.</summary>
    public double EnclosureChargeCoulombs { get; }

    /// <summary>Charge "at infinity" of an axisymmetric open boundary: minus the net charge of everything else (C).</summary>
    public double InfinityChargeCoulombs { get; }

    /// <summary>Field energy ½∫D·E dV, joules (planar: J per metre of depth).</summary>
    public double EnergyJoules { get; }

    /// <summary>Field energy as a total: times the depth for planar problems, joules.</summary>
    public double TotalEnergyJoules => Problem.Symmetry == ProblemSymmetry.Planar ? EnergyJoules * Problem.DepthMetres : EnergyJoules;

    /// <summary>Charge of conductor <paramref name="conductor"/> as a total in coulombs: times the depth for planar problems.</summary>
    /// <param name="conductor">Conductor index.</param>
    public double TotalChargeCoulombs(int conductor) =>
        Problem.Symmetry == ProblemSymmetry.Planar ? Conductors[conductor].ChargeCoulombs * Problem.DepthMetres : Conductors[conductor].ChargeCoulombs;

    /// <summary>The solver report (iterations, residual, timings).</summary>
    public SolveReport Report { get; }
}
