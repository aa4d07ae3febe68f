using System.Globalization;

namespace Electrostat.Geometry.Shapes;

/// <summary>Builds exact contours for the primitive shapes of the design file.</summary>
/// <remarks>
/// Fillets are exact arcs tangent to both adjacent edges (elementary geometry): at a corner with interior angle θ,
/// a fillet of radius r touches each edge at distance d = r / tan(θ/2) from the corner, and its centre lies on the
/// bisector at distance r / sin(θ/2).
/// </remarks>
public static class ShapeFactory
{
    /// <summary>A circle as four quarter arcs starting at angle 0, counter-clockwise.</summary>
    /// <param name="center">Centre, metres.</param>
    /// <param name="radiusMetres">Radius, metres (positive).</param>
    public static Contour Circle(Point2 center, double radiusMetres)
    {
        if (!(radiusMetres > 0) || !double.IsFinite(radiusMetres))
            throw new GeometryException("circle radius must be positive", hint: "give a radius greater than zero");
        return new Contour(Enumerable.Range(0, 4).Select(q => (CurveSegment)new ArcSegment(center, radiusMetres, q * Math.PI / 2, Math.PI / 2)));
    }

    /// <summary>An axis-aligned rectangle between two opposite corners, optionally with all corners rounded.</summary>
    /// <param name="min">Lower-left corner, metres.</param>
    /// <param name="max">Upper-right corner, metres.</param>
    /// <param name="cornerRadiusMetres">Fillet radius of every corner, metres (0 = sharp), at most half the shorter side.</param>
    public static Contour Rectangle(Point2 min, Point2 max, double cornerRadiusMetres = 0)
    {
        double w = max.X - min.X, h = max.Y - min.Y;
        if (!(w > 0) || !(h > 0))
            throw new GeometryException(string.Create(CultureInfo.InvariantCulture, $"rectangle has zero or negative size ({w * 1e3:G6} mm × {h * 1e3:G6} mm)"), location: min, hint: "give a positive width and height");
        if (cornerRadiusMetres < 0)
            throw new GeometryException("corner radius must not be negative", hint: "use 0 for sharp corners");
        double half = 0.5 * Math.Min(w, h);
        if (cornerRadiusMetres > half * (1 + 1e-12))
            throw new GeometryException(
                string.Create(CultureInfo.InvariantCulture, $"corner radius {cornerRadiusMetres * 1e3:G6} mm is larger than half the shorter side ({half * 1e3:G6} mm)"),
                hint: string.Create(CultureInfo.InvariantCulture, $"use a corner radius of at most {half * 1e3:G6} mm"));
        double r = Math.Min(cornerRadiusMetres, half);
        return Polygon(
        [
            new PolygonVertex(min, r),
            new PolygonVertex(new Point2(max.X, min.Y), r),
            new PolygonVertex(max, r),
            new PolygonVertex(new Point2(min.X, max.Y), r),
        ]);
    }

