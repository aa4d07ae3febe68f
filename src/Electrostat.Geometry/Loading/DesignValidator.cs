using System.Globalization;
using Electrostat.Geometry.Model;
using Electrostat.Geometry.Quantities;
using Electrostat.Geometry.Regions;
using Electrostat.Geometry.Shapes;
using NetTopologySuite.Geometries;
using NetTopologySuite.Operation.Distance;
using Newtonsoft.Json.Linq;

namespace Electrostat.Geometry.Loading;

/// <summary>
/// Cross-checks between bodies: enclosure, axis, containment, short circuits, merges and overlaps. Works on shapes
/// flattened to a chord tolerance of 1e-7 of the design size; two bodies closer than 1e-6 of the design size count
/// as touching (larger than twice the chord error, so tangent curved bodies are seen as touching, yet small enough
/// that a 35 um copper gap in a 1 m box is still a gap).
/// </summary>
internal sealed class DesignValidator(ReadContext ctx, ShapeReader shapes)
{
    private static readonly string[] EnclosureKeys = ["shape", "margin", "potential", "symmetry_planes", "open", "radius", "center"];
    private static readonly string[] PlaneKeys = ["x", "y"];

    private ProblemSink Sink => ctx.Sink;

    private double _chord;
    private double _touch;

    public Enclosure? BuildEnclosure(JToken? token, List<BodyDraft> conductors, List<BodyDraft> dielectrics)
    {
        if (ctx.AsObject(token, "enclosure") is not JObject obj) return null;
        ctx.CheckKeys(obj, "the enclosure", EnclosureKeys);
        double potential = ctx.Quantity(obj["potential"], QuantityKind.Potential, "enclosure potential") ?? 0;
        // Symmetry planes are read first: a shorthand box is cut back to them.
        var planes = new List<(bool IsX, double Value, JToken Token)>();
        if (obj["symmetry_planes"] is { } spToken && ctx.AsArray(spToken, "symmetry_planes") is JArray sp)
        {
            foreach (var item in sp)
            {
                if (ctx.AsObject(item, "a symmetry plane") is not JObject po) continue;
                ctx.CheckKeys(po, "a symmetry plane", PlaneKeys);
                if (po.Count != 1)
                {
                    Sink.Error(po, "a symmetry plane is given as {\"x\": value} or {\"y\": value}", "write one key per plane, e.g. {\"x\": 0}");
                    continue;
                }
                var prop = po.Properties().First();
                if (prop.Name is not ("x" or "y")) continue;
                if (ctx.Quantity(prop.Value, QuantityKind.Length, $"symmetry plane {prop.Name}") is double v)
                    planes.Add((prop.Name == "x", v, po));
            }
        }
        bool open = obj["open"] is { } openToken && (ctx.Bool(openToken, "open") ?? false);
        if (open) return BuildOpen(obj, potential, planes.Count > 0 ? planes[0].Token : null, conductors, dielectrics);
        foreach (string key in (ReadOnlySpan<string>)["radius", "center"])
        {
            if (obj[key] is not null)
                Sink.Error(obj.Property(key), $"\"{key}\" belongs to an open enclosure", "add \"open\": true for a design in open space, or remove it");
        }
        Shape? shape;
        bool shorthand = false;
        if (obj["shape"] is not null && obj["margin"] is not null)
        {
            Sink.Error(obj, "the enclosure has both \"shape\" and \"margin\"", "keep \"shape\" for an explicit outline or \"margin\" for a box around everything");
            return null;
        }
        if (obj["margin"] is { } marginToken)
        {
            shorthand = true;
            double? margin = ctx.Quantity(marginToken, QuantityKind.Length, "margin", nonNegative: true);
            if (margin is null) return null;
            var box = BoundingBox.Empty;
            foreach (var b in conductors.Concat(dielectrics)) box = box.Union(b.Shape.Bounds);
            if (box.IsEmpty)
            {
                if (Sink.HasErrors) return null; // the bodies themselves failed to read; do not pile on
                Sink.Error(marginToken, "the enclosure margin needs at least one body to surround", "add conductors, or give the enclosure an explicit \"shape\"");
                return null;
            }
            var bodies = box;
            box = box.Inflate(margin.Value);
            // A mirror plane that all bodies lie on one side of becomes an edge of the box (half models with a margin).
            double eps = 1e-9 * bodies.Diagonal;
            foreach (var (isX, v, _) in planes)
            {
                if (isX && bodies.MinX >= v - eps) box = box with { MinX = v };
                else if (isX && bodies.MaxX <= v + eps) box = box with { MaxX = v };
                else if (!isX && bodies.MinY >= v - eps) box = box with { MinY = v };
                else if (!isX && bodies.MaxY <= v + eps) box = box with { MaxY = v };
            }
            // Axisymmetric boxes always start on the axis: the domain of revolution includes r = 0.
            if (ctx.Symmetry == Symmetry.Axisymmetric) box = box with { MinX = 0 };
            if (!(margin > 0) && ctx.Symmetry == Symmetry.Planar)
                Sink.Warning(marginToken, "an enclosure margin of 0 makes the box touch the outermost bodies", "give a margin of a few times the largest gap");
            shape = new Shape(ShapeFactory.Rectangle(new Point2(box.MinX, box.MinY), new Point2(box.MaxX, box.MaxY)));
        }
        else
        {
            shape = shapes.Read(ctx.Required(obj, "shape", "the enclosure", "add \"shape\": {...}, or \"margin\": 10 for a box around everything"), "the enclosure", allowHoles: false);
            if (shape is null) return null;
        }

        double size = shape.Bounds.Diagonal;
        _chord = 1e-7 * size;
        _touch = 1e-6 * size;
        double tol = 1e-9 * size;

        // Markers: axis first (axisymmetric), then the requested symmetry planes.
        var used = new bool[planes.Count];
        bool axisymmetric = ctx.Symmetry == Symmetry.Axisymmetric;
        var marked = new Shape(shape.Outer.WithMarkers(seg =>
        {
            if (seg is not Shapes.LineSegment) return BoundaryMarker.None;
            if (axisymmetric && Math.Abs(seg.Start.X) <= tol && Math.Abs(seg.End.X) <= tol) return BoundaryMarker.Axis;
            for (int k = 0; k < planes.Count; k++)
            {
                var (isX, v, _) = planes[k];
                bool on = isX
                    ? Math.Abs(seg.Start.X - v) <= tol && Math.Abs(seg.End.X - v) <= tol
                    : Math.Abs(seg.Start.Y - v) <= tol && Math.Abs(seg.End.Y - v) <= tol;
                if (on) { used[k] = true; return BoundaryMarker.SymmetryPlane; }
            }
            return BoundaryMarker.None;
        }));
        for (int k = 0; k < planes.Count; k++)
        {
            if (used[k]) continue;
            var (isX, v, t) = planes[k];
            if (axisymmetric && isX && Math.Abs(v) <= tol)
            {
                Sink.Note(t, "in an axisymmetric design the edge on r = 0 is the axis and is marked automatically", "remove this symmetry plane");
                continue;
            }
            Sink.Error(t, string.Create(CultureInfo.InvariantCulture, $"no straight enclosure edge lies on {(isX ? "x" : "y")} = {UnitTable.Format(v, QuantityKind.Length)}"),
                "a symmetry plane must coincide with a straight edge of the enclosure; check the value");
        }
        if (axisymmetric && shape.Bounds.MinX < -tol)
        {
            var p = shape.Outer.Flatten(_chord).MinBy(q => q.X);
            Sink.Error(obj, "the enclosure reaches r < 0 in an axisymmetric design", "keep every x (radius) ≥ 0; put the enclosure's inner edge on the axis x = 0", p);
            return null;
        }
        return new Enclosure(marked, potential, shorthand);
    }

