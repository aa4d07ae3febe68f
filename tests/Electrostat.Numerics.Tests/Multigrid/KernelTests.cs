using Electrostat.Numerics.Multigrid;
using Electrostat.Numerics.Sparse;

namespace Electrostat.Numerics.Tests.Multigrid;

public class KernelTests
{
    [Fact]
    public void PackedMatrix_MultipliesLikeTheDoubleMatrixToSinglePrecision()
    {
        var a = TestProblems.JitteredP1(120);
        var packed = new PackedCsr(a);
        var x = TestProblems.RandomVector(a.Rows, 1);
        var y1 = new double[a.Rows];
        var y2 = new double[a.Rows];
        a.Multiply(x, y1);
        packed.Multiply(x, y2);
        double scale = y1.Max(Math.Abs) + 10;
        for (int i = 0; i < a.Rows; i++)
        {
            // float has a 2^-24 ≈ 6e-8 relative rounding per entry; rows have about 7 entries of size ≤ ~10.
            Assert.Equal(y1[i], y2[i], 1e-6 * scale);
        }
    }

    [Fact]
    public void FusedResidualRestriction_EqualsResidualThenTransposeProduct()
    {
        // Reference: r = b − Ã·x computed separately, then Pᵀ·r by an explicit transpose, on the same packed values.
        var a = TestProblems.JitteredP1(130);
        Assert.True(a.NonZeroCount > 40_000);
        int n = a.Rows, coarse = n / 5;
        var rng = new Random(4);
        var t = new List<(int, int, double)>();
        for (int i = 0; i < n; i++)
        {
            t.Add((i, i / 5 % coarse, 1.0));
            t.Add((i, (i / 5 + 1) % coarse, rng.NextDouble()));
        }
        var p = CsrMatrix.FromTriplets(n, coarse, t);
        var packedA = new PackedCsr(a);
        var packedP = new PackedCsr(p);
        var b = TestProblems.RandomVector(n, 2);
        var x = TestProblems.RandomVector(n, 3);
        var partials = Enumerable.Range(0, packedA.Workers).Select(_ => new double[coarse]).ToArray();
        var fused = new double[coarse];
        packedA.ResidualRestrict(b, x, packedP, fused, partials);

        var r = new double[n];
        packedA.Residual(b, x, r);
        var pRounded = new CsrMatrix(n, coarse, p.RowPointers, p.ColumnIndices, p.Values.Select(v => (double)(float)v).ToArray());
        var expected = new double[coarse];
        pRounded.MultiplyTransposed(r, expected);
        for (int j = 0; j < coarse; j++)
        {
            Assert.Equal(expected[j], fused[j], 1e-12 * (1 + Math.Abs(expected[j])));
        }
    }

    [Fact]
    public void HybridGaussSeidel_BackwardSweepIsTheAdjointOfTheForwardSweep()
    {
        // From x = 0 the forward sweep returns M⁻¹b and the backward sweep M⁻ᵀb, so u·(M⁻¹v) = v·(M⁻ᵀu) for all
        // u, v: the property that makes the V-cycle symmetric. Checked on a matrix large enough for several blocks.
        var a = new PackedCsr(TestProblems.JitteredP1(130));
        var gs = new HybridGaussSeidel(a);
        int n = a.Rows;
        var u = TestProblems.RandomVector(n, 5);
        var v = TestProblems.RandomVector(n, 6);
        var mv = new double[n];
        gs.ForwardFromZero(v, mv);
        var mtu = new double[n];
        Array.Clear(mtu);
        gs.Backward(u, mtu);
        double lhs = Electrostat.Numerics.Vectors.VectorKernels.Dot(u, mv);
        double rhs = Electrostat.Numerics.Vectors.VectorKernels.Dot(v, mtu);
        Assert.Equal(lhs, rhs, 1e-12 * Math.Abs(lhs));

        // The general forward sweep from x = 0 agrees with the specialised zero-start sweep.
        var viaGeneral = new double[n];
        gs.Forward(v, viaGeneral);
        for (int i = 0; i < n; i++)
        {
            Assert.Equal(mv[i], viaGeneral[i], 1e-14 * (1 + Math.Abs(mv[i])));
        }
    }
}
