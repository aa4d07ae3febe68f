using Electrostat.Analysis.Clearance;
using Electrostat.Analysis.Corners;
using Electrostat.Geometry.Shapes;

namespace Electrostat.Analysis.HotSpots;

/// <summary>Finds the top N local maxima of the recovered |E| (see <see cref="HotSpotOptions"/> for the merging rule).</summary>
/// <remarks>
/// Candidates are the vertex sides (one recovered value per vertex and material) whose |E| is not below that of any
/// neighbouring vertex's side of the same region (a discrete local maximum within the material). Regions without a
/// design material (an open-boundary image) are ignored.
/// </remarks>
public static class HotSpotFinder
{
    /// <summary>Finds the hot spots.</summary>
    /// <param name="context">The analysis context.</param>
    /// <param name="corners">The singular corners (from <see cref="SingularCornerDetector.Detect"/>), to flag hot spots near them.</param>
    /// <param name="options">Options; null for defaults.</param>
    /// <returns>Hot spots in decreasing |E|.</returns>
    public static IReadOnlyList<HotSpot> Find(AnalysisContext context, IReadOnlyList<SingularCorner> corners, HotSpotOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(context);
        ArgumentNullException.ThrowIfNull(corners);
        options ??= new HotSpotOptions();
        var rec = context.Recovered;
        var topo = context.Topology;
        var mesh = context.Mesh;
        var tri = mesh.Triangles;
        int nv = mesh.VertexCount;

        var candidates = new List<(int Side, int Vertex, double Field)>();
        for (int v = 0; v < nv; v++)
        {
            for (int s = rec.SideStart[v]; s < rec.SideStart[v + 1]; s++)
            {
                int r = rec.SideRegion[s];
                if (context.MaterialOfRegion(r) is null) continue;
                double e = rec.SideMagnitude(s);
                if (!(e > 0)) continue;
                bool isMax = true;
                foreach (int t in topo.TrianglesAround(v))
                {
                    if (mesh.TriangleRegion[t] != r) continue;
                    for (int i = 0; i < 3 && isMax; i++)
                    {
                        int w = tri[3 * t + i];
                        if (w != v && rec.SideMagnitude(rec.CornerSide[3 * t + i]) > e) isMax = false;
                    }
                    if (!isMax) break;
                }
                if (isMax) candidates.Add((s, v, e));
            }
        }
        candidates.Sort((a, b) => b.Field.CompareTo(a.Field));

        var outlines = ConductorOutline.Of(context.Design, context.ConductorPotentialVolts);
        var accepted = new List<(int Side, int Vertex, double Field, double Radius, int Merged)>();
        foreach (var c in candidates)
        {
            double x = mesh.X[c.Vertex], y = mesh.Y[c.Vertex];
            int host = -1;
            for (int k = 0; k < accepted.Count; k++)
            {
                var a = accepted[k];
                if (Sq(mesh.X[a.Vertex] - x) + Sq(mesh.Y[a.Vertex] - y) <= a.Radius * a.Radius) { host = k; break; }
            }
            if (host >= 0)
            {
                var a = accepted[host];
                accepted[host] = a with { Merged = a.Merged + 1 };
                continue;
            }
            if (accepted.Count >= options.Count) continue; // keep counting merges into the listed ones
            double gap = LocalGap(outlines, new Point2(x, y));
            // No outline at another potential (a lone conductor in open space): the design's size stands in, as for corners.
            if (!double.IsFinite(gap)) gap = context.Design.Bounds.Diagonal;
            double radius = Math.Max(options.MeshSizeFactor * topo.LocalSizeMetres[c.Vertex], options.GapFraction * gap);
            accepted.Add((c.Side, c.Vertex, c.Field, radius, 1));
        }

        var result = new List<HotSpot>(accepted.Count);
        for (int k = 0; k < accepted.Count; k++)
        {
            var a = accepted[k];
            int v = a.Vertex;
            int r = rec.SideRegion[a.Side];
            var material = context.MaterialOfRegion(r);
            var p = new Point2(mesh.X[v], mesh.Y[v]);
            var kind = KindOf(context, v);
            var (feature, distance) = NearestFeature(context, outlines, v, p);
            double? margin = material?.BreakdownFieldVoltsPerMetre is double eb ? eb / a.Field : null;
            bool nearCorner = corners.Any(cr => cr.Location.DistanceTo(p) <= cr.ReportDistanceMetres);
            result.Add(new HotSpot(k + 1, p.X, p.Y, a.Field, material?.Name, r, kind, feature, distance, margin, nearCorner, a.Radius, a.Merged));
        }
        return result;
    }

