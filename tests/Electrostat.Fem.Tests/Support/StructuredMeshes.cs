using Electrostat.Meshing;

namespace Electrostat.Fem.Tests.Support;

/// <summary>
/// Small structured meshes for the verification tests (nodes exactly on circles where the geometry is curved), so
/// the FEM checks do not depend on the mesher.
/// </summary>
internal static class StructuredMeshes
{
    /// <summary>Tags of the rectangle sides.</summary>
    public const int Bottom = 1, Right = 2, Top = 3, Left = 4;

    /// <summary>
    /// A rectangle of nx × ny cells. Criss-cross cells (4 triangles around a centre vertex) make the mesh symmetric
    /// under both mirror lines. Cells where <paramref name="hole"/> returns k ≥ 0 are left out; their edges bordering
    /// kept cells get tag 10 + k. Sides get tags <see cref="Bottom"/>.. <see cref="Left"/>; <paramref name="sideTag"/>
    /// may override the tag of an outer edge (midpoint x, y, default tag) and <paramref name="interiorTag"/> may tag
    /// interior edges (midpoint x, y → tag or −1). Regions come from <paramref name="region"/> at cell centres.
    /// </summary>
    public static TriangleMesh Rectangle(double x0, double x1, double y0, double y1, int nx, int ny,
        Func<double, double, int>? region = null, Func<int, int, int>? hole = null,
        Func<double, double, int, int>? sideTag = null, Func<double, double, int>? interiorTag = null, bool crissCross = true)
    {
        var xs = new List<double>();
        var ys = new List<double>();
        int Grid(int i, int j) => j * (nx + 1) + i;
        for (int j = 0; j <= ny; j++)
        {
            for (int i = 0; i <= nx; i++)
            {
                xs.Add(x0 + (x1 - x0) * i / nx);
                ys.Add(y0 + (y1 - y0) * j / ny);
            }
        }
        var tris = new List<int>();
        var regs = new List<int>();
        var segV = new List<int>();
        var segT = new List<int>();
        int HoleOf(int i, int j) => i < 0 || j < 0 || i >= nx || j >= ny ? -2 : hole?.Invoke(i, j) ?? -1;
        for (int j = 0; j < ny; j++)
        {
            for (int i = 0; i < nx; i++)
            {
                if (HoleOf(i, j) >= 0) continue;
                int a = Grid(i, j), b = Grid(i + 1, j), c = Grid(i + 1, j + 1), d = Grid(i, j + 1);
                double cx = x0 + (x1 - x0) * (i + 0.5) / nx, cy = y0 + (y1 - y0) * (j + 0.5) / ny;
                int r = region?.Invoke(cx, cy) ?? 0;
                if (crissCross)
                {
                    int m = xs.Count;
                    xs.Add(cx);
                    ys.Add(cy);
                    tris.AddRange([a, b, m, b, c, m, c, d, m, d, a, m]);
                    regs.AddRange([r, r, r, r]);
                }
                else
                {
                    tris.AddRange([a, b, c, a, c, d]);
                    regs.AddRange([r, r]);
                }
            }
        }
        void Edge(int p, int q, int tag)
        {
            segV.Add(p);
            segV.Add(q);
            segT.Add(tag);
        }
        // Horizontal edges between cell rows j−1 and j; vertical ones between columns i−1 and i.
        for (int j = 0; j <= ny; j++)
        {
            for (int i = 0; i < nx; i++)
            {
                int below = HoleOf(i, j - 1), above = HoleOf(i, j);
                double mx = x0 + (x1 - x0) * (i + 0.5) / nx, my = y0 + (y1 - y0) * j / ny;
                EdgeBetween(Grid(i, j), Grid(i + 1, j), below, above, mx, my, j == 0 ? Bottom : Top);
            }
        }
        for (int i = 0; i <= nx; i++)
        {
            for (int j = 0; j < ny; j++)
            {
                int leftCell = HoleOf(i - 1, j), rightCell = HoleOf(i, j);
                double mx = x0 + (x1 - x0) * i / nx, my = y0 + (y1 - y0) * (j + 0.5) / ny;
                EdgeBetween(Grid(i, j), Grid(i, j + 1), leftCell, rightCell, mx, my, i == 0 ? Left : Right);
            }
        }
        void EdgeBetween(int p, int q, int h1, int h2, double mx, double my, int side)
        {
            bool k1 = h1 == -1, k2 = h2 == -1;
            if (k1 && k2)
            {
                int t = interiorTag?.Invoke(mx, my) ?? -1;
                if (t >= 0) Edge(p, q, t);
            }
            else if (k1 || k2)
            {
                int other = k1 ? h2 : h1;
                Edge(p, q, other == -2 ? (sideTag?.Invoke(mx, my, side) ?? side) : 10 + other);
            }
        }
        return Compact(xs, ys, tris, regs, segV, segT);
    }

