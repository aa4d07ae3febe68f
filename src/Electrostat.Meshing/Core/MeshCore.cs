using System.Diagnostics;
using System.Runtime.CompilerServices;
using Electrostat.Meshing.Predicates;

namespace Electrostat.Meshing.Core;

/// <summary>
/// Array-based triangulation shared by construction and refinement.
/// </summary>
/// <remarks>
/// Topology invariants (checked by <see cref="CheckTopology"/>):
/// <list type="bullet">
/// <item>Triangle t has vertices <c>TV[3t..3t+2]</c> in counter-clockwise order.</item>
/// <item>Edge i of t is the edge opposite vertex i, from <c>TV[3t+(i+1)%3]</c> to <c>TV[3t+(i+2)%3]</c>; it runs
/// counter-clockwise about t. Its "edge code" is 3t+i.</item>
/// <item><c>TN[3t+i]</c> is the edge code of the same edge seen from the neighbouring triangle, or -1 on the domain
/// boundary; neighbours are symmetric: TN[TN[c]] == c.</item>
/// <item><c>TS[3t+i]</c> is the index of the input segment that the edge lies on, or -1 for an unconstrained edge;
/// both sides of a constrained edge carry the same value. Every boundary edge (TN == -1) is constrained.</item>
/// <item><c>TStamp[t]</c> changes whenever slot t is rewritten, so queued work on a stale slot is recognised.</item>
/// </list>
/// Triangle slots are never freed during refinement: a cavity's slots are reused and new ones appended.
/// </remarks>
internal sealed partial class MeshCore
{
    internal const byte KindInput = 0;
    internal const byte KindSegment = 1;
    internal const byte KindFree = 2;
    internal const byte KindSuper = 3;

    internal double[] X = new double[64];
    internal double[] Y = new double[64];
    internal byte[] VKind = new byte[64];
    internal int[] VSeg = new int[64];
    internal int[] VTri = new int[64];
    internal int NV;

    internal int[] TV = new int[192];
    internal int[] TN = new int[192];
    internal int[] TS = new int[192];
    internal int[] TReg = new int[64];
    internal int[] TStamp = new int[64];
    internal byte[] TSkip = new byte[64];
    internal int NT;

    private int[] _tmark = new int[64];
    private int _markCounter;
    private uint _rng = 0x2545F491u;

    // Cavity scratch.
    private int[] _cav = new int[64];
    private int _ncav;
    private int[] _bu = new int[64], _bv = new int[64], _bo = new int[64], _bs = new int[64], _br = new int[64];
    private int _nb;
    private int[] _stack = new int[64];
    private int[] _scrU = new int[64], _scrV = new int[64];
    internal int[] NewTris = new int[64];
    internal int NewCount;

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal static int Next(int i) => i == 2 ? 0 : i + 1;

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal static int Prev(int i) => i == 0 ? 2 : i - 1;

    internal int AddVertex(double x, double y, byte kind, int seg)
    {
        if (NV == X.Length)
        {
            int cap = X.Length * 2;
            Array.Resize(ref X, cap);
            Array.Resize(ref Y, cap);
            Array.Resize(ref VKind, cap);
            Array.Resize(ref VSeg, cap);
            Array.Resize(ref VTri, cap);
            int old = _scrU.Length;
            Array.Resize(ref _scrU, cap);
            Array.Resize(ref _scrV, cap);
            for (int i = old; i < cap; i++) { _scrU[i] = -1; _scrV[i] = -1; }
        }
        X[NV] = x;
        Y[NV] = y;
        VKind[NV] = kind;
        VSeg[NV] = seg;
        VTri[NV] = -1;
        return NV++;
    }

    internal void ReserveVertices(int n)
    {
        if (X.Length >= n) return;
        int old = _scrU.Length;
        Array.Resize(ref X, n);
        Array.Resize(ref Y, n);
        Array.Resize(ref VKind, n);
        Array.Resize(ref VSeg, n);
        Array.Resize(ref VTri, n);
        Array.Resize(ref _scrU, n);
        Array.Resize(ref _scrV, n);
        for (int i = old; i < n; i++) { _scrU[i] = -1; _scrV[i] = -1; }
    }

    internal void InitScratch()
    {
        Array.Fill(_scrU, -1);
        Array.Fill(_scrV, -1);
    }

