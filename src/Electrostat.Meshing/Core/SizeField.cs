using Electrostat.Meshing.Input;

namespace Electrostat.Meshing.Core;

/// <summary>
/// Target edge length h(x, y), metres: the minimum of the global limit, the region limit, the user's size
/// function and the automatic grading size.
/// </summary>
/// <remarks>
/// Automatic grading: each input vertex v gets a local feature size lfs(v), the distance to the nearest other input
/// vertex or to the nearest input segment not incident to v (Ruppert's local feature size, evaluated at input
/// vertices). The grading size is g(x) = min over v of lfs(v) + k·|x − v| with k = GradingRatio − 1. It is stored on
/// a uniform background grid, initialised exactly near each vertex and propagated by a two-pass chamfer distance
/// transform (Borgefors 1986, "Distance transformations in digital images"), then read by bilinear interpolation.
/// The chamfer distance overestimates Euclidean distance by at most about 8%, so grading is slightly gentler than
/// requested, never steeper.
/// </remarks>
internal sealed class SizeField
{
    private readonly double _global;
    private readonly double[] _regionSize;
    private readonly Func<double, double, double>? _user;
    private readonly double[]? _grid;
    private readonly int _nx, _ny;
    private readonly double _x0, _y0, _cell, _slope;

    internal SizeField(PlanarGraph graph, MeshOptions options)
    {
        _global = options.MaxEdgeLengthMetres ?? double.PositiveInfinity;
        _regionSize = new double[graph.Regions.Count];
        for (int r = 0; r < _regionSize.Length; r++) _regionSize[r] = graph.Regions[r].MaxEdgeLengthMetres ?? double.PositiveInfinity;
        _user = options.SizeFunction;
        if (options.GradingRatio is { } g && graph.VertexCount >= 2)
        {
            _slope = g - 1.0;
            double[] lfs = LocalFeatureSizes(graph);
            double minX = double.MaxValue, minY = double.MaxValue, maxX = double.MinValue, maxY = double.MinValue;
            for (int i = 0; i < graph.VertexCount; i++)
            {
                minX = Math.Min(minX, graph.X[i]); maxX = Math.Max(maxX, graph.X[i]);
                minY = Math.Min(minY, graph.Y[i]); maxY = Math.Max(maxY, graph.Y[i]);
            }
            double span = Math.Max(maxX - minX, maxY - minY);
            if (span > 0)
            {
                const int Cells = 512;
                _cell = span / Cells;
                _nx = (int)Math.Ceiling((maxX - minX) / _cell) + 1;
                _ny = (int)Math.Ceiling((maxY - minY) / _cell) + 1;
                _x0 = minX;
                _y0 = minY;
                _grid = BuildGrid(graph, lfs);
            }
        }
    }

    /// <summary>Target edge length at (x, y), metres, for a triangle of region seed <paramref name="region"/> (-1 for none).</summary>
    internal double At(double x, double y, int region)
    {
        double h = _global;
        if (region >= 0 && _regionSize[region] < h) h = _regionSize[region];
        if (_user is not null)
        {
            double u = _user(x, y);
            if (!(u > 0)) throw new ArgumentException($"The size function returned {u} m at ({PlanarGraph.Fmt(x)}, {PlanarGraph.Fmt(y)}) m; it must be positive.");
            if (u < h) h = u;
        }
        if (_grid is not null)
        {
            double g = Grading(x, y);
            if (g < h) h = g;
        }
        return h;
    }

    internal bool HasSizeLimit => _grid is not null || _user is not null || !double.IsPositiveInfinity(_global) || _regionSize.Any(double.IsFinite);

    private double Grading(double x, double y)
    {
        double fx = (x - _x0) / _cell, fy = (y - _y0) / _cell;
        double extra = 0;
        // Outside the grid: clamp and add the distance, which keeps g a valid cone bound.
        double cfx = Math.Clamp(fx, 0, _nx - 1), cfy = Math.Clamp(fy, 0, _ny - 1);
        if (cfx != fx || cfy != fy) extra = _slope * _cell * Math.Sqrt((cfx - fx) * (cfx - fx) + (cfy - fy) * (cfy - fy));
        int i = Math.Min((int)cfx, _nx - 2), j = Math.Min((int)cfy, _ny - 2);
        if (_nx < 2 || _ny < 2) return _grid![0] + extra;
        double s = cfx - i, t = cfy - j;
        int k = j * _nx + i;
        double g00 = _grid![k], g10 = _grid[k + 1], g01 = _grid[k + _nx], g11 = _grid[k + _nx + 1];
        return (1 - t) * ((1 - s) * g00 + s * g10) + t * ((1 - s) * g01 + s * g11) + extra;
    }

