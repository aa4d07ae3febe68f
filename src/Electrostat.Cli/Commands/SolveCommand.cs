using System.Globalization;
using Electrostat.Analysis;
using Electrostat.Analysis.Adaptivity;
using Electrostat.Analysis.Pipeline;
using Electrostat.Analysis.Results;
using Electrostat.Fem.Assembly;
using Electrostat.Fem.Problem;
using Electrostat.Meshing;
using Electrostat.Meshing.Input;
using Electrostat.Numerics.Parallelism;
using Electrostat.Rendering.Report;

namespace Electrostat.Cli.Commands;

/// <summary>
/// <c>electrostat solve DESIGN</c>: check, mesh, solve with adaptive refinement, analyse, write results.json and the
/// CSVs, print a summary. Exit 0 when every check passes (or none was requested), 1 when a margin or clearance check
/// fails, 2 for an input error, 3 when the solver fails, 130 when cancelled (no result file written).
/// </summary>
internal sealed class SolveCommand : ICancellableCommand
{
    public string Name => "solve";

    public string Summary => "mesh, solve (adaptive) and analyse a design; write results.json and CSVs";

    public string Usage => """
        usage: electrostat solve DESIGN.json [--out DIR] [--set name=value]... [--accuracy coarse|normal|fine|TOL]
                                             [--max-elements N] [--threads N] [--json | --quiet]
        Validates the design, meshes it, solves for the potential with adaptive refinement until the peak field
        per material and the capacitance matrix settle, then reports hot spots, margins, clearances, singular
        corners, energy and forces.
        Writes into DIR (default: DESIGN.results/ beside the design file; the design file is never modified):
          results.json                 all results, documented in docs/results.md (units in the key names)
          hotspots.csv                 the hot spots, highest first
          convergence.csv              the adaptive history (peaks, capacitances, time per level)
          surface-field-NAME.csv       |E|, normal field and surface charge along each conductor
          report.html                  self-contained report (verdict, field map, tables, cautions)
          field-map.png, field-map.svg |E| map with equipotentials and numbered hot spots
          hot-spot-1..3.png            zoomed views of the three highest hot spots
          surface-field-NAME.png       |E| along each conductor against its breakdown and margin lines
        Every file is written atomically (temporary file, then rename).
        options:
          --out DIR            output folder (created if missing)
          --set name=value     override a parameter (repeatable), e.g. --set gap=12 or --set "v_hv=25 kV"
          --accuracy LEVEL     coarse (2 %), normal (0.5 %, default), fine (0.1 %), or a tolerance such as 0.01 or 1%
          --max-elements N     element budget of the adaptive loop (default by accuracy: 50k / 200k / 1M)
          --threads N          use at most N threads in the solver kernels (default: all cores)
          --json               print results.json on stdout (nothing else on stdout; the files are still written)
          --quiet              no summary on stdout; the files and the exit code are unchanged
        Ctrl-C stops the run between adaptive levels; no result file is written (exit 130).
        exit codes: 0 all checks pass, 1 a margin or clearance check fails, 2 input error, 3 solver failure,
        130 cancelled.
        """;

    public OptionSpec Options { get; } = new(["set", "out", "accuracy", "max-elements", "threads"], ["json", "quiet"], 1, 1);

    private readonly bool? _interactive;

    /// <summary>Creates the command; <paramref name="interactive"/> overrides the terminal check for progress lines.</summary>
    public SolveCommand(bool? interactive = null) => _interactive = interactive;

    public int Run(ParsedArguments args, TextWriter stdout, TextWriter stderr) => Run(args, stdout, stderr, CancellationToken.None);

