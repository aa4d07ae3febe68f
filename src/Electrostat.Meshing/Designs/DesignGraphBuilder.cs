using Electrostat.Geometry.Model;
using Electrostat.Geometry.Shapes;
using Electrostat.Meshing.Core;
using Electrostat.Meshing.Input;
using Electrostat.Meshing.Predicates;

namespace Electrostat.Meshing.Designs;

/// <summary>
/// Turns a design into the mesher's planar graph: cuts curves into chords, nodes all outlines against each other,
/// labels every face with <see cref="Design.Classify"/>, drops outline pieces between equal regions (or inside
/// conductors and outside), and tags each kept piece from <see cref="BoundaryTagTable"/>.
/// </summary>
/// <remarks>
/// Faces are found without a polygon library: the noded outlines are triangulated (constrained Delaunay, no
/// refinement), each connected set of triangles between outlines is one face, and the face is classified at the
/// incentre of its triangle with the largest inscribed circle (far from the chords, so the chord-versus-arc gap
/// cannot put the test point on the wrong side). Region attributes: 0 = background material, j + 1 = dielectric j.
/// Conductors and the outside become holes.
/// </remarks>
public static class DesignGraphBuilder
{
    /// <summary>Largest chord angle on an open-space circle: 64 chords per full turn (common practice for a smooth far field).</summary>
    private const double OpenCircleChordAngle = 2 * Math.PI / 64;

    private readonly record struct Piece(double X0, double Y0, double X1, double Y1, SegmentSource Source, BoundaryMarker Marker);

