using Electrostat.Geometry.Loading;
using Electrostat.Geometry.Model;
using Newtonsoft.Json;
using Newtonsoft.Json.Linq;

namespace Electrostat.Cli.Commands;

/// <summary>
/// The machine-readable form of <c>electrostat check --json</c>: validity, every problem with its location, and (for a
/// valid design) the summary in SI units, with the unit in every key name.
/// </summary>
internal static class CheckJson
{
    /// <summary>Serialises a load result as indented JSON.</summary>
    public static string Write(DesignLoadResult result)
    {
        var root = new JObject
        {
            ["schema"] = "electrostat-check",
            ["schema_version"] = 1,
            ["valid"] = !result.HasErrors,
            ["problems"] = new JArray(result.Problems.Select(Problem)),
        };
        if (result.Design is { } d) root["design"] = Summary(d);
        return root.ToString(Formatting.Indented) + Environment.NewLine;
    }

    private static JObject Problem(DesignProblem p)
    {
        var o = new JObject
        {
            ["severity"] = p.Severity.ToString().ToLowerInvariant(),
            ["file"] = p.Source,
            ["json_path"] = p.JsonPath,
            ["line"] = p.Line,
            ["column"] = p.Column,
            ["message"] = p.Message,
            ["fix"] = p.Hint,
        };
        if (p.Coordinate is { } c) o["coordinate_m"] = new JArray(c.X, c.Y);
        return o;
    }

    private static JObject Summary(Design d) => new()
    {
        ["title"] = d.Title,
        ["symmetry"] = d.Symmetry == Symmetry.Planar ? "planar" : "axisymmetric",
        ["units"] = d.Units.Symbol,
        ["depth_m"] = d.DepthMetres,
        ["parameters"] = new JObject(d.Parameters.Select(kv => new JProperty(kv.Key, kv.Value))),
        ["background"] = d.BackgroundMaterial.Name,
        ["materials"] = new JArray(d.Materials.Values.Select(m => new JObject
        {
            ["name"] = m.Name,
            ["relative_permittivity"] = m.RelativePermittivity,
            ["breakdown_field_V_per_m"] = m.BreakdownFieldVoltsPerMetre,
            ["area_m2"] = d.Regions.MaterialAreasSquareMetres.GetValueOrDefault(m.Name),
        })),
        ["conductors"] = new JArray(d.Conductors.Select(c => new JObject
        {
            ["name"] = c.Name,
            ["floating"] = c.IsFloating,
            ["potential_V"] = c.PotentialVolts,
            ["charge_C"] = c.ChargeCoulombs,
            ["electrode"] = c.ElectrodeIndex,
        })),
        ["dielectrics"] = new JArray(d.Dielectrics.Select(x => new JObject { ["name"] = x.Name, ["material"] = x.MaterialName })),
        ["enclosure_potential_V"] = d.Enclosure.PotentialVolts,
        ["open_space"] = d.Enclosure.Open is { } open
            ? new JObject { ["radius_m"] = open.RadiusMetres, ["center_m"] = new JArray(open.Center.X, open.Center.Y) }
            : null,
    };
}
