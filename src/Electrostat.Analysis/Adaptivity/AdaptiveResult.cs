using Electrostat.Analysis.Pipeline;
using Electrostat.Fem.Capacitance;
using Electrostat.Fem.Solving;
using Electrostat.Meshing.Output;

namespace Electrostat.Analysis.Adaptivity;

/// <summary>The outcome of the adaptive loop: the final mesh and solution, the history and the error certificate.</summary>
/// <param name="Levels">Every level, oldest first.</param>
/// <param name="Converged">True when the stopping rule (changes below the tolerance) ended the loop; false when the
/// element budget or the level limit did ("not converged").</param>
/// <param name="StopReason">One sentence on why the loop stopped.</param>
/// <param name="Mesh">The final mesh with its provenance.</param>
/// <param name="Built">The final field problem and its design maps.</param>
/// <param name="Solution">The final solution.</param>
/// <param name="Capacitance">The final capacitance matrix, or null when not computed (no terminals).</param>
/// <param name="PeakErrors">Estimated error of each material's peak |E| (V/m), by material name.</param>
/// <param name="CapacitanceErrors">Estimated error of each Maxwell entry [i, j] (F/m planar, F axisymmetric), or null.</param>
/// <param name="Exclusions">The discs left out of the peak convergence test (singular corners).</param>
/// <param name="TotalSeconds">Wall time of the whole loop, seconds.</param>
public sealed record AdaptiveResult(
    IReadOnlyList<AdaptiveLevel> Levels,
    bool Converged,
    string StopReason,
    MeshResult Mesh,
    BuiltProblem Built,
    FieldSolution Solution,
    CapacitanceMatrixResult? Capacitance,
    IReadOnlyDictionary<string, ErrorEstimate> PeakErrors,
    ErrorEstimate[,]? CapacitanceErrors,
    IReadOnlyList<ExclusionDisc> Exclusions,
    double TotalSeconds)
{
    /// <summary>Time of the final level's solve (design and capacitance solves), seconds.</summary>
    public double FinalSolveSeconds => Levels[^1].SolveSeconds;

    /// <summary>Total time divided by the final level's solve time (dimensionless): the cost of adapting.</summary>
    public double AdaptOverhead => TotalSeconds / Math.Max(FinalSolveSeconds, 1e-9);
}
