using Electrostat.Fem.Problem;
using Electrostat.Meshing;

namespace Electrostat.Bench;

/// <summary>
/// The "solve" suite's design, on a generated (structured, not mesher-made) mesh: a 10 mm square cut into m × m
/// cells of two triangles, interior vertices jittered by up to 20 % of a cell (fixed seed) so the matrix has the
/// irregular values of a real mesh. Bottom edge: grounded enclosure. Top edge: electrode "lid" at 1 kV. A thin plate
/// electrode "plate" at −200 V lies along the middle row from 30 % to 70 % of the width. Sides: symmetry planes.
/// Lower half εr = 4.5, upper half vacuum.
/// </summary>
internal static class SolveBenchProblem
{
    public static ElectrostaticProblem Create(int m)
    {
        const double size = 0.01;
        int n = m + 1;
        var x = new double[n * n];
        var y = new double[n * n];
        var rng = new Random(11);
        int mid = m / 2;
        for (int j = 0; j < n; j++)
        {
            for (int i = 0; i < n; i++)
            {
                double jx = 0, jy = 0;
                if (i > 0 && i < m && j > 0 && j < m && j != mid)
                {
                    jx = 0.2 * (rng.NextDouble() - 0.5);
                    jy = 0.2 * (rng.NextDouble() - 0.5);
                }
                x[j * n + i] = size * (i + jx) / m;
                y[j * n + i] = size * (j + jy) / m;
            }
        }
        var tri = new int[6 * m * m];
        var region = new int[2 * m * m];
        int t = 0;
        for (int j = 0; j < m; j++)
        {
            for (int i = 0; i < m; i++)
            {
                int a = j * n + i, b = a + 1, c = a + n + 1, d = a + n;
                int reg = j < mid ? 1 : 2;
                tri[3 * t] = a; tri[3 * t + 1] = b; tri[3 * t + 2] = c; region[t++] = reg;
                tri[3 * t] = a; tri[3 * t + 1] = c; tri[3 * t + 2] = d; region[t++] = reg;
            }
        }
        var segV = new List<int>();
        var segT = new List<int>();
        for (int i = 0; i < m; i++)
        {
            segV.AddRange([i, i + 1]); segT.Add(1);
            segV.AddRange([m * n + i, m * n + i + 1]); segT.Add(3);
            segV.AddRange([i * n, (i + 1) * n]); segT.Add(4);
            segV.AddRange([i * n + m, (i + 1) * n + m]); segT.Add(2);
            if (i >= 3 * m / 10 && i < 7 * m / 10)
            {
                segV.AddRange([mid * n + i, mid * n + i + 1]); segT.Add(10);
            }
        }
        var mesh = new TriangleMesh(x, y, tri, region, [.. segV], [.. segT]);
        return new ElectrostaticProblem
        {
            Mesh = mesh,
            Conductors = [ConductorDefinition.Fixed("lid", 1000), ConductorDefinition.Fixed("plate", -200)],
            Materials = new Dictionary<int, RegionMaterial> { [1] = RegionMaterial.Dielectric(4.5), [2] = RegionMaterial.Vacuum },
            Boundaries = new Dictionary<int, BoundaryRole>
            {
                [1] = new EnclosureBoundary(), [3] = new ConductorBoundary(0), [10] = new ConductorBoundary(1),
                [2] = new NaturalBoundary(), [4] = new NaturalBoundary(),
            },
        };
    }
}
