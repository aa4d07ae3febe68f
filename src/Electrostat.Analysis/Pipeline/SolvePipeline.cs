using System.Diagnostics;
using Electrostat.Analysis.Adaptivity;
using Electrostat.Analysis.Corners;
using Electrostat.Geometry.Model;
using Electrostat.Meshing;
using Electrostat.Meshing.Designs;

namespace Electrostat.Analysis.Pipeline;

/// <summary>
/// Design → mesh → adaptive solve → analysis: the whole computation behind <c>electrostat solve</c>, without any
/// file output.
/// </summary>
/// <remarks>
/// Steps: 1. cut the design's curves (finer for higher accuracy, see <see cref="AccuracyLevel"/>) and mesh it;
/// 2. run <see cref="AdaptiveSolver"/>, with the singular corners found on the first solution excluded from the
/// peak-convergence test (a disc of the corner's report distance δ); 3. run <see cref="DesignAnalyzer"/> on the final
/// solution. User errors surface as <see cref="Meshing.Input.MeshInputException"/>,
/// <see cref="MeshBudgetExceededException"/> or <see cref="Fem.Assembly.FieldProblemException"/> (message for the user);
/// numerical failure as <see cref="SolveFailedException"/>.
/// </remarks>
public static class SolvePipeline
{
    /// <summary>Runs the pipeline.</summary>
    /// <param name="design">A validated design.</param>
    /// <param name="accuracy">Accuracy level; null for <see cref="AccuracyLevel.Normal"/>.</param>
    /// <param name="maxTriangles">Element budget override; null for the level's budget.</param>
    /// <param name="analysisOptions">Analysis options; null for defaults.</param>
    /// <param name="levelCompleted">Called after each adaptive level (see <see cref="AdaptiveOptions.LevelCompleted"/>); null for none.</param>
    /// <param name="cancellationToken">Checked after meshing, between adaptive levels and before the analysis.</param>
    /// <returns>The outcome.</returns>
    /// <exception cref="OperationCanceledException"><paramref name="cancellationToken"/> was cancelled.</exception>
    public static SolveOutcome Run(Design design, AccuracyLevel? accuracy = null, int? maxTriangles = null, AnalysisOptions? analysisOptions = null,
        Action<AdaptiveLevel>? levelCompleted = null, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(design);
        cancellationToken.ThrowIfCancellationRequested();
        accuracy ??= AccuracyLevel.Normal;
        int budget = maxTriangles ?? accuracy.MaxTriangles;
        var total = Stopwatch.StartNew();
        var settings = new DesignMeshSettings
        {
            ChordToleranceMetres = accuracy.ChordToleranceFraction * design.Bounds.Diagonal,
            MaxChordAngleDegrees = accuracy.MaxChordAngleDegrees,
        };
        // The mesher's own budget sits above the loop's so that the loop, not an exception, reports "not converged".
        var meshOptions = new MeshOptions { MaxTriangles = Math.Max(budget, 1000) * 4 };
        var (input, mesh) = DesignMesher.Create(design, meshOptions, settings);
        double meshSeconds = total.Elapsed.TotalSeconds;
        cancellationToken.ThrowIfCancellationRequested();
        var options = new AdaptiveOptions
        {
            RelativeTolerance = accuracy.RelativeTolerance,
            MaxTriangles = budget,
            ExclusionsAfterFirstSolve = (built, solution) =>
                SingularCornerDetector.Detect(new AnalysisContext(design, input.Tags, input.Regions, solution))
                    .Select(c => new ExclusionDisc(c.Location.X, c.Location.Y, c.ReportDistanceMetres, $"corner of {c.ConductorName}"))
                    .ToArray(),
            LevelCompleted = levelCompleted,
        };
        var adaptive = AdaptiveSolver.Run(design, input, mesh, options, meshSeconds, cancellationToken);
        cancellationToken.ThrowIfCancellationRequested();
        var context = new AnalysisContext(design, input.Tags, input.Regions, adaptive.Solution);
        var analysis = DesignAnalyzer.Analyze(context, analysisOptions, adaptive.Levels[^1].Peaks);
        var warnings = new List<string>();
        foreach (int e in DesignProblemBuilder.UnmeshedElectrodes(design, input.Tags))
            warnings.Add($"Electrode '{design.Electrodes[e].Name}' has no surface facing a meshed region (it lies inside another conductor); it is not a terminal.");
        if (!adaptive.Converged)
            warnings.Add($"Adaptive refinement {adaptive.StopReason}; the figures carry the estimated errors shown, not the requested {accuracy.RelativeTolerance:P2}.");
        if (adaptive.Capacitance is { PassesPhysicsChecks: false } cap)
            warnings.AddRange(cap.Violations.Select(v => "Capacitance matrix: " + v));
        return new SolveOutcome(design, input, accuracy, adaptive, analysis, warnings, total.Elapsed.TotalSeconds);
    }
}
