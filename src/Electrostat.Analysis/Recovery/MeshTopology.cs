using System.Diagnostics;
using Electrostat.Meshing;
using Electrostat.Meshing.Designs;

namespace Electrostat.Analysis.Recovery;

/// <summary>
/// Adjacency tables of a design mesh that the analyses share: triangles around each vertex, what each vertex lies on
/// (conductor, enclosure, interface), a local mesh size per vertex, and the triangle beside each constrained edge.
/// </summary>
internal sealed class MeshTopology
{
    public MeshTopology(TriangleMesh mesh, BoundaryTagTable? tags)
    {
        Mesh = mesh;
        int nv = mesh.VertexCount, nt = mesh.TriangleCount;
        var tri = mesh.Triangles;
        VertexTriangleStart = BuildVertexTriangles(nv, tri, out var list);
        VertexTriangles = list;

        LocalSizeMetres = new double[nv];
        var count = new int[nv];
        for (int t = 0; t < nt; t++)
        {
            for (int i = 0; i < 3; i++)
            {
                int a = tri[3 * t + i], b = tri[3 * t + (i + 1) % 3];
                double len = Math.Sqrt(Sq(mesh.X[a] - mesh.X[b]) + Sq(mesh.Y[a] - mesh.Y[b]));
                LocalSizeMetres[a] += len; count[a]++;
                LocalSizeMetres[b] += len; count[b]++;
            }
        }
        for (int v = 0; v < nv; v++) LocalSizeMetres[v] = count[v] > 0 ? LocalSizeMetres[v] / count[v] : 0;

        VertexConductor = new int[nv];
        Array.Fill(VertexConductor, -1);
        VertexOnEnclosure = new bool[nv];
        VertexOnInterface = new bool[nv];
        int ns = mesh.SegmentCount;
        if (tags is not null)
        {
            for (int s = 0; s < ns; s++)
            {
                int tag = mesh.SegmentTag[s];
                if (tag < 1 || tag > tags.Tags.Count) continue;
                var meaning = tags[tag];
                for (int e = 0; e < 2; e++)
                {
                    int v = mesh.SegmentVertices[2 * s + e];
                    switch (meaning.Kind)
                    {
                        case BoundaryKind.Conductor:
                            if (VertexConductor[v] < 0) VertexConductor[v] = meaning.ConductorIndex;
                            break;
                        case BoundaryKind.Enclosure:
                            VertexOnEnclosure[v] = true;
                            break;
                        case BoundaryKind.Interface:
                            VertexOnInterface[v] = true;
                            break;
                    }
                }
            }
        }

        // The triangle on each side of every constrained edge (the edge a→b of a CCW triangle has it on the left).
        SegmentLeftTriangle = new int[ns];
        SegmentRightTriangle = new int[ns];
        Array.Fill(SegmentLeftTriangle, -1);
        Array.Fill(SegmentRightTriangle, -1);
        var index = new Dictionary<long, int>(ns);
        for (int s = 0; s < ns; s++) index[Key(mesh.SegmentVertices[2 * s], mesh.SegmentVertices[2 * s + 1])] = s;
        for (int t = 0; t < nt; t++)
        {
            for (int i = 0; i < 3; i++)
            {
                int a = tri[3 * t + i], b = tri[3 * t + (i + 1) % 3];
                if (!index.TryGetValue(Key(a, b), out int s)) continue;
                if (mesh.SegmentVertices[2 * s] == a) SegmentLeftTriangle[s] = t;
                else SegmentRightTriangle[s] = t;
            }
        }
    }

    public TriangleMesh Mesh { get; }

    /// <summary>CSR start of each vertex's triangle list.</summary>
    public int[] VertexTriangleStart { get; }

    /// <summary>Triangles around each vertex (CSR).</summary>
    public int[] VertexTriangles { get; }

    /// <summary>Mean length of the edges at each vertex, metres.</summary>
    public double[] LocalSizeMetres { get; }

    /// <summary>Design conductor index of a conductor surface through the vertex, or -1.</summary>
    public int[] VertexConductor { get; }

    /// <summary>True when the vertex lies on the enclosure wall (not a symmetry plane or axis).</summary>
    public bool[] VertexOnEnclosure { get; }

    /// <summary>True when the vertex lies on a material interface.</summary>
    public bool[] VertexOnInterface { get; }

    /// <summary>Triangle to the left of segment s walked from its first to its second vertex, or -1.</summary>
    public int[] SegmentLeftTriangle { get; }

    /// <summary>Triangle to the right of segment s, or -1.</summary>
    public int[] SegmentRightTriangle { get; }

    public ReadOnlySpan<int> TrianglesAround(int v) =>
        VertexTriangles.AsSpan(VertexTriangleStart[v], VertexTriangleStart[v + 1] - VertexTriangleStart[v]);

    private static int[] BuildVertexTriangles(int nv, int[] tri, out int[] list)
    {
        var start = new int[nv + 1];
        foreach (int v in tri) start[v + 1]++;
        for (int v = 0; v < nv; v++) start[v + 1] += start[v];
        list = new int[tri.Length];
        var fill = (int[])start.Clone();
        for (int c = 0; c < tri.Length; c++) list[fill[tri[c]]++] = c / 3;
        Debug.Assert(fill[nv - 1] == start[nv], "every corner placed");
        return start;
    }

    private static long Key(int a, int b) => a < b ? ((long)a << 32) | (uint)b : ((long)b << 32) | (uint)a;

    private static double Sq(double v) => v * v;
}
