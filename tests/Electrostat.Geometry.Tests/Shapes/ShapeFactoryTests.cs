using Electrostat.Geometry.Shapes;

namespace Electrostat.Geometry.Tests.Shapes;

public class ShapeFactoryTests
{
    private const double Tol = 1e-12;

    [Fact]
    public void Circle_AreaPerimeterAndBounds_MatchClosedForms()
    {
        // Elementary geometry: A = π r², P = 2π r.
        var c = ShapeFactory.Circle(new Point2(1, -2), 0.5);
        Assert.Equal(Math.PI * 0.25, c.Area, Tol);
        Assert.Equal(Math.PI, c.Perimeter, Tol);
        Assert.True(c.IsCounterClockwise);
        Assert.Equal(new BoundingBox(0.5, -2.5, 1.5, -1.5), c.Bounds);
        Assert.Equal(4, c.Segments.Count);
    }

    [Theory]
    [InlineData(4.0, 2.0, 0.0)]
    [InlineData(4.0, 2.0, 0.5)]
    [InlineData(4.0, 2.0, 1.0)] // stadium: the fillets use up the short sides completely
    [InlineData(3.0, 3.0, 1.5)] // a circle made of four fillets
    public void RoundedRectangle_AreaAndPerimeter_MatchClosedForms(double w, double h, double r)
    {
        // Elementary geometry: each rounded corner removes a square r² and adds a quarter disc π r²/4, so
        // A = w h − (4 − π) r² and P = 2(w + h) − 8 r + 2π r.
        var c = ShapeFactory.Rectangle(new Point2(-1, 2), new Point2(-1 + w, 2 + h), r);
        Assert.Equal(w * h - (4 - Math.PI) * r * r, c.Area, 1e-12);
        Assert.Equal(2 * (w + h) - 8 * r + 2 * Math.PI * r, c.Perimeter, 1e-12);
        Assert.True(c.IsCounterClockwise);
        Assert.Equal(new BoundingBox(-1, 2, -1 + w, 2 + h), c.Bounds);
    }

    [Fact]
    public void RightAngleFillet_TouchesBothEdgesAtRadiusFromCorner()
    {
        // Elementary geometry: a fillet of radius r in a 90° corner touches each edge r from the corner and
        // is centred at (r, r) from it.
        var c = ShapeFactory.Polygon([new(new Point2(0, 0), 0.3), new(new Point2(2, 0)), new(new Point2(0, 2))]);
        var arc = Assert.Single(c.Segments.OfType<ArcSegment>());
        Assert.Equal(0.3, arc.Radius, Tol);
        Assert.Equal(0.3, arc.Center.X, Tol);
        Assert.Equal(0.3, arc.Center.Y, Tol);
        var ends = new[] { arc.Start, arc.End };
        Assert.Contains(ends, p => Math.Abs(p.X) < Tol && Math.Abs(p.Y - 0.3) < Tol);
        Assert.Contains(ends, p => Math.Abs(p.X - 0.3) < Tol && Math.Abs(p.Y) < Tol);
        Assert.Equal(0.5 * Math.PI * 0.3, arc.Length, Tol); // arc length = r |Δθ| with Δθ = π/2
    }

    [Fact]
    public void SixtyDegreeFillet_TangencyDistanceAndCentreMatchHalfAngleFormulas()
    {
        // Equilateral triangle, interior angle 60°: d = r / tan(30°) = r √3 and centre distance r / sin(30°) = 2r.
        double r = 0.1, s = 2;
        var a = new Point2(0, 0);
        var c = ShapeFactory.Polygon([new(a, r), new(new Point2(s, 0)), new(new Point2(s / 2, s * Math.Sqrt(3) / 2))]);
        var arc = Assert.Single(c.Segments.OfType<ArcSegment>());
        Assert.Equal(2 * r, arc.Center.DistanceTo(a), 1e-12);
        Assert.Equal(r * Math.Sqrt(3), arc.Start.DistanceTo(a), 1e-12);
        Assert.Equal(r * Math.Sqrt(3), arc.End.DistanceTo(a), 1e-12);
        Assert.Equal(2 * Math.PI / 3, Math.Abs(arc.SweepAngle), 1e-12); // turning angle π − 60°
        // Tangency: the arc's tangent at each end is parallel to the adjacent edge.
        foreach (var seg in c.Segments.OfType<LineSegment>())
        {
            if (seg.End.DistanceTo(arc.Start) < 1e-12)
                Assert.Equal(0, Point2.Cross(seg.TangentAt(1), arc.TangentAt(0)), 1e-12);
            if (seg.Start.DistanceTo(arc.End) < 1e-12)
                Assert.Equal(0, Point2.Cross(arc.TangentAt(1), seg.TangentAt(0)), 1e-12);
        }
        // Area: triangle minus the corner region cut by the fillet, (d·r − r²·(π − θ)/2) for interior angle θ.
        double theta = Math.PI / 3, d = r * Math.Sqrt(3);
        double expected = Math.Sqrt(3) / 4 * s * s - (d * r - 0.5 * r * r * (Math.PI - theta));
        Assert.Equal(expected, c.Area, 1e-12);
    }

