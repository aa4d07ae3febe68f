using Electrostat.Geometry.Loading;
using Electrostat.Geometry.Model;
using Electrostat.Geometry.Shapes;

namespace Electrostat.Geometry.Tests.Loading;

/// <summary>The open-space enclosure: its circle, markers, centre and potential at infinity.</summary>
public class OpenSpaceLoadingTests
{
    private static Design Load(string text)
    {
        var result = DesignLoader.LoadFromText(text, "open.json");
        Assert.False(result.HasErrors, string.Join("\n", result.Problems));
        return result.Design!;
    }

    [Fact]
    public void Planar_Margin_SizesTheCircleFromTheBodiesBoundingBox()
    {
        // Bodies span x ∈ [-6, 6] mm, y ∈ [-1, 3] mm: box centre (0, 1), farthest corner √(36 + 4) mm away.
        var d = Load("""
            { "units": "mm", "symmetry": "planar", "enclosure": { "open": true, "margin": 10 },
              "conductors": [
                { "name": "a", "potential": 1, "shape": { "type": "circle", "center": [-5, 0], "radius": 1 } },
                { "name": "b", "potential": 0, "shape": { "type": "rectangle", "min": [4, -1], "max": [6, 3] } } ] }
            """);
        var open = Assert.IsType<OpenSpace>(d.Enclosure.Open);
        Assert.True(d.Enclosure.IsOpen);
        Assert.Equal(0, open.Center.X, 12);
        Assert.Equal(1e-3, open.Center.Y, 12);
        Assert.Equal((Math.Sqrt(40) + 10) * 1e-3, open.RadiusMetres, 12);
        Assert.All(d.Enclosure.Shape.Outer.Segments, s => Assert.Equal(BoundaryMarker.OpenBoundary, s.Marker));
        // The domain is the disc minus the conductors: πR² − π·1² − 2·4 (mm²).
        double r = open.RadiusMetres * 1e3;
        Assert.Equal(Math.PI * r * r - Math.PI - 8, d.Regions.DomainAreaSquareMetres * 1e6, 2);
    }

    [Fact]
    public void Axisymmetric_Radius_GivesAHalfDiscOnTheAxis_WithThePotentialAtInfinity()
    {
        var d = Load("""
            { "units": "mm", "symmetry": "axisymmetric",
              "enclosure": { "open": true, "radius": 40, "center": [0, 5], "potential": "2 V" },
              "conductors": [ { "name": "ball", "potential": "1 kV", "shape": { "type": "path", "start": [0, -5], "segments": [ { "arc_center": [0, 5], "sweep": 180 } ] } } ] }
            """);
        var open = d.Enclosure.Open!;
        Assert.Equal(new Point2(0, 5e-3), open.Center);
        Assert.Equal(0.04, open.RadiusMetres, 12);
        Assert.Equal(2.0, d.Enclosure.PotentialVolts);
        var segs = d.Enclosure.Shape.Outer.Segments;
        Assert.Equal(2, segs.Count);
        Assert.Equal(BoundaryMarker.OpenBoundary, Assert.IsType<ArcSegment>(segs[0]).Marker);
        Assert.Equal(BoundaryMarker.Axis, Assert.IsType<LineSegment>(segs[1]).Marker);
        // Half disc r ≥ 0 of radius 40 around the ball's half disc of radius 10: π·40²/2 − π·10²/2.
        Assert.Equal(Math.PI * (1600 - 100) / 2, d.Regions.DomainAreaSquareMetres * 1e6, 2);
    }

    [Fact]
    public void ClosedEnclosure_IsNotOpen()
    {
        var d = Load(DesignTexts.Base);
        Assert.False(d.Enclosure.IsOpen);
        Assert.Null(d.Enclosure.Open);
    }
}
