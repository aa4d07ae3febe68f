using Electrostat.Meshing.Input;
using Electrostat.Meshing.Predicates;

namespace Electrostat.Meshing.Output;

/// <summary>
/// Checks the invariants of an exported mesh against its input graph, independently of the mesher's internal arrays:
/// counter-clockwise triangles, conformity (each edge shared by at most two triangles, in opposite directions),
/// boundary edges constrained, every input segment present as a chain of constrained edges along it, the constrained
/// Delaunay property (exact in-circle test across every unconstrained interior edge), region attributes matching the
/// seeds, no triangle at a hole seed, and optionally the area per region.
/// </summary>
internal static class MeshValidator
{
    private const int MaxPerKind = 5;

    internal static ValidationReport Validate(MeshResult result, IReadOnlyDictionary<int, double>? expectedRegionAreas, double areaRelTolerance, double areaAbsTolerance, string? topologyError)
    {
        var mesh = result.Mesh;
        var graph = result.Graph;
        var errors = new List<string>();
        var counts = new Dictionary<string, int>();
        void Fail(string kind, string message)
        {
            counts.TryGetValue(kind, out int c);
            counts[kind] = c + 1;
            if (c < MaxPerKind) errors.Add(message);
        }
        if (topologyError is not null) Fail("topology", "internal topology: " + topologyError);

        var x = mesh.X; var y = mesh.Y; var tri = mesh.Triangles;
        int nt = mesh.TriangleCount;
        for (int t = 0; t < nt; t++)
        {
            int a = tri[3 * t], b = tri[3 * t + 1], c = tri[3 * t + 2];
            if (GeometricPredicates.Orient2D(x[a], y[a], x[b], y[b], x[c], y[c]) <= 0)
                Fail("ccw", $"triangle {t} is not counter-clockwise (inverted or degenerate)");
        }

        // Directed edge -> (triangle, local edge).
        var directed = new Dictionary<long, int>(3 * nt);
        for (int t = 0; t < nt; t++)
        {
            for (int i = 0; i < 3; i++)
            {
                int u = tri[3 * t + (i + 1) % 3], w = tri[3 * t + (i + 2) % 3];
                if (!directed.TryAdd(Key(u, w), 3 * t + i)) Fail("conform", $"directed edge {u}->{w} appears in two triangles (overlap or inconsistent orientation)");
            }
        }
        var constrained = new HashSet<long>();
        for (int s = 0; s < mesh.SegmentCount; s++)
        {
            int u = mesh.SegmentVertices[2 * s], w = mesh.SegmentVertices[2 * s + 1];
            constrained.Add(Key(Math.Min(u, w), Math.Max(u, w)));
            if (!directed.ContainsKey(Key(u, w)) && !directed.ContainsKey(Key(w, u))) Fail("segedge", $"constrained edge {u}-{w} is not an edge of any triangle");
        }
        foreach (var (key, code) in directed)
        {
            int u = (int)(key >> 32), w = (int)(key & 0xffffffff);
            bool isConstrained = constrained.Contains(Key(Math.Min(u, w), Math.Max(u, w)));
            if (!directed.TryGetValue(Key(w, u), out int other))
            {
                if (!isConstrained) Fail("boundary", $"boundary edge {u}-{w} at ({x[u]}, {y[u]}) is not constrained");
                continue;
            }
            if (isConstrained || u > w) continue;
            int t = code / 3, i = code % 3;
            int t2 = other / 3, i2 = other % 3;
            int a = tri[3 * t], b = tri[3 * t + 1], c = tri[3 * t + 2];
            int d = tri[3 * t2 + i2];
            _ = i;
            if (GeometricPredicates.InCircle(x[a], y[a], x[b], y[b], x[c], y[c], x[d], y[d]) > 0)
                Fail("delaunay", $"edge {u}-{w} is not locally Delaunay (vertex {d} lies inside the circumcircle of triangle {t})");
        }

        CheckSegmentChains(result, Fail);
        CheckSeeds(result, graph, Fail);

        if (expectedRegionAreas is not null)
        {
            var area = new Dictionary<int, double>();
            for (int t = 0; t < nt; t++)
            {
                int a = tri[3 * t], b = tri[3 * t + 1], c = tri[3 * t + 2];
                double ar = 0.5 * ((x[b] - x[a]) * (y[c] - y[a]) - (y[b] - y[a]) * (x[c] - x[a]));
                area.TryGetValue(mesh.TriangleRegion[t], out double s);
                area[mesh.TriangleRegion[t]] = s + ar;
            }
            foreach (var (region, expected) in expectedRegionAreas)
            {
                area.TryGetValue(region, out double got);
                if (Math.Abs(got - expected) > Math.Max(areaRelTolerance * Math.Abs(expected), areaAbsTolerance))
                    Fail("area", $"region {region} has area {got:G12} m² in the mesh but {expected:G12} m² expected");
            }
        }

        foreach (var (kind, c) in counts)
            if (c > MaxPerKind) errors.Add($"... and {c - MaxPerKind} more '{kind}' violations");
        return new ValidationReport(errors);
    }

