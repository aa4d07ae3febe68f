using System.Security.Cryptography;
using Newtonsoft.Json.Linq;
using NJsonSchema;

namespace Electrostat.Cli.Tests;

public class SolveCommandTests
{
    private static string SchemaPath => Path.Combine(RepoPaths.Root, "docs", "results.schema.json");

    // What each example is meant to show: the HV fixture's air gap and the feedthrough's air at the rod's rounded end
    // fail their margins; the sensor and the validation cases pass.
    public static TheoryData<string, int> Examples() => new()
    {
        { "capacitive-sensor-pcb.json", 0 },
        { "feedthrough-axisymmetric.json", 1 },
        { "hv-electrode-over-plate.json", 1 },
        { "validation/coaxial-cylinders.json", 0 },
        { "validation/concentric-spheres.json", 0 },
        { "validation/layered-plate-capacitor.json", 0 },
    };

    [Fact]
    public void Examples_CoverEveryDesignInGeometries()
    {
        // Every scenario design at the top of geometries/ is solved here; the many closed-form cases in validation/
        // belong to the validate command and its tests.
        var listed = Examples().Select(row => Path.GetFullPath(Path.Combine(RepoPaths.Geometries, (string)row[0]))).ToHashSet(StringComparer.Ordinal);
        var topLevel = Directory.EnumerateFiles(RepoPaths.Geometries, "*.json").Select(Path.GetFullPath);
        Assert.All(topLevel, p => Assert.Contains(p, listed));
    }

    [Theory]
    [MemberData(nameof(Examples))]
    public async Task Solve_Example_ExitsAsIntended_ResultsValidate_InputUntouched_NoTempFiles(string example, int expectedExit)
    {
        string design = Path.Combine(RepoPaths.Geometries, example);
        byte[] before = SHA256.HashData(File.ReadAllBytes(design));
        string outDir = Path.Combine(Path.GetTempPath(), "electrostat-solve-" + Guid.NewGuid().ToString("N"));
        try
        {
            var (exit, stdout, stderr) = CliRun.Run("solve", design, "--out", outDir, "--accuracy", "coarse");
            Assert.True(exit == expectedExit, $"exit {exit}\n{stdout}\n{stderr}");
            Assert.Contains("caution", stdout, StringComparison.Ordinal);
            Assert.Contains("qualified", stdout, StringComparison.Ordinal);
            Assert.Equal(before, SHA256.HashData(File.ReadAllBytes(design)));

            var files = Directory.GetFiles(outDir).Select(Path.GetFileName).ToList();
            Assert.DoesNotContain(files, f => f!.EndsWith(".tmp", StringComparison.Ordinal));
            Assert.Contains("results.json", files);
            Assert.Contains("hotspots.csv", files);
            Assert.Contains("convergence.csv", files);
            // The pictures and the self-contained report are part of every solve (issue: solve writes them all).
            Assert.Contains("report.html", files);
            Assert.Contains("field-map.png", files);
            Assert.Contains("field-map.svg", files);
            Assert.Contains(files, f => f!.StartsWith("hot-spot-1", StringComparison.Ordinal));
            Assert.Contains(files, f => f!.StartsWith("surface-field-", StringComparison.Ordinal) && f.EndsWith(".png", StringComparison.Ordinal));
            string html = await File.ReadAllTextAsync(Path.Combine(outDir, "report.html"));
            Assert.DoesNotContain("http://", html, StringComparison.Ordinal);
            Assert.DoesNotContain("https://", html, StringComparison.Ordinal);

            string json = await File.ReadAllTextAsync(Path.Combine(outDir, "results.json"));
            var schema = await JsonSchema.FromFileAsync(SchemaPath);
            var errors = schema.Validate(json);
            Assert.True(errors.Count == 0, string.Join("\n", errors.Select(e => $"{e.Path}: {e.Kind}")));
            var root = JObject.Parse(json);
            Assert.Equal(expectedExit == 1 ? "fail" : "pass", (string?)root["verdict"]);
            foreach (var name in root["surface_field_files"]!.Values<string>()) Assert.Contains(name, files);
            Assert.True(root["convergence"]!.Count() >= 1);
        }
        finally
        {
            if (Directory.Exists(outDir)) Directory.Delete(outDir, recursive: true);
        }
    }

    [Fact]
    public void Solve_InvalidDesign_ExitsTwo_WritesNothing()
    {
        string design = Path.Combine(RepoPaths.Geometries, "invalid", "short-circuit.json");
        string outDir = Path.Combine(Path.GetTempPath(), "electrostat-solve-" + Guid.NewGuid().ToString("N"));
        var (exit, _, stderr) = CliRun.Run("solve", design, "--out", outDir);
        Assert.Equal(2, exit);
        Assert.Contains("error", stderr, StringComparison.Ordinal);
        Assert.False(Directory.Exists(outDir));
    }

    [Theory]
    [InlineData("--accuracy", "sloppy")]
    [InlineData("--accuracy", "0")]
    [InlineData("--max-elements", "ten")]
    public void Solve_BadOption_ExitsTwo(string option, string value)
    {
        string design = Path.Combine(RepoPaths.Geometries, "validation", "coaxial-cylinders.json");
        var (exit, _, stderr) = CliRun.Run("solve", design, option, value);
        Assert.Equal(2, exit);
        Assert.Contains(option, stderr, StringComparison.Ordinal);
    }

    [Fact]
    public void Solve_OutIsTheDesignFile_ExitsTwo_InputUntouched()
    {
        string dir = Path.Combine(Path.GetTempPath(), "electrostat-solve-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(dir);
        try
        {
            string design = Path.Combine(dir, "coax.json");
            File.Copy(Path.Combine(RepoPaths.Geometries, "validation", "coaxial-cylinders.json"), design);
            byte[] before = File.ReadAllBytes(design);
            var (exit, _, _) = CliRun.Run("solve", design, "--out", design);
            Assert.Equal(2, exit);
            Assert.Equal(before, File.ReadAllBytes(design));
        }
        finally
        {
            Directory.Delete(dir, recursive: true);
        }
    }

    [Fact]
    public void Solve_DefaultOut_IsBesideTheDesign()
    {
        string dir = Path.Combine(Path.GetTempPath(), "electrostat-solve-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(dir);
        try
        {
            string design = Path.Combine(dir, "plates.json");
            File.Copy(Path.Combine(RepoPaths.Geometries, "validation", "layered-plate-capacitor.json"), design);
            string text = File.ReadAllText(design).Replace("../../docs/", "", StringComparison.Ordinal);
            File.WriteAllText(design, text);
            var (exit, stdout, stderr) = CliRun.Run("solve", design, "--accuracy", "coarse");
            Assert.True(exit == 0, stdout + stderr);
            Assert.True(File.Exists(Path.Combine(dir, "plates.results", "results.json")));
            Assert.Equal(text, File.ReadAllText(design));
        }
        finally
        {
            Directory.Delete(dir, recursive: true);
        }
    }
}
