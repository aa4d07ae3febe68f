using System.Diagnostics;
using Electrostat.Meshing.Input;

namespace Electrostat.Meshing.Core;

/// <summary>
/// Delaunay refinement: Ruppert's algorithm with Shewchuk's improvements (J. Ruppert, "A Delaunay refinement
/// algorithm for quality 2-dimensional mesh generation", J. Algorithms 18:548-585, 1995; J. R. Shewchuk, "Delaunay
/// refinement algorithms for triangular mesh generation", Computational Geometry 22:21-74, 2002) and Üngör's
/// off-centres (A. Üngör, "Off-centers: a new type of Steiner points for computing size-optimal quality-guaranteed
/// Delaunay triangulations", LATIN 2004).
/// </summary>
/// <remarks>
/// Order of work: encroached subsegments are split first (a subsegment is encroached when a vertex sees it at an
/// angle above 90°, i.e. lies strictly inside its diametral circle); then the worst bad triangle is split at its
/// off-centre or circumcentre. A candidate point that would encroach a subsegment is not inserted; the subsegment is
/// split instead (Ruppert's rule), which also keeps every inserted point inside the domain. Subsegments with one
/// input-vertex end are split on concentric shells (distance from that vertex a power of two metres), so that splits
/// on two segments meeting at a small angle stay equidistant from the apex and do not cascade.
/// Termination: a skinny triangle is skipped (not split) when its smallest angle is an input angle between two
/// segments, or when its shortest edge joins equidistant shell vertices of two segments meeting at less than 60°
/// (Shewchuk 2002, §4); no subsegment shorter than 1e-10 times the domain size is split. Skipped triangles are
/// counted and reported.
/// </remarks>
internal sealed partial class MeshCore
{
    private double _sin2Bound;
    private double _offConst;
    private double _minLen2;
    private bool[] _segProtected = Array.Empty<bool>();
    private int[] _segA = Array.Empty<int>(), _segB = Array.Empty<int>();
    private SizeField? _size;
    private bool _hasSize;
    private int _budget;
    private readonly TriangleQueue _bad = new(96);
    private int[] _segQ = new int[64];
    private int _segQCount;
    private int[] _forced = new int[16];
    private int _forcedCount;
    private int[] _enc = new int[48];
    private byte _lastSplitFailure;

    internal int SkipSmallAngle, SkipProtected, SkipTiny, SkipDegenerate;

    internal void ConfigureRefinement(PlanarGraph graph, MeshOptions options, SizeField size)
    {
        double theta = options.MinAngleDegrees * Math.PI / 180.0;
        double s = Math.Sin(theta);
        _sin2Bound = s * s;
        // Off-centre distance from the shortest edge's midpoint: 0.95 · (L/2) · cot(θ/2), so the new triangle on the
        // shortest edge has an apex angle slightly above θ.
        _offConst = theta > 0.01 ? 0.475 / Math.Tan(theta / 2) : double.PositiveInfinity;
        int ns = graph.Segments.Count;
        _segProtected = new bool[ns];
        _segA = new int[ns];
        _segB = new int[ns];
        for (int i = 0; i < ns; i++)
        {
            _segProtected[i] = options.ProtectedTags.Contains(graph.Segments[i].Tag);
            _segA[i] = graph.Segments[i].A;
            _segB[i] = graph.Segments[i].B;
        }
        double minX = double.MaxValue, minY = double.MaxValue, maxX = double.MinValue, maxY = double.MinValue;
        for (int v = 0; v < InputVertexCount; v++)
        {
            minX = Math.Min(minX, X[v]); maxX = Math.Max(maxX, X[v]);
            minY = Math.Min(minY, Y[v]); maxY = Math.Max(maxY, Y[v]);
        }
        double diag = InputVertexCount > 0 ? Math.Sqrt((maxX - minX) * (maxX - minX) + (maxY - minY) * (maxY - minY)) : 1;
        _minLen2 = diag * diag * 1e-20;
        _size = size;
        _hasSize = size.HasSizeLimit;
        _budget = options.MaxTriangles;
    }

