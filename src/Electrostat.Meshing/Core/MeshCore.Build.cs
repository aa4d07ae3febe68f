using Electrostat.Meshing.Input;

namespace Electrostat.Meshing.Core;

/// <summary>Construction of the constrained Delaunay triangulation of a planar graph.</summary>
internal sealed partial class MeshCore
{
    /// <summary>Number of input vertices (they occupy vertex indices 0..InputVertexCount-1).</summary>
    internal int InputVertexCount;

    /// <summary>
    /// Builds the constrained Delaunay triangulation of <paramref name="graph"/>: incremental Bowyer-Watson insertion
    /// in Hilbert order inside a large enclosing triangle, segment recovery by edge flips (Sloan's method), Lawson
    /// flips back to the constrained Delaunay property, then flood fills that delete the exterior and holes and
    /// label regions. Triangle region = index of the region seed (-1 if none reached it).
    /// </summary>
    internal static MeshCore BuildConstrainedDelaunay(PlanarGraph graph)
    {
        var core = new MeshCore();
        int n = graph.VertexCount;
        core.InputVertexCount = n;
        core.ReserveVertices(n + 3);
        core.ReserveTriangles(2 * n + 8);
        core.InitScratch();
        double minX = double.MaxValue, minY = double.MaxValue, maxX = double.MinValue, maxY = double.MinValue;
        for (int i = 0; i < n; i++)
        {
            double x = graph.X[i], y = graph.Y[i];
            core.AddVertex(x, y, KindInput, -1);
            minX = Math.Min(minX, x); maxX = Math.Max(maxX, x);
            minY = Math.Min(minY, y); maxY = Math.Max(maxY, y);
        }
        if (n == 0) { minX = minY = 0; maxX = maxY = 1; }
        double span = Math.Max(Math.Max(maxX - minX, maxY - minY), 1e-300);
        double cx = 0.5 * (minX + maxX), cy = 0.5 * (minY + maxY);
        int s0 = core.AddVertex(cx - 40 * span, cy - 30 * span, KindSuper, -1);
        int s1 = core.AddVertex(cx + 40 * span, cy - 30 * span, KindSuper, -1);
        int s2 = core.AddVertex(cx, cy + 40 * span, KindSuper, -1);
        int t0 = core.NewTriangle();
        core.TV[0] = s0; core.TV[1] = s1; core.TV[2] = s2;
        core.TN[0] = core.TN[1] = core.TN[2] = -1;
        core.TS[0] = core.TS[1] = core.TS[2] = -1;
        core.TReg[t0] = -1;
        core.VTri[s0] = core.VTri[s1] = core.VTri[s2] = t0;

        int[] order = HilbertOrder(graph, minX, minY, span);
        int last = t0;
        foreach (int v in order)
        {
            int t = last;
            core.Locate(core.X[v], core.Y[v], ref t, out _);
            bool ok = core.FindCavity(core.X[v], core.Y[v], t, -1, -1, -1);
            if (!ok) throw new InvalidOperationException("Delaunay insertion produced a non-star-shaped cavity (internal error).");
            core.CommitCavity(v, -1, -1, -1);
            last = core.NewTris[0];
        }

        for (int s = 0; s < graph.Segments.Count; s++)
            core.RecoverSegment(graph.Segments[s].A, graph.Segments[s].B, s, graph);
        core.LegalizeAll();
        core.RemoveExteriorAndLabel(graph);
        return core;
    }

    private static int[] HilbertOrder(PlanarGraph graph, double minX, double minY, double span)
    {
        int n = graph.VertexCount;
        var keys = new long[n];
        var order = new int[n];
        const int Bits = 16;
        double scale = ((1 << Bits) - 1) / span;
        for (int i = 0; i < n; i++)
        {
            int hx = (int)((graph.X[i] - minX) * scale);
            int hy = (int)((graph.Y[i] - minY) * scale);
            keys[i] = ((long)HilbertIndex(hx, hy, Bits) << 20) | (uint)i;
            order[i] = i;
        }
        Array.Sort(keys, order);
        return order;
    }

    /// <summary>Position of cell (x, y) along the Hilbert curve of order <paramref name="bits"/> (classic rotate-and-reflect loop).</summary>
    internal static long HilbertIndex(int x, int y, int bits)
    {
        long d = 0;
        for (int s = 1 << (bits - 1); s > 0; s >>= 1)
        {
            int rx = (x & s) > 0 ? 1 : 0;
            int ry = (y & s) > 0 ? 1 : 0;
            d += (long)s * s * ((3 * rx) ^ ry);
            if (ry == 0)
            {
                if (rx == 1) { x = s - 1 - x; y = s - 1 - y; }
                (x, y) = (y, x);
            }
        }
        return d;
    }

