using Newtonsoft.Json.Linq;

namespace Electrostat.Cli.Tests;

public class CheckJsonTests
{
    [Fact]
    public void Json_ValidExample_ReportsValidAndTheSummaryInSiUnits()
    {
        string design = Path.Combine(RepoPaths.Geometries, "hv-electrode-over-plate.json");
        var (exit, stdout, _) = CliRun.Run("check", design, "--json");
        Assert.Equal(0, exit);
        var root = JObject.Parse(stdout); // nothing but JSON on stdout
        Assert.True((bool)root["valid"]!);
        Assert.Equal("planar", (string?)root["design"]!["symmetry"]);
        Assert.Contains(root["design"]!["conductors"]!, c => (string?)c["name"] == "hv_bar");
    }

    [Fact]
    public void Json_OpenSpaceDesign_GivesTheTruncationCircle()
    {
        // isolated-sphere.json: a 10 mm sphere, margin 15 mm beyond the bounding box's corner (√2·10 mm from the centre).
        var (exit, stdout, _) = CliRun.Run("check", Path.Combine(RepoPaths.Geometries, "validation", "isolated-sphere.json"), "--json");
        Assert.Equal(0, exit);
        var open = JObject.Parse(stdout)["design"]!["open_space"]!;
        Assert.Equal((Math.Sqrt(2) * 10 + 15) * 1e-3, (double)open["radius_m"]!, 12);
        Assert.Equal([0.0, 0.0], open["center_m"]!.Select(v => (double)v));
        var closed = JObject.Parse(CliRun.Run("check", Path.Combine(RepoPaths.Geometries, "hv-electrode-over-plate.json"), "--json").Out);
        Assert.Equal(JTokenType.Null, closed["design"]!["open_space"]!.Type);
    }

    [Fact]
    public void Json_InvalidDesign_ExitsTwo_AndLocatesEveryProblem()
    {
        string path = Path.Combine(Path.GetTempPath(), "electrostat-check-json-" + Guid.NewGuid().ToString("N") + ".json");
        File.WriteAllText(path, "{\n  \"units\": \"mm\",\n  \"symetry\": \"planar\"\n}\n");
        try
        {
            var (exit, stdout, _) = CliRun.Run("check", path, "--json");
            Assert.Equal(2, exit);
            var root = JObject.Parse(stdout);
            Assert.False((bool)root["valid"]!);
            var typo = root["problems"]!.First(p => ((string?)p["message"] ?? "").Contains("symetry", StringComparison.Ordinal));
            Assert.Equal(3, (int)typo["line"]!);
            Assert.True((int)typo["column"]! > 0);
            Assert.Null(root["design"]);
        }
        finally
        {
            File.Delete(path);
        }
    }

    [Fact]
    public void Quiet_ValidExample_PrintsNothing()
    {
        var (exit, stdout, _) = CliRun.Run("check", Path.Combine(RepoPaths.Geometries, "capacitive-sensor-pcb.json"), "--quiet");
        Assert.Equal(0, exit);
        Assert.Equal("", stdout);
    }
}