    /// <summary>
    /// The truncation circle of a design in open space: a full circle (planar) or a half disc on the axis
    /// (axisymmetric), sized by "radius" or by "margin" around the bodies, centred on "center" or on the bodies.
    /// </summary>
    private Enclosure? BuildOpen(JObject obj, double potential, JToken? planeToken, List<BodyDraft> conductors, List<BodyDraft> dielectrics)
    {
        bool axisymmetric = ctx.Symmetry == Symmetry.Axisymmetric;
        bool ok = true;
        if (planeToken is not null)
        {
            Sink.Error(planeToken, "symmetry planes cannot be combined with an open enclosure",
                "model the whole cross-section in open space (an axisymmetric design needs no plane on the axis), or use a closed enclosure");
            ok = false;
        }
        if (obj["shape"] is not null)
        {
            Sink.Error(obj.Property("shape"), "an open enclosure is a circle set by \"radius\" or \"margin\", not by \"shape\"",
                "remove \"shape\", or remove \"open\" for a closed enclosure of that outline");
            ok = false;
        }
        if (!axisymmetric && obj["potential"] is not null)
        {
            Sink.Error(obj.Property("potential"), "a planar design in open space has no fixed potential at infinity (the conductors' charges sum to zero)",
                "remove \"potential\"; fix the potentials on the conductors instead");
            ok = false;
        }
        var marginToken = obj["margin"];
        var radiusToken = obj["radius"];
        if (marginToken is not null && radiusToken is not null)
        {
            Sink.Error(obj, "the open enclosure has both \"radius\" and \"margin\"", "keep one: \"margin\" sizes the circle around the bodies, \"radius\" gives it outright");
            return null;
        }
        if (marginToken is null && radiusToken is null)
        {
            Sink.Error(obj, "the open enclosure needs \"margin\" or \"radius\" to size its truncation circle",
                "add e.g. \"margin\": 10 (the circle clears every body by that much); a margin of half the design's size is plenty");
            return null;
        }
        var box = BoundingBox.Empty;
        foreach (var b in conductors.Concat(dielectrics)) box = box.Union(b.Shape.Bounds);
        if (box.IsEmpty)
        {
            if (!Sink.HasErrors)
                Sink.Error(obj, "an open enclosure needs at least one body to surround", "add conductors");
            return null;
        }
        Point2 center = new((box.MinX + box.MaxX) / 2, (box.MinY + box.MaxY) / 2);
        if (obj["center"] is { } centerToken)
        {
            if (ctx.Point(centerToken, "center") is not Point2 c) return null;
            center = c;
        }
        if (axisymmetric)
        {
            if (obj["center"] is { } ct && Math.Abs(center.X) > 1e-12 * Math.Max(box.Diagonal, 1e-300))
            {
                Sink.Error(ct, "the centre of an axisymmetric open enclosure must lie on the axis (x = 0)", "write \"center\": [0, z]");
                return null;
            }
            center = new Point2(0, center.Y);
        }
        double radius;
        if (marginToken is not null)
        {
            double? margin = ctx.Quantity(marginToken, QuantityKind.Length, "margin", positive: true);
            if (margin is null) return null;
            double reach = 0;
            foreach (var (x, y) in new[] { (box.MinX, box.MinY), (box.MinX, box.MaxY), (box.MaxX, box.MinY), (box.MaxX, box.MaxY) })
                reach = Math.Max(reach, Math.Sqrt((x - center.X) * (x - center.X) + (y - center.Y) * (y - center.Y)));
            radius = reach + margin.Value;
        }
        else
        {
            double? r = ctx.Quantity(radiusToken, QuantityKind.Length, "radius", positive: true);
            if (r is null) return null;
            radius = r.Value;
        }
        if (!ok) return null;
        Contour outline;
        if (axisymmetric)
        {
            var bottom = new Point2(0, center.Y - radius);
            var top = new Point2(0, center.Y + radius);
            outline = new Contour([new ArcSegment(center, radius, -Math.PI / 2, Math.PI, bottom, top), new Shapes.LineSegment(top, bottom)])
                .WithMarkers(s => s is ArcSegment ? BoundaryMarker.OpenBoundary : BoundaryMarker.Axis);
        }
        else
        {
            outline = ShapeFactory.Circle(center, radius).WithMarkers(_ => BoundaryMarker.OpenBoundary);
        }
        double size = 2 * radius;
        _chord = 1e-7 * size;
        _touch = 1e-6 * size;
        return new Enclosure(new Shape(outline), axisymmetric ? potential : 0, marginToken is not null, new OpenSpace(center, radius));
    }