    /// <summary>
    /// The ring a ≤ |p − (cx, cy)| ≤ b swept by a polar grid, or a mapped ring between an inner circle (centre
    /// (d, 0), radius a) and an outer circle (centre 0, radius b) when <paramref name="innerOffset"/> ≠ 0: node (k, j)
    /// = (1 − s)·inner(θ_j) + s·outer(θ_j), s = k/nr (or geometrically graded), so every circle node lies exactly on its circle. Tag 1 inner,
    /// tag 2 outer, region 0.
    /// </summary>
    public static TriangleMesh Annulus(double a, double b, int nr, int ntheta, double innerOffset = 0, bool geometric = false)
    {
        var xs = new List<double>();
        var ys = new List<double>();
        for (int k = 0; k <= nr; k++)
        {
            // Geometric grading puts ring k at radius a·(b/a)^(k/nr) in the concentric case.
            double s = geometric ? (Math.Pow(b / a, (double)k / nr) - 1) / (b / a - 1) : (double)k / nr;
            for (int j = 0; j < ntheta; j++)
            {
                double th = 2 * Math.PI * j / ntheta;
                double xi = innerOffset + a * Math.Cos(th), yi = a * Math.Sin(th);
                double xo = b * Math.Cos(th), yo = b * Math.Sin(th);
                xs.Add((1 - s) * xi + s * xo);
                ys.Add((1 - s) * yi + s * yo);
            }
        }
        int N(int k, int j) => k * ntheta + (j % ntheta);
        var tris = new List<int>();
        for (int k = 0; k < nr; k++)
        {
            for (int j = 0; j < ntheta; j++)
            {
                int p = N(k, j), q = N(k + 1, j), r = N(k + 1, j + 1), s = N(k, j + 1);
                // Alternate diagonals so the grid has no preferred direction.
                if ((k + j) % 2 == 0) tris.AddRange([p, q, r, p, r, s]);
                else tris.AddRange([p, q, s, q, r, s]);
            }
        }
        var segV = new List<int>();
        var segT = new List<int>();
        for (int j = 0; j < ntheta; j++)
        {
            segV.AddRange([N(0, j), N(0, j + 1)]);
            segT.Add(1);
            segV.AddRange([N(nr, j), N(nr, j + 1)]);
            segT.Add(2);
        }
        return Compact(xs, ys, tris, Enumerable.Repeat(0, tris.Count / 3).ToList(), segV, segT);
    }