    [Fact]
    public void Polygon_ClockwiseInput_GivesNegativeAreaAndShapeNormalises()
    {
        var cw = ShapeFactory.Polygon([new(new Point2(0, 0)), new(new Point2(0, 1)), new(new Point2(1, 1)), new(new Point2(1, 0))]);
        Assert.Equal(-1.0, cw.SignedArea, Tol);
        var hole = ShapeFactory.Circle(new Point2(0.5, 0.5), 0.2);
        var shape = new Shape(cw, [hole]);
        Assert.True(shape.Outer.IsCounterClockwise);
        Assert.False(shape.Holes[0].IsCounterClockwise);
        Assert.Equal(1 - Math.PI * 0.04, shape.Area, Tol);
        Assert.False(shape.Contains(new Point2(0.5, 0.5)));
        Assert.True(shape.Contains(new Point2(0.1, 0.1)));
    }

    [Fact]
    public void Fillet_TooLarge_ThrowsWithLargestAllowedRadius()
    {
        // Edge of length 1 with 90° corners at both ends: d = r each, so at most r = 0.5 per corner when both are rounded.
        var ex = Assert.Throws<GeometryException>(() => ShapeFactory.Polygon(
        [
            new(new Point2(0, 0), 0.6), new(new Point2(1, 0), 0.5), new(new Point2(1, 3)), new(new Point2(0, 3)),
        ]));
        Assert.Contains("too large", ex.Message, StringComparison.Ordinal);
        Assert.Equal(0, ex.PointIndex);
        Assert.Contains("at most 500 mm", ex.Hint, StringComparison.Ordinal);
    }

    [Fact]
    public void Polygon_TwoPoints_Throws()
    {
        var ex = Assert.Throws<GeometryException>(() => ShapeFactory.Polygon([new(new Point2(0, 0)), new(new Point2(1, 0))]));
        Assert.Contains("at least 3 points", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Rectangle_CornerRadiusAboveHalfSide_Throws()
    {
        var ex = Assert.Throws<GeometryException>(() => ShapeFactory.Rectangle(new Point2(0, 0), new Point2(4e-3, 2e-3), 1.1e-3));
        Assert.Contains("at most 1 mm", ex.Hint, StringComparison.Ordinal);
    }

    [Fact]
    public void ConcaveFillet_AddsMaterialInTheNotch()
    {
        // L shape: 2×2 square minus the 1×1 upper-right square, area 3. Rounding the inner (reflex) corner at (1, 1)
        // with radius r fills the notch between the edges: area grows by r² − π r²/4 (elementary geometry).
        double r = 0.25;
        var c = ShapeFactory.Polygon(
        [
            new(new Point2(0, 0)), new(new Point2(2, 0)), new(new Point2(2, 1)), new(new Point2(1, 1), r), new(new Point2(1, 2)), new(new Point2(0, 2)),
        ]);
        Assert.Equal(3 + r * r - Math.PI * r * r / 4, c.Area, 1e-12);
        var arc = Assert.Single(c.Segments.OfType<ArcSegment>());
        Assert.True(arc.SweepAngle < 0); // a right turn on a counter-clockwise outline
        Assert.Equal(1 + r, arc.Center.X, 1e-12);
        Assert.Equal(1 + r, arc.Center.Y, 1e-12);
        Assert.False(c.Contains(new Point2(1 + r, 1 + r)));
        Assert.True(c.Contains(new Point2(1.02, 1.02))); // filled by the fillet
    }

    [Fact]
    public void FilletUsingWholeEdge_EndsExactlyOnTheNeighbourVertex()
    {
        // A rod drawn on the axis with a fully rounded end: the fillet of radius 4 at (4, -40) uses the whole 4 mm edge
        // from the axis, so it must end exactly at (0, -40), not at r = -6e-19 (which an axisymmetric mesh rejects).
        var c = ShapeFactory.Polygon([new(new Point2(0, -40)), new(new Point2(4, -40), 4), new(new Point2(4, 40), 4), new(new Point2(0, 40))]);
        foreach (var seg in c.Segments)
        {
            Assert.True(seg.Start.X >= 0 && seg.End.X >= 0, seg.ToString());
            foreach (var p in c.Flatten(1e-3)) Assert.True(p.X >= 0, p.ToString());
        }
        Assert.Contains(c.Segments, seg => seg.Start == new Point2(0, -40) || seg.End == new Point2(0, -40));
        // Joints are exact: each segment starts where the previous one ends, bit for bit.
        for (int i = 0; i < c.Segments.Count; i++)
            Assert.Equal(c.Segments[i].End, c.Segments[(i + 1) % c.Segments.Count].Start);
        // Half disc of radius 4 at each end plus an 8 × 72 rectangle... as halves: area = 4·80 − 2·(4² − π·4²/4).
        Assert.Equal(4 * 80 - 2 * (16 - Math.PI * 4), c.Area, 1e-9);
    }

    [Fact]
    public void Circle_QuarterPointsAreExact()
    {
        var c = ShapeFactory.Circle(new Point2(0, 0), 3);
        Assert.Equal(new Point2(0, 3), c.Segments[0].End);
        Assert.Equal(new Point2(-3, 0), c.Segments[1].End);
        Assert.Equal(new Point2(0, -3), c.Segments[2].End);
        Assert.Equal(new Point2(3, 0), c.Segments[3].End);
    }
}
