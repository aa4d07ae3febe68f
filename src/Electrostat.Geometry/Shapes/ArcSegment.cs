namespace Electrostat.Geometry.Shapes;

/// <summary>
/// An exact circular arc: the points <c>Center + Radius·(cos θ, sin θ)</c> for θ from <see cref="StartAngle"/> to
/// <see cref="StartAngle"/> + <see cref="SweepAngle"/>.
/// </summary>
/// <remarks>Angles are in radians, measured counter-clockwise from +x. A positive sweep turns counter-clockwise.</remarks>
public sealed record ArcSegment : CurveSegment
{
    /// <summary>Creates an arc.</summary>
    /// <param name="center">Centre, metres.</param>
    /// <param name="radius">Radius, metres (positive).</param>
    /// <param name="startAngle">Angle of the start point, radians.</param>
    /// <param name="sweepAngle">Signed angle swept, radians (positive = counter-clockwise), |sweep| ≤ 2π.</param>
    public ArcSegment(Point2 center, double radius, double startAngle, double sweepAngle)
    {
        if (!(radius > 0) || !double.IsFinite(radius)) throw new ArgumentOutOfRangeException(nameof(radius), "Arc radius must be positive and finite.");
        if (!double.IsFinite(startAngle)) throw new ArgumentOutOfRangeException(nameof(startAngle));
        if (!double.IsFinite(sweepAngle) || Math.Abs(sweepAngle) > 2 * Math.PI + 1e-12) throw new ArgumentOutOfRangeException(nameof(sweepAngle));
        Center = center;
        Radius = radius;
        StartAngle = startAngle;
        SweepAngle = sweepAngle;
    }

    /// <summary>Centre of the circle, metres.</summary>
    public Point2 Center { get; init; }

    /// <summary>Exact radius, metres.</summary>
    public double Radius { get; init; }

    /// <summary>Angle of <see cref="Start"/> seen from <see cref="Center"/>, radians.</summary>
    public double StartAngle { get; init; }

    /// <summary>Signed swept angle, radians (positive = counter-clockwise).</summary>
    public double SweepAngle { get; init; }

    /// <summary>Angle of <see cref="End"/> seen from <see cref="Center"/>, radians (= start + sweep, not wrapped).</summary>
    public double EndAngle => StartAngle + SweepAngle;

    /// <inheritdoc />
    public override Point2 Start => PointAtAngle(StartAngle);

    /// <inheritdoc />
    public override Point2 End => PointAtAngle(EndAngle);

    /// <inheritdoc />
    public override double Length => Radius * Math.Abs(SweepAngle);

    /// <summary>Point on the circle at angle θ (radians), metres.</summary>
    public Point2 PointAtAngle(double theta) => new(Center.X + Radius * Math.Cos(theta), Center.Y + Radius * Math.Sin(theta));

    /// <inheritdoc />
    public override Point2 PointAt(double t) => PointAtAngle(StartAngle + t * SweepAngle);

    /// <inheritdoc />
    public override Point2 TangentAt(double t)
    {
        double theta = StartAngle + t * SweepAngle;
        double s = Math.Sign(SweepAngle);
        return new Point2(-s * Math.Sin(theta), s * Math.Cos(theta));
    }

    /// <inheritdoc />
    public override CurveSegment Reversed() => new ArcSegment(Center, Radius, EndAngle, -SweepAngle) { Marker = Marker };

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
    public override CurveSegment Translated(Point2 offset) => this with { Center = Center + offset };

    /// <inheritdoc />
    public override void AppendFlattened(List<Point2> points, double chordToleranceMetres, double maxSegmentLengthMetres)
    {
        // Sagitta of a chord spanning angle φ is R(1 − cos(φ/2)); keep it ≤ tolerance.
        double maxStep = Math.PI / 2;
        if (chordToleranceMetres > 0 && chordToleranceMetres < Radius)
            maxStep = Math.Min(maxStep, 2 * Math.Acos(1 - chordToleranceMetres / Radius));
        if (maxSegmentLengthMetres > 0 && double.IsFinite(maxSegmentLengthMetres))
            maxStep = Math.Min(maxStep, 2 * Math.Asin(Math.Min(1.0, maxSegmentLengthMetres / (2 * Radius))));
        int n = Math.Max(1, (int)Math.Ceiling(Math.Abs(SweepAngle) / maxStep - 1e-9));
        for (int i = 1; i < n; i++) points.Add(PointAt((double)i / n));
        points.Add(End);
    }
}
