using Electrostat.Geometry.Loading;
using Electrostat.Geometry.Materials;
using Newtonsoft.Json.Linq;

namespace Electrostat.Cli.Tests.Workflow;

public class MaterialsPresetTests
{
    [Fact]
    public void EveryPreset_HasSource_PlausibleValues_UniqueName()
    {
        Assert.Equal(10, MaterialPresets.All.Count);
        Assert.Equal(MaterialPresets.All.Count, MaterialPresets.All.Select(p => p.Name).Distinct().Count());
        foreach (var p in MaterialPresets.All)
        {
            Assert.False(string.IsNullOrWhiteSpace(p.Source), p.Name);
            Assert.True(p.Source.Length > 20, p.Name);
            Assert.Contains("(from memory)", p.Source, StringComparison.Ordinal);
            // Relative permittivity of passive insulating media lies between 1 (vacuum) and ~10 (alumina);
            // breakdown between ~1 and ~100 kV/mm for the media listed (order of magnitude, from memory).
            Assert.InRange(p.RelativePermittivity, 1.0, 12.0);
            Assert.InRange(p.BreakdownFieldVoltsPerMetre, 1e6, 1e8);
        }
        Assert.Contains("humidity", MaterialPresets.Caution, StringComparison.Ordinal);
        Assert.Contains("rated", MaterialPresets.Caution, StringComparison.Ordinal);
    }

    [Fact]
    public void Design_NamesPreset_GetsPresetValues_DeclaredPresetOverrides()
    {
        string json = """
            { "units": "mm", "symmetry": "planar", "background": "air",
              "materials": { "oil": { "preset": "transformer-oil", "breakdown_field": "10 kV/mm" } },
              "enclosure": { "margin": 5 },
              "conductors": [ { "name": "a", "potential": "1 kV", "shape": { "type": "circle", "center": [0, 0], "radius": 1 } } ],
              "dielectrics": [ { "name": "d", "material": "oil", "shape": { "type": "rectangle", "min": [2, -1], "max": [4, 1] } },
                               { "name": "p", "material": "ptfe", "shape": { "type": "rectangle", "min": [-4, -1], "max": [-2, 1] } } ] }
            """;
        var r = DesignLoader.LoadFromText(json);
        Assert.False(r.HasErrors, string.Join("\n", r.Problems));
        var d = r.Design!;
        Assert.Equal(1.0006, d.BackgroundMaterial.RelativePermittivity);
        Assert.Equal(3e6, d.BackgroundMaterial.BreakdownFieldVoltsPerMetre);
        Assert.Equal(2.2, d.Materials["oil"].RelativePermittivity); // from the preset
        Assert.Equal(10e6, d.Materials["oil"].BreakdownFieldVoltsPerMetre); // overridden
        Assert.Equal(MaterialPresets.Find("ptfe")!.RelativePermittivity, d.Materials["ptfe"].RelativePermittivity);
        Assert.Contains(r.Problems, p => p.Message.Contains("built-in preset", StringComparison.Ordinal));
    }

    [Fact]
    public void Design_UnknownPreset_IsErrorWithSuggestion()
    {
        string json = """
            { "units": "mm", "symmetry": "planar", "materials": { "o": { "preset": "transformer_oil" } },
              "enclosure": { "margin": 5 },
              "conductors": [ { "name": "a", "potential": 1, "shape": { "type": "circle", "center": [0, 0], "radius": 1 } } ] }
            """;
        var r = DesignLoader.LoadFromText(json);
        Assert.True(r.HasErrors);
        Assert.Contains(r.Errors, p => p.Message.Contains("unknown material preset", StringComparison.Ordinal) && p.ToString().Contains("transformer-oil", StringComparison.Ordinal));
    }

    [Fact]
    public void MaterialsCommand_Json_ListsEveryPresetWithSource()
    {
        var (exit, stdout, _) = CliRun.Run("materials", "--json");
        Assert.Equal(0, exit);
        var root = JObject.Parse(stdout);
        var names = root["presets"]!.Select(p => (string)p["name"]!).ToList();
        Assert.Equal(MaterialPresets.All.Select(p => p.Name), names);
        Assert.All(root["presets"]!, p => Assert.False(string.IsNullOrEmpty((string?)p["source"])));
        var (exit2, text, _) = CliRun.Run("materials");
        Assert.Equal(0, exit2);
        Assert.Contains("caution", text, StringComparison.Ordinal);
    }
}