    /// <summary>Makes segment (a, b) an edge by flipping the edges it crosses (S. W. Sloan, "A fast algorithm for generating constrained Delaunay triangulations", Computers &amp; Structures 47(3), 1993).</summary>
    private void RecoverSegment(int a, int b, int seg, PlanarGraph graph)
    {
        int existing = FindEdge(a, b);
        if (existing >= 0) { MarkConstrained(existing, seg); return; }

        // Find the triangle around a through which the segment leaves a.
        int t = VTri[a];
        int crossT = -1, crossI = -1;
        for (int guard = 0; guard < 1_000_000; guard++)
        {
            int bt = 3 * t;
            int i = TV[bt] == a ? 0 : TV[bt + 1] == a ? 1 : 2;
            int p = TV[bt + Next(i)], q = TV[bt + Prev(i)];
            double o1 = Orient(a, b, p), o2 = Orient(a, b, q);
            if (o1 == 0 && Dot(a, p, b) > 0) ThrowOnSegment(p, a, b);
            if (o1 < 0 && o2 > 0) { crossT = t; crossI = i; break; }
            t = TN[bt + Next(i)] / 3;
        }
        if (crossT < 0) throw new InvalidOperationException("Segment recovery could not leave its first vertex (internal error).");

        var queue = new Queue<(int, int)>();
        t = crossT;
        int ei = crossI;
        while (true)
        {
            int bt = 3 * t;
            queue.Enqueue((TV[bt + Next(ei)], TV[bt + Prev(ei)]));
            int nc = TN[bt + ei];
            int t2 = nc / 3, e2 = nc - 3 * t2;
            int y = TV[3 * t2 + e2];
            if (y == b) break;
            double oy = Orient(a, b, y);
            if (oy == 0) ThrowOnSegment(y, a, b);
            t = t2;
            ei = oy > 0 ? Next(e2) : Prev(e2);
        }

        int stall = 0;
        while (queue.Count > 0)
        {
            var (u, w) = queue.Dequeue();
            int code = FindEdge(u, w);
            int tt = code / 3, e = code - 3 * tt;
            int bt = 3 * tt;
            int x = TV[bt + e], eu = TV[bt + Next(e)], ew = TV[bt + Prev(e)];
            int nc = TN[code];
            int y = TV[nc];
            if (Orient(x, eu, y) > 0 && Orient(y, ew, x) > 0)
            {
                Flip(code);
                stall = 0;
                if ((x == a && y == b) || (x == b && y == a)) continue;
                double ox = Orient(a, b, x), oy = Orient(a, b, y);
                if ((ox > 0 && oy < 0) || (ox < 0 && oy > 0)) queue.Enqueue((x, y));
            }
            else
            {
                queue.Enqueue((u, w));
                if (++stall > 4 * queue.Count + 8) throw new InvalidOperationException("Segment recovery stalled (internal error).");
            }
        }
        int c = FindEdge(a, b);
        if (c < 0) throw new InvalidOperationException("Segment recovery failed (internal error).");
        MarkConstrained(c, seg);
    }

    private void MarkConstrained(int code, int seg)
    {
        if (TS[code] >= 0 && TS[code] != seg)
            throw new InvalidOperationException("Two input segments map to one edge (validation should have rejected this).");
        TS[code] = seg;
        int n = TN[code];
        if (n >= 0) TS[n] = seg;
    }

    private double Dot(int a, int p, int b) => (X[p] - X[a]) * (X[b] - X[a]) + (Y[p] - Y[a]) * (Y[b] - Y[a]);

    private void ThrowOnSegment(int v, int a, int b) => throw new MeshInputException(
        $"Vertex ({PlanarGraph.Fmt(X[v])}, {PlanarGraph.Fmt(Y[v])}) m lies exactly on the segment from ({PlanarGraph.Fmt(X[a])}, {PlanarGraph.Fmt(Y[a])}) to ({PlanarGraph.Fmt(X[b])}, {PlanarGraph.Fmt(Y[b])}) m; split the segment there.");

    /// <summary>Lawson's flip algorithm: flips unconstrained edges that fail the in-circle test until none does.</summary>
    internal void LegalizeAll()
    {
        var stack = new Stack<int>(3 * NT);
        for (int c = 0; c < 3 * NT; c++)
            if (TS[c] < 0 && TN[c] > c) stack.Push(c);
        while (stack.Count > 0)
        {
            int c = stack.Pop();
            int n = TN[c];
            if (n < 0 || TS[c] >= 0) continue;
            int t = c / 3;
            int y = TV[n];
            if (InCircleP(t, X[y], Y[y]) <= 0) continue;
            int t2 = n / 3;
            Flip(c);
            stack.Push(3 * t); stack.Push(3 * t + 2); stack.Push(3 * t2); stack.Push(3 * t2 + 2);
        }
    }