    /// <summary>Queues every bad triangle and encroached subsegment, then refines until none is left.</summary>
    internal void RefineAll()
    {
        _bad.Clear();
        _segQCount = 0;
        for (int t = 0; t < NT; t++) EnqueueIfBad(t);
        for (int c = 0; c < 3 * NT; c++)
            if (TS[c] >= 0 && IsEncroachedFrom(c)) PushSeg(c);
        Run();
    }

    /// <summary>Splits the given triangles (whatever their quality), then restores the quality bound.</summary>
    internal void RefineTriangles(IEnumerable<int> triangles)
    {
        foreach (int t in triangles)
        {
            if ((uint)t >= (uint)NT) throw new ArgumentOutOfRangeException(nameof(triangles), $"Triangle index {t} is not in the mesh (0..{NT - 1}).");
            if (_forcedCount + 2 > _forced.Length) Array.Resize(ref _forced, _forced.Length * 2);
            _forced[_forcedCount++] = t;
            _forced[_forcedCount++] = TStamp[t];
        }
        Run();
    }

    /// <summary>
    /// Splits the given triangles, then <paramref name="passes"/> − 1 more times splits every triangle that touches a
    /// vertex inserted by the previous pass, so that a marked region is refined about 1.7× per pass.
    /// </summary>
    internal void RefineTriangles(IEnumerable<int> triangles, int passes)
    {
        int first = NV;
        RefineTriangles(triangles);
        var around = new List<int>();
        for (int pass = 1; pass < passes; pass++)
        {
            int firstNew = first;
            first = NV;
            if (firstNew == first) break; // nothing was inserted
            around.Clear();
            for (int t = 0; t < NT; t++)
            {
                if (TV[3 * t] >= firstNew || TV[3 * t + 1] >= firstNew || TV[3 * t + 2] >= firstNew) around.Add(t);
            }
            RefineTriangles(around);
        }
    }

    private void Run()
    {
        while (true)
        {
            ProcessSegments();
            if (_forcedCount > 0)
            {
                _forcedCount -= 2;
                int ft = _forced[_forcedCount], fs = _forced[_forcedCount + 1];
                if (TStamp[ft] == fs) SplitTriangle(ft, forced: true);
                continue;
            }
            if (!_bad.TryPop(out int t, out int stamp)) break;
            if (TStamp[t] != stamp) continue;
            int cls = Classify(t, out bool skinny);
            if (cls < 0) continue;
            if (skinny && IsUnfixable(t) && !IsOversized(t))
            {
                TSkip[t] = SkipReason.SmallInputAngle;
                SkipSmallAngle++;
                continue;
            }
            SplitTriangle(t, forced: false);
        }
    }

    private void ProcessSegments()
    {
        while (_segQCount > 0)
        {
            _segQCount -= 2;
            int code = _segQ[_segQCount], stamp = _segQ[_segQCount + 1];
            if (TStamp[code / 3] != stamp || TS[code] < 0) continue;
            if (_segProtected[TS[code]]) continue;
            if (IsEncroachedFrom(code) || (TN[code] >= 0 && IsEncroachedFrom(TN[code]))) SplitSubsegment(code);
        }
    }

    private void PushSeg(int code)
    {
        if (_segQCount + 2 > _segQ.Length) Array.Resize(ref _segQ, _segQ.Length * 2);
        _segQ[_segQCount++] = code;
        _segQ[_segQCount++] = TStamp[code / 3];
    }

    /// <summary>True if the apex of edge <paramref name="code"/>'s own triangle lies strictly inside the edge's diametral circle.</summary>
    private bool IsEncroachedFrom(int code)
    {
        int t = code / 3, e = code - 3 * t, b = 3 * t;
        int p = TV[code], a = TV[b + Next(e)], c = TV[b + Prev(e)];
        return (X[a] - X[p]) * (X[c] - X[p]) + (Y[a] - Y[p]) * (Y[c] - Y[p]) < 0;
    }

