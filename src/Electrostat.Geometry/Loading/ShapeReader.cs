using Electrostat.Geometry.Quantities;
using Electrostat.Geometry.Regions;
using Electrostat.Geometry.Shapes;
using NetTopologySuite.Operation.Valid;
using Newtonsoft.Json.Linq;

namespace Electrostat.Geometry.Loading;

/// <summary>Reads the shape objects of the design file into exact <see cref="Shape"/>s and checks each outline on its own.</summary>
internal sealed class ShapeReader(ReadContext ctx)
{
    private static readonly string[] Types = ["rectangle", "circle", "polygon", "path"];
    private static readonly string[] RectangleKeys = ["type", "min", "max", "center", "width", "height", "corner_radius", "holes"];
    private static readonly string[] CircleKeys = ["type", "center", "radius", "holes"];
    private static readonly string[] PolygonKeys = ["type", "points", "holes"];
    private static readonly string[] PathKeys = ["type", "start", "segments", "holes"];
    private static readonly string[] VertexKeys = ["at", "fillet"];
    private static readonly string[] LineStepKeys = ["line_to"];
    private static readonly string[] ArcCenterStepKeys = ["arc_center", "sweep"];
    private static readonly string[] ArcToStepKeys = ["arc_to", "center", "direction"];

    private ProblemSink Sink => ctx.Sink;

    /// <summary>Reads a shape with optional holes; null after reporting problems.</summary>
    public Shape? Read(JToken? token, string what, bool allowHoles = true)
    {
        try
        {
            return ReadUnguarded(token, what, allowHoles);
        }
        catch (Exception e) when (e is ArgumentException or GeometryException)
        {
            // Safety net: numerical corner cases the checks above did not foresee still become one located message.
            Sink.Error(token, $"{what}: the outline cannot be built ({e.Message})", "check the coordinates and radii of this shape");
            return null;
        }
    }

    private Shape? ReadUnguarded(JToken? token, string what, bool allowHoles)
    {
        var obj = ctx.AsObject(token, what);
        if (obj is null) return null;
        var typeToken = ctx.Required(obj, "type", what, "add \"type\": \"rectangle\", \"circle\", \"polygon\" or \"path\"");
        string? type = ctx.String(typeToken, $"{what} type");
        if (type is null) return null;
        Contour? outer;
        switch (type)
        {
            case "rectangle":
                ctx.CheckKeys(obj, $"a rectangle", RectangleKeys);
                outer = ReadRectangle(obj, what);
                break;
            case "circle":
                ctx.CheckKeys(obj, $"a circle", CircleKeys);
                outer = ReadCircle(obj, what);
                break;
            case "polygon":
                ctx.CheckKeys(obj, $"a polygon", PolygonKeys);
                outer = ReadPolygon(obj, what);
                break;
            case "path":
                ctx.CheckKeys(obj, $"a path", PathKeys);
                outer = ReadPath(obj, what);
                break;
            default:
                Sink.Error(typeToken, $"unknown shape type \"{type}\"", Suggestions.Hint(type, Types));
                return null;
        }
        if (outer is null) return null;
        // Circles and rectangles are simple by construction; only free outlines need the crossing test.
        if (!CheckOutline(outer, obj, what, checkCrossings: type is "polygon" or "path")) return null;

        var holes = new List<Contour>();
        var holesToken = obj["holes"];
        if (holesToken is not null)
        {
            if (!allowHoles)
            {
                Sink.Error(obj.Property("holes"), $"{what} cannot have holes");
                return null;
            }
            var arr = ctx.AsArray(holesToken, $"{what} holes");
            if (arr is null) return null;
            bool ok = true;
            for (int k = 0; k < arr.Count; k++)
            {
                var hole = Read(arr[k], $"hole {k} of {what}", allowHoles: false);
                if (hole is null) { ok = false; continue; }
                holes.Add(hole.Outer);
            }
            if (!ok) return null;
            if (!CheckHoles(outer, holes, arr, what)) return null;
        }
        return new Shape(outer, holes);
    }

