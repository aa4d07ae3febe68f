using SkiaSharp;

namespace Electrostat.Rendering.Drawing;

/// <summary>The one typeface used for every label, chosen once per process.</summary>
/// <remarks>
/// A fixed family (DejaVu Sans, present on Debian) keeps the glyphs, and therefore the PNG bytes, the same from run
/// to run on one machine; on a machine without it the platform default is used, so bytes may differ between
/// machines while the geometry (lines, markers, colours) does not.
/// </remarks>
internal static class Typefaces
{
    private static readonly Lazy<SKTypeface> Regular = new(Load);

    /// <summary>SVG font-family list matching the raster typeface.</summary>
    public const string SvgFamily = "DejaVu Sans, Verdana, sans-serif";

    public static SKTypeface Get() => Regular.Value;

    private static SKTypeface Load()
    {
        foreach (var dir in new[] { "/usr/share/fonts/truetype/dejavu", "/usr/share/fonts/dejavu" })
        {
            string file = Path.Combine(dir, "DejaVuSans.ttf");
            if (File.Exists(file))
            {
                var tf = SKTypeface.FromFile(file);
                if (tf is not null) return tf;
            }
        }
        return SKTypeface.FromFamilyName("DejaVu Sans") ?? SKTypeface.Default;
    }
}