    /// <summary>
    /// What a mesh vertex sits on: a triple point (on a conductor or the wall, with two different materials around
    /// it), a conductor surface, an interface, or the volume.
    /// </summary>
    /// <param name="context">The analysis context.</param>
    /// <param name="v">Vertex index.</param>
    public static HotSpotKind KindOf(AnalysisContext context, int v)
    {
        ArgumentNullException.ThrowIfNull(context);
        var topo = context.Topology;
        if (topo.VertexConductor[v] >= 0 || topo.VertexOnEnclosure[v])
        {
            string? first = null;
            foreach (int t in topo.TrianglesAround(v))
            {
                string? name = context.MaterialOfRegion(context.Mesh.TriangleRegion[t])?.Name;
                if (name is null) continue;
                if (first is null) first = name;
                else if (first != name) return HotSpotKind.TriplePoint;
            }
            return HotSpotKind.ConductorSurface;
        }
        return topo.VertexOnInterface[v] ? HotSpotKind.Interface : HotSpotKind.Volume;
    }

    /// <summary>Distance to the nearest outline at a potential other than that of the nearest outline, metres (∞ if none).</summary>
    internal static double LocalGap(IReadOnlyList<ConductorOutline> outlines, Point2 p)
    {
        ConductorOutline? nearest = null;
        double dn = double.PositiveInfinity;
        foreach (var o in outlines)
        {
            double d = o.DistanceTo(p).Distance;
            if (d < dn) { dn = d; nearest = o; }
        }
        if (nearest is null) return double.PositiveInfinity;
        double gap = double.PositiveInfinity;
        foreach (var o in outlines)
        {
            if (Math.Abs(o.PotentialVolts - nearest.PotentialVolts) > 0) gap = Math.Min(gap, o.DistanceTo(p).Distance);
        }
        return gap;
    }

    private static (string Name, double Distance) NearestFeature(AnalysisContext context, IReadOnlyList<ConductorOutline> outlines, int v, Point2 p)
    {
        var topo = context.Topology;
        if (topo.VertexConductor[v] >= 0) return (context.Design.Conductors[topo.VertexConductor[v]].Name, 0);
        if (topo.VertexOnEnclosure[v]) return (ConductorOutline.EnclosureName, 0);
        string name = "none";
        double best = double.PositiveInfinity;
        foreach (var o in outlines)
        {
            double d = o.DistanceTo(p).Distance;
            if (d < best) { best = d; name = o.Name; }
        }
        // Interfaces: the nearest constrained edge tagged as an interface (mesh edges lie on the exact outlines up to the chord tolerance).
        var mesh = context.Mesh;
        for (int s = 0; s < mesh.SegmentCount; s++)
        {
            int tag = mesh.SegmentTag[s];
            if (tag < 1 || tag > context.Tags.Tags.Count) continue;
            var meaning = context.Tags[tag];
            if (meaning.Kind != Meshing.Designs.BoundaryKind.Interface) continue;
            int a = mesh.SegmentVertices[2 * s], b = mesh.SegmentVertices[2 * s + 1];
            double d = PointSegment(p, mesh.X[a], mesh.Y[a], mesh.X[b], mesh.Y[b]);
            if (d < best)
            {
                best = d;
                string ma = context.MaterialOfRegion(meaning.RegionA)?.Name ?? $"region {meaning.RegionA}";
                string mb = context.MaterialOfRegion(meaning.RegionB)?.Name ?? $"region {meaning.RegionB}";
                name = $"interface {ma}/{mb}";
            }
        }
        return (name, best);
    }

    private static double PointSegment(Point2 p, double ax, double ay, double bx, double by)
    {
        double ux = bx - ax, uy = by - ay;
        double len2 = ux * ux + uy * uy;
        double t = len2 > 0 ? Math.Clamp(((p.X - ax) * ux + (p.Y - ay) * uy) / len2, 0, 1) : 0;
        return Math.Sqrt(Sq(p.X - ax - t * ux) + Sq(p.Y - ay - t * uy));
    }

    private static double Sq(double v) => v * v;
}
