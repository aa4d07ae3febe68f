namespace Electrostat.Rendering.Report;

/// <summary>The files written by <see cref="ReportWriter.Write"/>, full paths.</summary>
/// <param name="ReportHtml">report.html.</param>
/// <param name="FieldMapPng">The field map, PNG.</param>
/// <param name="FieldMapSvg">The field map, SVG, or null when not written.</param>
/// <param name="Insets">Zoomed images of the top hot spots, rank order.</param>
/// <param name="SurfacePlots">Surface-field plots, one per conductor surface.</param>
public sealed record ReportFiles(string ReportHtml, string FieldMapPng, string? FieldMapSvg, IReadOnlyList<string> Insets, IReadOnlyList<string> SurfacePlots)
{
    /// <summary>Every file written.</summary>
    public IEnumerable<string> All =>
        new[] { ReportHtml, FieldMapPng }.Concat(FieldMapSvg is null ? [] : [FieldMapSvg]).Concat(Insets).Concat(SurfacePlots);
}
