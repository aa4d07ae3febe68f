using SkiaSharp;

namespace Electrostat.Rendering.Colour;

/// <summary>
/// The viridis colour map: perceptually uniform, readable in grey scale and by most colour-blind readers.
/// </summary>
/// <remarks>
/// The stops are every 16th entry (plus the last) of the 256-entry viridis table published with matplotlib by
/// Stéfan van der Walt and Nathaniel Smith (2015, released under CC0), in linear sRGB components 0..1; between stops
/// the components are interpolated linearly, which differs from the full table by well under one 8-bit level.
/// </remarks>
public static class Viridis
{
    // Entries 0, 16, 32, …, 240 and 255 of the published table (r, g, b).
    private static readonly double[] Stops =
    [
        0.267004, 0.004874, 0.329415,
        0.282327, 0.094955, 0.417331,
        0.278826, 0.175490, 0.483397,
        0.258965, 0.251537, 0.524736,
        0.229739, 0.322361, 0.545706,
        0.199430, 0.387607, 0.554642,
        0.172719, 0.448791, 0.557885,
        0.149039, 0.508051, 0.557250,
        0.127568, 0.566949, 0.550556,
        0.120638, 0.625828, 0.533488,
        0.157851, 0.683765, 0.501686,
        0.246070, 0.738910, 0.452024,
        0.369214, 0.788888, 0.382914,
        0.515992, 0.831158, 0.294279,
        0.678489, 0.863742, 0.189503,
        0.845561, 0.887322, 0.099702,
        0.993248, 0.906157, 0.143936,
    ];

    // Position of each stop on 0..1 (table index / 255).
    private static readonly double[] Positions =
        [0 / 255.0, 16 / 255.0, 32 / 255.0, 48 / 255.0, 64 / 255.0, 80 / 255.0, 96 / 255.0, 112 / 255.0, 128 / 255.0,
         144 / 255.0, 160 / 255.0, 176 / 255.0, 192 / 255.0, 208 / 255.0, 224 / 255.0, 240 / 255.0, 1.0];

    /// <summary>The colour at <paramref name="t"/> (clamped to 0..1; 0 is dark violet, 1 is yellow).</summary>
    /// <param name="t">Position on the map, 0..1.</param>
    public static SKColor At(double t)
    {
        if (double.IsNaN(t)) t = 0;
        t = Math.Clamp(t, 0, 1);
        int k = 0;
        while (k < Positions.Length - 2 && t > Positions[k + 1]) k++;
        double u = (t - Positions[k]) / (Positions[k + 1] - Positions[k]);
        byte C(int c) => (byte)Math.Round(255 * (Stops[3 * k + c] + u * (Stops[3 * (k + 1) + c] - Stops[3 * k + c])));
        return new SKColor(C(0), C(1), C(2));
    }
}