    /// <summary>Builds the mesher input for a design.</summary>
    /// <param name="design">The design (metres).</param>
    /// <param name="options">Mesh options; their size limits cap the chord length on arcs. Null for defaults.</param>
    /// <param name="settings">Curve cutting settings; null for defaults.</param>
    /// <returns>The graph with its tag and region tables.</returns>
    public static DesignMeshInput Build(Design design, MeshOptions? options = null, DesignMeshSettings? settings = null)
    {
        ArgumentNullException.ThrowIfNull(design);
        options ??= new MeshOptions();
        settings ??= new DesignMeshSettings();
        double diag = Math.Max(design.Bounds.Diagonal, 1e-300);
        double chordTol = settings.ChordToleranceMetres ?? 2e-5 * diag;
        double maxAngle = settings.MaxChordAngleDegrees * Math.PI / 180;

        var pieces = new List<Piece>();
        double areaTol = 0;
        double openChord = design.Enclosure.Open is { } os ? OpenCircleChordLimit(design, os) : double.PositiveInfinity;
        void AddShape(Shape shape, SourceEntity entity, int index)
        {
            int ci = 0;
            foreach (var contour in shape.Contours)
            {
                for (int k = 0; k < contour.Segments.Count; k++)
                    areaTol += Cut(contour.Segments[k], new SegmentSource(entity, index, ci, k), chordTol, maxAngle, options, pieces, openChord);
                ci++;
            }
        }
        AddShape(design.Enclosure.Shape, SourceEntity.Enclosure, 0);
        for (int k = 0; k < design.Conductors.Count; k++) AddShape(design.Conductors[k].Shape, SourceEntity.Conductor, k);
        for (int j = 0; j < design.Dielectrics.Count; j++) AddShape(design.Dielectrics[j].Shape, SourceEntity.Dielectric, j);

        double eps = 1e-9 * diag;
        var (vx, vy, segs) = Node(pieces, eps);

        // Triangulate the noded outlines once to find the faces.
        var graph0 = new PlanarGraph();
        for (int i = 0; i < vx.Count; i++) graph0.AddVertex(vx[i], vy[i]);
        foreach (var (a, b, _) in segs) graph0.AddSegment(a, b, 0);
        try
        {
            graph0.Validate();
        }
        catch (MeshInputException e)
        {
            throw new MeshInputException($"The design outlines could not be noded cleanly: {e.Message} Move the outlines apart by more than {PlanarGraph.Fmt(eps)} m or make them meet exactly.");
        }
        var core = MeshCore.BuildConstrainedDelaunay(graph0);
        var comp = Components(core, out int ncomp);
        var seedX = new double[ncomp];
        var seedY = new double[ncomp];
        var bestR = new double[ncomp];
        for (int t = 0; t < core.NT; t++)
        {
            var (ix, iy, r) = Incircle(core, t);
            int c = comp[t];
            if (r > bestR[c]) { bestR[c] = r; seedX[c] = ix; seedY[c] = iy; }
        }
        var label = new RegionHit[ncomp];
        for (int c = 0; c < ncomp; c++) label[c] = design.Classify(seedX[c], seedY[c]);

        // Side labels of every noded segment: left and right of its A→B direction.
        var left = new RegionHit?[segs.Count];
        var right = new RegionHit?[segs.Count];
        for (int code = 0; code < 3 * core.NT; code++)
        {
            int s = core.TS[code];
            if (s < 0) continue;
            int t = code / 3, e = code % 3;
            int from = core.TV[3 * t + MeshCore.Next(e)];
            if (from == segs[s].A) left[s] = label[comp[t]];
            else right[s] = label[comp[t]];
        }

        var tags = new BoundaryTagTable();
        var graph = new PlanarGraph();
        var map = new int[vx.Count];
        Array.Fill(map, -1);
        var segSources = new List<SegmentSource>();
        var vertexSources = new List<SegmentSource>();
        for (int s = 0; s < segs.Count; s++)
        {
            var l = left[s] ?? new RegionHit(RegionKind.Outside, -1);
            var r = right[s] ?? new RegionHit(RegionKind.Outside, -1);
            int tag = TagFor(l, r, pieces[segs[s].Piece].Marker, design, tags);
            if (tag == 0) continue;
            int a = segs[s].A, b = segs[s].B;
            var src = pieces[segs[s].Piece].Source;
            if (map[a] < 0) { map[a] = graph.AddVertex(vx[a], vy[a]); vertexSources.Add(src); }
            if (map[b] < 0) { map[b] = graph.AddVertex(vx[b], vy[b]); vertexSources.Add(src); }
            graph.AddSegment(map[a], map[b], tag);
            segSources.Add(src);
        }
        var present = new SortedDictionary<int, MeshRegion>();
        for (int c = 0; c < ncomp; c++)
        {
            int attr = Attribute(label[c]);
            if (attr >= 0)
            {
                graph.AddRegion(new RegionSeed(seedX[c], seedY[c], attr));
                present[attr] = attr == 0 ? new MeshRegion(0, -1, design.BackgroundMaterial) : new MeshRegion(attr, attr - 1, design.Dielectrics[attr - 1].Material);
            }
            else graph.AddHole(seedX[c], seedY[c]);
        }
        var areas = new Dictionary<int, double>();
        foreach (int attr in present.Keys)
            areas[attr] = attr == 0 ? design.Regions.BackgroundAreaSquareMetres : design.Regions.DielectricAreasSquareMetres[attr - 1];
        OpenSpaceImage? image = design.Enclosure.Open is { } open
            ? AddOpenSpaceImage(design, open, graph, tags, segSources, vertexSources, areas)
            : null;
        // Chord polygons differ from the curves by at most chord × sagitta per chord; the region assembly flattens
        // with its own tolerance, adding the same kind of error.
        double perimeter = pieces.Sum(p => Math.Sqrt((p.X1 - p.X0) * (p.X1 - p.X0) + (p.Y1 - p.Y0) * (p.Y1 - p.Y0)));
        areaTol += perimeter * design.Regions.ChordToleranceMetres + 1e-12 * diag * diag;
        return new DesignMeshInput(graph, tags, present.Values.ToArray(), segSources.ToArray(), vertexSources.ToArray(), areas, areaTol)
        {
            OpenSpace = image,
        };
    }