    /// <summary>
    /// A half ring in the (r, z) half plane about (0, zc): a ≤ ρ ≤ b, polar angle α from −90° to 90°
    /// (r = ρ cos α, z = zc + ρ sin α), radii graded geometrically when <paramref name="geometric"/> is set.
    /// With a = 0 it is a half disk with a single centre vertex. Tags: 1 inner arc, 2 outer arc, 3 axis.
    /// </summary>
    public static TriangleMesh HalfAnnulusRz(double a, double b, int nr, int nalpha, double zc = 0, int region = 0, int tagOffset = 0, bool geometric = false)
    {
        var xs = new List<double>();
        var ys = new List<double>();
        var tris = new List<int>();
        var segV = new List<int>();
        var segT = new List<int>();
        double Radius(int k) => geometric && a > 0 ? a * Math.Pow(b / a, (double)k / nr) : a + (b - a) * k / nr;
        int kStart = 0;
        if (a == 0)
        {
            xs.Add(0);
            ys.Add(zc);
            kStart = 1;
        }
        int Node(int k, int j) => a == 0 ? (k == 0 ? 0 : 1 + (k - 1) * (nalpha + 1) + j) : k * (nalpha + 1) + j;
        for (int k = kStart; k <= nr; k++)
        {
            double rho = Radius(k);
            for (int j = 0; j <= nalpha; j++)
            {
                double al = -Math.PI / 2 + Math.PI * j / nalpha;
                // Exact zeros on the axis, so the axis vertices have r = 0 precisely.
                double r = j == 0 || j == nalpha ? 0 : rho * Math.Cos(al);
                xs.Add(r);
                ys.Add(zc + rho * Math.Sin(al));
            }
        }
        for (int k = 0; k < nr; k++)
        {
            for (int j = 0; j < nalpha; j++)
            {
                if (a == 0 && k == 0)
                {
                    // Fan around the centre: (centre, ring1 j, ring1 j+1) counter-clockwise.
                    tris.AddRange([0, Node(1, j), Node(1, j + 1)]);
                    continue;
                }
                int p = Node(k, j), q = Node(k + 1, j), r = Node(k + 1, j + 1), s = Node(k, j + 1);
                if ((k + j) % 2 == 0) tris.AddRange([p, q, r, p, r, s]);
                else tris.AddRange([p, q, s, q, r, s]);
            }
        }
        for (int j = 0; j < nalpha; j++)
        {
            if (a > 0)
            {
                segV.AddRange([Node(0, j), Node(0, j + 1)]);
                segT.Add(tagOffset + 1);
            }
            segV.AddRange([Node(nr, j), Node(nr, j + 1)]);
            segT.Add(tagOffset + 2);
        }
        for (int k = 0; k < nr; k++)
        {
            segV.AddRange([Node(k, 0), Node(k + 1, 0)]);
            segT.Add(tagOffset + 3);
            segV.AddRange([Node(k, nalpha), Node(k + 1, nalpha)]);
            segT.Add(tagOffset + 3);
        }
        return Compact(xs, ys, tris, Enumerable.Repeat(region, tris.Count / 3).ToList(), segV, segT);
    }

    /// <summary>Places two meshes side by side in one (vertices and triangles renumbered, nothing merged).</summary>
    public static TriangleMesh Union(TriangleMesh m1, TriangleMesh m2)
    {
        int off = m1.VertexCount;
        return new TriangleMesh(
            [.. m1.X, .. m2.X], [.. m1.Y, .. m2.Y],
            [.. m1.Triangles, .. m2.Triangles.Select(v => v + off)],
            [.. m1.TriangleRegion, .. m2.TriangleRegion],
            [.. m1.SegmentVertices, .. m2.SegmentVertices.Select(v => v + off)],
            [.. m1.SegmentTag, .. m2.SegmentTag]);
    }

    /// <summary>Drops vertices no triangle uses (holes) and renumbers.</summary>
    private static TriangleMesh Compact(List<double> xs, List<double> ys, List<int> tris, List<int> regs, List<int> segV, List<int> segT)
    {
        var used = new int[xs.Count];
        Array.Fill(used, -1);
        int n = 0;
        foreach (int v in tris)
        {
            if (used[v] < 0) used[v] = n++;
        }
        var x = new double[n];
        var y = new double[n];
        for (int i = 0; i < xs.Count; i++)
        {
            if (used[i] >= 0) { x[used[i]] = xs[i]; y[used[i]] = ys[i]; }
        }
        return new TriangleMesh(x, y, tris.Select(v => used[v]).ToArray(), regs.ToArray(), segV.Select(v => used[v]).ToArray(), segT.ToArray());
    }
}
