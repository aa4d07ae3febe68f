namespace Electrostat.Geometry.Shapes;

/// <summary>A straight segment from <see cref="Start"/> to <see cref="End"/>.</summary>
public sealed record LineSegment : CurveSegment
{
    /// <summary>Creates a straight segment between two points (metres).</summary>
    public LineSegment(Point2 start, Point2 end)
    {
        StartPoint = start;
        EndPoint = end;
    }

    /// <inheritdoc />
    public override Point2 Start => StartPoint;

    /// <inheritdoc />
    public override Point2 End => EndPoint;

    private Point2 StartPoint { get; }

    private Point2 EndPoint { get; }

    /// <inheritdoc />
    public override double Length => StartPoint.DistanceTo(EndPoint);

    /// <inheritdoc />
    public override Point2 PointAt(double t) =>
        new(StartPoint.X + t * (EndPoint.X - StartPoint.X), StartPoint.Y + t * (EndPoint.Y - StartPoint.Y));

    /// <inheritdoc />
    public override Point2 TangentAt(double t)
    {
        var d = EndPoint - StartPoint;
        double len = d.Length;
        return len > 0 ? (1.0 / len) * d : new Point2(0, 0);
    }

    /// <inheritdoc />
    public override CurveSegment Reversed() => new LineSegment(EndPoint, StartPoint) { Marker = Marker };

    /// <inheritdoc />
    public override double TwiceSignedAreaContribution() => Point2.Cross(StartPoint, EndPoint);

    /// <inheritdoc />
    public override CurveSegment Translated(Point2 offset) =>
        new LineSegment(StartPoint + offset, EndPoint + offset) { Marker = Marker };

    /// <inheritdoc />
    public override void AppendFlattened(List<Point2> points, double chordToleranceMetres, double maxSegmentLengthMetres)
    {
        int n = 1;
        if (maxSegmentLengthMetres > 0 && double.IsFinite(maxSegmentLengthMetres))
            n = (int)Math.Clamp(Math.Ceiling(Length / maxSegmentLengthMetres), 1, 1 << 20); // cap: a scale mismatch, not a need
        for (int i = 1; i < n; i++) points.Add(PointAt((double)i / n));
        points.Add(EndPoint);
    }
}
