using Electrostat.Analysis;
using Electrostat.Meshing;
using Electrostat.Rendering.FieldMaps;
using Electrostat.Rendering.Tests.Support;

namespace Electrostat.Rendering.Tests.FieldMaps;

public class AxisymmetricMapTests
{
    [Fact]
    public void MirroredSection_IsTheMirrorImageAboutTheAxis()
    {
        string json = File.ReadAllText(RepoPaths.File(Path.Combine("geometries", "feedthrough-axisymmetric.json")));
        var (ctx, _) = Designs.Solve(json, new MeshOptions());
        var report = DesignAnalyzer.Analyze(ctx);
        var full = FieldMapRenderer.Render(ctx, report.HotSpots, new FieldMapOptions { MirrorAxisymmetric = true, Title = ctx.Design.Title });
        string folder = Path.Combine(AppContext.BaseDirectory, "artifacts");
        Directory.CreateDirectory(folder);
        File.WriteAllBytes(Path.Combine(folder, "feedthrough-full-section.png"), full.Png());
        File.WriteAllText(Path.Combine(folder, "feedthrough-full-section.svg"), full.Svg());

        // The raster layer alone (no one-sided labels): pixel (axis + k) equals pixel (axis − k) on every row.
        using var raster = Drawing.PngPainter.Paint(full.Sketch, rasterOnly: true);
        var f = full.Frame;
        double axis = f.PixelX(0);
        int mismatches = 0, compared = 0;
        for (int row = (int)f.PixelY(40e-3); row < (int)f.PixelY(-40e-3); row += 7)
        {
            for (int k = 3; k < (int)(55e-3 * f.PixelsPerMetre); k += 5)
            {
                // The pixel whose centre is the mirror image of this pixel's centre.
                int right = (int)Math.Floor(axis + k);
                int left = (int)Math.Floor(2 * axis - (right + 0.5));
                var a = raster.GetPixel(right, row);
                var b = raster.GetPixel(left, row);
                compared++;
                if (Math.Abs(a.Red - b.Red) > 6 || Math.Abs(a.Green - b.Green) > 6 || Math.Abs(a.Blue - b.Blue) > 6) mismatches++;
            }
        }
        Assert.True(compared > 500);
        // Sub-pixel placement differs where a triangle edge crosses a pixel: allow a few such pixels.
        Assert.True(mismatches <= compared / 50, $"{mismatches} of {compared} mirrored pixels differ");
        // Both halves carry the same equipotentials: the picture has two segment layers of equal length.
        Assert.NotEmpty(full.Equipotentials);
    }
}
