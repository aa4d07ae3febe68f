using Electrostat.Numerics.Sparse;
using MathNet.Numerics.LinearAlgebra;

namespace Electrostat.Numerics.Multigrid;

/// <summary>
/// Exact solve on the coarsest multigrid level: a dense Cholesky factor from MathNet.Numerics, applied by
/// forward and back substitution into preallocated storage. If the coarsest matrix is only semidefinite
/// (a floating problem with no fixed potential), it falls back to the symmetric pseudo-inverse from an
/// eigendecomposition, which keeps the V-cycle symmetric.
/// </summary>
internal sealed class DenseCoarseSolver
{
    private readonly int _n;
    private readonly double[]? _lower;
    private readonly double[]? _pseudoInverse;
    private readonly double[] _y;

    public DenseCoarseSolver(CsrMatrix a)
    {
        _n = a.Rows;
        _y = new double[_n];
        var dense = a.ToDense();
        dense = (dense + dense.Transpose()) * 0.5;
        try
        {
            var factor = dense.Cholesky().Factor;
            // A semidefinite matrix (floating problem: constants in the kernel) can pass the factorisation with a
            // rounding-level pivot; a pivot below 1e-10 of the largest diagonal entry is treated as singular.
            double maxDiagonal = dense.Diagonal().Maximum();
            for (int i = 0; i < _n; i++)
            {
                if (factor[i, i] * factor[i, i] < 1e-10 * maxDiagonal)
                {
                    throw new ArgumentException("Numerically singular coarsest matrix.");
                }
            }
            _lower = new double[_n * _n];
            for (int i = 0; i < _n; i++)
            {
                for (int j = 0; j <= i; j++)
                {
                    _lower[i * _n + j] = factor[i, j];
                }
            }
            Method = "Cholesky";
        }
        catch (ArgumentException)
        {
            var evd = dense.Evd(Symmetricity.Symmetric);
            double max = evd.EigenValues.Enumerate().Max(z => z.Real);
            var values = evd.EigenValues.Map(z => z.Real > 1e-12 * max ? 1.0 / z.Real : 0.0, MathNet.Numerics.LinearAlgebra.Zeros.Include);
            var pinv = evd.EigenVectors * Matrix<double>.Build.DiagonalOfDiagonalVector(values) * evd.EigenVectors.Transpose();
            _pseudoInverse = pinv.ToRowMajorArray();
            Method = "pseudo-inverse";
        }
    }

    /// <summary>"Cholesky" or "pseudo-inverse".</summary>
    public string Method { get; }

    public void Solve(double[] b, double[] x)
    {
        int n = _n;
        if (_lower is not null)
        {
            var l = _lower;
            for (int i = 0; i < n; i++)
            {
                double s = b[i];
                int row = i * n;
                for (int j = 0; j < i; j++)
                {
                    s -= l[row + j] * _y[j];
                }
                _y[i] = s / l[row + i];
            }
            for (int i = n - 1; i >= 0; i--)
            {
                double s = _y[i];
                for (int j = i + 1; j < n; j++)
                {
                    s -= l[j * n + i] * x[j];
                }
                x[i] = s / l[i * n + i];
            }
            return;
        }
        var p = _pseudoInverse!;
        for (int i = 0; i < n; i++)
        {
            double s = 0;
            int row = i * n;
            for (int j = 0; j < n; j++)
            {
                s += p[row + j] * b[j];
            }
            x[i] = s;
        }
    }
}
