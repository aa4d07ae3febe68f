using System.Globalization;
using Electrostat.Analysis.Results;
using Electrostat.Cli.Sweeps;
using Electrostat.Geometry.Model;

namespace Electrostat.Cli.Commands;

/// <summary>
/// <c>electrostat sweep</c>: solves a design over a grid of parameter values (cases in parallel), or seeks the
/// smallest/largest value meeting a goal, or merges the results of shards. Writes sweep.csv, sweep.json, SVG charts
/// and sweep.html; a failed case is recorded with its error while the others carry on.
/// </summary>
internal sealed class SweepCommand : ICancellableCommand
{
    /// <param name="interactive">True when a person watches stderr (progress lines); null to ask the console.</param>
    public SweepCommand(bool? interactive = null) => _interactive = interactive;

    private readonly bool? _interactive;

    public string Name => "sweep";

    public string Summary => "solve over a grid of parameter values, or seek the value meeting a goal";

    public string Usage => $"""
        usage: electrostat sweep DESIGN.json --vary name=from..to [--steps N] [--vary ...] [options]
               electrostat sweep DESIGN.json --vary name=from..to --goal "GOAL" [--largest] [--tolerance T] [options]
               electrostat sweep --merge DIR... --out DIR

        Grid: every combination of the --vary values (N evenly spaced values per parameter, ends included; the first
        --vary varies slowest) is solved like `electrostat solve --set name=value`, several cases at once. A case that
        fails is recorded with its error and the others carry on.
        Goal-seek (one --vary): scans the range with N points, brackets the first value meeting the goal, then narrows
        the bracket (bisection, or T+1-section with --threads T) to the tolerance, assuming the response is monotone.
        It reports the smallest (or with --largest the largest) value that meets the goal, with the bracketing cases.
        GOAL is {SweepGoal.Grammar}.
        Values in --vary are plain numbers in the parameter's own unit, as with --set.

        Writes into DIR (default: DESIGN.sweep/ beside the design), each file atomically:
          sweep.csv            one row per case: parameters, status, verdict, figures (SI units in the header), error
          sweep.json           the same with the axes, units and the goal's answer (docs/cli.md)
          sweep-*.svg          peak field per material, margins, clearances, capacitance entries against the parameter
          sweep.html           summary with the charts and the table

        options:
          --vary name=a..b     parameter to vary (repeatable: a grid)
          --steps N            values per --vary (default 5; give once for all, or once per --vary)
          --goal "GOAL"        seek the value meeting GOAL instead of a grid
          --largest            goal-seek: the largest value meeting GOAL (default: the smallest)
          --tolerance T        goal-seek: stop when the bracket is narrower than T (default: range / 1000)
          --shard k/N          run only cases k-1, k-1+N, k-1+2N, ... (for job arrays; see docs/scaling.md)
          --merge              combine the sweep.json of shard folders given as arguments; needs --out
          --set name=value     fixed parameter override for every case (repeatable)
          --accuracy LEVEL     coarse, normal (default), fine, or a tolerance such as 0.01 or 1%
          --max-elements N     element budget of each case
          --threads N          cases solved at once (default: number of cores)
          --out DIR            output folder
          --json               print sweep.json on stdout (nothing else on stdout)
          --quiet              no summary and no progress lines

        exit codes: 0 every case solved (grid) or goal met (goal-seek), 1 goal not met in the range, 2 input error,
        3 one or more cases failed, 130 cancelled (Ctrl-C; no files written).

        examples:
          electrostat sweep gap.json --vary gap=2..12 --steps 6
          electrostat sweep gap.json --vary gap=2..12 --goal "margin >= 2" --accuracy coarse
          electrostat sweep rod.json --vary rod_r=1..6 --goal "peak[transformer-oil] <= 6 kV/mm"
          electrostat sweep pads.json --vary target_height=1..10 --vary pad_gap=1..3 --steps 4 --shard 2/8 --out part-2
          electrostat sweep --merge part-* --out all
        """;

    public OptionSpec Options { get; } = new(
        ["vary", "steps", "goal", "tolerance", "shard", "set", "accuracy", "max-elements", "threads", "out"],
        ["largest", "merge", "json", "quiet"], 0, int.MaxValue);

