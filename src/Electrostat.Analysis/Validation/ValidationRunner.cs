using System.Diagnostics;
using Electrostat.Analysis.Pipeline;
using Electrostat.Geometry.Loading;

namespace Electrostat.Analysis.Validation;

/// <summary>Loads and solves the validation designs once each and measures every case.</summary>
public static class ValidationRunner
{
    /// <summary>Runs the cases.</summary>
    /// <param name="designFolder">The folder holding the validation designs (geometries/validation).</param>
    /// <param name="cases">The cases to run; null for <see cref="ValidationSuite.Cases"/>.</param>
    /// <param name="accuracy">Accuracy level; null for <see cref="AccuracyLevel.Normal"/> (the default of <c>solve</c>).</param>
    /// <param name="progress">Called with each design file name before it is solved, and its time after; may be null.</param>
    /// <returns>One row per case, in order.</returns>
    public static IReadOnlyList<ValidationRow> Run(string designFolder, IReadOnlyList<ValidationCase>? cases = null,
        AccuracyLevel? accuracy = null, Action<string>? progress = null)
    {
        ArgumentNullException.ThrowIfNull(designFolder);
        cases ??= ValidationSuite.Cases;
        var solved = new Dictionary<string, (SolveOutcome? Outcome, string? Failure)>();
        var rows = new List<ValidationRow>();
        foreach (var c in cases)
        {
            var outcomes = new List<SolveOutcome>();
            string? failure = null;
            foreach (string file in c.DesignFiles)
            {
                if (!solved.TryGetValue(file, out var entry))
                {
                    progress?.Invoke($"solving {file} ...");
                    entry = Solve(Path.Combine(designFolder, file), accuracy);
                    solved[file] = entry;
                    progress?.Invoke(entry.Outcome is { } o
                        ? $"  {file}: {o.Adaptive.Mesh.Mesh.TriangleCount} triangles, {o.TotalSeconds:0.0} s"
                        : $"  {file}: FAILED: {entry.Failure}");
                }
                if (entry.Outcome is null) failure ??= entry.Failure;
                else outcomes.Add(entry.Outcome);
            }
            int elements = outcomes.Sum(o => o.Adaptive.Mesh.Mesh.TriangleCount);
            double seconds = outcomes.Sum(o => o.TotalSeconds);
            ValidationMeasurement? measurement = null;
            if (failure is null)
            {
                try
                {
                    measurement = c.Measure(outcomes);
                }
                catch (InvalidOperationException e)
                {
                    failure = e.Message;
                }
            }
            rows.Add(new ValidationRow(c, measurement, elements, seconds, failure));
        }
        return rows;
    }

    private static (SolveOutcome? Outcome, string? Failure) Solve(string path, AccuracyLevel? accuracy)
    {
        if (!File.Exists(path)) return (null, $"design file not found: {path}");
        var loaded = DesignLoader.Load(path);
        if (loaded.HasErrors || loaded.Design is null)
            return (null, string.Join("; ", loaded.Errors.Select(p => p.ToString())));
        var watch = Stopwatch.StartNew();
        try
        {
            return (SolvePipeline.Run(loaded.Design, accuracy), null);
        }
#pragma warning disable CA1031 // A case that cannot be solved becomes a failed row with its message; the other cases still run.
        catch (Exception e)
#pragma warning restore CA1031
        {
            return (null, $"{e.GetType().Name}: {e.Message} (after {watch.Elapsed.TotalSeconds:0.0} s)");
        }
    }
}
