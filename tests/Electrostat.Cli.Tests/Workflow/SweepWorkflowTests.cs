using Electrostat.Cli.Commands;
using Electrostat.Cli.Sweeps;
using Newtonsoft.Json.Linq;

namespace Electrostat.Cli.Tests.Workflow;

public class SweepWorkflowTests
{
    private const double Epsilon0 = 8.8541878128e-12; // CODATA 2018, F/m

    [Fact]
    public void Sweep_EqualsIndividualSolves_AndClosedForm()
    {
        using var dir = new WorkflowDesigns();
        string design = dir.Write("plate.json", WorkflowDesigns.PlateGap);
        string outDir = dir.PathOf("sweep");
        var (exit, stdout, stderr) = CliRun.Run("sweep", design, "--vary", "d=4..8", "--steps", "2", "--accuracy", "coarse", "--threads", "2", "--out", outDir);
        Assert.True(exit == 0, stdout + stderr);
        foreach (var f in new[] { "sweep.csv", "sweep.json", "sweep.html", "sweep-peak-field.svg", "sweep-margin.svg", "sweep-capacitance.svg" })
            Assert.True(File.Exists(Path.Combine(outDir, f)), f);
        var sweep = JObject.Parse(File.ReadAllText(Path.Combine(outDir, "sweep.json")));
        var cases = sweep["cases"]!.ToList();
        Assert.Equal(2, cases.Count);

        foreach (var c in cases)
        {
            double d = (double)c["parameters"]!["d"]!;
            var solve = CliRun.Run("solve", design, "--set", "d=" + d.ToString("R", System.Globalization.CultureInfo.InvariantCulture), "--accuracy", "coarse", "--out", dir.PathOf("solve-" + d));
            Assert.True(solve.Exit == 0 || solve.Exit == 1, solve.Err);
            var results = JObject.Parse(File.ReadAllText(Path.Combine(dir.PathOf("solve-" + d), "results.json")));
            var m = c["metrics"]!;
            double peak = (double)results["peaks"]!.Single(p => (string?)p["material"] == "gap_air")!["field_V_per_m"]!;
            double margin = (double)results["margins"]!.Single(p => (string?)p["material"] == "gap_air")!["margin"]!;
            double cap = (double)results["capacitance"]!["maxwell"]![0]![0]!;
            // The sweep runs the same pipeline on the same design: the figures agree to rounding.
            Assert.Equal(peak, (double)m["peak[gap_air]"]!, 1e-9 * peak);
            Assert.Equal(margin, (double)m["margin[gap_air]"]!, 1e-9);
            Assert.Equal(margin, (double)m["margin"]!, 1e-9);
            Assert.Equal(cap, (double)m["capacitance[upper,upper]"]!, 1e-9 * cap);
            // Closed form (uniform field, Griffiths §2.5): E = V/d, C' = ε0 w/d.
            Assert.Equal(10e3 / (d * 1e-3), peak, 1e-3 * peak);
            Assert.Equal(Epsilon0 * 10e-3 / (d * 1e-3), cap, 1e-3 * cap);
        }
    }

    [Fact]
    public void GoalSeek_FindsClosedFormGap()
    {
        using var dir = new WorkflowDesigns();
        string design = dir.Write("plate.json", WorkflowDesigns.PlateGap);
        var (exit, stdout, stderr) = CliRun.Run("sweep", design, "--vary", "d=2..10", "--steps", "3", "--goal", "margin >= 2",
            "--tolerance", "0.05", "--accuracy", "coarse", "--threads", "2", "--out", dir.PathOf("goal"), "--json");
        Assert.True(exit == 0, stdout + stderr);
        var goal = JObject.Parse(stdout)["goal"]!;
        Assert.True((bool)goal["found"]!);
        // margin = E_bd / (V/d) = 2  <=>  d = 2 V / E_bd = 2 · 10 kV / (3 kV/mm) = 20/3 mm (uniform field, Griffiths §2.5).
        double exact = 20.0 / 3.0;
        double value = (double)goal["value"]!;
        Assert.InRange(value, exact - 1e-3, exact + 0.05 + 1e-3);
        double meeting = (double)goal["meeting_case"]!["d"]!, failing = (double)goal["failing_case"]!["d"]!;
        Assert.True(failing < exact + 1e-3 && meeting > exact - 1e-3, $"bracket {failing}..{meeting}");
        Assert.True(meeting - failing <= 0.05);
        Assert.True((double)goal["meeting_case"]!["subject_value_si"]! >= 2);

        // Largest d with margin <= 2... expressed as the largest gap whose peak stays above 1.5 kV/mm: d <= 10/1.5.
        var largest = CliRun.Run("sweep", design, "--vary", "d=2..10", "--steps", "3", "--goal", "peak[gap_air] >= 1.5 kV/mm", "--largest",
            "--tolerance", "0.05", "--accuracy", "coarse", "--threads", "2", "--out", dir.PathOf("goal2"), "--json");
        Assert.True(largest.Exit == 0, largest.Out + largest.Err);
        double v2 = (double)JObject.Parse(largest.Out)["goal"]!["value"]!;
        Assert.InRange(v2, 10 / 1.5 - 0.05 - 1e-3, 10 / 1.5 + 1e-3);
    }