    public int Run(ParsedArguments args, TextWriter stdout, TextWriter stderr) => Run(args, stdout, stderr, CancellationToken.None);

    /// <summary>Runs with a cancellation token; the optional callback sees each case as it finishes (tests use it to cancel mid-run).</summary>
    public int Run(ParsedArguments args, TextWriter stdout, TextWriter stderr, CancellationToken token) => Run(args, stdout, stderr, token, null);

    internal int Run(ParsedArguments args, TextWriter stdout, TextWriter stderr, CancellationToken token, Action<SweepCase>? observer)
    {
        bool json = args.Has("json"), quiet = args.Has("quiet");
        var progress = new ProgressLine(stderr, !json && !quiet && (_interactive ?? !Console.IsErrorRedirected));
        if (args.Has("merge")) return Merge(args, stdout, stderr, json, quiet);

        if (args.Positionals.Count != 1) throw new UsageException(args.Positionals.Count == 0 ? "missing the design file" : $"unexpected argument \"{args.Positionals[1]}\"");
        string designPath = args.Positionals[0];
        var fixedOverrides = DesignInput.ParseOverrides(args.Values("set"));
        var accuracy = SolveCommand.ParseAccuracy(args.Values("accuracy"));
        int? budget = SolveCommand.ParseBudget(args.Values("max-elements"));
        int threads = ParseThreads(args.Values("threads"));
        var axes = ParseAxes(args.Values("vary"), args.Values("steps"));
        string outDir = OutputFolder(designPath, args.Values("out"));
        SweepGoal? goal = args.Values("goal") switch
        {
            [] => null,
            [var g] => SweepGoal.Parse(g),
            _ => throw new UsageException("--goal given more than once"),
        };
        if (goal is null && (args.Has("largest") || args.Values("tolerance").Count > 0)) throw new UsageException("--largest and --tolerance belong to --goal");
        if (goal is not null && axes.Count != 1) throw new UsageException("--goal seeks one parameter: give exactly one --vary");
        if (goal is not null && args.Values("shard").Count > 0) throw new UsageException("--shard applies to grid sweeps, not to --goal (a goal-seek is sequential)");

        var base_ = DesignInput.Load(designPath, fixedOverrides, stderr);
        if (base_.Design is null) return ExitCodes.InputError;
        foreach (var a in axes)
            if (!base_.Design.Parameters.ContainsKey(a.Name))
                throw new UsageException($"--vary {a.Name}: the design has no parameter \"{a.Name}\" (it has: {string.Join(", ", base_.Design.Parameters.Keys)})");
        if (fixedOverrides.Keys.Intersect(axes.Select(a => a.Name)).FirstOrDefault() is { } both)
            throw new UsageException($"\"{both}\" is both fixed with --set and varied with --vary; drop one");
        var settings = new SweepSettings(designPath, fixedOverrides, accuracy, budget, threads);
        bool planar = base_.Design.Symmetry == Symmetry.Planar;
        double? requiredMargin = base_.Design.Checks.MinMargin;

        SweepReport report;
        int exit;
        if (goal is not null)
        {
            double tol = ParseTolerance(args.Values("tolerance"), axes[0]);
            if (axes[0].Steps < 2) throw new UsageException("--goal needs at least 2 scan points (--steps 2 or more)");
            if (progress.Enabled) stderr.WriteLine($"seeking the {(args.Has("largest") ? "largest" : "smallest")} {axes[0].Name} with {goal.Text} ...");
            var result = GoalSeeker.Seek(settings, axes[0], goal, args.Has("largest"), tol, c => { progress.CaseDone(c, 0); observer?.Invoke(c); }, token);
            var ordered = result.Cases.OrderBy(c => c.Parameters[axes[0].Name]).ToList();
            report = new SweepReport(designPath, axes, result.Cases.Count, null, planar, accuracy.Name, fixedOverrides, ordered, goal, result, args.Has("largest"), requiredMargin);
            exit = result.Found ? ExitCodes.Ok : ExitCodes.ChecksFailed;
        }
        else
        {
            var all = SweepPlan.Cases(axes);
            string? shardText = null;
            var cases = all;
            if (args.Values("shard") is [var sh])
            {
                var (k, n) = SweepPlan.ParseShard(sh);
                cases = SweepPlan.Shard(all, k, n);
                shardText = string.Create(CultureInfo.InvariantCulture, $"{k}/{n}");
            }
            else if (args.Values("shard").Count > 1) throw new UsageException("--shard given more than once");
            if (progress.Enabled) stderr.WriteLine($"solving {cases.Count} case{(cases.Count == 1 ? "" : "s")}{(shardText is null ? "" : $" (shard {shardText} of {all.Count})")}, {threads} at a time ...");
            var solved = CaseRunner.RunAll(settings, cases, c => { progress.CaseDone(c, cases.Count); observer?.Invoke(c); }, token);
            report = new SweepReport(designPath, axes, all.Count, shardText, planar, accuracy.Name, fixedOverrides, solved, RequiredMargin: requiredMargin);
            exit = solved.Any(c => !c.Ok) ? ExitCodes.SolverFailure : ExitCodes.Ok;
        }
        token.ThrowIfCancellationRequested();
        int written = Write(report, outDir, stdout, stderr, json, quiet);
        return written != ExitCodes.Ok ? written : exit;
    }

