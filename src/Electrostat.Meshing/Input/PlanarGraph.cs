using System.Globalization;
using Electrostat.Meshing.Predicates;

namespace Electrostat.Meshing.Input;

/// <summary>
/// The mesher's input: a planar straight-line graph (vertices and segments in metres), region seeds and hole seeds.
/// </summary>
/// <remarks>
/// Segments become constrained edges of the mesh; every region must be closed off by segments, because flood fills
/// from the outside, from hole seeds and from region seeds stop only at segments. Triangles reached by no region
/// seed get region attribute 0. <see cref="Validate"/> rejects duplicate vertices, zero-length segments, vertices
/// lying inside a segment and segments that cross, each with the coordinate and the fix.
/// </remarks>
public sealed class PlanarGraph
{
    private readonly List<double> _x = new();
    private readonly List<double> _y = new();
    private readonly List<GraphSegment> _segments = new();
    private readonly List<RegionSeed> _regions = new();
    private readonly List<(double X, double Y)> _holes = new();

    /// <summary>Vertex x coordinates, metres.</summary>
    public IReadOnlyList<double> X => _x;

    /// <summary>Vertex y coordinates, metres.</summary>
    public IReadOnlyList<double> Y => _y;

    /// <summary>Input segments.</summary>
    public IReadOnlyList<GraphSegment> Segments => _segments;

    /// <summary>Region seeds.</summary>
    public IReadOnlyList<RegionSeed> Regions => _regions;

    /// <summary>Hole seeds (points in metres inside regions that get no triangles).</summary>
    public IReadOnlyList<(double X, double Y)> Holes => _holes;

    /// <summary>Number of vertices.</summary>
    public int VertexCount => _x.Count;

    /// <summary>Adds a vertex and returns its index.</summary>
    /// <param name="x">x, metres.</param>
    /// <param name="y">y, metres.</param>
    /// <returns>The new vertex index.</returns>
    public int AddVertex(double x, double y)
    {
        if (!double.IsFinite(x) || !double.IsFinite(y))
            throw new MeshInputException($"Vertex ({Fmt(x)}, {Fmt(y)}) m is not a finite coordinate; check the geometry expressions.");
        _x.Add(x);
        _y.Add(y);
        return _x.Count - 1;
    }

    /// <summary>Adds a segment between two existing vertices and returns its index.</summary>
    /// <param name="a">First vertex index.</param>
    /// <param name="b">Second vertex index.</param>
    /// <param name="tag">Boundary tag carried to the mesh edges on this segment.</param>
    /// <returns>The new segment index.</returns>
    public int AddSegment(int a, int b, int tag)
    {
        if ((uint)a >= (uint)_x.Count || (uint)b >= (uint)_x.Count)
            throw new ArgumentOutOfRangeException(nameof(a), "Segment endpoints must be existing vertex indices.");
        _segments.Add(new GraphSegment(a, b, tag));
        return _segments.Count - 1;
    }

    /// <summary>Adds a closed polygon (vertices in order, last joined to first) with one tag on all its edges.</summary>
    /// <param name="points">Polygon corners in metres.</param>
    /// <param name="tag">Tag for every edge.</param>
    /// <returns>The index of the first vertex added.</returns>
    public int AddPolygon(IReadOnlyList<(double X, double Y)> points, int tag)
    {
        ArgumentNullException.ThrowIfNull(points);
        int first = _x.Count;
        for (int i = 0; i < points.Count; i++) AddVertex(points[i].X, points[i].Y);
        for (int i = 0; i < points.Count; i++) AddSegment(first + i, first + (i + 1) % points.Count, tag);
        return first;
    }

    /// <summary>Adds a region seed.</summary>
    /// <param name="seed">The seed.</param>
    public void AddRegion(RegionSeed seed)
    {
        if (seed.MaxEdgeLengthMetres is { } h && !(h > 0))
            throw new MeshInputException($"Region {seed.Attribute} at ({Fmt(seed.X)}, {Fmt(seed.Y)}) m has maximum element size {Fmt(h)} m; it must be positive.");
        _regions.Add(seed);
    }

