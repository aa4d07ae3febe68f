namespace Electrostat.Geometry.Shapes;

/// <summary>One exact piece of a closed <see cref="Contour"/>: a straight line or a circular arc.</summary>
/// <remarks>
/// The parameter t runs from 0 at <see cref="Start"/> to 1 at <see cref="End"/>, proportional to arc length.
/// Segments are immutable; <see cref="Marker"/> is changed with a <c>with</c> expression.
/// </remarks>
public abstract record CurveSegment
{
    /// <summary>First point of the segment, metres.</summary>
    public abstract Point2 Start { get; }

    /// <summary>Last point of the segment, metres.</summary>
    public abstract Point2 End { get; }

    /// <summary>Length of the segment along the curve, metres.</summary>
    public abstract double Length { get; }

    /// <summary>Boundary meaning of the segment (used on the enclosure only).</summary>
    public BoundaryMarker Marker { get; init; }

    /// <summary>Point at curve parameter t in [0, 1] (proportional to arc length), metres.</summary>
    public abstract Point2 PointAt(double t);

    /// <summary>Unit tangent at parameter t, pointing from <see cref="Start"/> towards <see cref="End"/>.</summary>
    public abstract Point2 TangentAt(double t);

    /// <summary>The same curve traversed the other way, keeping the marker.</summary>
    public abstract CurveSegment Reversed();

    /// <summary>
    /// Twice the signed area swept by this segment with respect to the origin, ∮ (x dy − y dx) over the segment (m²).
    /// Summed over a closed contour it gives twice the enclosed signed area (Green's theorem).
    /// </summary>
    public abstract double TwiceSignedAreaContribution();

    /// <summary>The same curve moved by an offset.</summary>
    public abstract CurveSegment Translated(Point2 offset);

    /// <summary>
    /// Appends points approximating the segment, excluding <see cref="Start"/> and including <see cref="End"/>.
    /// Chord sagitta stays at or below <paramref name="chordToleranceMetres"/> and pieces at or below
    /// <paramref name="maxSegmentLengthMetres"/>.
    /// </summary>
    public abstract void AppendFlattened(List<Point2> points, double chordToleranceMetres, double maxSegmentLengthMetres);
}