    /// <summary>
    /// Adds the Kelvin image of the space outside an open design's truncation circle: a copy of the circle's chords
    /// (same angles, same radius) about a centre 3R beside the design (+x planar, +z along the axis when
    /// axisymmetric), the image centre as a vertex, and a region seed. The image region is the next free attribute.
    /// </summary>
    private static OpenSpaceImage AddOpenSpaceImage(Design design, OpenSpace open, PlanarGraph graph, BoundaryTagTable tags,
        List<SegmentSource> segSources, List<SegmentSource> vertexSources, Dictionary<int, double> areas)
    {
        bool axi = design.Symmetry == Symmetry.Axisymmetric;
        double r = open.RadiusMetres;
        double cx = open.Center.X, cy = open.Center.Y;
        double ix = axi ? 0 : cx + 3 * r, iy = axi ? cy + 3 * r : cy;
        int interiorTag = tags.GetOrAdd(BoundaryKind.OpenBoundary, -1, -1, -1, -1);
        int imageTag = tags.GetOrAdd(BoundaryKind.OpenBoundaryImage, -1, -1, -1, -1);
        int imageRegion = design.Dielectrics.Count + 1;
        var copy = new Dictionary<int, int>();
        var imageSource = new SegmentSource(SourceEntity.Enclosure, 0, 0, 0);
        int Copy(int v)
        {
            if (copy.TryGetValue(v, out int w)) return w;
            w = graph.AddVertex(graph.X[v] - cx + ix, graph.Y[v] - cy + iy);
            vertexSources.Add(imageSource);
            copy[v] = w;
            return w;
        }
        double twiceArea = 0;
        int count = graph.Segments.Count;
        for (int s = 0; s < count; s++)
        {
            var seg = graph.Segments[s];
            if (seg.Tag != interiorTag) continue;
            int a = Copy(seg.A), b = Copy(seg.B);
            graph.AddSegment(a, b, imageTag);
            segSources.Add(imageSource);
            twiceArea += (graph.X[a] - ix) * (graph.Y[b] - iy) - (graph.X[b] - ix) * (graph.Y[a] - iy);
        }
        int centre = graph.AddVertex(ix, iy);
        vertexSources.Add(imageSource);
        if (axi)
        {
            // The image's straight edge lies on the axis: bottom → centre → top, natural like the design's axis.
            int axisTag = tags.GetOrAdd(BoundaryKind.Axis, -1, -1, -1, -1);
            int bottom = Copy(FindVertex(graph, cx, cy - r, r)), top = Copy(FindVertex(graph, cx, cy + r, r));
            graph.AddSegment(bottom, centre, axisTag);
            graph.AddSegment(centre, top, axisTag);
            segSources.Add(imageSource);
            segSources.Add(imageSource);
        }
        // The image starts at about the chord size of its circle; adaptive refinement takes it on from there.
        graph.AddRegion(new RegionSeed(ix + 0.5 * r, iy + 0.1 * r, imageRegion, 0.1 * r));
        areas[imageRegion] = 0.5 * Math.Abs(twiceArea);
        return new OpenSpaceImage(interiorTag, imageTag, imageRegion, r, cx, cy, ix, iy, design.BackgroundMaterial);
    }

    private static int FindVertex(PlanarGraph graph, double x, double y, double scale)
    {
        double tol2 = 1e-18 * scale * scale;
        for (int v = 0; v < graph.VertexCount; v++)
        {
            if ((graph.X[v] - x) * (graph.X[v] - x) + (graph.Y[v] - y) * (graph.Y[v] - y) <= tol2) return v;
        }
        throw new MeshInputException($"The open-space circle has no vertex on the axis at ({PlanarGraph.Fmt(x)}, {PlanarGraph.Fmt(y)}) m.");
    }

    private static int Attribute(RegionHit h) => h.Kind switch
    {
        RegionKind.Background => 0,
        RegionKind.Dielectric => h.Index + 1,
        _ => -1,
    };

    /// <summary>Tag for a piece with regions l and r on its sides; 0 to drop it.</summary>
    private static int TagFor(RegionHit l, RegionHit r, BoundaryMarker marker, Design design, BoundaryTagTable tags)
    {
        int al = Attribute(l), ar = Attribute(r);
        if (al < 0 && ar < 0) return 0;
        if (al >= 0 && ar >= 0)
            return al == ar ? 0 : tags.GetOrAdd(BoundaryKind.Interface, -1, -1, Math.Min(al, ar), Math.Max(al, ar));
        var other = al < 0 ? l : r;
        if (other.Kind == RegionKind.Conductor)
            return tags.GetOrAdd(BoundaryKind.Conductor, other.Index, design.Conductors[other.Index].ElectrodeIndex, -1, -1);
        var kind = marker switch
        {
            BoundaryMarker.SymmetryPlane => BoundaryKind.SymmetryPlane,
            BoundaryMarker.Axis => BoundaryKind.Axis,
            BoundaryMarker.OpenBoundary => BoundaryKind.OpenBoundary,
            _ => BoundaryKind.Enclosure,
        };
        return tags.GetOrAdd(kind, -1, -1, -1, -1);
    }

