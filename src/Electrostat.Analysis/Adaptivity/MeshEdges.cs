using Electrostat.Meshing;

namespace Electrostat.Analysis.Adaptivity;

/// <summary>
/// Edge adjacency of a <see cref="TriangleMesh"/>: for every triangle edge, the triangle edge on the other side and
/// the segment tag the edge lies on.
/// </summary>
/// <remarks>
/// Edge code 3·t + i is the edge of triangle t opposite its vertex i, from vertex (i + 1) mod 3 to (i + 2) mod 3
/// (counter-clockwise about t, so the outward normal is the edge direction turned clockwise).
/// </remarks>
public sealed class MeshEdges
{
    private MeshEdges(int[] neighbour, int[] tag)
    {
        Neighbour = neighbour;
        Tag = tag;
    }

    /// <summary>For each edge code, the edge code of the same edge in the neighbouring triangle, or -1 on the mesh boundary.</summary>
    public int[] Neighbour { get; }

    /// <summary>For each edge code, the segment tag of the constrained edge it lies on, or 0 when it is unconstrained.</summary>
    public int[] Tag { get; }

    /// <summary>Builds the adjacency by sorting the edges by their vertex pair (O(n log n), no hashing).</summary>
    /// <param name="mesh">The mesh.</param>
    /// <returns>The adjacency.</returns>
    public static MeshEdges Build(TriangleMesh mesh)
    {
        ArgumentNullException.ThrowIfNull(mesh);
        int nt = mesh.TriangleCount;
        var tv = mesh.Triangles;
        var keys = new long[3 * nt];
        var codes = new int[3 * nt];
        for (int t = 0; t < nt; t++)
        {
            for (int i = 0; i < 3; i++)
            {
                int code = 3 * t + i;
                keys[code] = Key(tv[3 * t + (i + 1) % 3], tv[3 * t + (i + 2) % 3]);
                codes[code] = code;
            }
        }
        Array.Sort(keys, codes);
        var neighbour = new int[3 * nt];
        Array.Fill(neighbour, -1);
        for (int k = 0; k + 1 < keys.Length; k++)
        {
            if (keys[k] != keys[k + 1]) continue;
            neighbour[codes[k]] = codes[k + 1];
            neighbour[codes[k + 1]] = codes[k];
            k++;
        }
        var tag = new int[3 * nt];
        var sv = mesh.SegmentVertices;
        for (int s = 0; s < mesh.SegmentCount; s++)
        {
            int pos = Array.BinarySearch(keys, Key(sv[2 * s], sv[2 * s + 1]));
            if (pos < 0) continue;
            while (pos > 0 && keys[pos - 1] == keys[pos]) pos--;
            for (; pos < keys.Length && keys[pos] == Key(sv[2 * s], sv[2 * s + 1]); pos++) tag[codes[pos]] = mesh.SegmentTag[s];
        }
        return new MeshEdges(neighbour, tag);
    }

    private static long Key(int a, int b) => a < b ? ((long)a << 32) | (uint)b : ((long)b << 32) | (uint)a;
}
