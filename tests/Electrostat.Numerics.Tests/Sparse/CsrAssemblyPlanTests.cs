using Electrostat.Numerics.Sparse;
using MathNet.Numerics.LinearAlgebra;

namespace Electrostat.Numerics.Tests.Sparse;

public class CsrAssemblyPlanTests
{
    [Theory]
    [InlineData(false)]
    [InlineData(true)]
    public void P1OnRightIsoscelesTriangles_IsTheFivePointStencil(bool alternate)
    {
        // Linear elements on a uniform right-triangle mesh reproduce the 5-point difference stencil (4, −1)
        // exactly: the diagonal couplings cancel. (Strang and Fix, "An Analysis of the Finite Element Method",
        // 1973, §1.3 — section number from memory.)
        int m = 9;
        var grid = JitteredSquare.Create(m, jitter: 0);
        var (x, y) = (grid.X, grid.Y);
        var tri = JitteredSquare.StructuredTriangles(m, alternate);
        var plan = CsrAssemblyPlan.Create(tri, 3, grid.DofOfNode, grid.DofCount);
        var a = plan.Assemble((e, k) => JitteredSquare.P1Stiffness(x, y, tri.AsSpan(3 * e, 3), k));
        a.Validate();
        var expected = TestProblems.FivePoint(m - 1).ToDense();
        Assert.True((a.ToDense() - expected).InfinityNorm() < 1e-13);
    }

    [Fact]
    public void DofMap_MergesAndEliminates_LikeDenseReference()
    {
        // Reference: the definition of assembly, A[d(a), d(b)] += K_e[a, b], done on a dense matrix.
        var rng = new Random(11);
        int nodes = 30, elements = 40, k = 3;
        var conn = new int[elements * k];
        for (int e = 0; e < elements; e++)
        {
            // Three distinct nodes per element.
            var set = new HashSet<int>();
            while (set.Count < k)
            {
                set.Add(rng.Next(nodes));
            }
            set.ToArray().CopyTo(conn, e * k);
        }
        var ke = new double[elements][];
        for (int e = 0; e < elements; e++)
        {
            ke[e] = Enumerable.Range(0, k * k).Select(_ => rng.NextDouble()).ToArray();
        }
        // Nodes 0-4 eliminated, nodes 5-9 merged into one dof (a "floating conductor"), the rest one dof each.
        var map = new int[nodes];
        int dofs = 0;
        for (int i = 0; i < nodes; i++)
        {
            map[i] = i < 5 ? -1 : i < 10 ? 0 : ++dofs;
        }
        dofs++;
        var plan = CsrAssemblyPlan.Create(conn, k, map, dofs);
        var a = plan.CreateMatrix();
        for (int e = 0; e < elements; e++)
        {
            plan.AddElement(a, e, ke[e]);
        }
        var parallel = plan.Assemble((e, dst) => ke[e].CopyTo(dst));
        var dense = Matrix<double>.Build.Dense(dofs, dofs);
        for (int e = 0; e < elements; e++)
        {
            for (int p = 0; p < k; p++)
            {
                for (int q = 0; q < k; q++)
                {
                    int r = map[conn[e * k + p]], c = map[conn[e * k + q]];
                    if (r >= 0 && c >= 0)
                    {
                        dense[r, c] += ke[e][p * k + q];
                    }
                }
            }
        }
        a.Validate();
        Assert.True((a.ToDense() - dense).InfinityNorm() < 1e-13);
        Assert.True((parallel.ToDense() - dense).InfinityNorm() < 1e-13);
    }

    [Fact]
    public void RectangularPlan_BuildsCouplingBlock()
    {
        // Rows: free nodes; columns: eliminated nodes. Entry (free i, fixed j) = Σ_e K_e(i, j), so that
        // b_free −= A_free,fixed · g moves known potentials to the right-hand side.
        int[] conn = [0, 1, 2, 1, 3, 2];
        int[] rowMap = [0, -1, 1, 2];   // node 1 fixed
        int[] colMap = [-1, 0, -1, -1]; // only node 1 as a column
        var plan = CsrAssemblyPlan.Create(conn, 3, rowMap, 3, colMap, 1);
        var c = plan.Assemble((e, k) =>
        {
            for (int t = 0; t < 9; t++)
            {
                k[t] = 10 * e + t;
            }
        });
        Assert.Equal(3, c.Rows);
        Assert.Equal(1, c.Columns);
        Assert.Equal(1.0, c[0, 0]);          // element 0, (node 0, node 1) = local (0,1)
        Assert.Equal(7.0 + 16.0, c[1, 0]);   // node 2: element 0 local (2,1) = 7, element 1 local (2,0) = 10+6
        Assert.Equal(13.0, c[2, 0]);         // node 3: element 1 local (1,0) = 10+3
    }

    [Fact]
    public void Create_NodeOutOfRange_NamesTheElement()
    {
        var ex = Assert.Throws<ArgumentException>(() => CsrAssemblyPlan.Create([0, 1, 7], 3, 3));
        Assert.Contains("Element 0", ex.Message);
    }
}