    [Fact]
    public void GoalSeek_OnTheFieldEnhancementFactor_FindsTheCoaxRadius()
    {
        // Coax, outer radius b = 10 mm: f = (b − a)/(a·ln(b/a)) (Gauss's law field, Griffiths ch. 2, over the mean field
        // V/(b − a)) falls as the inner radius a grows; f = 2 at a = 2.847 mm (solved by hand from the closed form).
        using var dir = new WorkflowDesigns();
        string design = dir.Write("coax.json", """
            { "units": "mm", "symmetry": "planar", "parameters": { "a": 2 },
              "enclosure": { "shape": { "type": "circle", "center": [0, 0], "radius": 10 } },
              "conductors": [ { "name": "inner", "potential": "1 kV", "shape": { "type": "circle", "center": [0, 0], "radius": "a" } } ] }
            """);
        var (exit, stdout, stderr) = CliRun.Run("sweep", design, "--vary", "a=1..5", "--steps", "3", "--goal", "enhancement <= 2",
            "--tolerance", "0.05", "--accuracy", "coarse", "--threads", "2", "--out", dir.PathOf("goal"), "--json");
        Assert.True(exit == 0, stdout + stderr);
        var goal = JObject.Parse(stdout)["goal"]!;
        Assert.True((bool)goal["found"]!);
        double a = (double)goal["value"]!;
        Assert.InRange(a, 2.847 - 0.1, 2.847 + 0.1);
    }

    [Fact]
    public void GoalSeek_Unreachable_ExitsOne()
    {
        using var dir = new WorkflowDesigns();
        string design = dir.Write("plate.json", WorkflowDesigns.PlateGap);
        var (exit, stdout, _) = CliRun.Run("sweep", design, "--vary", "d=2..4", "--steps", "2", "--goal", "margin >= 2", "--accuracy", "coarse", "--out", dir.PathOf("g"));
        Assert.Equal(1, exit);
        Assert.Contains("widen the range", stdout, StringComparison.Ordinal);
    }

    [Fact]
    public void ShardsMerged_EqualUnsharded_AndJsonMatchesFile()
    {
        using var dir = new WorkflowDesigns();
        string design = dir.Write("plate.json", WorkflowDesigns.PlateGap);
        string[] common = ["--vary", "d=3..6", "--vary", "w=8..10", "--steps", "3", "--steps", "2", "--accuracy", "coarse", "--threads", "2"];
        var whole = CliRun.Run(["sweep", design, .. common, "--out", dir.PathOf("whole"), "--json"]);
        Assert.True(whole.Exit == 0, whole.Err);
        // --json: stdout is exactly sweep.json.
        Assert.Equal(File.ReadAllText(Path.Combine(dir.PathOf("whole"), "sweep.json")).Trim(), whole.Out.Trim());
        Assert.Equal(6, JObject.Parse(whole.Out)["cases"]!.Count());

        var shards = new List<string>();
        for (int k = 1; k <= 4; k++)
        {
            string o = dir.PathOf("part-" + k);
            var r = CliRun.Run(["sweep", design, .. common, "--shard", $"{k}/4", "--out", o, "--quiet"]);
            Assert.True(r.Exit == 0, r.Err);
            Assert.Equal("", r.Out);
            shards.Add(o);
        }
        Assert.Single(JObject.Parse(File.ReadAllText(Path.Combine(shards[3], "sweep.json")))["cases"]!); // 6 cases: 2,2,1,1
        var merged = CliRun.Run(["sweep", "--merge", .. shards, "--out", dir.PathOf("merged")]);
        Assert.True(merged.Exit == 0, merged.Err);
        Assert.Equal(File.ReadAllText(Path.Combine(dir.PathOf("whole"), "sweep.csv")), File.ReadAllText(Path.Combine(dir.PathOf("merged"), "sweep.csv")));
        var a = JObject.Parse(File.ReadAllText(Path.Combine(dir.PathOf("whole"), "sweep.json")));
        var b = JObject.Parse(File.ReadAllText(Path.Combine(dir.PathOf("merged"), "sweep.json")));
        foreach (var j in new[] { a, b })
            foreach (var c in j["cases"]!) ((JObject)c).Remove("seconds"); // wall time differs run to run
        Assert.True(JToken.DeepEquals(a, b));

        // A missing shard is refused with a clear message.
        var partial = CliRun.Run(["sweep", "--merge", .. shards.Take(3), "--out", dir.PathOf("partial")]);
        Assert.Equal(2, partial.Exit);
        Assert.Contains("missing", partial.Err, StringComparison.Ordinal);
    }