    /// <summary>Cuts one curve into chords; returns the area bound between chords and curve (Σ chord × sagitta), m².</summary>
    /// <summary>
    /// Longest chord allowed on the open-space circle: the smallest clearance between the circle and any body. The
    /// circle is never refined later, so its chords must not be longer than the gap they face, or the triangles there
    /// stay as large as the gap and the field in it is never resolved (measured: a sphere 0.3 mm inside a circle cut
    /// into 1 mm chords came out with a peak 7 % high and an estimate of 0.9 %).
    /// </summary>
    private static double OpenCircleChordLimit(Design design, OpenSpace open)
    {
        double gap = double.PositiveInfinity;
        double tol = 1e-4 * open.RadiusMetres;
        foreach (var shape in design.Conductors.Select(c => c.Shape).Concat(design.Dielectrics.Select(d => d.Shape)))
        {
            foreach (var p in shape.Outer.Flatten(tol))
            {
                double d = Math.Sqrt((p.X - open.Center.X) * (p.X - open.Center.X) + (p.Y - open.Center.Y) * (p.Y - open.Center.Y));
                gap = Math.Min(gap, open.RadiusMetres - d);
            }
        }
        // Bodies touching the circle are refused by the loader; the floor only bounds the chord count.
        return Math.Max(gap, 1e-3 * open.RadiusMetres);
    }

    private static double Cut(CurveSegment seg, SegmentSource src, double chordTol, double maxAngle, MeshOptions options, List<Piece> pieces,
        double openChord)
    {
        if (seg is ArcSegment arc)
        {
            double sweep = Math.Abs(arc.SweepAngle);
            double r = arc.Radius;
            int n = (int)Math.Ceiling(sweep / maxAngle - 1e-9);
            // The open-space circle is not a physical surface: a fixed number of chords per turn replaces the sagitta rule
            // (its chord gap shorts a sliver of thickness ~2·sagitta, which changes a capacitance by < 0.1 % × a/R at
            // 64 chords per turn, a the body's size; verified in the isolated-sphere validation case).
            bool openCircle = seg.Marker == BoundaryMarker.OpenBoundary;
            if (chordTol < r && !openCircle) n = Math.Max(n, (int)Math.Ceiling(sweep / (2 * Math.Acos(1 - chordTol / r)) - 1e-9));
            var mid = arc.PointAt(0.5);
            double h = options.MaxEdgeLengthMetres ?? double.PositiveInfinity;
            if (options.SizeFunction is not null) h = Math.Min(h, options.SizeFunction(mid.X, mid.Y));
            if (h < 2 * r) n = Math.Max(n, (int)Math.Ceiling(sweep / (2 * Math.Asin(h / (2 * r))) - 1e-9));
            // The open-space circle is never split later (its image must keep the same vertices): cut it finely now,
            // at 64 chords per turn and no chord longer than the gap to the nearest body.
            if (openCircle)
            {
                n = Math.Max(n, (int)Math.Ceiling(sweep / OpenCircleChordAngle - 1e-9));
                if (openChord < 2 * r) n = Math.Max(n, (int)Math.Ceiling(sweep / (2 * Math.Asin(openChord / (2 * r))) - 1e-9));
            }
            n = Math.Max(n, 1);
            var prev = arc.Start;
            for (int i = 1; i <= n; i++)
            {
                var p = i == n ? arc.End : arc.PointAt((double)i / n);
                pieces.Add(new Piece(prev.X, prev.Y, p.X, p.Y, src, seg.Marker));
                prev = p;
            }
            double phi = sweep / n;
            return n * (2 * r * Math.Sin(phi / 2)) * r * (1 - Math.Cos(phi / 2));
        }
        pieces.Add(new Piece(seg.Start.X, seg.Start.Y, seg.End.X, seg.End.Y, src, seg.Marker));
        return 0;
    }