    private static int Merge(ParsedArguments args, TextWriter stdout, TextWriter stderr, bool json, bool quiet)
    {
        if (args.Values("vary").Count > 0 || args.Values("goal").Count > 0 || args.Values("shard").Count > 0)
            throw new UsageException("--merge combines finished shards; it takes no --vary, --goal or --shard");
        if (args.Values("out") is not [var outDir]) throw new UsageException("--merge needs --out DIR (once) for the combined results");
        if (File.Exists(outDir)) throw new UsageException($"--out \"{outDir}\" is an existing file; choose a folder");
        var report = SweepMerge.Merge(args.Positionals);
        int w = Write(report, outDir, stdout, stderr, json, quiet);
        return w != ExitCodes.Ok ? w : report.Cases.Any(c => !c.Ok) ? ExitCodes.SolverFailure : ExitCodes.Ok;
    }

    private static int Write(SweepReport r, string outDir, TextWriter stdout, TextWriter stderr, bool json, bool quiet)
    {
        string jsonText = SweepFiles.Json(r);
        try
        {
            Directory.CreateDirectory(outDir);
            var svgs = SweepCharts.Svgs(r);
            AtomicFile.WriteAllText(Path.Combine(outDir, "sweep.csv"), SweepFiles.Csv(r));
            AtomicFile.WriteAllText(Path.Combine(outDir, "sweep.json"), jsonText);
            foreach (var (name, svg) in svgs) AtomicFile.WriteAllText(Path.Combine(outDir, name), svg);
            AtomicFile.WriteAllText(Path.Combine(outDir, "sweep.html"), SweepCharts.Html(r, svgs));
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            stderr.WriteLine($"electrostat sweep: cannot write the results to \"{outDir}\": {e.Message} Choose another folder with --out.");
            return ExitCodes.InputError;
        }
        if (json) stdout.WriteLine(jsonText);
        else if (!quiet) PrintSummary(r, outDir, stdout);
        foreach (var c in r.Cases.Where(c => !c.Ok)) stderr.WriteLine(string.Create(CultureInfo.InvariantCulture, $"electrostat sweep: case {c.Index} ({Values(c)}) failed: {c.Error}"));
        return ExitCodes.Ok;
    }

    private static string Values(SweepCase c) => string.Join(", ", c.Parameters.Select(p => $"{p.Key}={p.Value.ToString("G6", CultureInfo.InvariantCulture)}"));

