using Electrostat.Analysis;
using Electrostat.Analysis.Adaptivity;
using Electrostat.Analysis.Pipeline;
using Electrostat.Cli.Commands;
using Newtonsoft.Json.Linq;

namespace Electrostat.Cli.Tests;

/// <summary><c>solve --json</c>, <c>--quiet</c> and cancellation.</summary>
public sealed class SolveOptionsTests : IDisposable
{
    private static string Design => Path.Combine(RepoPaths.Geometries, "validation", "coaxial-cylinders.json");

    private readonly string _outDir = Path.Combine(Path.GetTempPath(), "electrostat-solve-options-" + Guid.NewGuid().ToString("N"));

    public void Dispose()
    {
        if (Directory.Exists(_outDir)) Directory.Delete(_outDir, recursive: true);
    }

    [Fact]
    public void Json_PrintsExactlyResultsJson_AndNothingElse()
    {
        var (exit, stdout, stderr) = CliRun.Run("solve", Design, "--out", _outDir, "--accuracy", "coarse", "--json");
        Assert.True(exit == 0, $"exit {exit}\n{stderr}");
        string written = File.ReadAllText(Path.Combine(_outDir, "results.json"));
        Assert.Equal(written, stdout);
        var parsed = JObject.Parse(stdout);
        Assert.True(JToken.DeepEquals(JObject.Parse(written), parsed));
        Assert.Equal("pass", (string?)parsed["verdict"]);
        Assert.True(File.Exists(Path.Combine(_outDir, "hotspots.csv")));
    }

    [Fact]
    public void Quiet_PrintsNothingOnStdout_StillWritesFilesAndExitCode()
    {
        var (exit, stdout, stderr) = CliRun.Run("solve", Design, "--out", _outDir, "--accuracy", "coarse", "--quiet");
        Assert.True(exit == 0, $"exit {exit}\n{stderr}");
        Assert.Equal("", stdout);
        Assert.True(File.Exists(Path.Combine(_outDir, "results.json")));
        Assert.True(File.Exists(Path.Combine(_outDir, "convergence.csv")));
    }

    [Fact]
    public void Quiet_FailingChecks_StillExitsOne()
    {
        // The HV fixture's air gap fails its margin at coarse accuracy (see SolveCommandTests.Examples).
        string design = Path.Combine(RepoPaths.Geometries, "hv-electrode-over-plate.json");
        var (exit, stdout, stderr) = CliRun.Run("solve", design, "--out", _outDir, "--accuracy", "coarse", "--quiet");
        Assert.True(exit == ExitCodes.ChecksFailed, $"exit {exit}\n{stderr}");
        Assert.Equal("", stdout);
    }

    [Fact]
    public void JsonAndQuiet_Together_ExitsTwo()
    {
        var (exit, _, stderr) = CliRun.Run("solve", Design, "--out", _outDir, "--json", "--quiet");
        Assert.Equal(ExitCodes.InputError, exit);
        Assert.Contains("--json", stderr, StringComparison.Ordinal);
    }

    [Fact]
    public void Cancelled_BeforeStart_Exits130_WritesNothing()
    {
        using var cts = new CancellationTokenSource();
        cts.Cancel();
        var o = new StringWriter();
        var e = new StringWriter();
        int exit = CommandRunner.Run(["solve", Design, "--out", _outDir, "--accuracy", "coarse"], o, e, cts.Token);
        Assert.Equal(Cancellation.ExitCode, exit);
        Assert.Equal(130, exit);
        Assert.False(Directory.Exists(_outDir));
        Assert.Equal("", o.ToString());
        Assert.Contains("cancelled", e.ToString(), StringComparison.Ordinal);
    }

    [Fact]
    public void Solve_SupportsCancellation()
    {
        Assert.True(CommandRunner.SupportsCancellation(["solve", Design]));
    }

    [Fact]
    public void Pipeline_CancelledFromLevelCallback_StopsBeforeTheNextLevel()
    {
        var loaded = DesignInput.Load(Design, new Dictionary<string, string>(), TextWriter.Null);
        Assert.NotNull(loaded.Design);
        using var cts = new CancellationTokenSource();
        var levels = new List<AdaptiveLevel>();
        Assert.ThrowsAny<OperationCanceledException>(() => SolvePipeline.Run(loaded.Design!, AccuracyLevel.Coarse, levelCompleted: level =>
        {
            levels.Add(level);
            cts.Cancel();
        }, cancellationToken: cts.Token));
        // The loop needs at least two levels to converge; cancelling after the first stops it there.
        Assert.Single(levels);
        Assert.Equal(0, levels[0].Index);
    }

    [Fact]
    public void Pipeline_LevelCallback_SeesEveryLevelOfAnUncancelledRun()
    {
        var loaded = DesignInput.Load(Design, new Dictionary<string, string>(), TextWriter.Null);
        var levels = new List<AdaptiveLevel>();
        var outcome = SolvePipeline.Run(loaded.Design!, AccuracyLevel.Coarse, levelCompleted: levels.Add);
        Assert.Equal(outcome.Adaptive.Levels.Count, levels.Count);
        Assert.True(levels.Count >= 2);
    }
}
