namespace Electrostat.Geometry.Shapes;

/// <summary>
/// A closed loop of exact <see cref="CurveSegment"/>s: each segment starts where the previous one ends and the last
/// ends where the first starts.
/// </summary>
/// <remarks>
/// Orientation convention (stated once, here): inside a <see cref="Shape"/> the outer contour runs counter-clockwise
/// (positive <see cref="SignedArea"/>) and hole contours run clockwise. The loader normalises every shape this way.
/// </remarks>
public sealed class Contour
{
    private readonly CurveSegment[] _segments;

    /// <summary>Creates a contour from segments that join end to start (within 1e-9 of the contour size).</summary>
    /// <exception cref="ArgumentException">The segments do not form a closed chain.</exception>
    public Contour(IEnumerable<CurveSegment> segments)
    {
        ArgumentNullException.ThrowIfNull(segments);
        _segments = segments.ToArray();
        if (_segments.Length == 0) throw new ArgumentException("A contour needs at least one segment.", nameof(segments));
        var box = BoundingBox.Empty;
        foreach (var s in _segments) box = box.Union(SegmentBox(s));
        Bounds = box;
        double tol = 1e-9 * Math.Max(box.Diagonal, 1e-12);
        for (int i = 0; i < _segments.Length; i++)
        {
            var next = _segments[(i + 1) % _segments.Length];
            if (_segments[i].End.DistanceTo(next.Start) > tol)
                throw new ArgumentException($"Segment {i} ends at {_segments[i].End} but segment {(i + 1) % _segments.Length} starts at {next.Start}.", nameof(segments));
        }
        double twice = 0;
        foreach (var s in _segments) twice += s.TwiceSignedAreaContribution();
        SignedArea = 0.5 * twice;
    }

    /// <summary>The segments in order.</summary>
    public IReadOnlyList<CurveSegment> Segments => _segments;

    /// <summary>Exact signed enclosed area, m² (positive when counter-clockwise), from Green's theorem.</summary>
    public double SignedArea { get; }

    /// <summary>Exact enclosed area, m².</summary>
    public double Area => Math.Abs(SignedArea);

    /// <summary>True when the loop runs counter-clockwise.</summary>
    public bool IsCounterClockwise => SignedArea > 0;

    /// <summary>Exact perimeter, metres.</summary>
    public double Perimeter => _segments.Sum(s => s.Length);

    /// <summary>Exact axis-aligned bounds (arcs contribute their extreme points), metres.</summary>
    public BoundingBox Bounds { get; }

    /// <summary>The same loop traversed the other way (segments reversed, markers kept).</summary>
    public Contour Reversed() => new(_segments.Reverse().Select(s => s.Reversed()));

    /// <summary>This contour with counter-clockwise orientation when <paramref name="counterClockwise"/>, else clockwise.</summary>
    public Contour WithOrientation(bool counterClockwise) => IsCounterClockwise == counterClockwise ? this : Reversed();

    /// <summary>The contour moved by an offset, metres.</summary>
    public Contour Translated(Point2 offset) => new(_segments.Select(s => s.Translated(offset)));

    /// <summary>The same contour with every segment's marker chosen by a function.</summary>
    public Contour WithMarkers(Func<CurveSegment, BoundaryMarker> marker)
    {
        ArgumentNullException.ThrowIfNull(marker);
        return new(_segments.Select(s => s with { Marker = marker(s) }));
    }

    /// <summary>
    /// Approximates the loop by a polygon: vertices in order, the first not repeated at the end. Every segment end is a
    /// vertex; arcs are split so that chord sagitta ≤ <paramref name="chordToleranceMetres"/>, and no piece is longer
    /// than <paramref name="maxSegmentLengthMetres"/> (use +∞ for no limit).
    /// </summary>
    /// <remarks>For geometric queries (areas of boolean results, clearances); the mesher discretises the exact segments itself.</remarks>
    public IReadOnlyList<Point2> Flatten(double chordToleranceMetres, double maxSegmentLengthMetres = double.PositiveInfinity)
    {
        if (!(chordToleranceMetres > 0)) throw new ArgumentOutOfRangeException(nameof(chordToleranceMetres), "Chord tolerance must be positive.");
        var points = new List<Point2>(_segments.Length * 4) { _segments[0].Start };
        foreach (var s in _segments) s.AppendFlattened(points, chordToleranceMetres, maxSegmentLengthMetres);
        points.RemoveAt(points.Count - 1); // closing point equals the first
        return points;
    }