    /// <summary>
    /// Nodes the pieces: splits each at every endpoint of another piece lying on it (within eps) and at every proper
    /// crossing, merges points closer than eps, and removes repeated and zero-length pieces.
    /// </summary>
    private static (List<double> X, List<double> Y, List<(int A, int B, int Piece)> Segs) Node(List<Piece> pieces, double eps)
    {
        int n = pieces.Count;
        var splits = new List<(double T, double X, double Y)>?[n];
        void AddSplit(int i, double t, double x, double y) => (splits[i] ??= new()).Add((t, x, y));

        var order = Enumerable.Range(0, n).OrderBy(i => Math.Min(pieces[i].X0, pieces[i].X1)).ToArray();
        var active = new List<int>();
        foreach (int i in order)
        {
            var p = pieces[i];
            double minX = Math.Min(p.X0, p.X1);
            active.RemoveAll(j => Math.Max(pieces[j].X0, pieces[j].X1) < minX - eps);
            foreach (int j in active)
            {
                var q = pieces[j];
                if (Math.Max(p.Y0, p.Y1) < Math.Min(q.Y0, q.Y1) - eps || Math.Max(q.Y0, q.Y1) < Math.Min(p.Y0, p.Y1) - eps) continue;
                EndOn(p, q.X0, q.Y0, i); EndOn(p, q.X1, q.Y1, i);
                EndOn(q, p.X0, p.Y0, j); EndOn(q, p.X1, p.Y1, j);
                double o1 = GeometricPredicates.Orient2D(p.X0, p.Y0, p.X1, p.Y1, q.X0, q.Y0);
                double o2 = GeometricPredicates.Orient2D(p.X0, p.Y0, p.X1, p.Y1, q.X1, q.Y1);
                double o3 = GeometricPredicates.Orient2D(q.X0, q.Y0, q.X1, q.Y1, p.X0, p.Y0);
                double o4 = GeometricPredicates.Orient2D(q.X0, q.Y0, q.X1, q.Y1, p.X1, p.Y1);
                if ((o1 > 0 && o2 < 0 || o1 < 0 && o2 > 0) && (o3 > 0 && o4 < 0 || o3 < 0 && o4 > 0))
                {
                    double dx1 = p.X1 - p.X0, dy1 = p.Y1 - p.Y0, dx2 = q.X1 - q.X0, dy2 = q.Y1 - q.Y0;
                    double den = dx1 * dy2 - dy1 * dx2;
                    double u = ((q.X0 - p.X0) * dy2 - (q.Y0 - p.Y0) * dx2) / den;
                    double x = p.X0 + u * dx1, y = p.Y0 + u * dy1;
                    if (!NearEnd(p, x, y, eps) && !NearEnd(q, x, y, eps))
                    {
                        AddSplit(i, u, x, y);
                        AddSplit(j, Param(q, x, y), x, y);
                    }
                }
            }
            active.Add(i);
        }

        void EndOn(Piece s, double x, double y, int idx)
        {
            if (NearEnd(s, x, y, eps)) return;
            double t = Param(s, x, y);
            if (t <= 0 || t >= 1) return;
            double px = s.X0 + t * (s.X1 - s.X0), py = s.Y0 + t * (s.Y1 - s.Y0);
            if ((px - x) * (px - x) + (py - y) * (py - y) <= eps * eps) AddSplit(idx, t, x, y);
        }

        // Points: all piece ends first (so outline corners keep their exact coordinates), then split points.
        var px = new List<double>();
        var py = new List<double>();
        var chains = new List<int>[n];
        for (int i = 0; i < n; i++)
        {
            chains[i] = new List<int> { px.Count };
            px.Add(pieces[i].X0); py.Add(pieces[i].Y0);
        }
        var ends = new int[n];
        for (int i = 0; i < n; i++) { ends[i] = px.Count; px.Add(pieces[i].X1); py.Add(pieces[i].Y1); }
        for (int i = 0; i < n; i++)
        {
            if (splits[i] is { } list)
                foreach (var s in list.OrderBy(s => s.T)) { chains[i].Add(px.Count); px.Add(s.X); py.Add(s.Y); }
            chains[i].Add(ends[i]);
        }
        int np = px.Count;
        var parent = Enumerable.Range(0, np).ToArray();
        int Find(int a) { while (parent[a] != a) a = parent[a] = parent[parent[a]]; return a; }
        var byX = Enumerable.Range(0, np).OrderBy(k => px[k]).ToArray();
        for (int a = 0; a < np; a++)
        {
            int ka = byX[a];
            for (int b = a + 1; b < np && px[byX[b]] - px[ka] <= eps; b++)
            {
                int kb = byX[b];
                if ((py[kb] - py[ka]) * (py[kb] - py[ka]) + (px[kb] - px[ka]) * (px[kb] - px[ka]) <= eps * eps)
                {
                    int ra = Find(ka), rb = Find(kb);
                    if (ra != rb) { if (ra < rb) parent[rb] = ra; else parent[ra] = rb; }
                }
            }
        }
        var id = new int[np];
        Array.Fill(id, -1);
        var vx = new List<double>();
        var vy = new List<double>();
        for (int k = 0; k < np; k++)
        {
            int r = Find(k);
            if (id[r] < 0) { id[r] = vx.Count; vx.Add(px[r]); vy.Add(py[r]); }
            id[k] = id[r];
        }
        var segs = new List<(int, int, int)>();
        var seen = new HashSet<long>();
        for (int i = 0; i < n; i++)
        {
            var ch = chains[i];
            for (int k = 0; k + 1 < ch.Count; k++)
            {
                int a = id[ch[k]], b = id[ch[k + 1]];
                if (a == b) continue;
                long key = ((long)Math.Min(a, b) << 32) | (uint)Math.Max(a, b);
                if (seen.Add(key)) segs.Add((a, b, i));
            }
        }
        return (vx, vy, segs);
    }