    private double[] BuildGrid(PlanarGraph graph, double[] lfs)
    {
        var grid = new double[_nx * _ny];
        Array.Fill(grid, double.PositiveInfinity);
        for (int v = 0; v < graph.VertexCount; v++)
        {
            double fx = (graph.X[v] - _x0) / _cell, fy = (graph.Y[v] - _y0) / _cell;
            int ci = (int)fx, cj = (int)fy;
            for (int j = Math.Max(0, cj - 1); j <= Math.Min(_ny - 1, cj + 2); j++)
            {
                for (int i = Math.Max(0, ci - 1); i <= Math.Min(_nx - 1, ci + 2); i++)
                {
                    double dx = i - fx, dy = j - fy;
                    double val = lfs[v] + _slope * _cell * Math.Sqrt(dx * dx + dy * dy);
                    int k = j * _nx + i;
                    if (val < grid[k]) grid[k] = val;
                }
            }
        }
        double a = _slope * _cell, d = _slope * _cell * Math.Sqrt(2.0);
        for (int j = 0; j < _ny; j++)
        {
            for (int i = 0; i < _nx; i++)
            {
                int k = j * _nx + i;
                double g = grid[k];
                if (i > 0) g = Math.Min(g, grid[k - 1] + a);
                if (j > 0)
                {
                    g = Math.Min(g, grid[k - _nx] + a);
                    if (i > 0) g = Math.Min(g, grid[k - _nx - 1] + d);
                    if (i < _nx - 1) g = Math.Min(g, grid[k - _nx + 1] + d);
                }
                grid[k] = g;
            }
        }
        for (int j = _ny - 1; j >= 0; j--)
        {
            for (int i = _nx - 1; i >= 0; i--)
            {
                int k = j * _nx + i;
                double g = grid[k];
                if (i < _nx - 1) g = Math.Min(g, grid[k + 1] + a);
                if (j < _ny - 1)
                {
                    g = Math.Min(g, grid[k + _nx] + a);
                    if (i < _nx - 1) g = Math.Min(g, grid[k + _nx + 1] + d);
                    if (i > 0) g = Math.Min(g, grid[k + _nx - 1] + d);
                }
                grid[k] = g;
            }
        }
        return grid;
    }

