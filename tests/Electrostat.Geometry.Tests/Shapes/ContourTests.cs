using Electrostat.Geometry.Shapes;

namespace Electrostat.Geometry.Tests.Shapes;

public class ContourTests
{
    [Fact]
    public void Contains_IsExactBetweenChordAndArc()
    {
        // A point just inside the circle but outside every chord of a coarse flattening must still be inside.
        var c = ShapeFactory.Circle(new Point2(0, 0), 1);
        double a = Math.PI / 4;
        var nearRim = new Point2((1 - 1e-9) * Math.Cos(a), (1 - 1e-9) * Math.Sin(a));
        var justOut = new Point2((1 + 1e-9) * Math.Cos(a), (1 + 1e-9) * Math.Sin(a));
        Assert.True(c.Contains(nearRim));
        Assert.False(c.Contains(justOut));
        Assert.True(c.Contains(new Point2(0, 0)));
        Assert.False(c.Contains(new Point2(1.5, 0)));
        Assert.False(c.Contains(new Point2(0, 1.0000001)));
    }

    [Fact]
    public void Contains_AgreesWithDistanceSignOnRoundedRectangle()
    {
        var c = ShapeFactory.Rectangle(new Point2(0, 0), new Point2(3, 2), 0.7);
        var rng = new Random(12345);
        for (int i = 0; i < 2000; i++)
        {
            var p = new Point2(-0.5 + 4 * rng.NextDouble(), -0.5 + 3 * rng.NextDouble());
            // Reference by construction: inside iff within the rectangle shrunk by r, grown by r (Minkowski sum).
            double qx = Math.Clamp(p.X, 0.7, 2.3), qy = Math.Clamp(p.Y, 0.7, 1.3);
            bool expected = p.DistanceTo(new Point2(qx, qy)) < 0.7;
            if (Math.Abs(p.DistanceTo(new Point2(qx, qy)) - 0.7) < 1e-9) continue;
            Assert.Equal(expected, c.Contains(p));
        }
    }

    [Fact]
    public void Flatten_StaysWithinChordTolerance()
    {
        var c = ShapeFactory.Circle(new Point2(0.2, 0.1), 0.05);
        double tol = 1e-6;
        var pts = c.Flatten(tol);
        for (int i = 0; i < pts.Count; i++)
        {
            var p = pts[i];
            var q = pts[(i + 1) % pts.Count];
            Assert.Equal(0.05, p.DistanceTo(new Point2(0.2, 0.1)), 1e-15);
            var mid = 0.5 * (p + q);
            Assert.True(0.05 - mid.DistanceTo(new Point2(0.2, 0.1)) <= tol * (1 + 1e-9)); // sagitta
        }
        // Sagitta R(1 − cos(φ/2)) ≤ tol gives at least 2π / (2 acos(1 − tol/R)) pieces (elementary geometry).
        Assert.True(pts.Count >= Math.PI / Math.Acos(1 - tol / 0.05));
    }

    [Fact]
    public void ArcSegment_SignedAreaContribution_GivesCircularSegmentArea()
    {
        // Half disc closed by its diameter: area π r² / 2 (elementary geometry), any centre.
        var arc = new ArcSegment(new Point2(3, -1), 2, 0, Math.PI);
        var contour = new Contour([arc, new LineSegment(arc.End, arc.Start)]);
        Assert.Equal(Math.PI * 2, contour.SignedArea, 1e-12);
        Assert.Equal(2 * Math.PI + 4, contour.Perimeter, 1e-12);
    }

    [Fact]
    public void DistanceTo_ArcAndLine()
    {
        var c = ShapeFactory.Rectangle(new Point2(0, 0), new Point2(2, 2), 0.5);
        Assert.Equal(1.0, c.DistanceTo(new Point2(1, 1)), 1e-12);
        // From the fillet centre (0.5, 0.5) looking outward along the diagonal, the distance to the arc is r.
        var p = new Point2(0.5 - 0.3, 0.5 - 0.3);
        Assert.Equal(0.5 - 0.3 * Math.Sqrt(2), c.DistanceTo(p), 1e-12);
    }

    [Fact]
    public void Contour_OpenChain_Throws()
    {
        Assert.Throws<ArgumentException>(() => new Contour([new LineSegment(new Point2(0, 0), new Point2(1, 0)), new LineSegment(new Point2(1, 0), new Point2(1, 1))]));
    }

    [Fact]
    public void Reversed_KeepsGeometryAndFlipsSign()
    {
        var c = ShapeFactory.Rectangle(new Point2(0, 0), new Point2(3, 1), 0.25);
        var r = c.Reversed();
        Assert.Equal(-c.SignedArea, r.SignedArea, 1e-12);
        Assert.Equal(c.Perimeter, r.Perimeter, 1e-12);
        Assert.Equal(c.Bounds.MinX, r.Bounds.MinX, 1e-15);
    }

    [Fact]
    public void Segments_PointAtAndTangentAt_FollowArcLength()
    {
        var line = new LineSegment(new Point2(1, 1), new Point2(4, 5));
        Assert.Equal(new Point2(2.5, 3), line.PointAt(0.5));
        Assert.Equal(5, line.Length, 1e-15);
        Assert.Equal(0.6, line.TangentAt(0.3).X, 1e-15);
        // Clockwise quarter arc from angle π/2 to 0 around (0, 0), radius 2: midpoint at 45°, tangent pointing down-right.
        var arc = new ArcSegment(new Point2(0, 0), 2, Math.PI / 2, -Math.PI / 2);
        var mid = arc.PointAt(0.5);
        Assert.Equal(Math.Sqrt(2), mid.X, 1e-14);
        Assert.Equal(Math.Sqrt(2), mid.Y, 1e-14);
        var t = arc.TangentAt(0.5);
        Assert.Equal(Math.Sqrt(0.5), t.X, 1e-14);
        Assert.Equal(-Math.Sqrt(0.5), t.Y, 1e-14);
        Assert.Equal(Math.PI, arc.Length, 1e-14); // r |Δθ|
        Assert.Equal(new Point2(2, 0).X, arc.End.X, 1e-15);
    }

    [Fact]
    public void Flatten_RespectsMaximumPieceLength()
    {
        var c = ShapeFactory.Rectangle(new Point2(0, 0), new Point2(10, 3), 1);
        var pts = c.Flatten(1e-3, 0.4);
        for (int i = 0; i < pts.Count; i++)
            Assert.True(pts[i].DistanceTo(pts[(i + 1) % pts.Count]) <= 0.4 + 1e-12);
        // Every segment end is kept as a vertex, so fillet tangency points survive flattening exactly.
        foreach (var seg in c.Segments)
            Assert.Contains(pts, p => p.DistanceTo(seg.Start) < 1e-15);
    }
}