    [Fact]
    public void FailedCase_IsRecorded_OthersCarryOn_ExitThree()
    {
        using var dir = new WorkflowDesigns();
        string design = dir.Write("plate.json", WorkflowDesigns.PlateGap);
        // d = -2 puts the plate outside its own enclosure (an invalid design at that value); d = 4 is fine.
        var (exit, stdout, stderr) = CliRun.Run("sweep", design, "--vary", "d=-2..4", "--steps", "2", "--accuracy", "coarse", "--out", dir.PathOf("s"));
        Assert.True(exit == 3, stdout + stderr);
        var cases = JObject.Parse(File.ReadAllText(Path.Combine(dir.PathOf("s"), "sweep.json")))["cases"]!.ToList();
        Assert.Equal("error", (string?)cases[0]["status"]);
        Assert.False(string.IsNullOrEmpty((string?)cases[0]["error"]));
        Assert.Equal("ok", (string?)cases[1]["status"]);
        Assert.Contains("error", File.ReadAllText(Path.Combine(dir.PathOf("s"), "sweep.csv")), StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("--vary", "nope=1..2")]
    [InlineData("--vary", "d=1..")]
    [InlineData("--goal", "margin >= 2")]
    [InlineData("--steps", "0")]
    public void BadArguments_ExitTwo(string option, string value)
    {
        using var dir = new WorkflowDesigns();
        string design = dir.Write("plate.json", WorkflowDesigns.PlateGap);
        string[] args = option == "--vary" ? ["sweep", design, option, value] : ["sweep", design, "--vary", "d=1..2", "--vary", "w=1..2", option, value];
        var (exit, _, stderr) = CliRun.Run(args);
        Assert.True(exit == 2, stderr);
        Assert.False(Directory.Exists(dir.PathOf("plate.sweep")));
    }

    [Theory]
    [InlineData("margin >= 2", "margin", ">=", 2.0)]
    [InlineData("peak[air] <= 5 kV/mm", "peak[air]", "<=", 5e6)]
    [InlineData("clearance[a, b] > 8", "clearance[a,b]", ">", 8e-3)]
    [InlineData("capacitance[tx,rx] < -0.5 pF", "capacitance[tx,rx]", "<", -0.5e-12)]
    [InlineData("enhancement <= 1.3", "enhancement", "<=", 1.3)]
    public void GoalGrammar_Parses(string text, string subject, string op, double threshold)
    {
        var g = SweepGoal.Parse(text);
        Assert.Equal(subject, g.Subject);
        Assert.Equal(op, g.Operator);
        Assert.Equal(threshold, g.ThresholdSi, 1e-9 * Math.Abs(threshold));
    }

    [Fact]
    public void Cancellation_StopsBetweenCases_WritesNothing()
    {
        using var dir = new WorkflowDesigns();
        string design = dir.Write("plate.json", WorkflowDesigns.PlateGap);
        string outDir = dir.PathOf("cancelled");
        using var cts = new CancellationTokenSource();
        var args = ParsedArguments.Parse([design, "--vary", "d=3..6", "--steps", "4", "--threads", "1", "--accuracy", "coarse", "--out", outDir],
            new SweepCommand().Options);
        int seen = 0;
        Assert.Throws<OperationCanceledException>(() =>
            new SweepCommand(interactive: false).Run(args, TextWriter.Null, TextWriter.Null, cts.Token, _ =>
            {
                seen++;
                cts.Cancel(); // as Ctrl-C would, right after the first case
            }));
        Assert.Equal(1, seen);
        Assert.False(Directory.Exists(outDir) && Directory.EnumerateFileSystemEntries(outDir).Any());

        // Through the runner: a cancelled run exits 130 with a clear message and writes nothing.
        using var pre = new CancellationTokenSource();
        pre.Cancel();
        var err = new StringWriter();
        int code = CommandRunner.Run(["sweep", design, "--vary", "d=3..6", "--steps", "2", "--out", outDir], TextWriter.Null, err, pre.Token);
        Assert.Equal(130, code);
        Assert.Contains("cancelled", err.ToString(), StringComparison.Ordinal);
        Assert.False(Directory.Exists(outDir) && Directory.EnumerateFileSystemEntries(outDir).Any());
    }

    [Fact]
    public void Help_ListsCommandsExamplesAndExitCodes()
    {
        var (exit, stdout, _) = CliRun.Run("--help");
        Assert.Equal(0, exit);
        foreach (var word in new[] { "init", "sweep", "materials", "examples", "130" }) Assert.Contains(word, stdout, StringComparison.Ordinal);
        foreach (var cmd in new[] { "sweep", "init", "materials" })
        {
            var h = CliRun.Run(cmd, "--help");
            Assert.Equal(0, h.Exit);
            Assert.Contains("examples:", h.Out, StringComparison.Ordinal);
        }
        Assert.Matches(@"^electrostat \d+\.\d+\.\d+", CliRun.Run("--version").Out);
    }
}