    private static void PrintSummary(SweepReport r, string outDir, TextWriter w)
    {
        var c = CultureInfo.InvariantCulture;
        w.WriteLine($"design     {r.DesignPath}");
        w.WriteLine(string.Create(c, $"cases      {r.Cases.Count} solved{(r.Shard is null ? "" : $" (shard {r.Shard} of {r.TotalCases})")}, {r.Cases.Count(k => !k.Ok)} failed; accuracy {r.Accuracy}"));
        string[] shown = ["margin", "clearance"];
        var cols = r.MetricNames().Where(m => shown.Contains(m) || m.StartsWith("peak[", StringComparison.Ordinal)).ToList();
        w.WriteLine("  " + string.Join(" ", r.Axes.Select(a => a.Name.PadLeft(12)).Concat(["verdict".PadLeft(12)]).Concat(cols.Select(m => Head(m).PadLeft(16)))));
        foreach (var k in r.Cases)
        {
            var cells = r.Axes.Select(a => (k.Parameters.TryGetValue(a.Name, out double v) ? v.ToString("G6", c) : "").PadLeft(12)).ToList();
            cells.Add((k.Verdict ?? "FAILED").PadLeft(12));
            cells.AddRange(cols.Select(m => (k.Metrics.TryGetValue(m, out var x) && x is double d ? Show(m, d) : "-").PadLeft(16)));
            w.WriteLine("  " + string.Join(" ", cells));
        }
        if (r.GoalResult is { } g)
        {
            w.WriteLine("goal       " + g.Message);
            foreach (var s in g.Warnings) w.WriteLine("warning: " + s);
        }
        w.WriteLine($"results    {outDir}{Path.DirectorySeparatorChar}sweep.csv (+ sweep.json, sweep.html, sweep-*.svg)");
        w.WriteLine("caution    " + ResultsJsonWriter.Caution);
    }

    private static string Head(string m) => m.StartsWith("peak[", StringComparison.Ordinal) ? m + " kV/mm" : m == "clearance" ? "clearance mm" : m;

    private static string Show(string m, double v) => (m.StartsWith("peak[", StringComparison.Ordinal) ? v * 1e-6 : m == "clearance" ? v * 1e3 : v).ToString("G5", CultureInfo.InvariantCulture);

    private static List<SweepAxis> ParseAxes(IReadOnlyList<string> vary, IReadOnlyList<string> steps)
    {
        if (vary.Count == 0) throw new UsageException("give at least one --vary name=from..to");
        if (steps.Count > 1 && steps.Count != vary.Count) throw new UsageException("give --steps once (for every --vary) or once per --vary");
        var counts = steps.Select(s => int.TryParse(s, NumberStyles.Integer, CultureInfo.InvariantCulture, out int n) && n >= 1 && n <= 10_000
            ? n : throw new UsageException($"--steps expects a whole number from 1 to 10000, got \"{s}\"")).ToList();
        var axes = vary.Select((v, i) => SweepAxis.Parse(v, counts.Count == 0 ? 5 : counts[Math.Min(i, counts.Count - 1)])).ToList();
        if (axes.Select(a => a.Name).Distinct(StringComparer.Ordinal).Count() != axes.Count) throw new UsageException("a parameter is given to --vary twice");
        return axes;
    }

    private static int ParseThreads(IReadOnlyList<string> values) => values switch
    {
        [] => Environment.ProcessorCount,
        [var t] when int.TryParse(t, NumberStyles.Integer, CultureInfo.InvariantCulture, out int n) && n >= 1 && n <= 1024 => n,
        [var t] => throw new UsageException($"--threads expects a whole number of at least 1, got \"{t}\""),
        _ => throw new UsageException("--threads given more than once"),
    };

    private static double ParseTolerance(IReadOnlyList<string> values, SweepAxis axis) => values switch
    {
        [] => Math.Abs(axis.To - axis.From) / 1000,
        [var t] when double.TryParse(t, NumberStyles.Float, CultureInfo.InvariantCulture, out double x) && x > 0 && double.IsFinite(x) => x,
        [var t] => throw new UsageException($"--tolerance expects a positive number in the parameter's unit, got \"{t}\""),
        _ => throw new UsageException("--tolerance given more than once"),
    };

    private static string OutputFolder(string designPath, IReadOnlyList<string> outValues)
    {
        if (outValues.Count > 1) throw new UsageException("--out given more than once");
        string dir = outValues.Count == 1 ? outValues[0]
            : Path.Combine(Path.GetDirectoryName(Path.GetFullPath(designPath)) ?? ".", Path.GetFileNameWithoutExtension(designPath) + ".sweep");
        if (string.Equals(Path.GetFullPath(dir), Path.GetFullPath(designPath), StringComparison.Ordinal))
            throw new UsageException("--out names the design file itself; choose a folder");
        if (File.Exists(dir)) throw new UsageException($"--out \"{dir}\" is an existing file; choose a folder");
        return dir;
    }
}