    /// <summary>
    /// Bucket of a bad triangle (skinny ones by their smallest angle, worst first; then oversized ones, largest first),
    /// or -1 if good. The size field is evaluated only for triangles that are not skinny.
    /// </summary>
    private int Classify(int t, out bool skinny)
    {
        int b = 3 * t;
        int va = TV[b], vb = TV[b + 1], vc = TV[b + 2];
        double ax = X[va], ay = Y[va], bx = X[vb], by = Y[vb], cx = X[vc], cy = Y[vc];
        double l0 = (cx - bx) * (cx - bx) + (cy - by) * (cy - by);
        double l1 = (ax - cx) * (ax - cx) + (ay - cy) * (ay - cy);
        double l2 = (bx - ax) * (bx - ax) + (by - ay) * (by - ay);
        double area2 = (bx - ax) * (cy - ay) - (by - ay) * (cx - ax);
        double lmax = Math.Max(l0, Math.Max(l1, l2));
        double lmin = Math.Min(l0, Math.Min(l1, l2));
        double lmid = l0 + l1 + l2 - lmax - lmin;
        // sin²(smallest angle) = (2·area)² / (middle edge² · longest edge²), from the law of sines.
        double s2 = area2 * area2 / (lmid * lmax);
        skinny = s2 < _sin2Bound;
        if (skinny)
        {
            if (lmin < _minLen2) return -1;
            int q = (int)(Math.Sqrt(s2 / _sin2Bound) * 64);
            return Math.Clamp(q, 0, 63);
        }
        if (!_hasSize) return -1;
        double h = _size!.At((ax + bx + cx) / 3, (ay + by + cy) / 3, TReg[t]);
        double r = lmax / (h * h);
        if (!(r > 1)) return -1;
        return 64 + Math.Max(0, 31 - Math.Min(31, Math.ILogB(r)));
    }

    private bool IsOversized(int t)
    {
        if (!_hasSize) return false;
        int b = 3 * t;
        int va = TV[b], vb = TV[b + 1], vc = TV[b + 2];
        double lmax = Math.Max(Len2(vb, vc), Math.Max(Len2(vc, va), Len2(va, vb)));
        double h = _size!.At((X[va] + X[vb] + X[vc]) / 3, (Y[va] + Y[vb] + Y[vc]) / 3, TReg[t]);
        return lmax > h * h;
    }

    private void EnqueueIfBad(int t)
    {
        int cls = Classify(t, out _);
        if (cls >= 0) _bad.Push(t, TStamp[t], cls);
    }

    /// <summary>
    /// True when a skinny triangle cannot be improved: its smallest angle lies between two segments, or its shortest
    /// edge joins two shell vertices of segments meeting at a small input angle (below 60°).
    /// </summary>
    private bool IsUnfixable(int t)
    {
        int b = 3 * t;
        double l0 = Len2(TV[b + 1], TV[b + 2]), l1 = Len2(TV[b + 2], TV[b]), l2 = Len2(TV[b], TV[b + 1]);
        int r = l0 <= l1 && l0 <= l2 ? 0 : l1 <= l2 ? 1 : 2; // apex of the smallest angle
        if (TS[b + Next(r)] >= 0 && TS[b + Prev(r)] >= 0) return true;
        int p = TV[b + Next(r)], q = TV[b + Prev(r)];
        int sp = SegmentOf(p), sq = SegmentOf(q);
        if (sp < 0 || sq < 0 || sp == sq) return false;
        int apex = _segA[sp] == _segA[sq] || _segA[sp] == _segB[sq] ? _segA[sp]
                 : _segB[sp] == _segA[sq] || _segB[sp] == _segB[sq] ? _segB[sp] : -1;
        if (apex < 0) return false;
        double dp = Math.Sqrt(Len2(apex, p)), dq = Math.Sqrt(Len2(apex, q));
        if (Math.Abs(dp - dq) > 1e-3 * Math.Max(dp, dq)) return false;
        int fp = _segA[sp] == apex ? _segB[sp] : _segA[sp];
        int fq = _segA[sq] == apex ? _segB[sq] : _segA[sq];
        double ux = X[fp] - X[apex], uy = Y[fp] - Y[apex], vx = X[fq] - X[apex], vy = Y[fq] - Y[apex];
        double cos = (ux * vx + uy * vy) / Math.Sqrt((ux * ux + uy * uy) * (vx * vx + vy * vy));
        return cos > 0.5;
    }