    /// <summary>
    /// Exact point-in-loop test by the crossing rule on a ray towards +x (half-open in y), with arcs split into
    /// y-monotone pieces. Points exactly on the boundary may go either way.
    /// </summary>
    public bool Contains(Point2 p)
    {
        var b = Bounds;
        if (p.X < b.MinX || p.X > b.MaxX || p.Y < b.MinY || p.Y > b.MaxY) return false;
        bool inside = false;
        foreach (var s in _segments)
        {
            if (s is LineSegment)
            {
                if (Crosses(s.Start, s.End, p)) inside = !inside;
            }
            else if (s is ArcSegment arc)
            {
                if (p.Y < arc.Center.Y - arc.Radius || p.Y > arc.Center.Y + arc.Radius) continue;
                // Walk the y-monotone pieces between the turning angles θ = π/2 + kπ (no allocation: hot path).
                double lo = Math.Min(arc.StartAngle, arc.EndAngle), hi = Math.Max(arc.StartAngle, arc.EndAngle);
                // The stored end points (shared bit for bit with the neighbours) stand for the angles lo and hi.
                double yLo = (arc.SweepAngle >= 0 ? arc.Start : arc.End).Y;
                double yHi = (arc.SweepAngle >= 0 ? arc.End : arc.Start).Y;
                double a0 = lo;
                double cut = Math.PI / 2 + Math.Ceiling((lo - Math.PI / 2) / Math.PI) * Math.PI;
                while (a0 < hi)
                {
                    if (cut <= a0) { cut += Math.PI; continue; }
                    double a1 = Math.Min(cut, hi);
                    double ya = a0 == lo ? yLo : arc.Center.Y + arc.Radius * Math.Sin(a0);
                    double yb = a1 == hi ? yHi : arc.Center.Y + arc.Radius * Math.Sin(a1);
                    if (PieceCrosses(arc, a0, a1, ya, yb, p)) inside = !inside;
                    a0 = a1;
                    cut += Math.PI;
                }
            }
        }
        return inside;
    }

    /// <summary>Exact distance from a point to the loop (not to its interior), metres.</summary>
    public double DistanceTo(Point2 p)
    {
        double best = double.PositiveInfinity;
        foreach (var s in _segments) best = Math.Min(best, SegmentDistance(s, p));
        return best;
    }

    internal static double SegmentDistance(CurveSegment s, Point2 p)
    {
        if (s is ArcSegment arc)
        {
            var d = p - arc.Center;
            double theta = Math.Atan2(d.Y, d.X);
            if (AngleWithin(arc, theta)) return Math.Abs(d.Length - arc.Radius);
            return Math.Min(p.DistanceTo(arc.Start), p.DistanceTo(arc.End));
        }
        var a = s.Start;
        var ab = s.End - a;
        double len2 = Point2.Dot(ab, ab);
        double t = len2 > 0 ? Math.Clamp(Point2.Dot(p - a, ab) / len2, 0, 1) : 0;
        return p.DistanceTo(a + t * ab);
    }

    /// <summary>True when angle θ lies on the arc's sweep (modulo 2π).</summary>
    internal static bool AngleWithin(ArcSegment arc, double theta)
    {
        double lo = Math.Min(arc.StartAngle, arc.EndAngle);
        double span = Math.Abs(arc.SweepAngle);
        double rel = theta - lo;
        rel -= 2 * Math.PI * Math.Floor(rel / (2 * Math.PI));
        return rel <= span + 1e-15;
    }

    private static bool Crosses(Point2 a, Point2 b, Point2 p)
    {
        if ((a.Y > p.Y) == (b.Y > p.Y)) return false;
        double x = a.X + (p.Y - a.Y) * (b.X - a.X) / (b.Y - a.Y);
        return x > p.X;
    }

    /// <summary>Whether the ray from p towards +x crosses the y-monotone arc piece between angles a0 &lt; a1 (half-open in y).</summary>
    private static bool PieceCrosses(ArcSegment arc, double a0, double a1, double ya, double yb, Point2 p)
    {
        if ((ya > p.Y) == (yb > p.Y)) return false;
        // On a y-monotone piece cos θ keeps its sign, so the crossing lies on one side of the centre.
        double side = Math.Cos(0.5 * (a0 + a1)) >= 0 ? 1 : -1;
        double dy = p.Y - arc.Center.Y;
        double x = arc.Center.X + side * Math.Sqrt(Math.Max(0, arc.Radius * arc.Radius - dy * dy));
        return x > p.X;
    }

    private static BoundingBox SegmentBox(CurveSegment s)
    {
        var box = BoundingBox.Empty.Include(s.Start).Include(s.End);
        if (s is ArcSegment arc)
        {
            for (int q = 0; q < 4; q++)
            {
                double theta = q * Math.PI / 2;
                if (AngleWithin(arc, theta)) box = box.Include(arc.PointAtAngle(theta));
            }
        }
        return box;
    }
}
