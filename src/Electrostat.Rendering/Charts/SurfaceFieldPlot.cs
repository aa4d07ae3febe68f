using Electrostat.Analysis.Margins;
using Electrostat.Analysis.Surface;
using Electrostat.Geometry.Model;

namespace Electrostat.Rendering.Charts;

/// <summary>
/// The chart of |E| against arc length along one conductor surface, with each adjacent material's breakdown field
/// and margin threshold (breakdown ÷ required margin) as guides.
/// </summary>
public static class SurfaceFieldPlot
{
    /// <summary>Builds the chart (lengths in the design's unit, fields in kV/mm).</summary>
    /// <param name="profile">The surface profile.</param>
    /// <param name="margins">The margin report (for required margins).</param>
    /// <param name="design">The design (materials and length unit).</param>
    public static LineChart Build(SurfaceFieldProfile profile, MarginReport margins, Design design)
    {
        ArgumentNullException.ThrowIfNull(profile);
        ArgumentNullException.ThrowIfNull(margins);
        ArgumentNullException.ThrowIfNull(design);
        double unit = design.Units.Metres;
        var pieces = profile.Samples.Select(s => s.Piece).Distinct().OrderBy(p => p).ToList();
        var series = new List<ChartSeries>();
        foreach (int piece in pieces)
        {
            var samples = profile.Samples.Where(s => s.Piece == piece).ToList();
            string name = pieces.Count > 1 ? $"|E| on {profile.ConductorName}, piece {piece + 1}" : $"|E| on {profile.ConductorName}";
            series.Add(new ChartSeries(name, samples.Select(s => s.ArcLengthMetres / unit).ToArray(), samples.Select(s => s.FieldVoltsPerMetre * 1e-6).ToArray()));
        }
        var guides = new List<ChartGuide>();
        foreach (string materialName in profile.Samples.Select(s => s.MaterialName).OfType<string>().Distinct(StringComparer.Ordinal).OrderBy(n => n, StringComparer.Ordinal))
        {
            if (!design.Materials.TryGetValue(materialName, out var material) || material.BreakdownFieldVoltsPerMetre is not double ebd) continue;
            guides.Add(new ChartGuide($"breakdown of {materialName} ({Drawing.Labels.Number(ebd * 1e-6)} kV/mm)", ebd * 1e-6));
            var m = margins.Materials.FirstOrDefault(x => x.MaterialName == materialName);
            if (m?.RequiredMargin is double req && req > 0)
                guides.Add(new ChartGuide($"{materialName} limit at margin {Drawing.Labels.Number(req)} ({Drawing.Labels.Number(ebd / req * 1e-6)} kV/mm)", ebd / req * 1e-6));
        }
        return new LineChart
        {
            Title = $"Surface field along {profile.ConductorName}",
            XLabel = $"arc length ({design.Units.Symbol})",
            YLabel = "|E| (kV/mm)",
            Series = series,
            Guides = guides,
        };
    }
}