    /// <summary>
    /// A polygon whose corners may carry fillet radii. Vertices are given in either orientation; the result keeps the
    /// given order (normalise with <see cref="Contour.WithOrientation"/> or by building a <see cref="Shape"/>).
    /// </summary>
    /// <exception cref="GeometryException">Fewer than 3 points, repeated points, a spike, or a fillet too large for its edges.</exception>
    public static Contour Polygon(IReadOnlyList<PolygonVertex> vertices)
    {
        ArgumentNullException.ThrowIfNull(vertices);
        int n = vertices.Count;
        if (n < 3)
            throw new GeometryException($"a polygon needs at least 3 points, this one has {n}", hint: "add points or use a rectangle or circle");
        for (int i = 0; i < n; i++)
        {
            if (vertices[i].FilletRadiusMetres < 0 || !double.IsFinite(vertices[i].FilletRadiusMetres))
                throw new GeometryException("fillet radius must be zero or positive", i, vertices[i].Point, "use 0 for a sharp corner");
            var next = vertices[(i + 1) % n].Point;
            if (vertices[i].Point.DistanceTo(next) == 0)
                throw new GeometryException($"points {i} and {(i + 1) % n} coincide", (i + 1) % n, next, "remove the repeated point");
        }

        if (AllCollinear(vertices))
            throw new GeometryException("the polygon encloses zero area: all its points lie on one line", 0, vertices[0].Point, "spread the points so the outline encloses a region");

        // Tangent distance d and fillet arc at each corner.
        var d = new double[n];
        var arcs = new ArcSegment?[n];
        var halfAngle = new double[n];
        for (int i = 0; i < n; i++)
        {
            var p = vertices[i].Point;
            var a = vertices[(i + n - 1) % n].Point;
            var b = vertices[(i + 1) % n].Point;
            var u1 = (1.0 / (a - p).Length) * (a - p);
            var u2 = (1.0 / (b - p).Length) * (b - p);
            double cross = Point2.Cross(p - a, b - p);
            double theta = Math.Acos(Math.Clamp(Point2.Dot(u1, u2), -1, 1)); // interior angle between the edges
            halfAngle[i] = 0.5 * theta;
            double r = vertices[i].FilletRadiusMetres;
            if (theta < 1e-9)
                throw new GeometryException($"the outline folds back on itself at point {i} (a zero-angle spike)", i, p, "remove the point or move it");
            // Sharp corner, or straight to within 1e-6 rad: such a fillet would leave the line by r·1e-13, and its centre
            // (on a bisector of length 2 cos(θ/2)) could not be placed accurately.
            if (r == 0 || Math.PI - theta < 1e-6) continue;
            double scale = Math.Max(Math.Max(Math.Abs(p.X), Math.Abs(p.Y)), Math.Max((a - p).Length, (b - p).Length));
            if (r < 1e-9 * scale)
                throw new GeometryException(string.Create(CultureInfo.InvariantCulture, $"fillet radius {r:G3} m at point {i} is too small to represent at this position"), i, p, "use 0 for a sharp corner");
            d[i] = r / Math.Tan(0.5 * theta);
            var t1 = p + d[i] * u1;
            var t2 = p + d[i] * u2;
            var bis = u1 + u2;
            var c = p + (r / Math.Sin(0.5 * theta) / bis.Length) * bis;
            double start = Math.Atan2(t1.Y - c.Y, t1.X - c.X);
            double sweep = Math.Sign(cross) * (Math.PI - theta);
            try
            {
                arcs[i] = new ArcSegment(c, r, start, sweep, t1, t2); // end points: the tangency points themselves
            }
            catch (ArgumentException)
            {
                throw new GeometryException($"the fillet at point {i} cannot be constructed accurately (the corner is almost straight or degenerate)", i, p, "use 0 for this corner or move the point");
            }
        }

        for (int i = 0; i < n; i++)
        {
            int j = (i + 1) % n;
            double len = vertices[i].Point.DistanceTo(vertices[j].Point);
            if (d[i] + d[j] > len * (1 + 1e-9))
            {
                int culprit = d[j] > d[i] ? j : i;
                int other = culprit == i ? j : i;
                double maxR = Math.Max(0, len - d[other]) * Math.Tan(halfAngle[culprit]);
                throw new GeometryException(
                    string.Create(CultureInfo.InvariantCulture,
                        $"fillet radius {vertices[culprit].FilletRadiusMetres * 1e3:G6} mm at point {culprit} is too large: the fillets at points {i} and {j} need {(d[i] + d[j]) * 1e3:G6} mm of the {len * 1e3:G6} mm edge between them"),
                    culprit, vertices[culprit].Point,
                    string.Create(CultureInfo.InvariantCulture, $"reduce the fillet radius at point {culprit} to at most {maxR * 1e3:G6} mm"));
            }
        }

        // Where a fillet uses up a whole edge, make the joint exact: fillets meeting share one point, and a fillet
        // reaching a sharp corner ends exactly on it (otherwise rounding leaves ~1e-17 m slivers, or r = -6e-19).
        for (int i = 0; i < n; i++)
        {
            int j = (i + 1) % n;
            double len = vertices[i].Point.DistanceTo(vertices[j].Point);
            double tiny = 1e-12 * len;
            if (arcs[i] is { } ai && arcs[j] is { } aj && ai.End.DistanceTo(aj.Start) <= tiny) arcs[j] = aj.WithStart(ai.End);
            else if (arcs[i] is { } ai2 && arcs[j] is null && ai2.End.DistanceTo(vertices[j].Point) <= tiny) arcs[i] = ai2.WithEnd(vertices[j].Point);
            else if (arcs[i] is null && arcs[j] is { } aj2 && aj2.Start.DistanceTo(vertices[i].Point) <= tiny) arcs[j] = aj2.WithStart(vertices[i].Point);
        }

        var segments = new List<CurveSegment>(2 * n);
        for (int i = 0; i < n; i++)
        {
            int j = (i + 1) % n;
            Point2 from;
            if (arcs[i] is { } arc)
            {
                segments.Add(arc);
                from = arc.End;
            }
            else
            {
                from = vertices[i].Point;
            }
            Point2 to = arcs[j]?.Start ?? vertices[j].Point;
            double len = vertices[i].Point.DistanceTo(vertices[j].Point);
            // When two fillets use up a whole edge they meet exactly and no straight piece remains between them.
            if (from.DistanceTo(to) > 1e-12 * len)
                segments.Add(new LineSegment(from, to));
        }

        // Snap joints so consecutive segments share exact end points (fillet end points come from trigonometry).
        return new Contour(Snap(segments));
    }

    private static bool AllCollinear(IReadOnlyList<PolygonVertex> v)
    {
        var p0 = v[0].Point;
        var far = v.MaxBy(q => q.Point.DistanceTo(p0)).Point;
        var axis = far - p0;
        double len = axis.Length;
        if (len == 0) return true;
        return v.All(q => Math.Abs(Point2.Cross(axis, q.Point - p0)) / len <= 1e-12 * len);
    }

    /// <summary>Replaces each line's end points by the exact ends of neighbouring arcs, so joints coincide bit for bit.</summary>
    private static List<CurveSegment> Snap(List<CurveSegment> segments)
    {
        int m = segments.Count;
        for (int i = 0; i < m; i++)
        {
            if (segments[i] is not LineSegment line) continue;
            var prev = segments[(i + m - 1) % m];
            var next = segments[(i + 1) % m];
            var start = prev is ArcSegment ? prev.End : line.Start;
            var end = next is ArcSegment ? next.Start : line.End;
            segments[i] = new LineSegment(start, end) { Marker = line.Marker };
        }
        return segments;
    }
}
