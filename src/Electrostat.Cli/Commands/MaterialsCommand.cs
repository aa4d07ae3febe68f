using System.Globalization;
using System.Text.Json;
using Electrostat.Geometry.Materials;

namespace Electrostat.Cli.Commands;

/// <summary><c>electrostat materials</c>: lists the built-in material presets with their sources and the caution.</summary>
internal sealed class MaterialsCommand : ICommand
{
    public string Name => "materials";

    public string Summary => "list the built-in material presets (typical permittivity and breakdown field, with sources)";

    public string Usage => """
        usage: electrostat materials [--json]

        Lists the built-in material presets. A design uses one by naming it ("background": "air",
        "material": "ptfe") or declares it with overrides:
          "materials": { "oil": { "preset": "transformer-oil", "breakdown_field": "10 kV/mm" } }
        Breakdown figures are typical, not rated: enter the rated value for your own material.

        options:
          --json    the table as JSON on stdout (fields in V/m)

        examples:
          electrostat materials
          electrostat materials --json
        """;

    public OptionSpec Options { get; } = new([], ["json"], 0, 0);

    public int Run(ParsedArguments args, TextWriter stdout, TextWriter stderr)
    {
        var c = CultureInfo.InvariantCulture;
        if (args.Has("json"))
        {
            var doc = new
            {
                caution = MaterialPresets.Caution,
                presets = MaterialPresets.All.Select(p => new
                {
                    name = p.Name,
                    description = p.Description,
                    relative_permittivity = p.RelativePermittivity,
                    breakdown_field_V_per_m = p.BreakdownFieldVoltsPerMetre,
                    source = p.Source,
                }),
            };
            stdout.WriteLine(JsonSerializer.Serialize(doc, new JsonSerializerOptions { WriteIndented = true }));
            return ExitCodes.Ok;
        }
        stdout.WriteLine($"{"name",-16} {"eps_r",-8} {"breakdown",-12} description");
        foreach (var p in MaterialPresets.All)
        {
            stdout.WriteLine(string.Create(c, $"{p.Name,-16} {p.RelativePermittivity,-8:G5} {p.BreakdownFieldVoltsPerMetre * 1e-6,5:G3} kV/mm  {p.Description}"));
            stdout.WriteLine($"{"",-16} source: {p.Source}");
        }
        stdout.WriteLine();
        stdout.WriteLine("caution: " + MaterialPresets.Caution);
        return ExitCodes.Ok;
    }
}
