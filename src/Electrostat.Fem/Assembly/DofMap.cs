using System.Diagnostics;

namespace Electrostat.Fem.Assembly;

/// <summary>
/// Which unknown (degree of freedom) each mesh vertex belongs to. Vertices held at a known potential (Dirichlet)
/// map to −1; the vertices of a floating conductor, and the matched vertex pairs of a Kelvin open boundary, share one
/// unknown (degree-of-freedom merging).
/// </summary>
internal sealed class DofMap
{
    private DofMap(int[] dofOfNode, int dofCount, int[] terminalOfNode, bool[] terminalIsFixed, int[] floatingDof, int[] spatialOrder)
    {
        SpatialOrder = spatialOrder;
        DofOfNode = dofOfNode;
        DofCount = dofCount;
        TerminalOfNode = terminalOfNode;
        TerminalIsFixed = terminalIsFixed;
        FloatingDof = floatingDof;
    }

    /// <summary>The vertices in the space-filling-curve order used to number the unknowns.</summary>
    public int[] SpatialOrder { get; }

    /// <summary>Unknown of each vertex, or −1 when its potential is known.</summary>
    public int[] DofOfNode { get; }

    /// <summary>Number of unknowns.</summary>
    public int DofCount { get; }

    /// <summary>Terminal of each vertex after merging (a merged group shares its terminal), or −1.</summary>
    public int[] TerminalOfNode { get; }

    /// <summary>Whether each terminal's potential is known.</summary>
    public bool[] TerminalIsFixed { get; }

    /// <summary>The shared unknown of each floating conductor, −1 for fixed conductors.</summary>
    public int[] FloatingDof { get; }

    /// <summary>
    /// Builds the map. With <paramref name="floatingAsFixed"/> every conductor is held at a known potential (the
    /// capacitance-matrix solves); otherwise floating conductors become one merged unknown each (the design solve).
    /// </summary>
    public static DofMap Build(CompiledProblem cp, bool floatingAsFixed)
    {
        int n = cp.Mesh.VertexCount;
        var parent = new int[n];
        for (int i = 0; i < n; i++) parent[i] = i;

        foreach (var (a, b) in cp.MergePairs) Union(parent, a, b);

        var fixedTerminal = new bool[cp.TerminalCount];
        for (int k = 0; k < cp.ConductorCount; k++)
        {
            fixedTerminal[k] = floatingAsFixed || !cp.Problem.Conductors[k].IsFloating;
        }
        fixedTerminal[cp.EnclosureTerminal] = true;
        fixedTerminal[cp.InfinityTerminal] = true;

        var firstOfFloating = new int[cp.ConductorCount];
        Array.Fill(firstOfFloating, -1);
        for (int i = 0; i < n; i++)
        {
            int t = cp.NodeTerminal[i];
            if (t >= 0 && t < cp.ConductorCount && !fixedTerminal[t])
            {
                if (firstOfFloating[t] < 0) firstOfFloating[t] = i;
                else Union(parent, firstOfFloating[t], i);
            }
        }

        // Terminal of each merged group; a group may not join two different terminals.
        var rootTerminal = new int[n];
        Array.Fill(rootTerminal, -1);
        for (int i = 0; i < n; i++)
        {
            int t = cp.NodeTerminal[i];
            if (t < 0) continue;
            int r = Find(parent, i);
            if (rootTerminal[r] >= 0 && rootTerminal[r] != t)
            {
                throw new FieldProblemException($"Mesh vertex {i} joins {cp.TerminalName(rootTerminal[r])} and {cp.TerminalName(t)} through the open boundary's matched arcs: keep conductors off the open-boundary circle.");
            }
            rootTerminal[r] = t;
        }

        var dofOfRoot = new int[n];
        Array.Fill(dofOfRoot, -1);
        var dofOfNode = new int[n];
        var terminalOfNode = new int[n];
        int count = 0;
        var order = MortonOrder(cp.Mesh.X, cp.Mesh.Y);
        foreach (int i in order)
        {
            int r = Find(parent, i);
            int t = rootTerminal[r];
            terminalOfNode[i] = t;
            if (t >= 0 && fixedTerminal[t])
            {
                dofOfNode[i] = -1;
                continue;
            }
            if (dofOfRoot[r] < 0) dofOfRoot[r] = count++;
            dofOfNode[i] = dofOfRoot[r];
        }

        var floatingDof = new int[cp.ConductorCount];
        for (int k = 0; k < cp.ConductorCount; k++)
        {
            floatingDof[k] = fixedTerminal[k] ? -1 : dofOfNode[firstOfFloating[k]];
        }

        bool anyFixed = false;
        for (int i = 0; i < n && !anyFixed; i++) anyFixed = dofOfNode[i] < 0;
        if (!anyFixed)
        {
            throw new FieldProblemException("No vertex has a known potential, so the potential is undetermined: add an enclosure, a fixed-potential conductor, or (axisymmetric) an open boundary.");
        }
        CheckEveryPieceIsAnchored(cp, parent, dofOfNode);
        Debug.Assert(count > 0 || n > 0);
        return new DofMap(dofOfNode, count, terminalOfNode, fixedTerminal, floatingDof, order);
    }