    /// <summary>Adds a hole seed: the region containing (x, y) gets no triangles.</summary>
    /// <param name="x">x, metres.</param>
    /// <param name="y">y, metres.</param>
    public void AddHole(double x, double y) => _holes.Add((x, y));

    /// <summary>
    /// Checks the graph: duplicate vertices, zero-length or repeated segments, vertices inside segments and crossing
    /// segments. Throws <see cref="MeshInputException"/> naming the first problem found.
    /// </summary>
    public void Validate()
    {
        int n = _x.Count;
        // Duplicate points: sort indices by (x, y) and compare neighbours.
        var order = new int[n];
        for (int i = 0; i < n; i++) order[i] = i;
        Array.Sort(order, (p, q) => _x[p] != _x[q] ? _x[p].CompareTo(_x[q]) : _y[p].CompareTo(_y[q]));
        for (int i = 1; i < n; i++)
        {
            int p = order[i - 1], q = order[i];
            if (_x[p] == _x[q] && _y[p] == _y[q])
                throw new MeshInputException($"Duplicate vertex at ({Fmt(_x[p])}, {Fmt(_y[p])}) m (vertices {p} and {q}); merge them so that both outlines share one vertex.");
        }

        var seen = new HashSet<long>();
        foreach (var s in _segments)
        {
            if (s.A == s.B)
                throw new MeshInputException($"Zero-length segment at ({Fmt(_x[s.A])}, {Fmt(_y[s.A])}) m; remove it.");
            long key = ((long)Math.Min(s.A, s.B) << 32) | (uint)Math.Max(s.A, s.B);
            if (!seen.Add(key))
                throw new MeshInputException($"Segment from ({Fmt(_x[s.A])}, {Fmt(_y[s.A])}) to ({Fmt(_x[s.B])}, {Fmt(_y[s.B])}) m is given twice; keep one copy.");
        }

        CheckCrossings();
    }

    private void CheckCrossings()
    {
        int m = _segments.Count;
        if (m == 0) return;
        // Sweep over x: segments sorted by their left end; only segments whose x-ranges overlap are compared.
        var idx = new int[m];
        var minX = new double[m];
        for (int i = 0; i < m; i++)
        {
            idx[i] = i;
            minX[i] = Math.Min(_x[_segments[i].A], _x[_segments[i].B]);
        }
        Array.Sort(minX, idx);
        var active = new List<int>();
        for (int k = 0; k < m; k++)
        {
            int s = idx[k];
            double left = minX[k];
            active.RemoveAll(t => Math.Max(_x[_segments[t].A], _x[_segments[t].B]) < left);
            foreach (int t in active) CheckPair(s, t);
            active.Add(s);
        }
        // A vertex inside a segment (touching without being an endpoint) is an error too; the sweep above
        // catches it for vertices that are segment endpoints; isolated vertices are checked here.
        var onSegment = new bool[_x.Count];
        foreach (var s in _segments) { onSegment[s.A] = true; onSegment[s.B] = true; }
        for (int v = 0; v < _x.Count; v++)
        {
            if (onSegment[v]) continue;
            for (int t = 0; t < m; t++) CheckVertexOnSegment(v, t);
        }
    }

