namespace Electrostat.Geometry.Shapes;

/// <summary>
/// An exact circular arc: the points <c>Center + Radius·(cos θ, sin θ)</c> for θ from <see cref="StartAngle"/> to
/// <see cref="StartAngle"/> + <see cref="SweepAngle"/>.
/// </summary>
/// <remarks>
/// Angles are in radians, measured counter-clockwise from +x. A positive sweep turns counter-clockwise.
/// The end points are stored, not recomputed: when built from known points (fillet tangency points, a path's given
/// end point, a neighbour's end) they coincide bit for bit with the neighbouring segments. Otherwise they are computed
/// once, with angles at a multiple of 90° giving exact axis-aligned points (so a half circle drawn on the axis ends
/// exactly at r = 0, not at r = -6e-17).
/// </remarks>
public sealed record ArcSegment : CurveSegment
{
    private const int MaxPieces = 1 << 16;

    private readonly Point2 _start;
    private readonly Point2 _end;

    /// <summary>Creates an arc; its end points are computed from the angles.</summary>
    /// <param name="center">Centre, metres.</param>
    /// <param name="radius">Radius, metres (positive).</param>
    /// <param name="startAngle">Angle of the start point, radians.</param>
    /// <param name="sweepAngle">Signed angle swept, radians (positive = counter-clockwise), |sweep| ≤ 2π.</param>
    public ArcSegment(Point2 center, double radius, double startAngle, double sweepAngle)
        : this(center, radius, startAngle, sweepAngle, null, null)
    {
    }

    /// <summary>Creates an arc with given end points, which must lie on the circle (within 1e-9 of the radius).</summary>
    /// <param name="center">Centre, metres.</param>
    /// <param name="radius">Radius, metres (positive).</param>
    /// <param name="startAngle">Angle of the start point, radians.</param>
    /// <param name="sweepAngle">Signed angle swept, radians (positive = counter-clockwise), |sweep| ≤ 2π.</param>
    /// <param name="start">The start point, metres; null to compute it from the angle.</param>
    /// <param name="end">The end point, metres; null to compute it from the angle.</param>
    public ArcSegment(Point2 center, double radius, double startAngle, double sweepAngle, Point2? start, Point2? end)
    {
        if (!(radius > 0) || !double.IsFinite(radius)) throw new ArgumentOutOfRangeException(nameof(radius), "Arc radius must be positive and finite.");
        if (!double.IsFinite(startAngle)) throw new ArgumentOutOfRangeException(nameof(startAngle));
        if (!double.IsFinite(sweepAngle) || Math.Abs(sweepAngle) > 2 * Math.PI + 1e-12) throw new ArgumentOutOfRangeException(nameof(sweepAngle));
        Center = center;
        Radius = radius;
        StartAngle = startAngle;
        SweepAngle = sweepAngle;
        _start = start ?? ExactPointAtAngle(center, radius, startAngle);
        _end = end ?? ExactPointAtAngle(center, radius, startAngle + sweepAngle);
        if (Math.Abs(_start.DistanceTo(center) - radius) > 1e-9 * radius || Math.Abs(_end.DistanceTo(center) - radius) > 1e-9 * radius)
            throw new ArgumentException("Arc end points must lie on the circle.", nameof(start));
    }

    /// <summary>Centre of the circle, metres.</summary>
    public Point2 Center { get; }

    /// <summary>Exact radius, metres.</summary>
    public double Radius { get; }

    /// <summary>Angle of <see cref="Start"/> seen from <see cref="Center"/>, radians.</summary>
    public double StartAngle { get; }

    /// <summary>Signed swept angle, radians (positive = counter-clockwise).</summary>
    public double SweepAngle { get; }

    /// <summary>Angle of <see cref="End"/> seen from <see cref="Center"/>, radians (= start + sweep, not wrapped).</summary>
    public double EndAngle => StartAngle + SweepAngle;

    /// <inheritdoc />
    public override Point2 Start => _start;

    /// <inheritdoc />
    public override Point2 End => _end;

    /// <inheritdoc />
    public override double Length => Radius * Math.Abs(SweepAngle);

    /// <summary>Point on the circle at angle θ (radians), metres.</summary>
    public Point2 PointAtAngle(double theta) => new(Center.X + Radius * Math.Cos(theta), Center.Y + Radius * Math.Sin(theta));