    public int Run(ParsedArguments args, TextWriter stdout, TextWriter stderr, CancellationToken token)
    {
        string designPath = args.Positionals[0];
        var overrides = DesignInput.ParseOverrides(args.Values("set"));
        var accuracy = ParseAccuracy(args.Values("accuracy"));
        int? budget = ParseBudget(args.Values("max-elements"));
        bool json = args.Has("json"), quiet = args.Has("quiet");
        int? threads = ParseThreads(args.Values("threads"));
        if (json && quiet) throw new UsageException("--json and --quiet cannot be combined (--json already prints only results.json)");
        string outDir = OutputFolder(designPath, args.Values("out"));

        var loaded = DesignInput.Load(designPath, overrides, stderr);
        if (loaded.Design is null) return ExitCodes.InputError;
        foreach (var p in loaded.Remarks) stderr.WriteLine(p.ToString());

        SolveOutcome outcome;
        try
        {
            // Progress goes to stderr, only when a person is watching (never redirected, never with --json/--quiet).
            bool showProgress = !json && !quiet && (_interactive ?? !Console.IsErrorRedirected);
            Action<AdaptiveLevel>? progress = showProgress
                ? level => stderr.WriteLine(string.Create(CultureInfo.InvariantCulture,
                    $"  level {level.Index}: {level.Triangles} triangles, {level.Iterations} CG iterations, {level.TotalSeconds:F2} s"))
                : null;
            using (threads is int n ? WorkerLimit.Scope(n) : null)
                outcome = SolvePipeline.Run(loaded.Design, accuracy, budget, levelCompleted: progress, cancellationToken: token);
        }
        catch (MeshInputException e)
        {
            stderr.WriteLine($"electrostat solve: {designPath}: the design cannot be meshed: {e.Message}");
            return ExitCodes.InputError;
        }
        catch (MeshBudgetExceededException e)
        {
            stderr.WriteLine($"electrostat solve: {designPath}: {e.Message} (or pass a larger --max-elements)");
            return ExitCodes.InputError;
        }
        catch (FieldProblemException e)
        {
            stderr.WriteLine($"electrostat solve: {designPath}: {e.Message}");
            return ExitCodes.InputError;
        }
        catch (SolveFailedException e)
        {
            stderr.WriteLine($"electrostat solve: solver failure: {e.Message}");
            return ExitCodes.SolverFailure;
        }

        // Last point to stop: once writing starts, every file is written, so a run leaves all of its files or none.
        token.ThrowIfCancellationRequested();
        string resultsJson = ResultsJsonWriter.Write(outcome, designPath);
        try
        {
            Directory.CreateDirectory(outDir);
            AtomicFile.WriteAllText(Path.Combine(outDir, "results.json"), resultsJson);
            AtomicFile.WriteAllText(Path.Combine(outDir, "hotspots.csv"), ResultsCsvWriter.HotSpots(outcome));
            AtomicFile.WriteAllText(Path.Combine(outDir, "convergence.csv"), ResultsCsvWriter.Convergence(outcome));
            foreach (var profile in outcome.Analysis.SurfaceProfiles)
                AtomicFile.WriteAllText(Path.Combine(outDir, ResultsJsonWriter.SurfaceFileName(profile.ConductorName)), profile.ToCsv());
            ReportWriter.Write(outDir, ReportInput.FromOutcome(outcome));
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            stderr.WriteLine($"electrostat solve: cannot write the results to \"{outDir}\": {e.Message} Choose another folder with --out.");
            return ExitCodes.InputError;
        }

        if (json) stdout.Write(resultsJson);
        else if (!quiet) SolveSummary.Write(outcome, designPath, outDir, stdout);
        return outcome.Analysis.Verdict == CheckVerdict.Fail ? ExitCodes.ChecksFailed : ExitCodes.Ok;
    }

    /// <summary>The output folder: --out, else DESIGN.results beside the design (never the design file itself).</summary>
    internal static string OutputFolder(string designPath, IReadOnlyList<string> outValues)
    {
        if (outValues.Count > 1) throw new UsageException("--out given more than once");
        string dir = outValues.Count == 1 ? outValues[0] : Path.Combine(Path.GetDirectoryName(Path.GetFullPath(designPath)) ?? ".", Path.GetFileNameWithoutExtension(designPath) + ".results");
        if (string.Equals(Path.GetFullPath(dir), Path.GetFullPath(designPath), StringComparison.Ordinal))
            throw new UsageException("--out names the design file itself; choose a folder");
        if (File.Exists(dir)) throw new UsageException($"--out \"{dir}\" is an existing file; choose a folder");
        return dir;
    }

    /// <summary>The --threads value: a whole number of at least 1, or null when not given.</summary>
    internal static int? ParseThreads(IReadOnlyList<string> values)
    {
        if (values.Count == 0) return null;
        if (values.Count > 1) throw new UsageException("--threads given more than once");
        if (!int.TryParse(values[0], NumberStyles.Integer, CultureInfo.InvariantCulture, out int n) || n < 1)
            throw new UsageException($"--threads \"{values[0]}\" is not a whole number of at least 1, e.g. --threads 1");
        return n;
    }

    internal static AccuracyLevel ParseAccuracy(IReadOnlyList<string> values)
    {
        if (values.Count == 0) return AccuracyLevel.Normal;
        if (values.Count > 1) throw new UsageException("--accuracy given more than once");
        string v = values[0].Trim();
        switch (v)
        {
            case "coarse": return AccuracyLevel.Coarse;
            case "normal": return AccuracyLevel.Normal;
            case "fine": return AccuracyLevel.Fine;
        }
        bool percent = v.EndsWith('%');
        if (double.TryParse(percent ? v[..^1] : v, NumberStyles.Float, CultureInfo.InvariantCulture, out double tol))
        {
            if (percent) tol /= 100;
            if (tol > 0 && tol < 0.5) return AccuracyLevel.Custom(tol);
        }
        throw new UsageException($"--accuracy expects coarse, normal, fine or a tolerance such as 0.01 or 1%, got \"{v}\"");
    }

    internal static int? ParseBudget(IReadOnlyList<string> values)
    {
        if (values.Count == 0) return null;
        if (values.Count > 1) throw new UsageException("--max-elements given more than once");
        if (int.TryParse(values[0], NumberStyles.Integer, CultureInfo.InvariantCulture, out int n) && n >= 100) return n;
        throw new UsageException($"--max-elements expects a whole number of at least 100, got \"{values[0]}\"");
    }
}
