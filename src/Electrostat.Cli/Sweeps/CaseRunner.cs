using System.Diagnostics;
using System.Globalization;
using Electrostat.Analysis;
using Electrostat.Analysis.Pipeline;
using Electrostat.Fem.Assembly;
using Electrostat.Geometry.Loading;
using Electrostat.Meshing;
using Electrostat.Meshing.Input;

namespace Electrostat.Cli.Sweeps;

/// <summary>Solves one case: the design with the fixed and varied overrides, through the same pipeline as <c>solve</c>.</summary>
internal static class CaseRunner
{
    /// <summary>Override text for a varied value: round-trip formatting, so a case is reproducible with <c>solve --set</c>.</summary>
    public static string Text(double value) => value.ToString("R", CultureInfo.InvariantCulture);

    /// <summary>Runs the case; never throws for a problem of the case itself (it is recorded as "error").</summary>
    public static SweepCase Run(SweepSettings s, int index, IReadOnlyDictionary<string, double> parameters)
    {
        var clock = Stopwatch.StartNew();
        var overrides = new Dictionary<string, string>(s.FixedOverrides, StringComparer.Ordinal);
        foreach (var (name, value) in parameters) overrides[name] = Text(value);
        string? error;
        try
        {
            var loaded = DesignLoader.Load(s.DesignPath, overrides);
            if (loaded.Design is null)
            {
                error = "invalid design at these values: " + string.Join("; ", loaded.Errors.Select(p => p.ToString().Split('\n')[0]));
            }
            else
            {
                var outcome = SolvePipeline.Run(loaded.Design, s.Accuracy, s.MaxTriangles);
                return new SweepCase(index, parameters, "ok", Analysis.Results.ResultsJsonWriter.Verdict(outcome.Analysis.Verdict),
                    CaseMetrics.From(outcome), null, clock.Elapsed.TotalSeconds);
            }
        }
        catch (Exception e) when (e is MeshInputException or MeshBudgetExceededException or FieldProblemException)
        {
            error = "cannot be solved: " + e.Message;
        }
        catch (SolveFailedException e)
        {
            error = "solver failure: " + e.Message;
        }
#pragma warning disable CA1031 // One broken case must not stop the others; the error is recorded with the case.
        catch (Exception e) when (e is not OperationCanceledException)
#pragma warning restore CA1031
        {
            error = $"internal error ({e.GetType().Name}: {e.Message}); please report it with the design file";
        }
        return new SweepCase(index, parameters, "error", null, new Dictionary<string, double?>(), error, clock.Elapsed.TotalSeconds);
    }

    /// <summary>Runs cases in parallel (at most <see cref="SweepSettings.Threads"/> at once), in any order; results come
    /// back sorted by index. Cancellation stops starting new cases and throws <see cref="OperationCanceledException"/>.</summary>
    public static List<SweepCase> RunAll(SweepSettings s, IReadOnlyList<(int Index, IReadOnlyDictionary<string, double> Parameters)> cases,
        Action<SweepCase>? done, CancellationToken token)
    {
        var results = new SweepCase[cases.Count];
        var options = new ParallelOptions { MaxDegreeOfParallelism = Math.Max(1, s.Threads), CancellationToken = token };
        Parallel.For(0, cases.Count, options, (k, state) =>
        {
            if (token.IsCancellationRequested)
            {
                state.Stop();
                return;
            }
            results[k] = Run(s, cases[k].Index, cases[k].Parameters);
            done?.Invoke(results[k]);
        });
        token.ThrowIfCancellationRequested();
        return results.OrderBy(r => r.Index).ToList();
    }
}