    /// <summary>
    /// lfs at each input vertex: distance to the nearest other vertex or non-incident segment, metres. Uses a uniform
    /// bucket grid (about one vertex per cell) and searches rings of cells outwards until the ring is farther than
    /// the best distance found, so the cost is near-linear for evenly spread inputs.
    /// </summary>
    internal static double[] LocalFeatureSizes(PlanarGraph graph)
    {
        int n = graph.VertexCount, m = graph.Segments.Count;
        var lfs = new double[n];
        Array.Fill(lfs, double.PositiveInfinity);
        var xs = graph.X.ToArray();
        var ys = graph.Y.ToArray();
        var sa = new int[m];
        var sb = new int[m];
        for (int s = 0; s < m; s++)
        {
            sa[s] = graph.Segments[s].A;
            sb[s] = graph.Segments[s].B;
            double len = Math.Sqrt(Sq(xs[sa[s]] - xs[sb[s]]) + Sq(ys[sa[s]] - ys[sb[s]]));
            lfs[sa[s]] = Math.Min(lfs[sa[s]], len);
            lfs[sb[s]] = Math.Min(lfs[sb[s]], len);
        }
        if (n < 2) return FillIsolated(lfs);
        double minX = xs.Min(), maxX = xs.Max(), minY = ys.Min(), maxY = ys.Max();
        double span = Math.Max(maxX - minX, maxY - minY);
        if (!(span > 0)) return FillIsolated(lfs);
        int side = Math.Clamp((int)Math.Sqrt(n), 1, 2048);
        double cell = span / side * (1 + 1e-9);
        int nx = Math.Max(1, (int)((maxX - minX) / cell) + 1), ny = Math.Max(1, (int)((maxY - minY) / cell) + 1);
        int Cx(double x) => Math.Clamp((int)((x - minX) / cell), 0, nx - 1);
        int Cy(double y) => Math.Clamp((int)((y - minY) / cell), 0, ny - 1);

        // Compressed bucket lists: vertices by their cell, segments by every cell their bounding box touches.
        var vStart = new int[nx * ny + 1];
        for (int v = 0; v < n; v++) vStart[Cy(ys[v]) * nx + Cx(xs[v]) + 1]++;
        for (int k = 0; k < nx * ny; k++) vStart[k + 1] += vStart[k];
        var vItems = new int[n];
        var fill = (int[])vStart.Clone();
        for (int v = 0; v < n; v++) vItems[fill[Cy(ys[v]) * nx + Cx(xs[v])]++] = v;
        var sStart = new int[nx * ny + 1];
        void ForCells(int s, Action<int> act)
        {
            int x0 = Cx(Math.Min(xs[sa[s]], xs[sb[s]])), x1 = Cx(Math.Max(xs[sa[s]], xs[sb[s]]));
            int y0 = Cy(Math.Min(ys[sa[s]], ys[sb[s]])), y1 = Cy(Math.Max(ys[sa[s]], ys[sb[s]]));
            for (int j = y0; j <= y1; j++) for (int i = x0; i <= x1; i++) act(j * nx + i);
        }
        for (int s = 0; s < m; s++) ForCells(s, k => sStart[k + 1]++);
        for (int k = 0; k < nx * ny; k++) sStart[k + 1] += sStart[k];
        var sItems = new int[sStart[nx * ny]];
        var sFill = (int[])sStart.Clone();
        for (int s = 0; s < m; s++) { int ss = s; ForCells(s, k => sItems[sFill[k]++] = ss); }

        var seen = new int[m];
        int stamp = 0;
        for (int v = 0; v < n; v++)
        {
            double x = xs[v], y = ys[v];
            double best2 = lfs[v] * lfs[v];
            int ci = Cx(x), cj = Cy(y);
            stamp++;
            int maxRing = Math.Max(nx, ny);
            for (int r = 0; r <= maxRing; r++)
            {
                // Everything within distance r·cell of v lies in rings 0..r, so stop once that covers the best.
                if (r > 0 && Sq((r - 1) * cell) >= best2) break;
                for (int j = cj - r; j <= cj + r; j++)
                {
                    if (j < 0 || j >= ny) continue;
                    bool edgeRow = j == cj - r || j == cj + r;
                    for (int i = ci - r; i <= ci + r; i += edgeRow ? 1 : 2 * r)
                    {
                        if (i >= 0 && i < nx)
                        {
                            int k = j * nx + i;
                            for (int q = vStart[k]; q < vStart[k + 1]; q++)
                            {
                                int w = vItems[q];
                                if (w == v) continue;
                                double d2 = Sq(xs[w] - x) + Sq(ys[w] - y);
                                if (d2 < best2) best2 = d2;
                            }
                            for (int q = sStart[k]; q < sStart[k + 1]; q++)
                            {
                                int s = sItems[q];
                                if (seen[s] == stamp || sa[s] == v || sb[s] == v) continue;
                                seen[s] = stamp;
                                double ax = xs[sa[s]], ay = ys[sa[s]], dx = xs[sb[s]] - ax, dy = ys[sb[s]] - ay;
                                double t = Math.Clamp(((x - ax) * dx + (y - ay) * dy) / (dx * dx + dy * dy), 0, 1);
                                double d2 = Sq(ax + t * dx - x) + Sq(ay + t * dy - y);
                                if (d2 < best2) best2 = d2;
                            }
                        }
                        if (r == 0) break;
                    }
                }
            }
            lfs[v] = Math.Sqrt(best2);
        }
        return FillIsolated(lfs);
    }

    private static double[] FillIsolated(double[] lfs)
    {
        for (int i = 0; i < lfs.Length; i++) if (double.IsPositiveInfinity(lfs[i])) lfs[i] = double.MaxValue / 4;
        return lfs;
    }

    private static double Sq(double v) => v * v;
}