    /// <inheritdoc />
    public override Point2 PointAt(double t) => t <= 0 ? _start : t >= 1 ? _end : PointAtAngle(StartAngle + t * SweepAngle);

    /// <inheritdoc />
    public override Point2 TangentAt(double t)
    {
        double theta = StartAngle + t * SweepAngle;
        double s = Math.Sign(SweepAngle);
        return new Point2(-s * Math.Sin(theta), s * Math.Cos(theta));
    }

    /// <inheritdoc />
    public override CurveSegment Reversed() => new ArcSegment(Center, Radius, EndAngle, -SweepAngle, _end, _start) { Marker = Marker };

    /// <summary>The same arc starting exactly at a given point on its circle (to close a joint bit for bit).</summary>
    public ArcSegment WithStart(Point2 start) => new(Center, Radius, StartAngle, SweepAngle, start, _end) { Marker = Marker };

    /// <summary>The same arc ending exactly at a given point on its circle (to close a joint bit for bit).</summary>
    public ArcSegment WithEnd(Point2 end) => new(Center, Radius, StartAngle, SweepAngle, _start, end) { Marker = Marker };

    /// <inheritdoc />
    public override double TwiceSignedAreaContribution()
    {
        // Along x = cx + R cos θ, y = cy + R sin θ the integrand is x dy − y dx = (R² + R cx cos θ + R cy sin θ) dθ,
        // so the integral is R² Δθ + R [cx (sin θ2 − sin θ1) − cy (cos θ2 − cos θ1)] (elementary calculus).
        double t1 = StartAngle, t2 = EndAngle;
        return Radius * Radius * SweepAngle
             + Radius * (Center.X * (Math.Sin(t2) - Math.Sin(t1)) - Center.Y * (Math.Cos(t2) - Math.Cos(t1)));
    }

    /// <inheritdoc />
    public override CurveSegment Translated(Point2 offset) =>
        new ArcSegment(Center + offset, Radius, StartAngle, SweepAngle, _start + offset, _end + offset) { Marker = Marker };

    /// <inheritdoc />
    public override void AppendFlattened(List<Point2> points, double chordToleranceMetres, double maxSegmentLengthMetres)
    {
        // Sagitta of a chord spanning angle φ is R(1 − cos(φ/2)); keep it ≤ tolerance. For a tiny tolerance/radius
        // ratio x, 1 − x rounds to 1 and acos gives 0, so use the series 2 acos(1 − x) ≈ 2 √(2x) there.
        double maxStep = Math.PI / 2;
        double x = chordToleranceMetres / Radius;
        if (x > 0 && x < 1)
            maxStep = Math.Min(maxStep, x < 1e-8 ? 2 * Math.Sqrt(2 * x) : 2 * Math.Acos(1 - x));
        if (maxSegmentLengthMetres > 0 && double.IsFinite(maxSegmentLengthMetres))
            maxStep = Math.Min(maxStep, 2 * Math.Asin(Math.Min(1.0, maxSegmentLengthMetres / (2 * Radius))));
        // At most 65536 pieces per arc: a request finer than that is a scale mismatch, not a need.
        double pieces = Math.Ceiling(Math.Abs(SweepAngle) / maxStep - 1e-9);
        int n = pieces > MaxPieces || double.IsNaN(pieces) ? MaxPieces : Math.Max(1, (int)pieces);
        for (int i = 1; i < n; i++) points.Add(PointAt((double)i / n));
        points.Add(End);
    }

    /// <summary>Point at an angle, exact (cos, sin ∈ {0, ±1}) when the angle is a multiple of 90° to within 1e-12 rad.</summary>
    private static Point2 ExactPointAtAngle(Point2 center, double radius, double theta)
    {
        double quarters = theta / (Math.PI / 2);
        double k = Math.Round(quarters);
        if (Math.Abs(quarters - k) * (Math.PI / 2) < 1e-12)
        {
            int q = (int)(((long)k % 4 + 4) % 4);
            return q switch
            {
                0 => new Point2(center.X + radius, center.Y),
                1 => new Point2(center.X, center.Y + radius),
                2 => new Point2(center.X - radius, center.Y),
                _ => new Point2(center.X, center.Y - radius),
            };
        }
        return new Point2(center.X + radius * Math.Cos(theta), center.Y + radius * Math.Sin(theta));
    }
}