    private static bool NearEnd(Piece s, double x, double y, double eps) =>
        (s.X0 - x) * (s.X0 - x) + (s.Y0 - y) * (s.Y0 - y) <= eps * eps || (s.X1 - x) * (s.X1 - x) + (s.Y1 - y) * (s.Y1 - y) <= eps * eps;

    private static double Param(Piece s, double x, double y)
    {
        double dx = s.X1 - s.X0, dy = s.Y1 - s.Y0;
        return ((x - s.X0) * dx + (y - s.Y0) * dy) / (dx * dx + dy * dy);
    }

    private static int[] Components(MeshCore core, out int count)
    {
        var comp = new int[core.NT];
        Array.Fill(comp, -1);
        count = 0;
        var stack = new Stack<int>();
        for (int s = 0; s < core.NT; s++)
        {
            if (comp[s] >= 0) continue;
            comp[s] = count;
            stack.Push(s);
            while (stack.Count > 0)
            {
                int t = stack.Pop();
                for (int i = 0; i < 3; i++)
                {
                    int c = 3 * t + i;
                    int nb = core.TN[c];
                    if (nb < 0 || core.TS[c] >= 0 || comp[nb / 3] >= 0) continue;
                    comp[nb / 3] = count;
                    stack.Push(nb / 3);
                }
            }
            count++;
        }
        return comp;
    }

    /// <summary>Incentre and inradius of triangle t, metres.</summary>
    private static (double X, double Y, double R) Incircle(MeshCore core, int t)
    {
        int a = core.TV[3 * t], b = core.TV[3 * t + 1], c = core.TV[3 * t + 2];
        double ax = core.X[a], ay = core.Y[a], bx = core.X[b], by = core.Y[b], cx = core.X[c], cy = core.Y[c];
        double la = Math.Sqrt((bx - cx) * (bx - cx) + (by - cy) * (by - cy));
        double lb = Math.Sqrt((ax - cx) * (ax - cx) + (ay - cy) * (ay - cy));
        double lc = Math.Sqrt((ax - bx) * (ax - bx) + (ay - by) * (ay - by));
        double per = la + lb + lc;
        double area2 = Math.Abs((bx - ax) * (cy - ay) - (by - ay) * (cx - ax));
        return ((la * ax + lb * bx + lc * cx) / per, (la * ay + lb * by + lc * cy) / per, area2 / per);
    }
}
