using Electrostat.Analysis.Clearance;
using Electrostat.Fem.Problem;
using Electrostat.Meshing.Designs;

namespace Electrostat.Analysis.Surface;

/// <summary>Builds the surface field profile of every conductor and of the enclosure wall.</summary>
public static class SurfaceFieldProfiler
{
    /// <summary>Profiles of every design conductor with a meshed surface, then the enclosure wall.</summary>
    /// <param name="context">The analysis context.</param>
    public static IReadOnlyList<SurfaceFieldProfile> Profile(AnalysisContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        var list = new List<SurfaceFieldProfile>();
        for (int k = 0; k < context.Design.Conductors.Count; k++)
        {
            int kk = k;
            var p = Walk(context, context.Design.Conductors[k].Name, k, t => t.Kind == BoundaryKind.Conductor && t.ConductorIndex == kk);
            if (p.Samples.Count > 0) list.Add(p);
        }
        var wall = Walk(context, ConductorOutline.EnclosureName, -1, t => t.Kind == BoundaryKind.Enclosure);
        if (wall.Samples.Count > 0) list.Add(wall);
        return list;
    }

    private static SurfaceFieldProfile Walk(AnalysisContext context, string name, int index, Func<BoundaryTag, bool> select)
    {
        var mesh = context.Mesh;
        var topo = context.Topology;
        var rec = context.Recovered;
        bool axi = context.Solution.Problem.Symmetry == ProblemSymmetry.Axisymmetric;

        // Oriented edges (field triangle on the left).
        var from = new List<int>();
        var to = new List<int>();
        var side = new List<int>();
        for (int s = 0; s < mesh.SegmentCount; s++)
        {
            int tag = mesh.SegmentTag[s];
            if (tag < 1 || tag > context.Tags.Tags.Count || !select(context.Tags[tag])) continue;
            int a = mesh.SegmentVertices[2 * s], b = mesh.SegmentVertices[2 * s + 1];
            int left = topo.SegmentLeftTriangle[s], right = topo.SegmentRightTriangle[s];
            if (left >= 0 && right >= 0) continue; // both sides meshed: not a surface
            if (left >= 0) { from.Add(a); to.Add(b); side.Add(left); }
            else if (right >= 0) { from.Add(b); to.Add(a); side.Add(right); }
        }
        int ne = from.Count;
        var outgoing = new Dictionary<int, int>(ne);
        var hasIncoming = new HashSet<int>();
        for (int e = 0; e < ne; e++)
        {
            outgoing.TryAdd(from[e], e);
            hasIncoming.Add(to[e]);
        }
        var used = new bool[ne];
        var order = Enumerable.Range(0, ne).Where(e => !hasIncoming.Contains(from[e])).Concat(Enumerable.Range(0, ne));
        var samples = new List<SurfaceFieldSample>();
        double charge = 0;
        int piece = 0;
        foreach (int start in order)
        {
            if (used[start]) continue;
            var chain = new List<int>();
            for (int e = start; e >= 0 && !used[e];)
            {
                used[e] = true;
                chain.Add(e);
                e = outgoing.TryGetValue(to[e], out int n) ? n : -1;
            }
            double arc = 0;
            SurfaceFieldSample? previous = null;
            for (int i = 0; i < chain.Count; i++)
            {
                int e = chain[i];
                int a = from[e], b = to[e];
                double dx = mesh.X[b] - mesh.X[a], dy = mesh.Y[b] - mesh.Y[a];
                double len = Math.Sqrt(dx * dx + dy * dy);
                double nx = -dy / len, ny = dx / len;
                int region = mesh.TriangleRegion[side[e]];
                double eps = context.PermittivityOfRegion(region);
                string? material = context.MaterialOfRegion(region)?.Name;
                var sa = Sample(rec, piece, arc, mesh.X[a], mesh.Y[a], rec.SideOf(a, region), nx, ny, eps, material);
                var sb = Sample(rec, piece, arc + len, mesh.X[b], mesh.Y[b], rec.SideOf(b, region), nx, ny, eps, material);
                // One sample per vertex and material: skip the start when it repeats the previous edge's end.
                if (previous is not SurfaceFieldSample prev || prev.MaterialName != material || prev.ArcLengthMetres != arc)
                {
                    samples.Add(sa);
                }
                else
                {
                    // Average the two edge normals at a shared vertex.
                    samples[^1] = Average(prev, sa, eps);
                }
                samples.Add(sb);
                previous = sb;
                double wa = axi ? 2 * Math.PI * mesh.X[a] : 1, wb = axi ? 2 * Math.PI * mesh.X[b] : 1;
                charge += 0.5 * len * (wa * sa.SurfaceChargeDensityCoulombsPerSquareMetre + wb * sb.SurfaceChargeDensityCoulombsPerSquareMetre);
                arc += len;
            }
            piece++;
        }
        return new SurfaceFieldProfile(name, index, samples, charge);
    }

    private static SurfaceFieldSample Sample(Recovery.RecoveredField rec, int piece, double arc, double x, double y, int s, double nx, double ny,
        double eps, string? material)
    {
        double ex = rec.SideFieldXVoltsPerMetre[s], ey = rec.SideFieldYVoltsPerMetre[s];
        double en = ex * nx + ey * ny;
        return new SurfaceFieldSample(piece, arc, x, y, Math.Sqrt(ex * ex + ey * ey), en, eps * en, material);
    }

    private static SurfaceFieldSample Average(SurfaceFieldSample prev, SurfaceFieldSample next, double eps)
    {
        // At a vertex between two edges the normal field is the mean over the two edge normals (same field vector).
        double en = 0.5 * (prev.NormalFieldVoltsPerMetre + next.NormalFieldVoltsPerMetre);
        return prev with { NormalFieldVoltsPerMetre = en, SurfaceChargeDensityCoulombsPerSquareMetre = eps * en };
    }
}