    private Contour? ReadRectangle(JObject obj, string what)
    {
        var radius = ctx.Quantity(obj["corner_radius"], QuantityKind.Length, "corner_radius", nonNegative: true) ?? 0;
        Point2? min, max;
        bool byCorners = obj["min"] is not null || obj["max"] is not null;
        bool byCenter = obj["center"] is not null || obj["width"] is not null || obj["height"] is not null;
        if (byCorners && byCenter)
        {
            Sink.Error(obj, $"{what}: give either \"min\" and \"max\" or \"center\", \"width\" and \"height\", not both");
            return null;
        }
        if (byCorners)
        {
            min = ctx.Point(ctx.Required(obj, "min", what, "add \"min\": [x, y], the lower-left corner"), "min");
            max = ctx.Point(ctx.Required(obj, "max", what, "add \"max\": [x, y], the upper-right corner"), "max");
            if (min is null || max is null) return null;
            if (!(max.Value.X > min.Value.X) || !(max.Value.Y > min.Value.Y))
            {
                Sink.Error(obj["max"], $"{what}: \"max\" must lie above and to the right of \"min\"", "swap the corners or fix the coordinates", min);
                return null;
            }
        }
        else
        {
            var c = ctx.Point(ctx.Required(obj, "center", what, "add \"center\": [x, y] with \"width\" and \"height\", or \"min\" and \"max\""), "center");
            var w = ctx.Quantity(ctx.Required(obj, "width", what, "add \"width\""), QuantityKind.Length, "width", positive: true);
            var h = ctx.Quantity(ctx.Required(obj, "height", what, "add \"height\""), QuantityKind.Length, "height", positive: true);
            if (c is null || w is null || h is null) return null;
            min = new Point2(c.Value.X - 0.5 * w.Value, c.Value.Y - 0.5 * h.Value);
            max = new Point2(c.Value.X + 0.5 * w.Value, c.Value.Y + 0.5 * h.Value);
        }
        try
        {
            return ShapeFactory.Rectangle(min.Value, max.Value, radius);
        }
        catch (GeometryException e)
        {
            Sink.Error(obj["corner_radius"] ?? obj, $"{what}: {e.Message}", e.Hint, e.Location);
            return null;
        }
    }

    private Contour? ReadCircle(JObject obj, string what)
    {
        var c = ctx.Point(ctx.Required(obj, "center", what, "add \"center\": [x, y]"), "center");
        var r = ctx.Quantity(ctx.Required(obj, "radius", what, "add \"radius\""), QuantityKind.Length, "radius", positive: true);
        if (c is null || r is null) return null;
        return ShapeFactory.Circle(c.Value, r.Value);
    }

    private Contour? ReadPolygon(JObject obj, string what)
    {
        var arr = ctx.AsArray(ctx.Required(obj, "points", what, "add \"points\": [[x, y], ...]"), $"{what} points");
        if (arr is null) return null;
        var vertices = new List<PolygonVertex>();
        bool ok = true;
        for (int i = 0; i < arr.Count; i++)
        {
            var t = arr[i];
            Point2? p;
            double fillet = 0;
            if (t is JObject vo)
            {
                ctx.CheckKeys(vo, "a polygon point", VertexKeys);
                p = ctx.Point(ctx.Required(vo, "at", "a polygon point", "add \"at\": [x, y]"), "at");
                fillet = ctx.Quantity(vo["fillet"], QuantityKind.Length, "fillet", nonNegative: true) ?? 0;
            }
            else
            {
                p = ctx.Point(t, $"point {i}");
            }
            if (p is null) { ok = false; continue; }
            vertices.Add(new PolygonVertex(p.Value, fillet));
        }
        if (!ok) return null;
        try
        {
            return ShapeFactory.Polygon(vertices);
        }
        catch (GeometryException e)
        {
            JToken at = e.PointIndex is int k && k < arr.Count ? arr[k] : arr;
            Sink.Error(at, $"{what}: {e.Message}", e.Hint, e.Location);
            return null;
        }
    }

