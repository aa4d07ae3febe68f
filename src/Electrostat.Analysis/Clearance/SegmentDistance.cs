using Electrostat.Geometry.Shapes;

namespace Electrostat.Analysis.Clearance;

/// <summary>
/// Exact minimum distance between two curve pieces (line or circular arc) with the two closest points.
/// </summary>
/// <remarks>
/// Why the candidate lists are complete: the minimum of |p − q| over p on curve A and q on curve B is attained
/// either where the curves meet (distance 0), or with p or q at an end point (handled by exact point–curve
/// distances), or at interior points of both, where p − q is normal to both curves. For a line that normal pair is
/// the perpendicular from the circle centre; for two arcs it lies on the line of centres. Each case is a closed form
/// (elementary analytic geometry), so the result is exact up to rounding.
/// </remarks>
internal static class SegmentDistance
{
    public static (double Distance, Point2 A, Point2 B) Between(CurveSegment a, CurveSegment b)
    {
        var best = (Distance: double.PositiveInfinity, A: a.Start, B: b.Start);
        void Consider(Point2 p, Point2 q)
        {
            double d = p.DistanceTo(q);
            if (d < best.Distance) best = (d, p, q);
        }

        // End points against the other curve.
        foreach (var p in new[] { a.Start, a.End }) Consider(p, ClosestPoint(b, p));
        foreach (var q in new[] { b.Start, b.End }) Consider(ClosestPoint(a, q), q);

        switch (a, b)
        {
            case (LineSegment la, LineSegment lb):
                if (SegmentsIntersect(la.Start, la.End, lb.Start, lb.End, out var x)) Consider(x, x);
                break;
            case (LineSegment la, ArcSegment ab):
                LineArc(la, ab, (p, q) => Consider(p, q));
                break;
            case (ArcSegment aa, LineSegment lb):
                LineArc(lb, aa, (p, q) => Consider(q, p));
                break;
            case (ArcSegment aa, ArcSegment ab):
                ArcArc(aa, ab, (p, q) => Consider(p, q));
                break;
        }
        return best;
    }

    /// <summary>The point of a curve closest to p (exact).</summary>
    public static Point2 ClosestPoint(CurveSegment s, Point2 p)
    {
        if (s is ArcSegment arc)
        {
            var d = p - arc.Center;
            double len = d.Length;
            if (len > 0)
            {
                double theta = Math.Atan2(d.Y, d.X);
                if (OnArc(arc, theta)) return arc.PointAtAngle(theta);
            }
            return p.DistanceTo(arc.Start) <= p.DistanceTo(arc.End) ? arc.Start : arc.End;
        }
        var a = s.Start;
        var ab = s.End - a;
        double len2 = Point2.Dot(ab, ab);
        double t = len2 > 0 ? Math.Clamp(Point2.Dot(p - a, ab) / len2, 0, 1) : 0;
        return a + t * ab;
    }

    /// <summary>True when angle θ lies within the arc's sweep (modulo 2π, with a tolerance of 1e-12 rad).</summary>
    public static bool OnArc(ArcSegment arc, double theta)
    {
        double lo = Math.Min(arc.StartAngle, arc.EndAngle);
        double span = Math.Abs(arc.SweepAngle);
        double rel = theta - lo;
        rel -= 2 * Math.PI * Math.Floor(rel / (2 * Math.PI));
        return rel <= span + 1e-12 || rel >= 2 * Math.PI - 1e-12;
    }

    private static void LineArc(LineSegment line, ArcSegment arc, Action<Point2, Point2> consider)
    {
        var a = line.Start;
        var u = line.End - a;
        double len2 = Point2.Dot(u, u);
        if (len2 == 0) return;
        var c = arc.Center;
        double tf = Point2.Dot(c - a, u) / len2;
        var f = a + tf * u;
        var cf = f - c;
        double dist = cf.Length;
        // Interior–interior candidates: the foot of the perpendicular from the centre, against the circle points on it.
        if (tf >= 0 && tf <= 1 && dist > 0)
        {
            double th = Math.Atan2(cf.Y, cf.X);
            if (OnArc(arc, th)) consider(f, arc.PointAtAngle(th));
            if (OnArc(arc, th + Math.PI)) consider(f, arc.PointAtAngle(th + Math.PI));
        }
        // Crossings of the line with the circle.
        if (dist <= arc.Radius)
        {
            double half = Math.Sqrt(Math.Max(0, arc.Radius * arc.Radius - dist * dist) / len2);
            foreach (double t in new[] { tf - half, tf + half })
            {
                if (t < 0 || t > 1) continue;
                var p = a + t * u;
                var d = p - c;
                if (OnArc(arc, Math.Atan2(d.Y, d.X))) consider(p, p);
            }
        }
    }

    private static void ArcArc(ArcSegment a, ArcSegment b, Action<Point2, Point2> consider)
    {
        var d = b.Center - a.Center;
        double dist = d.Length;
        if (dist < 1e-15 * Math.Max(a.Radius, b.Radius))
        {
            // Concentric: any common angle gives |Ra − Rb|.
            foreach (double th in new[] { a.StartAngle, a.EndAngle })
            {
                if (OnArc(b, th)) consider(a.PointAtAngle(th), b.PointAtAngle(th));
            }
            foreach (double th in new[] { b.StartAngle, b.EndAngle })
            {
                if (OnArc(a, th)) consider(a.PointAtAngle(th), b.PointAtAngle(th));
            }
            return;
        }
        double phi = Math.Atan2(d.Y, d.X);
        foreach (double ta in new[] { phi, phi + Math.PI })
        {
            if (!OnArc(a, ta)) continue;
            foreach (double tb in new[] { phi, phi + Math.PI })
            {
                if (OnArc(b, tb)) consider(a.PointAtAngle(ta), b.PointAtAngle(tb));
            }
        }
        // Circle–circle crossings.
        if (dist <= a.Radius + b.Radius && dist >= Math.Abs(a.Radius - b.Radius))
        {
            double x = (dist * dist + a.Radius * a.Radius - b.Radius * b.Radius) / (2 * dist);
            double h = Math.Sqrt(Math.Max(0, a.Radius * a.Radius - x * x));
            var e = (1 / dist) * d;
            var n = new Point2(-e.Y, e.X);
            foreach (double sgn in new[] { -1.0, 1.0 })
            {
                var p = a.Center + x * e + (sgn * h) * n;
                var pa = p - a.Center;
                var pb = p - b.Center;
                if (OnArc(a, Math.Atan2(pa.Y, pa.X)) && OnArc(b, Math.Atan2(pb.Y, pb.X))) consider(p, p);
            }
        }
    }

    private static bool SegmentsIntersect(Point2 p1, Point2 p2, Point2 q1, Point2 q2, out Point2 at)
    {
        at = p1;
        var r = p2 - p1;
        var s = q2 - q1;
        double den = Point2.Cross(r, s);
        if (den == 0) return false; // parallel: end-point candidates already cover touching and overlap
        var qp = q1 - p1;
        double t = Point2.Cross(qp, s) / den;
        double u = Point2.Cross(qp, r) / den;
        if (t < 0 || t > 1 || u < 0 || u > 1) return false;
        at = p1 + t * r;
        return true;
    }
}