    /// <summary>
    /// Vertices in Morton (Z-curve) order of their coordinates, so that unknowns close in space get close numbers.
    /// Mesher output appends refinement vertices in the order they were created, which scatters neighbours across
    /// memory; numbering along a space-filling curve keeps matrix rows, vectors and multigrid aggregates cache-local.
    /// Ties (equal keys) keep the vertex order, so the numbering is deterministic.
    /// </summary>
    private static int[] MortonOrder(double[] x, double[] y)
    {
        int n = x.Length;
        var order = new int[n];
        for (int i = 0; i < n; i++) order[i] = i;
        if (n < 4096) return order;
        double minX = double.MaxValue, minY = double.MaxValue, maxX = double.MinValue, maxY = double.MinValue;
        for (int i = 0; i < n; i++)
        {
            minX = Math.Min(minX, x[i]); maxX = Math.Max(maxX, x[i]);
            minY = Math.Min(minY, y[i]); maxY = Math.Max(maxY, y[i]);
        }
        double scale = (1 << 20) / Math.Max(Math.Max(maxX - minX, maxY - minY), double.Epsilon);
        var keys = new ulong[n];
        for (int i = 0; i < n; i++)
        {
            uint qx = (uint)Math.Min((1 << 20) - 1, (x[i] - minX) * scale);
            uint qy = (uint)Math.Min((1 << 20) - 1, (y[i] - minY) * scale);
            keys[i] = Spread(qx) | (Spread(qy) << 1); // 40-bit Morton key, y in the odd bits
        }
        // LSD radix sort, 8 bits per pass: O(n) and stable, so equal keys keep the vertex order (deterministic).
        var tmpOrder = new int[n];
        var count = new int[257];
        for (int shift = 0; shift < 40; shift += 8)
        {
            Array.Clear(count);
            for (int k = 0; k < n; k++) count[(int)((keys[order[k]] >> shift) & 0xFF) + 1]++;
            for (int b = 0; b < 256; b++) count[b + 1] += count[b];
            for (int k = 0; k < n; k++)
            {
                int v = order[k];
                tmpOrder[count[(int)((keys[v] >> shift) & 0xFF)]++] = v;
            }
            (order, tmpOrder) = (tmpOrder, order);
        }
        return order;
    }

    private static ulong Spread(uint v)
    {
        ulong w = v & 0xFFFFF;
        w = (w | (w << 16)) & 0x0000FFFF0000FFFFUL;
        w = (w | (w << 8)) & 0x00FF00FF00FF00FFUL;
        w = (w | (w << 4)) & 0x0F0F0F0F0F0F0F0FUL;
        w = (w | (w << 2)) & 0x3333333333333333UL;
        w = (w | (w << 1)) & 0x5555555555555555UL;
        return w;
    }

    /// <summary>
    /// Every connected piece of the mesh (triangles sharing vertices, plus merged vertices) must reach a vertex of
    /// known potential; otherwise its potential is undetermined and the matrix singular. Reported with a place.
    /// </summary>
    private static void CheckEveryPieceIsAnchored(CompiledProblem cp, int[] parent, int[] dofOfNode)
    {
        var tri = cp.Mesh.Triangles;
        for (int t = 0; t < cp.Mesh.TriangleCount; t++)
        {
            Union(parent, tri[3 * t], tri[3 * t + 1]);
            Union(parent, tri[3 * t], tri[3 * t + 2]);
        }
        int n = dofOfNode.Length;
        var anchored = new bool[n];
        for (int i = 0; i < n; i++)
        {
            if (dofOfNode[i] < 0) anchored[Find(parent, i)] = true;
        }
        for (int i = 0; i < n; i++)
        {
            if (!anchored[Find(parent, i)])
            {
                throw new FieldProblemException(string.Create(System.Globalization.CultureInfo.InvariantCulture,
                    $"The part of the mesh around ({cp.Mesh.X[i]:G6} m, {cp.Mesh.Y[i]:G6} m) touches no conductor of known potential, no enclosure and no open boundary, so its potential is undetermined: connect it to the rest of the design or give it a fixed-potential boundary."));
            }
        }
    }

    private static int Find(int[] parent, int i)
    {
        while (parent[i] != i)
        {
            parent[i] = parent[parent[i]];
            i = parent[i];
        }
        return i;
    }

    private static void Union(int[] parent, int a, int b)
    {
        int ra = Find(parent, a), rb = Find(parent, b);
        if (ra == rb) return;
        if (ra < rb) parent[rb] = ra;
        else parent[ra] = rb;
    }
}