    private Contour? ReadPath(JObject obj, string what)
    {
        var start = ctx.Point(ctx.Required(obj, "start", what, "add \"start\": [x, y]"), "start");
        var arr = ctx.AsArray(ctx.Required(obj, "segments", what, "add \"segments\": [{\"line_to\": [x, y]}, ...]"), $"{what} segments");
        if (start is null || arr is null) return null;
        var segments = new List<CurveSegment>();
        var current = start.Value;
        for (int i = 0; i < arr.Count; i++)
        {
            var so = ctx.AsObject(arr[i], $"segment {i}");
            if (so is null) return null;
            if (so["line_to"] is not null)
            {
                ctx.CheckKeys(so, "a line segment", LineStepKeys);
                var to = ctx.Point(so["line_to"], "line_to");
                if (to is null) return null;
                if (to.Value.DistanceTo(current) == 0)
                {
                    Sink.Error(so["line_to"], $"{what}: segment {i} has zero length (it ends where it starts)", "remove the segment", to);
                    return null;
                }
                segments.Add(new LineSegment(current, to.Value));
                current = to.Value;
            }
            else if (so["arc_center"] is not null)
            {
                ctx.CheckKeys(so, "an arc segment", ArcCenterStepKeys);
                var c = ctx.Point(so["arc_center"], "arc_center");
                var sweep = ctx.Quantity(ctx.Required(so, "sweep", "an arc segment", "add \"sweep\": angle in degrees, positive counter-clockwise"), QuantityKind.Angle, "sweep");
                if (c is null || sweep is null) return null;
                double r = current.DistanceTo(c.Value);
                if (r == 0 || sweep.Value == 0 || Math.Abs(sweep.Value) > 2 * Math.PI)
                {
                    Sink.Error(so, $"{what}: arc {i} is degenerate (radius {r * 1e3:G6} mm, sweep {sweep.Value * 180 / Math.PI:G6} deg)",
                        "put the centre away from the current point and use a sweep between -360 and 360 deg, not 0", c);
                    return null;
                }
                var arc = new ArcSegment(c.Value, r, Math.Atan2(current.Y - c.Value.Y, current.X - c.Value.X), sweep.Value, current, null);
                segments.Add(arc);
                current = arc.End;
            }
            else if (so["arc_to"] is not null)
            {
                ctx.CheckKeys(so, "an arc segment", ArcToStepKeys);
                var to = ctx.Point(so["arc_to"], "arc_to");
                var c = ctx.Point(ctx.Required(so, "center", "an arc segment", "add \"center\": [x, y]"), "center");
                string dir = so["direction"] is null ? "ccw" : ctx.String(so["direction"], "direction") ?? "ccw";
                if (to is null || c is null) return null;
                if (dir is not ("ccw" or "cw"))
                {
                    Sink.Error(so["direction"], $"direction must be \"ccw\" or \"cw\", found \"{dir}\"", Suggestions.Hint(dir, ["ccw", "cw"]));
                    return null;
                }
                double r0 = current.DistanceTo(c.Value), r1 = to.Value.DistanceTo(c.Value);
                if (r0 == 0 || Math.Abs(r1 - r0) > 1e-6 * r0)
                {
                    Sink.Error(so["arc_to"], $"{what}: arc {i} end point is {r1 * 1e3:G6} mm from the centre but the start is {r0 * 1e3:G6} mm from it",
                        "move the end point or the centre so both ends lie on one circle", to);
                    return null;
                }
                double a0 = Math.Atan2(current.Y - c.Value.Y, current.X - c.Value.X);
                double a1 = Math.Atan2(to.Value.Y - c.Value.Y, to.Value.X - c.Value.X);
                double sweep = a1 - a0;
                if (dir == "ccw") { while (sweep <= 0) sweep += 2 * Math.PI; }
                else { while (sweep >= 0) sweep -= 2 * Math.PI; }
                // The arc starts and ends exactly on the given points (r1 equals r0 to 1e-6; the stored end is the given point).
                segments.Add(new ArcSegment(c.Value, r0, a0, sweep, current, ScaleOntoCircle(to.Value, c.Value, r0)));
                current = segments[^1].End;
            }
            else
            {
                Sink.Error(so, $"segment {i} must have \"line_to\", \"arc_center\" (with \"sweep\") or \"arc_to\" (with \"center\")",
                    "write e.g. {\"line_to\": [x, y]}");
                return null;
            }
        }
        if (segments.Count == 0)
        {
            Sink.Error(arr, $"{what}: a path needs at least one segment");
            return null;
        }
        double scale = segments.Aggregate(BoundingBox.Empty, (b, s) => b.Include(s.Start).Include(s.End)).Diagonal;
        if (current.DistanceTo(start.Value) > 1e-9 * scale)
            segments.Add(new LineSegment(current, start.Value)); // a path closes itself with a straight line
        else if (segments[^1] is ArcSegment last)
            segments[^1] = last.WithEnd(start.Value); // an arc that returns to the start closes exactly
        // Make each joint exact: a line starts where the previous segment really ends (arc ends come from trigonometry).
        for (int i = 0; i < segments.Count; i++)
        {
            if (segments[i] is LineSegment line)
            {
                var prevEnd = segments[(i + segments.Count - 1) % segments.Count].End;
                var nextStart = segments[(i + 1) % segments.Count].Start;
                segments[i] = new LineSegment(i == 0 ? line.Start : prevEnd, segments[(i + 1) % segments.Count] is ArcSegment ? nextStart : line.End);
            }
        }
        if (segments.Count < 2 || (segments.Count == 2 && segments.All(s => s is LineSegment)))
        {
            Sink.Error(arr, $"{what}: the path encloses no area", "add segments so the outline encloses a region", start);
            return null;
        }
        try
        {
            return new Contour(segments);
        }
        catch (ArgumentException)
        {
            Sink.Error(arr, $"{what}: the path segments do not join up", "check that each arc ends where the next segment starts");
            return null;
        }
    }