    internal int NewTriangle()
    {
        if (NT == TReg.Length)
        {
            int cap = TReg.Length * 2;
            Array.Resize(ref TV, 3 * cap);
            Array.Resize(ref TN, 3 * cap);
            Array.Resize(ref TS, 3 * cap);
            Array.Resize(ref TReg, cap);
            Array.Resize(ref TStamp, cap);
            Array.Resize(ref TSkip, cap);
            Array.Resize(ref _tmark, cap);
        }
        TStamp[NT] = 0;
        TSkip[NT] = 0;
        _tmark[NT] = 0;
        return NT++;
    }

    internal void ReserveTriangles(int n)
    {
        if (TReg.Length >= n) return;
        Array.Resize(ref TV, 3 * n);
        Array.Resize(ref TN, 3 * n);
        Array.Resize(ref TS, 3 * n);
        Array.Resize(ref TReg, n);
        Array.Resize(ref TStamp, n);
        Array.Resize(ref TSkip, n);
        Array.Resize(ref _tmark, n);
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal double Orient(int a, int b, int c) =>
        GeometricPredicates.Orient2D(X[a], Y[a], X[b], Y[b], X[c], Y[c]);

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal double OrientP(int a, int b, double px, double py) =>
        GeometricPredicates.Orient2D(X[a], Y[a], X[b], Y[b], px, py);

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    internal double InCircleP(int t, double px, double py)
    {
        int a = TV[3 * t], b = TV[3 * t + 1], c = TV[3 * t + 2];
        return GeometricPredicates.InCircle(X[a], Y[a], X[b], Y[b], X[c], Y[c], px, py);
    }

    internal enum WalkResult { Inside, Blocked, Outside }

    /// <summary>
    /// Visibility walk from triangle <paramref name="t"/> towards (px, py). Stops inside the containing triangle
    /// (point inside or on its boundary), or at a constrained edge / domain boundary edge that the walk would cross.
    /// The first edge to test is chosen by a deterministic pseudo-random rotation, which prevents cycling.
    /// </summary>
    internal WalkResult Locate(double px, double py, ref int t, out int blockedCode, bool crossConstraints = false)
    {
        blockedCode = -1;
        int guard = 0;
        while (true)
        {
            int b = 3 * t;
            _rng = _rng * 1103515245u + 12345u;
            int off = (int)((_rng >> 16) % 3);
            int found = -1;
            for (int k = 0; k < 3; k++)
            {
                int i = off + k;
                if (i >= 3) i -= 3;
                int u = TV[b + Next(i)], w = TV[b + Prev(i)];
                if (OrientP(u, w, px, py) < 0) { found = i; break; }
            }
            if (found < 0) return WalkResult.Inside;
            int code = b + found;
            int n = TN[code];
            if (TS[code] >= 0 && !crossConstraints) { blockedCode = code; return WalkResult.Blocked; }
            if (n < 0) { blockedCode = code; return WalkResult.Outside; }
            t = n / 3;
            if (++guard > 4 * NT + 16) throw new InvalidOperationException("Point location did not terminate (internal error).");
        }
    }

    /// <summary>
    /// Bowyer-Watson cavity of point (px, py): the triangles reachable from the seed(s) without crossing a constrained
    /// edge whose circumcircle strictly contains the point. Edge codes <paramref name="skip0"/>/<paramref name="skip1"/>
    /// (the subsegment being split, seen from both sides) are interior to the cavity. Returns false if some boundary
    /// edge does not see the point strictly on its inner side (the cavity would not be star-shaped).
    /// </summary>
    internal bool FindCavity(double px, double py, int seed0, int seed1, int skip0, int skip1)
    {
        int markIn = ++_markCounter;
        int markOut = ++_markCounter;
        if (_markCounter > int.MaxValue - 4) { Array.Clear(_tmark); _markCounter = 2; markIn = 1; markOut = 2; }
        _ncav = 0;
        _nb = 0;
        int sp = 0;
        PushCav(seed0, markIn, ref sp);
        if (seed1 >= 0) PushCav(seed1, markIn, ref sp);
        while (sp > 0)
        {
            int t = _stack[--sp];
            int b = 3 * t;
            for (int i = 0; i < 3; i++)
            {
                int code = b + i;
                if (code == skip0 || code == skip1) continue;
                int n = TN[code];
                if (TS[code] < 0 && n >= 0)
                {
                    int nt = n / 3;
                    int m = _tmark[nt];
                    if (m == markIn) continue;
                    if (m != markOut)
                    {
                        if (InCircleP(nt, px, py) > 0) { PushCav(nt, markIn, ref sp); continue; }
                        _tmark[nt] = markOut;
                    }
                }
                AddBoundary(t, i);
            }
        }
        for (int k = 0; k < _nb; k++)
        {
            if (OrientP(_bu[k], _bv[k], px, py) <= 0) return false;
        }
        return true;
    }

    private void PushCav(int t, int markIn, ref int sp)
    {
        _tmark[t] = markIn;
        if (_ncav == _cav.Length) Array.Resize(ref _cav, _cav.Length * 2);
        _cav[_ncav++] = t;
        if (sp == _stack.Length) Array.Resize(ref _stack, _stack.Length * 2);
        _stack[sp++] = t;
    }

    private void AddBoundary(int t, int i)
    {
        if (_nb == _bu.Length)
        {
            int cap = _bu.Length * 2;
            Array.Resize(ref _bu, cap);
            Array.Resize(ref _bv, cap);
            Array.Resize(ref _bo, cap);
            Array.Resize(ref _bs, cap);
            Array.Resize(ref _br, cap);
        }
        int b = 3 * t;
        _bu[_nb] = TV[b + Next(i)];
        _bv[_nb] = TV[b + Prev(i)];
        _bo[_nb] = TN[b + i];
        _bs[_nb] = TS[b + i];
        _br[_nb] = TReg[t];
        _nb++;
    }

    internal int BoundaryCount => _nb;

    /// <summary>Constrained boundary edge k of the last cavity: endpoints and input segment.</summary>
    internal (int U, int V, int Seg) BoundaryEdge(int k) => (_bu[k], _bv[k], _bs[k]);

    /// <summary>
    /// Replaces the last cavity by the fan of triangles from vertex p to the cavity boundary. When splitting a
    /// subsegment (a, b) of input segment <paramref name="splitSeg"/>, the fan edges p-a and p-b become constrained.
    /// The new triangles are listed in <see cref="NewTris"/>.
    /// </summary>
    internal void CommitCavity(int p, int splitA, int splitB, int splitSeg)
    {
        Debug.Assert(_nb >= _ncav, "A cavity has at least as many boundary edges as triangles.");
        if (NewTris.Length < _nb) NewTris = new int[Math.Max(_nb, 2 * NewTris.Length)];
        NewCount = _nb;
        for (int j = 0; j < _nb; j++)
        {
            int t = j < _ncav ? _cav[j] : NewTriangle();
            NewTris[j] = t;
            int b = 3 * t;
            int u = _bu[j], v = _bv[j];
            TV[b] = p; TV[b + 1] = u; TV[b + 2] = v;
            int o = _bo[j];
            TN[b] = o;
            if (o >= 0) TN[o] = b;
            TS[b] = _bs[j];
            TReg[t] = _br[j];
            TStamp[t]++;
            TSkip[t] = 0;
            _scrU[u] = t;
            _scrV[v] = t;
            // Both ends: on a one-sided (boundary) split the boundary is a path, and its last vertex is no edge's start.
            VTri[u] = t;
            VTri[v] = t;
        }
        for (int j = 0; j < _nb; j++)
        {
            int t = NewTris[j];
            int b = 3 * t;
            int u = _bu[j], v = _bv[j];
            int nu = _scrU[v];
            TN[b + 1] = nu >= 0 ? 3 * nu + 2 : -1;
            TS[b + 1] = splitSeg >= 0 && (v == splitA || v == splitB) ? splitSeg : -1;
            int nv = _scrV[u];
            TN[b + 2] = nv >= 0 ? 3 * nv + 1 : -1;
            TS[b + 2] = splitSeg >= 0 && (u == splitA || u == splitB) ? splitSeg : -1;
        }
        for (int j = 0; j < _nb; j++)
        {
            _scrU[_bu[j]] = -1;
            _scrV[_bv[j]] = -1;
        }
        VTri[p] = NewTris[0];
    }

    /// <summary>Flips edge <paramref name="code"/> (must be unconstrained and interior). Afterwards t = (x, u, y) and t2 = (y, w, x).</summary>
    internal void Flip(int code)
    {
        int t = code / 3, e = code - 3 * t;
        int n = TN[code];
        int t2 = n / 3, e2 = n - 3 * t2;
        int b = 3 * t, b2 = 3 * t2;
        int x = TV[b + e], u = TV[b + Next(e)], w = TV[b + Prev(e)];
        int y = TV[b2 + e2];
        int n1 = TN[b + Next(e)], s1 = TS[b + Next(e)];   // edge (w, x)
        int n2 = TN[b + Prev(e)], s2 = TS[b + Prev(e)];   // edge (x, u)
        int m1 = TN[b2 + Next(e2)], r1 = TS[b2 + Next(e2)]; // edge (u, y)
        int m2 = TN[b2 + Prev(e2)], r2 = TS[b2 + Prev(e2)]; // edge (y, w)
        TV[b] = x; TV[b + 1] = u; TV[b + 2] = y;
        TN[b] = m1; TS[b] = r1; if (m1 >= 0) TN[m1] = b;
        TN[b + 1] = b2 + 1; TS[b + 1] = -1;
        TN[b + 2] = n2; TS[b + 2] = s2; if (n2 >= 0) TN[n2] = b + 2;
        TV[b2] = y; TV[b2 + 1] = w; TV[b2 + 2] = x;
        TN[b2] = n1; TS[b2] = s1; if (n1 >= 0) TN[n1] = b2;
        TN[b2 + 1] = b + 1; TS[b2 + 1] = -1;
        TN[b2 + 2] = m2; TS[b2 + 2] = r2; if (m2 >= 0) TN[m2] = b2 + 2;
        TStamp[t]++; TStamp[t2]++;
        TSkip[t] = 0; TSkip[t2] = 0;
        VTri[x] = t; VTri[u] = t; VTri[y] = t; VTri[w] = t2;
    }

    /// <summary>An edge code (either side) of the edge {u, w}, found by rotating about u; -1 if there is none.</summary>
    internal int FindEdge(int u, int w)
    {
        int start = VTri[u];
        int t = start;
        int guard = 0;
        Debug.Assert(TV[3 * t] == u || TV[3 * t + 1] == u || TV[3 * t + 2] == u, "VTri must point to a triangle that has the vertex.");
        // Rotate counter-clockwise about u; on reaching a boundary, rotate the other way from the start.
        while (true)
        {
            int b = 3 * t;
            int i = TV[b] == u ? 0 : TV[b + 1] == u ? 1 : 2;
            if (TV[b + Next(i)] == w) return b + Prev(i);
            if (TV[b + Prev(i)] == w) return b + Next(i);
            int n = TN[b + Next(i)];
            if (n < 0) break;
            t = n / 3;
            if (t == start) return -1;
            if (++guard > 100000) return -1;
        }
        t = start;
        while (true)
        {
            int b = 3 * t;
            int i = TV[b] == u ? 0 : TV[b + 1] == u ? 1 : 2;
            int n = TN[b + Prev(i)];
            if (n < 0) return -1;
            t = n / 3;
            b = 3 * t;
            i = TV[b] == u ? 0 : TV[b + 1] == u ? 1 : 2;
            if (TV[b + Next(i)] == w) return b + Prev(i);
            if (TV[b + Prev(i)] == w) return b + Next(i);
            if (++guard > 200000) return -1;
        }
    }

    /// <summary>Checks the topology invariants listed on the type; returns the first violation or null.</summary>
    internal string? CheckTopology()
    {
        for (int t = 0; t < NT; t++)
        {
            int b = 3 * t;
            if (Orient(TV[b], TV[b + 1], TV[b + 2]) <= 0) return $"triangle {t} is not counter-clockwise";
            for (int i = 0; i < 3; i++)
            {
                int n = TN[b + i];
                if (n < 0)
                {
                    if (TS[b + i] < 0) return $"boundary edge {i} of triangle {t} is not constrained";
                    continue;
                }
                if (TN[n] != b + i) return $"neighbour of triangle {t} edge {i} is not symmetric";
                int t2 = n / 3, e2 = n % 3;
                if (TV[3 * t2 + Next(e2)] != TV[b + Prev(i)] || TV[3 * t2 + Prev(e2)] != TV[b + Next(i)])
                    return $"triangles {t} and {t2} do not share the edge they are linked across";
                if (TS[n] != TS[b + i]) return $"constraint mark differs across edge {i} of triangle {t}";
            }
        }
        return null;
    }
}
