using Electrostat.Rendering.Colour;
using SkiaSharp;

namespace Electrostat.Rendering.Tests.FieldMaps;

public class ViridisTests
{
    [Fact]
    public void Ends_AndMiddle_MatchThePublishedTable()
    {
        // Entries 0, 128 and 255 of matplotlib's viridis table (van der Walt & Smith, 2015, CC0):
        // (0.267004, 0.004874, 0.329415), (0.127568, 0.566949, 0.550556), (0.993248, 0.906157, 0.143936).
        Assert.Equal(new SKColor(68, 1, 84), Viridis.At(0));
        Assert.Equal(new SKColor(33, 145, 140), Viridis.At(128 / 255.0));
        Assert.Equal(new SKColor(253, 231, 37), Viridis.At(1));
        // Entry 100 (0.166617, 0.463708, 0.558119) lies between stops 96 and 112: linear interpolation stays within one level.
        var c = Viridis.At(100 / 255.0);
        Assert.InRange(c.Red, 41, 44);
        Assert.InRange(c.Green, 117, 120);
        Assert.InRange(c.Blue, 141, 143);
    }

    [Fact]
    public void Lightness_IncreasesMonotonically()
    {
        // Viridis is designed with monotonically increasing lightness; the Rec. 709 luma of our interpolation must
        // increase too.
        double previous = -1;
        for (int i = 0; i <= 100; i++)
        {
            var c = Viridis.At(i / 100.0);
            double luma = 0.2126 * c.Red + 0.7152 * c.Green + 0.0722 * c.Blue;
            Assert.True(luma >= previous, $"luma falls at {i}");
            previous = luma;
        }
    }
}