    private void CheckPair(int s, int t)
    {
        var a = _segments[s];
        var b = _segments[t];
        double ymin1 = Math.Min(_y[a.A], _y[a.B]), ymax1 = Math.Max(_y[a.A], _y[a.B]);
        double ymin2 = Math.Min(_y[b.A], _y[b.B]), ymax2 = Math.Max(_y[b.A], _y[b.B]);
        if (ymax1 < ymin2 || ymax2 < ymin1) return;
        bool shareA = a.A == b.A || a.A == b.B;
        bool shareB = a.B == b.A || a.B == b.B;
        if (!shareA && !shareB)
        {
            double o1 = Orient(a.A, a.B, b.A), o2 = Orient(a.A, a.B, b.B);
            double o3 = Orient(b.A, b.B, a.A), o4 = Orient(b.A, b.B, a.B);
            if (o1 == 0 && Between(a, b.A)) ThrowTouch(b.A, s);
            if (o2 == 0 && Between(a, b.B)) ThrowTouch(b.B, s);
            if (o3 == 0 && Between(b, a.A)) ThrowTouch(a.A, t);
            if (o4 == 0 && Between(b, a.B)) ThrowTouch(a.B, t);
            if (o1 * o2 < 0 && o3 * o4 < 0)
            {
                // Intersection point for the message (floating point is fine for reporting).
                double x1 = _x[a.A], y1 = _y[a.A], dx1 = _x[a.B] - x1, dy1 = _y[a.B] - y1;
                double x2 = _x[b.A], y2 = _y[b.A], dx2 = _x[b.B] - x2, dy2 = _y[b.B] - y2;
                double den = dx1 * dy2 - dy1 * dx2;
                double u = ((x2 - x1) * dy2 - (y2 - y1) * dx2) / den;
                throw new MeshInputException(
                    $"Segments cross at about ({Fmt(x1 + u * dx1)}, {Fmt(y1 + u * dy1)}) m (segment {s} from ({Fmt(_x[a.A])}, {Fmt(_y[a.A])}) and segment {t} from ({Fmt(_x[b.A])}, {Fmt(_y[b.A])})); split both at the crossing point or move the outlines apart.");
            }
        }
        else if (shareA != shareB || (shareA && shareB))
        {
            // Segments sharing one endpoint overlap if the other endpoint of one lies on the other, collinear.
            int common = shareA ? a.A : a.B;
            int oa = common == a.A ? a.B : a.A;
            int ob = common == b.A ? b.B : b.A;
            if (Orient(common, oa, ob) == 0)
            {
                double dot = (_x[oa] - _x[common]) * (_x[ob] - _x[common]) + (_y[oa] - _y[common]) * (_y[ob] - _y[common]);
                if (dot > 0)
                    throw new MeshInputException($"Segments {s} and {t} overlap along a line from ({Fmt(_x[common])}, {Fmt(_y[common])}) m; node the outlines so that the shared part is given once.");
            }
        }
    }

    private void CheckVertexOnSegment(int v, int t)
    {
        var s = _segments[t];
        if (Orient(s.A, s.B, v) == 0 && Between(s, v)) ThrowTouch(v, t);
    }

    private bool Between(GraphSegment s, int v)
    {
        double dot1 = (_x[v] - _x[s.A]) * (_x[s.B] - _x[s.A]) + (_y[v] - _y[s.A]) * (_y[s.B] - _y[s.A]);
        double dot2 = (_x[v] - _x[s.B]) * (_x[s.A] - _x[s.B]) + (_y[v] - _y[s.B]) * (_y[s.A] - _y[s.B]);
        return dot1 > 0 && dot2 > 0;
    }

    private void ThrowTouch(int v, int t) => throw new MeshInputException(
        $"Vertex ({Fmt(_x[v])}, {Fmt(_y[v])}) m lies inside segment {t} from ({Fmt(_x[_segments[t].A])}, {Fmt(_y[_segments[t].A])}) to ({Fmt(_x[_segments[t].B])}, {Fmt(_y[_segments[t].B])}) m; split the segment at that vertex.");

    private double Orient(int a, int b, int c) => GeometricPredicates.Orient2D(_x[a], _y[a], _x[b], _y[b], _x[c], _y[c]);

    internal static string Fmt(double v) => v.ToString("G9", CultureInfo.InvariantCulture);
}
