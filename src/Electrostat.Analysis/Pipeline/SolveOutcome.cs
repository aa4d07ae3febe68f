using Electrostat.Analysis.Adaptivity;
using Electrostat.Geometry.Model;
using Electrostat.Meshing.Designs;

namespace Electrostat.Analysis.Pipeline;

/// <summary>Everything the solve pipeline produced for one design.</summary>
/// <param name="Design">The design that was solved.</param>
/// <param name="MeshInput">The mesher input (tag and region tables).</param>
/// <param name="Accuracy">The accuracy level used.</param>
/// <param name="Adaptive">The adaptive loop's history, final solution and error certificate.</param>
/// <param name="Analysis">Hot spots, margins, clearances, corners, profiles and forces on the final solution.</param>
/// <param name="Warnings">Pipeline warnings (unmeshed electrodes, not converged), in addition to the analysis warnings.</param>
/// <param name="TotalSeconds">Wall time from meshing to the end of the analysis, seconds.</param>
public sealed record SolveOutcome(
    Design Design,
    DesignMeshInput MeshInput,
    AccuracyLevel Accuracy,
    AdaptiveResult Adaptive,
    AnalysisReport Analysis,
    IReadOnlyList<string> Warnings,
    double TotalSeconds);