    private int SegmentOf(int v) => VKind[v] == KindSegment ? VSeg[v] : -1;

    private double Len2(int a, int b) => (X[a] - X[b]) * (X[a] - X[b]) + (Y[a] - Y[b]) * (Y[a] - Y[b]);

    /// <summary>Splits triangle t; when its point is rejected for encroachment, the subsegments are split and t is
    /// queued again (in the forced queue if <paramref name="forced"/>, so a requested split is not forgotten).</summary>
    private void SplitTriangle(int t, bool forced)
    {
        int b = 3 * t;
        int va = TV[b], vb = TV[b + 1], vc = TV[b + 2];
        double ax = X[va], ay = Y[va];
        double bx = X[vb] - ax, by = Y[vb] - ay, cx = X[vc] - ax, cy = Y[vc] - ay;
        double d = 2 * (bx * cy - by * cx);
        double b2 = bx * bx + by * by, c2 = cx * cx + cy * cy;
        double ux = (cy * b2 - by * c2) / d, uy = (bx * c2 - cx * b2) / d;
        // Off-centre: move the point towards the shortest edge's midpoint when the circumcentre is far from it.
        double l0 = (cx - bx) * (cx - bx) + (cy - by) * (cy - by);
        double mx, my, lmin2;
        if (b2 <= c2 && b2 <= l0) { mx = bx / 2; my = by / 2; lmin2 = b2; }
        else if (c2 <= l0) { mx = cx / 2; my = cy / 2; lmin2 = c2; }
        else { mx = (bx + cx) / 2; my = (by + cy) / 2; lmin2 = l0; }
        double dx = ux - mx, dy = uy - my;
        double dist2 = dx * dx + dy * dy;
        double off = _offConst * _offConst * lmin2;
        if (dist2 > off)
        {
            double f = Math.Sqrt(off / dist2);
            ux = mx + dx * f;
            uy = my + dy * f;
        }
        double px = ax + ux, py = ay + uy;

        int lt = t;
        var res = Locate(px, py, ref lt, out int blocked);
        if (res != WalkResult.Inside)
        {
            int seg = TS[blocked];
            if (seg < 0) { TSkip[t] = SkipReason.Degenerate; SkipDegenerate++; return; }
            if (_segProtected[seg]) { TSkip[t] = SkipReason.ProtectedSegment; SkipProtected++; return; }
            if (!SplitSubsegment(blocked)) { TSkip[t] = _lastSplitFailure; return; }
            Requeue(t, forced);
            return;
        }
        bool starShaped = FindCavity(px, py, lt, -1, -1, -1);

        // Ruppert's rule: a point that would encroach a subsegment is rejected and the subsegment split instead.
        int nenc = 0;
        for (int k = 0; k < _nb; k++)
        {
            if (_bs[k] < 0) continue;
            int u = _bu[k], v = _bv[k];
            if ((X[u] - px) * (X[v] - px) + (Y[u] - py) * (Y[v] - py) < 0)
            {
                if (nenc + 3 > _enc.Length) Array.Resize(ref _enc, _enc.Length * 2);
                _enc[nenc++] = u; _enc[nenc++] = v; _enc[nenc++] = _bs[k];
            }
        }
        if (nenc > 0)
        {
            bool split = false;
            byte reason = SkipReason.TinyFeature;
            var enc = _enc.AsSpan(0, nenc).ToArray();
            for (int k = 0; k < nenc; k += 3)
            {
                if (_segProtected[enc[k + 2]]) { reason = SkipReason.ProtectedSegment; continue; }
                int code = FindEdge(enc[k], enc[k + 1]);
                if (code < 0 || TS[code] != enc[k + 2]) continue;
                if (SplitSubsegment(code)) split = true;
                else reason = _lastSplitFailure;
            }
            if (split) Requeue(t, forced);
            else
            {
                TSkip[t] = reason;
                if (reason == SkipReason.ProtectedSegment) SkipProtected++;
            }
            return;
        }
        if (!starShaped) { TSkip[t] = SkipReason.Degenerate; SkipDegenerate++; return; }
        int p = AddVertex(px, py, KindFree, -1);
        CommitCavity(p, -1, -1, -1);
        AfterInsert();
    }

