using Electrostat.Analysis.Pipeline;
using Electrostat.Fem.Solving;

namespace Electrostat.Analysis.Adaptivity;

/// <summary>Options of the adaptive loop (immutable).</summary>
public sealed record AdaptiveOptions
{
    /// <summary>Stop when every peak |E| per material and every capacitance entry changes by less than this relative
    /// amount between two levels (dimensionless; default 0.005 = 0.5 %). A capacitance entry's change is measured
    /// against √(C_ii·C_jj), so that a tiny coupling is judged on the scale of its terminals.</summary>
    public double RelativeTolerance { get; init; } = 0.005;

    /// <summary>Element budget: the loop stops ("not converged") rather than let the next level exceed it.</summary>
    public int MaxTriangles { get; init; } = 200_000;

    /// <summary>Dörfler bulk fraction θ (default 0.8).</summary>
    public double Theta { get; init; } = 0.8;

    /// <summary>Mark at least this fraction of the triangles per level (default 0.6), so the mesh grows geometrically
    /// and the loop's total cost stays a bounded multiple of the final level.</summary>
    public double MinimumMarkedFraction { get; init; } = 0.6;

    /// <summary>Split passes per level (default 1). With 2, the marked triangles are split and then every triangle
    /// touching a vertex of that pass, so the mesh grows 2.5–3.5× per level instead of about 1.7× (see
    /// <see cref="Electrostat.Meshing.RefinableMesh.RefineTriangles(IEnumerable{int}, int)"/>). Measured on the
    /// capacitive-sensor example: 3 levels instead of 6 and half the loop time (1.98 s against 3.89 s), but the
    /// three-level extrapolation then rests on levels far apart and became unreliable (an FR-4 peak estimate of 13 %
    /// for a 1 % change; on the validation suite the concentric-sphere peak estimate fell below the true error), so
    /// the default keeps one pass. docs/performance.md has the figures.</summary>
    public int SplitPasses { get; init; } = 1;

    /// <summary>Least number of levels (default 3: the error estimate extrapolates from the last three).</summary>
    public int MinLevels { get; init; } = 3;

    /// <summary>Largest number of levels (default 12).</summary>
    public int MaxLevels { get; init; } = 12;

    /// <summary>Compute the Maxwell capacitance matrix at every level (needed for its convergence test and error estimate).</summary>
    public bool ComputeCapacitance { get; init; } = true;

    /// <summary>Discs around singular corners, left out of the peak-field convergence test.</summary>
    public IReadOnlyList<ExclusionDisc> Exclusions { get; init; } = [];

    /// <summary>Optional: called once after the first solve to add exclusion discs found from the solved design (the
    /// singular-corner detector needs a solution); its discs join <see cref="Exclusions"/> for every level.</summary>
    public Func<BuiltProblem, FieldSolution, IReadOnlyList<ExclusionDisc>>? ExclusionsAfterFirstSolve { get; init; }

    /// <summary>Linear solver options.</summary>
    public FieldSolverOptions Solver { get; init; } = new();

    /// <summary>Called on the solving thread after each level is measured (before the convergence test), e.g. for
    /// progress; null for none. A callback may cancel the run's token: the loop checks it before the next level.</summary>
    public Action<AdaptiveLevel>? LevelCompleted { get; init; }
}