    /// <summary>The given point if it is on the circle to rounding, else its projection onto the circle.</summary>
    private static Point2 ScaleOntoCircle(Point2 p, Point2 center, double radius)
    {
        double d = p.DistanceTo(center);
        return Math.Abs(d - radius) <= 1e-12 * radius ? p : center + (radius / d) * (p - center);
    }

    /// <summary>Zero area and self-intersection checks on one outline.</summary>
    private bool CheckOutline(Contour contour, JObject obj, string what, bool checkCrossings)
    {
        double diag = contour.Bounds.Diagonal;
        if (checkCrossings && !CheckCrossings(contour, obj, what, diag)) return false;
        if (contour.Area <= 1e-9 * diag * diag)
        {
            Sink.Error(obj, $"{what} encloses zero area", "spread the points so the outline encloses a region",
                new Point2(contour.Bounds.MinX, contour.Bounds.MinY));
            return false;
        }
        return true;
    }

    private bool CheckCrossings(Contour contour, JObject obj, string what, double diag)
    {
        var ring = NtsShapes.ToRing(contour, 1e-7 * diag);
        var bad = IsSimpleOp.GetNonSimpleLocation(ring);
        if (bad is not null)
        {
            Sink.Error(obj, $"{what} outline crosses itself", "reorder or move the points so the outline does not cross itself",
                NtsShapes.ToPoint(bad));
            return false;
        }
        return true;
    }

    private bool CheckHoles(Contour outer, List<Contour> holes, JArray tokens, string what)
    {
        double tol = 1e-7 * outer.Bounds.Diagonal;
        var outerPoly = NetTopologySuite.Geometries.Prepared.PreparedGeometryFactory.Prepare(NtsShapes.ToPolygon(outer, tol));
        var polys = holes.Select(h => NtsShapes.ToPolygon(h, tol)).ToList();
        bool ok = true;
        for (int k = 0; k < polys.Count; k++)
        {
            if (!outerPoly.ContainsProperly(polys[k]))
            {
                Sink.Error(tokens[k], $"hole {k} of {what} is not inside its outline", "move or shrink the hole so it lies strictly inside (not touching the outline)",
                    NtsShapes.ToPoint(polys[k].InteriorPoint.Coordinate));
                ok = false;
            }
            for (int m = 0; m < k; m++)
            {
                if (polys[k].Intersects(polys[m]))
                {
                    Sink.Error(tokens[k], $"holes {m} and {k} of {what} overlap or touch", "merge them into one hole or separate them",
                        NtsShapes.ToPoint(polys[k].Intersection(polys[m]).Centroid.Coordinate));
                    ok = false;
                }
            }
        }
        return ok;
    }
}
