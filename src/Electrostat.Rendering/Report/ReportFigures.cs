using Electrostat.Rendering.Charts;
using Electrostat.Rendering.Drawing;
using Electrostat.Rendering.FieldMaps;

namespace Electrostat.Rendering.Report;

/// <summary>The figures of one report, rendered once and shared by the files and the page.</summary>
/// <param name="Map">The main field map.</param>
/// <param name="MapPng">Its PNG bytes.</param>
/// <param name="Insets">Zoomed PNGs of the top hot spots, by rank.</param>
/// <param name="SurfacePlots">Surface-field plot PNGs, by conductor name.</param>
/// <param name="ReadoutJson">The pointer-readout grid as JSON.</param>
public sealed record ReportFigures(
    FieldMapPicture Map,
    byte[] MapPng,
    IReadOnlyList<(int Rank, byte[] Png)> Insets,
    IReadOnlyList<(string Conductor, byte[] Png)> SurfacePlots,
    string ReadoutJson)
{
    /// <summary>Renders every figure.</summary>
    /// <param name="input">The solved design and its analysis.</param>
    /// <param name="options">Options.</param>
    public static ReportFigures Render(ReportInput input, ReportOptions options)
    {
        ArgumentNullException.ThrowIfNull(input);
        ArgumentNullException.ThrowIfNull(options);
        var ctx = input.Context;
        var design = ctx.Design;
        string title = design.Title ?? "Field map";
        var mapOptions = options.Map with { Title = options.Map.Title ?? $"{title}: |E| and equipotentials" };
        var map = FieldMapRenderer.Render(ctx, input.Analysis.HotSpots, mapOptions);

        // Insets: a square window around each of the top hot spots, a few merge radii or 6 % of the design wide.
        var b = design.Bounds;
        double diag = Math.Sqrt((b.MaxX - b.MinX) * (b.MaxX - b.MinX) + (b.MaxY - b.MinY) * (b.MaxY - b.MinY));
        var insets = new List<(int, byte[])>();
        foreach (var h in input.Analysis.HotSpots.Take(options.Insets))
        {
            double half = Math.Max(0.06 * diag, 3 * h.MergeRadiusMetres);
            var inset = FieldMapRenderer.Render(ctx, input.Analysis.HotSpots, options.Map with
            {
                WidthPixels = 520,
                Window = (h.XMetres - half, h.YMetres - half, h.XMetres + half, h.YMetres + half),
                MirrorAxisymmetric = false,
                EquipotentialIntervals = options.Map.EquipotentialIntervals * 2,
                Title = $"Hot spot {h.Rank}: {Labels.Number(h.FieldKilovoltsPerMillimetre)} kV/mm",
            });
            insets.Add((h.Rank, inset.Png()));
        }

        var plots = new List<(string, byte[])>();
        foreach (var profile in input.Analysis.SurfaceProfiles)
        {
            if (profile.Samples.Count < 2) continue;
            var chart = SurfaceFieldPlot.Build(profile, input.Analysis.Margins, design);
            plots.Add((profile.ConductorName, PngPainter.Encode(LineChartRenderer.Render(chart))));
        }

        // The readout grid covers the map's right half for a mirrored section (the left is its mirror image).
        var mb = MeshBounds(ctx);
        var grid = ReadoutGrid.Sample(ctx, mb.MinX, mb.MinY, mb.MaxX, mb.MaxY, options.ReadoutColumns);
        bool mirrored = mapOptions.MirrorAxisymmetric && ctx.Solution.Problem.Symmetry == Fem.Problem.ProblemSymmetry.Axisymmetric;
        string json = grid.ToJson(map.Frame, mirrored, design.Units.Metres, design.Units.Symbol);
        return new ReportFigures(map, map.Png(), insets, plots, json);
    }

    private static (double MinX, double MinY, double MaxX, double MaxY) MeshBounds(Analysis.AnalysisContext ctx)
    {
        var m = ctx.Mesh;
        double minX = double.MaxValue, minY = double.MaxValue, maxX = double.MinValue, maxY = double.MinValue;
        for (int v = 0; v < m.VertexCount; v++)
        {
            minX = Math.Min(minX, m.X[v]); maxX = Math.Max(maxX, m.X[v]);
            minY = Math.Min(minY, m.Y[v]); maxY = Math.Max(maxY, m.Y[v]);
        }
        return (minX, minY, maxX, maxY);
    }
}