    public List<Electrode>? Validate(Enclosure enclosure, List<BodyDraft> conductors, List<BodyDraft> dielectrics)
    {
        bool earlierErrors = Sink.HasErrors; // then some bodies may be missing: skip whole-design judgements
        bool axisymmetric = ctx.Symmetry == Symmetry.Axisymmetric;
        var enclosurePoly = NtsShapes.ToPolygon(enclosure.Shape, _chord);
        var enclosurePrepared = NetTopologySuite.Geometries.Prepared.PreparedGeometryFactory.Prepare(enclosurePoly);
        double areaTol = _touch * _touch;
        bool ok = true;

        // r < 0 and outside the enclosure.
        var all = conductors.Select(c => (Body: c, Kind: "conductor")).Concat(dielectrics.Select(d => (Body: d, Kind: "dielectric"))).ToList();
        var polys = new Dictionary<BodyDraft, Polygon>();
        foreach (var (b, kind) in all)
        {
            var poly = NtsShapes.ToPolygon(b.Shape, _chord);
            polys[b] = poly;
            if (axisymmetric && b.Shape.Bounds.MinX < -1e-9 * enclosure.Shape.Bounds.Diagonal)
            {
                var p = b.Shape.Outer.Flatten(_chord).MinBy(q => q.X);
                Sink.Error(b.Token["shape"] ?? b.Token, $"{kind} \"{b.Name}\" reaches r < 0 in an axisymmetric design",
                    "keep every x (radius) ≥ 0: a body of revolution is drawn on the r ≥ 0 side only", p);
                ok = false;
                continue;
            }
            if (enclosurePrepared.Covers(poly)) continue;
            var outside = poly.Difference(enclosurePoly);
            if (outside.Area > areaTol)
            {
                Sink.Error(b.Token["shape"] ?? b.Token, $"{kind} \"{b.Name}\" lies (partly) outside the enclosure",
                    "move or shrink it, or enlarge the enclosure", NtsShapes.ToPoint(outside.InteriorPoint.Coordinate));
                ok = false;
            }
        }
        if (!ok) return null;

        // An open enclosure's circle is not a wall: every body must lie strictly inside it.
        if (enclosure.Open is { } openSpace)
        {
            foreach (var (b, kind) in all)
            {
                var centre = new Coordinate(openSpace.Center.X, openSpace.Center.Y);
                var far = polys[b].Coordinates.MaxBy(c => c.Distance(centre))!;
                if (far.Distance(centre) <= openSpace.RadiusMetres - _touch) continue;
                Sink.Error(b.Token["shape"] ?? b.Token, $"{kind} \"{b.Name}\" touches the open enclosure's circle (radius {UnitTable.Format(openSpace.RadiusMetres, QuantityKind.Length)})",
                    "enlarge \"radius\", or give \"margin\" instead so that the circle clears every body", new Point2(far.X, far.Y));
                ok = false;
            }
            if (!ok) return null;
        }

        // Enclosure edges held at the enclosure potential (not symmetry planes, not the axis).
        var wallLines = enclosure.Shape.Outer.Segments
            .Where(s => s.Marker == BoundaryMarker.None)
            .Select(s =>
            {
                var pts = new List<Point2> { s.Start };
                s.AppendFlattened(pts, _chord, double.PositiveInfinity);
                return (LineString)NtsShapes.Factory.CreateLineString(pts.Select(p => new Coordinate(p.X, p.Y)).ToArray());
            }).ToArray();
        var wall = NtsShapes.Factory.CreateMultiLineString(wallLines);
        // Indexed: the naive distance is quadratic in vertex count. No wall at all when every edge is a mirror plane or the axis.
        var wallIndex = wallLines.Length > 0 ? new IndexedFacetDistance(wall) : null;

        // Union-find of touching conductors that may be joined.
        int n = conductors.Count;
        var parent = Enumerable.Range(0, n).ToArray();
        int Find(int i) => parent[i] == i ? i : parent[i] = Find(parent[i]);
        var touchesWall = new bool[n];
        for (int i = 0; i < n; i++)
        {
            var a = conductors[i];
            if (wallIndex is not null)
            {
                if (wallIndex.IsWithinDistance(polys[a], _touch))
                {
                    var at = NtsShapes.ToPoint(wallIndex.NearestPoints(polys[a])[0]);
                    if (a.PotentialVolts is null)
                    {
                        Sink.Error(a.Token, $"floating conductor \"{a.Name}\" touches the enclosure, which is held at {UnitTable.Format(enclosure.PotentialVolts, QuantityKind.Potential)}",
                            "move it away from the enclosure wall, or give it the enclosure's potential", at);
                        ok = false;
                    }
                    else if (a.PotentialVolts.Value != enclosure.PotentialVolts)
                    {
                        Sink.Error(a.Token, $"short circuit: conductor \"{a.Name}\" at {UnitTable.Format(a.PotentialVolts.Value, QuantityKind.Potential)} touches the enclosure at {UnitTable.Format(enclosure.PotentialVolts, QuantityKind.Potential)}",
                            "move it away from the enclosure wall, or set its potential to the enclosure's", at);
                        ok = false;
                    }
                    else
                    {
                        touchesWall[i] = true;
                        Sink.Note(a.Token, $"conductor \"{a.Name}\" touches the enclosure wall and is part of it (same potential)", null, at);
                    }
                }
            }
            for (int j = 0; j < i; j++)
            {
                var b = conductors[j];
                if (polys[a].EnvelopeInternal.Distance(polys[b].EnvelopeInternal) > _touch) continue;
                bool intersects = polys[a].Intersects(polys[b]);
                if (!intersects && !IndexedFacetDistance.IsWithinDistance(polys[a], polys[b], _touch)) continue;
                var intersection = intersects ? polys[a].Intersection(polys[b]) : null;
                bool overlap = intersection is not null && intersection.Area > areaTol;
                var at = NtsShapes.ToPoint(overlap ? intersection!.InteriorPoint.Coordinate : IndexedFacetDistance.NearestPoints(polys[a], polys[b])[0]);
                string how = overlap ? "overlap" : "touch";
                if (a.PotentialVolts is null != b.PotentialVolts is null)
                {
                    var (fl, fx) = a.PotentialVolts is null ? (a, b) : (b, a);
                    Sink.Error(a.Token, $"floating conductor \"{fl.Name}\" and fixed conductor \"{fx.Name}\" {how}: the floating one would simply take the fixed potential",
                        $"separate them, or give \"{fl.Name}\" the potential of \"{fx.Name}\"", at);
                    ok = false;
                }
                else if (a.PotentialVolts is double va && b.PotentialVolts is double vb && va != vb)
                {
                    Sink.Error(a.Token, $"short circuit: conductors \"{b.Name}\" ({UnitTable.Format(vb, QuantityKind.Potential)}) and \"{a.Name}\" ({UnitTable.Format(va, QuantityKind.Potential)}) {how}",
                        "separate them, or give them the same potential", at);
                    ok = false;
                }
                else
                {
                    parent[Find(i)] = Find(j);
                    Sink.Note(a.Token, $"conductors \"{b.Name}\" and \"{a.Name}\" {how} and are at the same potential: they are merged into one electrode", null, at);
                }
            }
        }

        // A dielectric swallowed by conductors fills nothing (conductors win); say so rather than silently drop it.
        foreach (var d in dielectrics)
        {
            NetTopologySuite.Geometries.Geometry rest = polys[d];
            foreach (var c in conductors)
                if (rest.EnvelopeInternal.Intersects(polys[c].EnvelopeInternal)) rest = rest.Difference(polys[c]);
            if (rest.Area <= areaTol)
                Sink.Warning(d.Token, $"dielectric \"{d.Name}\" lies entirely inside conductors and has no effect (conductors win over dielectrics)",
                    "remove it or move it out of the conductor", NtsShapes.ToPoint(polys[d].InteriorPoint.Coordinate));
        }

        // Dielectric overlaps (the later entry wins; a partial overlap is often a drawing slip).
        for (int i = 0; i < dielectrics.Count; i++)
        {
            for (int j = i + 1; j < dielectrics.Count; j++)
            {
                var a = polys[dielectrics[i]];
                var b = polys[dielectrics[j]];
                if (!a.EnvelopeInternal.Intersects(b.EnvelopeInternal)) continue;
                var inter = a.Intersection(b);
                if (inter.Area <= areaTol) continue;
                var at = NtsShapes.ToPoint(inter.InteriorPoint.Coordinate);
                if (a.Difference(b).Area <= areaTol)
                {
                    Sink.Warning(dielectrics[i].Token, $"dielectric \"{dielectrics[i].Name}\" lies entirely inside the later dielectric \"{dielectrics[j].Name}\" and has no effect",
                        $"move \"{dielectrics[i].Name}\" after \"{dielectrics[j].Name}\" in the list if it should be an inclusion", at);
                }
                else if (b.Difference(a).Area > areaTol)
                {
                    Sink.Warning(dielectrics[j].Token, $"dielectrics \"{dielectrics[i].Name}\" and \"{dielectrics[j].Name}\" partly overlap; the later one, \"{dielectrics[j].Name}\", fills the overlap",
                        "make the outlines meet edge to edge if the overlap is not intended", at);
                }
            }
        }

        // A design needs two different potentials, or a charged floating conductor, to have any field.
        var potentials = conductors.Where(c => c.PotentialVolts is not null).Select(c => c.PotentialVolts!.Value).ToHashSet();
        // Infinity is a reference at the enclosure potential in axisymmetric open space; planar open space has none.
        if (wallLines.Length > 0 || (enclosure.IsOpen && axisymmetric)) potentials.Add(enclosure.PotentialVolts);
        bool charged = conductors.Any(c => c.ChargeCoulombs is double q && q != 0);
        if (enclosure.IsOpen && !axisymmetric && !earlierErrors && (potentials.Count == 0 || (potentials.Count < 2 && !charged)))
        {
            // In 2D open space infinity is free and the charges must sum to zero: a fixed conductor must take the return
            // charge, and something (a potential difference or a floating charge) must drive the field; a lone line
            // charge would have a logarithmically infinite potential.
            Sink.Error(conductors.Count > 0 ? conductors[0].Token.Parent : null,
                "a planar design in open space needs conductors at two different potentials (or a fixed conductor beside a charged floating one): a lone conductor in 2D open space has no finite capacitance",
                "add the return conductor (a second wire, a ground plane) at another potential, or use a closed enclosure as the return");
            ok = false;
        }
        else if (potentials.Count < 2 && !charged && !earlierErrors)
        {
            Sink.Warning(conductors.Count > 0 ? conductors[0].Token.Parent : null, "the design has no potential difference: every conductor and the enclosure are at the same potential, so the field is zero everywhere",
                "give at least one conductor a different potential, or a floating conductor a charge");
        }
        if (!ok) return null;

        // Electrodes in order of their first conductor.
        var groups = Enumerable.Range(0, n).GroupBy(Find).OrderBy(g => g.Min()).ToList();
        var electrodes = new List<Electrode>();
        foreach (var g in groups)
        {
            var members = g.OrderBy(i => i).ToList();
            var first = conductors[members[0]];
            string name = string.Join("+", members.Select(i => conductors[i].Name));
            double? charge = first.PotentialVolts is null ? members.Sum(i => conductors[i].ChargeCoulombs ?? 0) : null;
            electrodes.Add(new Electrode(electrodes.Count, name, members, first.PotentialVolts, charge, members.Any(i => touchesWall[i])));
        }
        return electrodes;
    }
}