    private static void CheckSegmentChains(MeshResult result, Action<string, string> fail)
    {
        var mesh = result.Mesh;
        var graph = result.Graph;
        var bySeg = new Dictionary<int, List<(int, int)>>();
        for (int s = 0; s < mesh.SegmentCount; s++)
        {
            int seg = result.SegmentInputSegment[s];
            if (!bySeg.TryGetValue(seg, out var list)) bySeg[seg] = list = new List<(int, int)>();
            list.Add((mesh.SegmentVertices[2 * s], mesh.SegmentVertices[2 * s + 1]));
            if (mesh.SegmentTag[s] != graph.Segments[seg].Tag) fail("tag", $"constrained edge {s} carries tag {mesh.SegmentTag[s]} but its input segment has tag {graph.Segments[seg].Tag}");
        }
        var exportedOfInput = new Dictionary<int, int>();
        for (int v = 0; v < mesh.VertexCount; v++)
            if (result.VertexInputVertex[v] >= 0) exportedOfInput[result.VertexInputVertex[v]] = v;
        for (int seg = 0; seg < graph.Segments.Count; seg++)
        {
            var s = graph.Segments[seg];
            bool hasA = exportedOfInput.TryGetValue(s.A, out int a);
            bool hasB = exportedOfInput.TryGetValue(s.B, out int b);
            if (!bySeg.TryGetValue(seg, out var edges))
            {
                // A segment may lie wholly inside a hole or the exterior; then none of it is meshed.
                continue;
            }
            if (!hasA || !hasB) { fail("chain", $"input segment {seg} is meshed but an endpoint is missing"); continue; }
            var adj = new Dictionary<int, List<int>>();
            foreach (var (u, w) in edges)
            {
                if (!adj.TryGetValue(u, out var lu)) adj[u] = lu = new List<int>();
                if (!adj.TryGetValue(w, out var lw)) adj[w] = lw = new List<int>();
                lu.Add(w); lw.Add(u);
            }
            double ax = mesh.X[a], ay = mesh.Y[a], bx = mesh.X[b], by = mesh.Y[b];
            double len = Math.Sqrt((bx - ax) * (bx - ax) + (by - ay) * (by - ay));
            int prev = -1, cur = a, steps = 0;
            double lastT = 0;
            while (cur != b)
            {
                if (!adj.TryGetValue(cur, out var nbrs) || steps > edges.Count) { fail("chain", $"input segment {seg} is not a connected chain of constrained edges"); break; }
                int next = -1;
                foreach (int w in nbrs) if (w != prev) { next = w; break; }
                if (next < 0) { fail("chain", $"input segment {seg} chain stops early"); break; }
                double px = mesh.X[next], py = mesh.Y[next];
                double tpar = ((px - ax) * (bx - ax) + (py - ay) * (by - ay)) / (len * len);
                double off = Math.Abs((px - ax) * (by - ay) - (py - ay) * (bx - ax)) / len;
                if (off > 1e-9 * len) fail("chain", $"vertex {next} of input segment {seg} is {off:G3} m off the segment");
                if (tpar <= lastT) fail("chain", $"input segment {seg} chain goes backwards at vertex {next}");
                lastT = tpar;
                prev = cur;
                cur = next;
                steps++;
            }
            if (cur == b && steps != edges.Count) fail("chain", $"input segment {seg} has {edges.Count} edges but its chain uses {steps}");
        }
    }

    private static void CheckSeeds(MeshResult result, PlanarGraph graph, Action<string, string> fail)
    {
        var mesh = result.Mesh;
        // First seed to reach a component wins during meshing; check each seed whose point is covered.
        var claimed = new Dictionary<int, int>();
        for (int r = 0; r < graph.Regions.Count; r++)
        {
            var seed = graph.Regions[r];
            int t = FindTriangle(mesh, seed.X, seed.Y);
            if (t < 0) continue;
            if (mesh.TriangleRegion[t] != seed.Attribute && !claimed.ContainsKey(t))
                fail("region", $"region seed {seed.Attribute} at ({seed.X}, {seed.Y}) lies in triangle {t} with region {mesh.TriangleRegion[t]}");
            claimed[t] = r;
        }
        foreach (var (hx, hy) in graph.Holes)
        {
            int t = FindTriangle(mesh, hx, hy);
            if (t >= 0) fail("hole", $"hole seed ({hx}, {hy}) is covered by triangle {t}");
        }
    }

    /// <summary>Linear scan for a triangle containing (px, py) (strictly or on its boundary); -1 if none.</summary>
    internal static int FindTriangle(TriangleMesh mesh, double px, double py)
    {
        var x = mesh.X; var y = mesh.Y; var tri = mesh.Triangles;
        for (int t = 0; t < mesh.TriangleCount; t++)
        {
            int a = tri[3 * t], b = tri[3 * t + 1], c = tri[3 * t + 2];
            if (GeometricPredicates.Orient2D(x[a], y[a], x[b], y[b], px, py) >= 0
                && GeometricPredicates.Orient2D(x[b], y[b], x[c], y[c], px, py) >= 0
                && GeometricPredicates.Orient2D(x[c], y[c], x[a], y[a], px, py) >= 0) return t;
        }
        return -1;
    }

    private static long Key(int u, int w) => ((long)u << 32) | (uint)w;
}
