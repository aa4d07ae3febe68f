using System.Diagnostics;
using Electrostat.Analysis.Pipeline;
using Electrostat.Fem.Capacitance;
using Electrostat.Fem.Solving;
using Electrostat.Geometry.Model;
using Electrostat.Meshing;
using Electrostat.Meshing.Designs;
using Electrostat.Meshing.Output;

namespace Electrostat.Analysis.Adaptivity;

/// <summary>
/// The adaptive loop: solve → estimate (<see cref="ResidualErrorEstimator"/>) → mark (<see cref="DorflerMarking"/>)
/// → refine locally (<see cref="RefinableMesh.RefineTriangles(IEnumerable{int}, int)"/>) → solve again, warm-started from the previous
/// solution (<see cref="WarmStart"/>), until the peaks and capacitances settle or the element budget is reached.
/// </summary>
/// <remarks>
/// Stopping rule: after at least <see cref="AdaptiveOptions.MinLevels"/> levels, stop ("converged") when, between the
/// last two levels, every material's peak |E| (outside the singular-corner discs) changed by less than
/// <see cref="AdaptiveOptions.RelativeTolerance"/> of its value and every capacitance entry by less than that
/// fraction of √(C_ii·C_jj). Stop ("not converged") when the next level would exceed the element budget (predicted
/// from the last growth ratio) or at <see cref="AdaptiveOptions.MaxLevels"/>. The error certificate per quantity is
/// <see cref="ErrorEstimate.FromSequence"/> over the levels.
/// </remarks>
public static class AdaptiveSolver
{
    /// <summary>Runs the loop on an already meshed design.</summary>
    /// <param name="design">The design.</param>
    /// <param name="input">Its mesher input (tag and region tables).</param>
    /// <param name="mesh">The refinable initial mesh (refined in place).</param>
    /// <param name="options">Loop options.</param>
    /// <param name="initialMeshSeconds">Time already spent making the initial mesh (counted in level 0), seconds.</param>
    /// <param name="cancellationToken">Checked before each level (solve) and after each refinement; a level in progress
    /// runs to its end.</param>
    /// <returns>The result.</returns>
    /// <exception cref="Fem.Assembly.FieldProblemException">The design cannot be posed as a field problem (user error).</exception>
    /// <exception cref="SolveFailedException">A linear solve did not converge.</exception>
    /// <exception cref="OperationCanceledException"><paramref name="cancellationToken"/> was cancelled.</exception>
    public static AdaptiveResult Run(Design design, DesignMeshInput input, RefinableMesh mesh, AdaptiveOptions options, double initialMeshSeconds = 0,
        CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(design);
        ArgumentNullException.ThrowIfNull(input);
        ArgumentNullException.ThrowIfNull(mesh);
        ArgumentNullException.ThrowIfNull(options);
        var total = Stopwatch.StartNew();
        var sw = Stopwatch.StartNew();
        var levels = new List<AdaptiveLevel>();
        MeshResult current = mesh.Export();
        double meshSeconds = initialMeshSeconds + sw.Elapsed.TotalSeconds;
        double[]? warm = null;
        string reason;
        var exclusions = options.Exclusions.ToList();
        bool converged = false;
        BuiltProblem built;
        FieldSolution solution;
        CapacitanceMatrixResult? cap;
        while (true)
        {
            cancellationToken.ThrowIfCancellationRequested();
            sw.Restart();
            built = DesignProblemBuilder.Build(design, input, current.Mesh);
            var solver = new FieldSolver(built.Problem, options.Solver);
            solution = solver.Solve(warm);
            if (!solution.Report.Converged)
                throw new SolveFailedException($"The linear solver did not converge on level {levels.Count} ({solution.Report}).");
            cap = options.ComputeCapacitance && built.Problem.Conductors.Count > 0 ? solver.ComputeCapacitanceMatrix() : null;
            if (cap is not null && cap.ColumnReports.Any(r => !r.Converged))
                throw new SolveFailedException($"A capacitance solve did not converge on level {levels.Count}.");
            double solveSeconds = sw.Elapsed.TotalSeconds;
            if (levels.Count == 0 && options.ExclusionsAfterFirstSolve is { } more) exclusions.AddRange(more(built, solution));

            sw.Restart();
            var edges = MeshEdges.Build(current.Mesh);
            var eta2 = new double[current.Mesh.TriangleCount];
            double eta = ResidualErrorEstimator.Estimate(solution, edges, eta2);
            var peaks = PeakFieldMeter.Measure(built, solution, edges, exclusions);
            var level = new AdaptiveLevel(levels.Count, current.Mesh.TriangleCount, current.Mesh.VertexCount, peaks,
                cap?.Maxwell, eta, solution.Report.Iterations, meshSeconds, solveSeconds, 0);
            levels.Add(level);
            options.LevelCompleted?.Invoke(level);

            if (levels.Count >= Math.Max(2, options.MinLevels) && Settled(levels[^2], levels[^1], options.RelativeTolerance))
            {
                converged = true;
                reason = $"converged: peaks and capacitances changed by less than {options.RelativeTolerance:P2} between the last two levels";
                levels[^1] = level with { EstimateSeconds = sw.Elapsed.TotalSeconds };
                break;
            }
            int n = current.Mesh.TriangleCount;
            double growth = levels.Count >= 2 ? Math.Max(1.2, (double)n / levels[^2].Triangles) : Math.Pow(1.7, options.SplitPasses);
            if (n * growth > options.MaxTriangles)
            {
                reason = $"not converged: the next level would exceed the element budget of {options.MaxTriangles:N0} triangles";
                levels[^1] = level with { EstimateSeconds = sw.Elapsed.TotalSeconds };
                break;
            }
            if (levels.Count >= options.MaxLevels)
            {
                reason = $"not converged: reached the limit of {options.MaxLevels} levels";
                levels[^1] = level with { EstimateSeconds = sw.Elapsed.TotalSeconds };
                break;
            }
            int minCount = (int)Math.Ceiling(options.MinimumMarkedFraction * n);
            int maxCount = Math.Max(1, (int)((options.MaxTriangles - n) / (4 * Math.Pow(1.7, options.SplitPasses - 1))));
            var marked = DorflerMarking.Mark(eta2, options.Theta, minCount, maxCount);
            levels[^1] = level with { EstimateSeconds = sw.Elapsed.TotalSeconds };

            sw.Restart();
            var old = current.Mesh;
            mesh.RefineTriangles(marked, options.SplitPasses);
            current = mesh.Export();
            warm = WarmStart.Interpolate(old, solution.PotentialVolts, current.Mesh);
            meshSeconds = sw.Elapsed.TotalSeconds;
        }

        var peakErrors = new Dictionary<string, ErrorEstimate>(StringComparer.Ordinal);
        foreach (var p in levels[^1].Peaks)
        {
            var seq = levels.Select(l => l.Peaks.FirstOrDefault(q => q.MaterialName == p.MaterialName)?.FieldVoltsPerMetre ?? double.NaN)
                .Where(double.IsFinite).ToList();
            peakErrors[p.MaterialName] = ErrorEstimate.FromSequence(seq);
        }
        ErrorEstimate[,]? capErrors = null;
        if (cap is not null)
        {
            int m = cap.Count;
            capErrors = new ErrorEstimate[m, m];
            for (int i = 0; i < m; i++)
            {
                for (int j = 0; j < m; j++)
                {
                    capErrors[i, j] = ErrorEstimate.FromSequence(levels.Where(l => l.Capacitance is not null).Select(l => l.Capacitance![i, j]).ToList());
                }
            }
        }
        return new AdaptiveResult(levels, converged, reason, current, built, solution, cap, peakErrors, capErrors, exclusions, total.Elapsed.TotalSeconds + initialMeshSeconds);
    }

    /// <summary>True when every peak and capacitance entry of <paramref name="b"/> is within the tolerance of <paramref name="a"/>.</summary>
    private static bool Settled(AdaptiveLevel a, AdaptiveLevel b, double tol)
    {
        foreach (var p in b.Peaks)
        {
            var q = a.Peaks.FirstOrDefault(x => x.MaterialName == p.MaterialName);
            if (q is null || Math.Abs(p.FieldVoltsPerMetre - q.FieldVoltsPerMetre) > tol * Math.Abs(p.FieldVoltsPerMetre)) return false;
        }
        if (a.Capacitance is { } ca && b.Capacitance is { } cb)
        {
            int m = cb.GetLength(0);
            for (int i = 0; i < m; i++)
            {
                for (int j = 0; j < m; j++)
                {
                    double scale = Math.Sqrt(Math.Abs(cb[i, i] * cb[j, j]));
                    if (Math.Abs(cb[i, j] - ca[i, j]) > tol * scale) return false;
                }
            }
        }
        return true;
    }
}