    private void RemoveExteriorAndLabel(PlanarGraph graph)
    {
        const int Unvisited = -3, Dead = -2;
        var label = new int[NT];
        Array.Fill(label, Unvisited);
        var stack = new Stack<int>();

        void Flood(int start, int value)
        {
            if (label[start] != Unvisited) return;
            label[start] = value;
            stack.Push(start);
            while (stack.Count > 0)
            {
                int t = stack.Pop();
                for (int i = 0; i < 3; i++)
                {
                    int c = 3 * t + i;
                    int nb = TN[c];
                    if (nb < 0 || TS[c] >= 0) continue;
                    int nt = nb / 3;
                    if (label[nt] != Unvisited) continue;
                    label[nt] = value;
                    stack.Push(nt);
                }
            }
        }

        // Seeds are located before anything is deleted, walking straight through constraints.
        var holeTris = new int[graph.Holes.Count];
        for (int h = 0; h < graph.Holes.Count; h++) holeTris[h] = LocateSeed(graph.Holes[h].X, graph.Holes[h].Y, "Hole seed");
        var regionTris = new int[graph.Regions.Count];
        for (int r = 0; r < graph.Regions.Count; r++) regionTris[r] = LocateSeed(graph.Regions[r].X, graph.Regions[r].Y, $"Region seed {graph.Regions[r].Attribute}");

        for (int t = 0; t < NT; t++)
        {
            int b = 3 * t;
            if (VKind[TV[b]] == KindSuper || VKind[TV[b + 1]] == KindSuper || VKind[TV[b + 2]] == KindSuper) Flood(t, Dead);
        }
        foreach (int t in holeTris) if (t >= 0) Flood(t, Dead);
        for (int r = 0; r < regionTris.Length; r++) if (regionTris[r] >= 0) Flood(regionTris[r], r);

        // Compact: keep live triangles in their current order.
        var newIndex = new int[NT];
        int m = 0;
        for (int t = 0; t < NT; t++) newIndex[t] = label[t] == Dead ? -1 : m++;
        for (int t = 0; t < NT; t++)
        {
            int nt = newIndex[t];
            if (nt < 0) continue;
            for (int i = 0; i < 3; i++)
            {
                int nb = TN[3 * t + i];
                int remapped = -1;
                if (nb >= 0 && newIndex[nb / 3] >= 0) remapped = 3 * newIndex[nb / 3] + nb % 3;
                TV[3 * nt + i] = TV[3 * t + i];
                TN[3 * nt + i] = remapped;
                TS[3 * nt + i] = TS[3 * t + i];
            }
            TReg[nt] = label[t] == Unvisited ? -1 : label[t];
            TStamp[nt] = 0;
            TSkip[nt] = 0;
        }
        NT = m;
        for (int v = 0; v < NV; v++) VTri[v] = -1;
        for (int t = 0; t < NT; t++)
            for (int i = 0; i < 3; i++) VTri[TV[3 * t + i]] = t;
        if (NT == 0 && graph.VertexCount > 0)
            throw new MeshInputException("No closed region to mesh: the outside reaches every triangle. Close each outline with segments (every boundary must be a closed loop), and check that hole seeds are not placed in the region to be meshed.");
    }

    /// <summary>Triangle containing a seed point in the full triangulation; -1 if outside all of it. Throws if the seed lies on a segment or vertex.</summary>
    private int LocateSeed(double x, double y, string what)
    {
        if (NT == 0) return -1;
        int t = 0;
        var r = Locate(x, y, ref t, out _, crossConstraints: true);
        if (r != WalkResult.Inside) return -1;
        int b = 3 * t;
        for (int i = 0; i < 3; i++)
        {
            int u = TV[b + Next(i)], w = TV[b + Prev(i)];
            if (X[u] == x && Y[u] == y)
                throw new MeshInputException($"{what} at ({PlanarGraph.Fmt(x)}, {PlanarGraph.Fmt(y)}) m sits exactly on a vertex; move it into the interior of its region.");
            if (TS[b + i] >= 0 && OrientP(u, w, x, y) == 0)
                throw new MeshInputException($"{what} at ({PlanarGraph.Fmt(x)}, {PlanarGraph.Fmt(y)}) m sits exactly on a segment; move it into the interior of its region.");
        }
        return t;
    }
}
