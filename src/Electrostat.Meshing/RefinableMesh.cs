using Electrostat.Meshing.Core;
using Electrostat.Meshing.Input;
using Electrostat.Meshing.Output;

namespace Electrostat.Meshing;

/// <summary>
/// A quality mesh that can be refined further in place (for adaptive FEM) and exported any number of times.
/// </summary>
/// <remarks>
/// Index mapping: triangle i of an exported <see cref="TriangleMesh"/> is internal triangle slot i, so indices from
/// the latest export can be passed straight to <see cref="RefineTriangles(IEnumerable{int})"/>. Refinement reuses the slots of the
/// triangles it replaces and appends new ones, so after refining, an old index may name a different triangle: always
/// export again. Vertices are never removed or reordered; exported vertex indices are the internal ones with unused
/// vertices (input vertices outside the domain, the enclosing triangle) left out, so an exported vertex index stays
/// valid across later exports. The mesh stays conforming, constrained Delaunay and within the quality bound
/// (except reported skipped triangles) after every refinement.
/// </remarks>
public sealed class RefinableMesh
{
    private readonly MeshCore _core;
    private readonly PlanarGraph _graph;
    private MeshOptions _options;
    private int _version;

    private RefinableMesh(MeshCore core, PlanarGraph graph, MeshOptions options)
    {
        _core = core;
        _graph = graph;
        _options = options;
    }

    /// <summary>Validates the graph, builds its constrained Delaunay triangulation and refines it to the options.</summary>
    /// <param name="graph">Input graph (metres).</param>
    /// <param name="options">Quality and size options; null for defaults (28°, no size limit, grading 1.5).</param>
    /// <returns>The refinable mesh.</returns>
    /// <exception cref="MeshInputException">The graph has a user-fixable problem (message names the place).</exception>
    /// <exception cref="MeshBudgetExceededException">The mesh would exceed <see cref="MeshOptions.MaxTriangles"/>.</exception>
    public static RefinableMesh Create(PlanarGraph graph, MeshOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(graph);
        options ??= new MeshOptions();
        options.Check();
        graph.Validate();
        var core = MeshCore.BuildConstrainedDelaunay(graph);
        var mesh = new RefinableMesh(core, graph, options);
        core.ConfigureRefinement(graph, options, new SizeField(graph, options));
        core.RefineAll();
        return mesh;
    }

    /// <summary>Current number of triangles.</summary>
    public int TriangleCount => _core.NT;

    /// <summary>The options in force (changes after <see cref="RefineToSize"/>).</summary>
    public MeshOptions Options => _options;

    /// <summary>Splits the given triangles (indices of the latest export) and restores the quality bound around them.</summary>
    /// <param name="triangles">Triangle indices to split.</param>
    public void RefineTriangles(IEnumerable<int> triangles)
    {
        ArgumentNullException.ThrowIfNull(triangles);
        _version++;
        _core.RefineTriangles(triangles);
    }

    /// <summary>
    /// Splits the given triangles, then <paramref name="passes"/> − 1 more times every triangle touching a vertex that
    /// the previous pass inserted (a marked region grows about 1.7× per pass), restoring the quality bound each time.
    /// </summary>
    /// <param name="triangles">Triangle indices of the latest export to split.</param>
    /// <param name="passes">Number of passes (1 is <see cref="RefineTriangles(IEnumerable{int})"/>).</param>
    public void RefineTriangles(IEnumerable<int> triangles, int passes)
    {
        ArgumentNullException.ThrowIfNull(triangles);
        ArgumentOutOfRangeException.ThrowIfLessThan(passes, 1);
        _version++;
        _core.RefineTriangles(triangles, passes);
    }

    /// <summary>
    /// Refines in place so that edges are no longer than <paramref name="sizeFunction"/>(x, y) metres (combined with the
    /// existing limits by taking the smaller). Nothing is coarsened.
    /// </summary>
    /// <param name="sizeFunction">New target edge length h(x, y), metres.</param>
    public void RefineToSize(Func<double, double, double> sizeFunction)
    {
        ArgumentNullException.ThrowIfNull(sizeFunction);
        var old = _options.SizeFunction;
        Func<double, double, double> combined = old is null ? sizeFunction : (x, y) => Math.Min(old(x, y), sizeFunction(x, y));
        _options = _options with { SizeFunction = combined };
        _version++;
        _core.ConfigureRefinement(_graph, _options, new SizeField(_graph, _options));
        _core.RefineAll();
    }

    /// <summary>Exports the current mesh with provenance maps and quality statistics.</summary>
    /// <returns>The result.</returns>
    public MeshResult Export()
    {
        var c = _core;
        int nt = c.NT;
        var used = new int[c.NV];
        for (int i = 0; i < 3 * nt; i++) used[c.TV[i]] = 1;
        int nv = 0;
        for (int v = 0; v < c.NV; v++) used[v] = used[v] == 1 ? nv++ : -1;
        var x = new double[nv];
        var y = new double[nv];
        var vin = new int[nv];
        var vseg = new int[nv];
        for (int v = 0; v < c.NV; v++)
        {
            int e = used[v];
            if (e < 0) continue;
            x[e] = c.X[v];
            y[e] = c.Y[v];
            vin[e] = v < c.InputVertexCount ? v : -1;
            vseg[e] = c.VKind[v] == MeshCore.KindSegment ? c.VSeg[v] : -1;
        }
        var tri = new int[3 * nt];
        var reg = new int[nt];
        int nseg = 0;
        for (int t = 0; t < nt; t++)
        {
            for (int i = 0; i < 3; i++)
            {
                int code = 3 * t + i;
                tri[code] = used[c.TV[code]];
                if (c.TS[code] >= 0 && (c.TN[code] < 0 || c.TN[code] > code)) nseg++;
            }
            int r = c.TReg[t];
            reg[t] = r >= 0 ? _graph.Regions[r].Attribute : 0;
        }
        var segV = new int[2 * nseg];
        var segTag = new int[nseg];
        var segIn = new int[nseg];
        int k = 0;
        for (int code = 0; code < 3 * nt; code++)
        {
            if (c.TS[code] < 0 || (c.TN[code] >= 0 && c.TN[code] < code)) continue;
            int t = code / 3, i = code % 3;
            segV[2 * k] = used[c.TV[3 * t + (i + 1) % 3]];
            segV[2 * k + 1] = used[c.TV[3 * t + (i + 2) % 3]];
            segIn[k] = c.TS[code];
            segTag[k] = _graph.Segments[c.TS[code]].Tag;
            k++;
        }
        var mesh = new TriangleMesh(x, y, tri, reg, segV, segTag);
        var below = new List<(int Triangle, double MinAngle)>();
        var quality = MeshQuality.Of(mesh, _options.MinAngleDegrees, below);
        var skipped = below.Select(b => new SkippedTriangle(b.Triangle, b.MinAngle, (SkipCause)c.TSkip[b.Triangle])).ToArray();
        int version = _version;
        return new MeshResult(mesh, _graph, _options, vin, vseg, segIn, skipped, quality,
            () => version == _version ? c.CheckTopology() : null);
    }

    /// <summary>Counts of refinement steps that were skipped, by cause (diagnostics).</summary>
    /// <returns>Small-angle, protected-segment, tiny-feature and degenerate skip counts.</returns>
    public (int SmallInputAngle, int ProtectedSegment, int TinyFeature, int Degenerate) SkipCounts() =>
        (_core.SkipSmallAngle, _core.SkipProtected, _core.SkipTiny, _core.SkipDegenerate);
}
