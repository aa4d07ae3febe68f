using Electrostat.Cli.Commands;
using Newtonsoft.Json.Linq;

namespace Electrostat.Cli.Tests;

public class SolveThreadsAndProgressTests
{
    private static string Design => Path.Combine(RepoPaths.Geometries, "validation", "coaxial-cylinders.json");

    private static JObject SolveJson(params string[] extra)
    {
        string outDir = Path.Combine(Path.GetTempPath(), "electrostat-threads-" + Guid.NewGuid().ToString("N"));
        try
        {
            var (exit, stdout, stderr) = CliRun.Run(["solve", Design, "--out", outDir, "--accuracy", "coarse", "--json", .. extra]);
            Assert.True(exit == 0, $"exit {exit}\n{stderr}");
            return JObject.Parse(stdout);
        }
        finally
        {
            if (Directory.Exists(outDir)) Directory.Delete(outDir, recursive: true);
        }
    }

    [Fact]
    public void Threads_One_GivesTheSameFiguresAsAllCores()
    {
        // Only the order of floating-point reductions may differ between thread counts: agree to round-off.
        var all = SolveJson();
        var one = SolveJson("--threads", "1");
        var a = all.SelectTokens("$.capacitance.maxwell[*][*]").Select(t => (double)t!).ToArray();
        var b = one.SelectTokens("$.capacitance.maxwell[*][*]").Select(t => (double)t!).ToArray();
        Assert.NotEmpty(a);
        Assert.Equal(a.Length, b.Length);
        for (int i = 0; i < a.Length; i++) Assert.Equal(a[i], b[i], 1e-9 * Math.Abs(a[i]));
    }

    [Theory]
    [InlineData("0")]
    [InlineData("two")]
    public void Threads_Invalid_ExitsTwo(string value)
    {
        var (exit, _, stderr) = CliRun.Run("solve", Design, "--threads", value);
        Assert.Equal(2, exit);
        Assert.Contains("--threads", stderr, StringComparison.Ordinal);
    }

    [Fact]
    public void Progress_OnAnInteractiveTerminal_PrintsOneLinePerLevelOnStderr()
    {
        string outDir = Path.Combine(Path.GetTempPath(), "electrostat-progress-" + Guid.NewGuid().ToString("N"));
        try
        {
            var command = new SolveCommand(interactive: true);
            var args = ParsedArguments.Parse([Design, "--out", outDir, "--accuracy", "coarse"], command.Options);
            var stdout = new StringWriter();
            var stderr = new StringWriter();
            int exit = command.Run(args, stdout, stderr);
            Assert.Equal(0, exit);
            Assert.Contains("level 0:", stderr.ToString(), StringComparison.Ordinal);
            Assert.DoesNotContain("level 0:", stdout.ToString(), StringComparison.Ordinal);
        }
        finally
        {
            if (Directory.Exists(outDir)) Directory.Delete(outDir, recursive: true);
        }
    }
}