    private void Requeue(int t, bool forced)
    {
        if (!forced)
        {
            _bad.Push(t, TStamp[t], 0);
            return;
        }
        if (_forcedCount + 2 > _forced.Length) Array.Resize(ref _forced, _forced.Length * 2);
        _forced[_forcedCount++] = t;
        _forced[_forcedCount++] = TStamp[t];
    }

    /// <summary>Splits the subsegment at edge <paramref name="code"/>; false if it is protected or too short.</summary>
    private bool SplitSubsegment(int code)
    {
        int seg = TS[code];
        Debug.Assert(seg >= 0, "Only constrained edges are split as subsegments.");
        _lastSplitFailure = SkipReason.ProtectedSegment;
        if (_segProtected[seg]) return false;
        _lastSplitFailure = SkipReason.TinyFeature;
        int t = code / 3, e = code - 3 * t, b = 3 * t;
        int a = TV[b + Next(e)], c = TV[b + Prev(e)];
        double ex = X[c] - X[a], ey = Y[c] - Y[a];
        double len2 = ex * ex + ey * ey;
        if (len2 < 4 * _minLen2) { SkipTiny++; return false; }
        double frac = 0.5;
        bool aIn = VKind[a] == KindInput, cIn = VKind[c] == KindInput;
        if (aIn != cIn)
        {
            // Concentric shells about the input end: distance 2^k metres, the power of two nearest half the length.
            double len = Math.Sqrt(len2);
            double dshell = Math.ScaleB(1.0, (int)Math.Round(Math.Log2(len / 2)));
            frac = aIn ? dshell / len : 1 - dshell / len;
        }
        double mx = X[a] + frac * ex, my = Y[a] + frac * ey;
        if (frac == 0.5) { mx = 0.5 * (X[a] + X[c]); my = 0.5 * (Y[a] + Y[c]); }
        if ((mx == X[a] && my == Y[a]) || (mx == X[c] && my == Y[c])) { SkipTiny++; return false; }
        int n = TN[code];
        if (!FindCavity(mx, my, t, n >= 0 ? n / 3 : -1, code, n)) { SkipDegenerate++; _lastSplitFailure = SkipReason.Degenerate; return false; }
        int m = AddVertex(mx, my, KindSegment, seg);
        CommitCavity(m, a, c, seg);
        AfterInsert();
        return true;
    }

    private void AfterInsert()
    {
        if (NT > _budget) throw new MeshBudgetExceededException(_budget);
        for (int j = 0; j < NewCount; j++)
        {
            int t = NewTris[j];
            EnqueueIfBad(t);
            int b = 3 * t;
            for (int i = 0; i < 3; i++)
            {
                int code = b + i;
                if (TS[code] >= 0 && IsEncroachedFrom(code) && !_segProtected[TS[code]]) PushSeg(code);
            }
        }
    }
}
