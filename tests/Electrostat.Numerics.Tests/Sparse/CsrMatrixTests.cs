using Electrostat.Numerics.Sparse;
using MathNet.Numerics.LinearAlgebra;

namespace Electrostat.Numerics.Tests.Sparse;

public class CsrMatrixTests
{
    [Fact]
    public void FromTriplets_SumsDuplicates_AndSortsColumns()
    {
        var a = CsrMatrix.FromTriplets(3, 3, [(0, 2, 1.0), (0, 0, 2.0), (0, 2, 3.0), (2, 1, -1.0)]);
        Assert.Equal(3, a.NonZeroCount);
        Assert.Equal(2.0, a[0, 0]);
        Assert.Equal(4.0, a[0, 2]);
        Assert.Equal(-1.0, a[2, 1]);
        Assert.Equal(0.0, a[1, 1]);
        Assert.Equal([0, 2, 2, 3], a.RowPointers);
    }

    [Fact]
    public void Construct_UnsortedColumns_Throws()
    {
        var ex = Assert.Throws<ArgumentException>(() => new CsrMatrix(1, 3, [0, 2], [2, 1], [1.0, 1.0]));
        Assert.Contains("row 0", ex.Message);
    }

    [Theory]
    [InlineData(50)]
    [InlineData(400)]
    public void Multiply_MatchesDenseProduct(int n)
    {
        // Reference: MathNet.Numerics dense matrix-vector product. n = 400 with the 5-point matrix of a 20x20 grid
        // has 1,920 entries; the 5-point matrix of 220x220 below exercises the parallel path.
        var a = TestProblems.RandomSpd(n, 0.05, seed: n);
        var x = TestProblems.RandomVector(n, 3);
        var y = new double[n];
        a.Multiply(x, y);
        var expected = a.ToDense() * Vector<double>.Build.DenseOfArray(x);
        for (int i = 0; i < n; i++)
        {
            Assert.Equal(expected[i], y[i], 1e-12);
        }
    }

    [Fact]
    public void Multiply_Parallel_MatchesSerial()
    {
        var a = TestProblems.FivePoint(220);
        Assert.True(a.NonZeroCount > 200_000);
        var x = TestProblems.RandomVector(a.Rows, 5);
        var y1 = new double[a.Rows];
        var y2 = new double[a.Rows];
        a.Multiply(x, y1);
        a.MultiplySerial(x, y2);
        Assert.Equal(y2, y1);
    }

    [Fact]
    public void Transpose_OfRectangular_MatchesDenseTranspose()
    {
        var a = CsrMatrix.FromTriplets(2, 4, [(0, 3, 1.0), (1, 0, 2.0), (1, 3, 5.0), (0, 1, -4.0)]);
        var t = a.Transpose();
        t.Validate();
        Assert.Equal(a.ToDense().Transpose(), t.ToDense());
        var x = new double[] { 1, 2 };
        var y = new double[4];
        a.MultiplyTransposed(x, y);
        Assert.Equal(new double[] { 4, -4, 0, 11 }, y);
    }

    [Fact]
    public void Residual_IsRightHandSideMinusProduct()
    {
        var a = TestProblems.FivePoint(4);
        var x = TestProblems.RandomVector(16, 1);
        var b = TestProblems.RandomVector(16, 2);
        var r = new double[16];
        var ax = new double[16];
        a.Residual(b, x, r);
        a.Multiply(x, ax);
        for (int i = 0; i < 16; i++)
        {
            Assert.Equal(b[i] - ax[i], r[i], 1e-14);
        }
    }

    [Fact]
    public void RelativeAsymmetry_DetectsUnsymmetricEntry()
    {
        Assert.Equal(0.0, TestProblems.FivePoint(5).RelativeAsymmetry());
        var a = CsrMatrix.FromTriplets(2, 2, [(0, 0, 2.0), (0, 1, -1.0), (1, 0, -0.5), (1, 1, 2.0)]);
        Assert.Equal(0.25, a.RelativeAsymmetry(), 1e-15);
    }
}
