using Electrostat.Numerics.Sparse;

namespace Electrostat.Numerics.Solvers;

/// <summary>M = diag(A): the diagonal (Jacobi) preconditioner. Cheap, but its CG iteration count grows like 1/h.</summary>
public sealed class JacobiPreconditioner : IPreconditioner
{
    private readonly double[] _inverseDiagonal;

    /// <summary>Builds the preconditioner from the diagonal of <paramref name="matrix"/>, which must be positive.</summary>
    public JacobiPreconditioner(CsrMatrix matrix)
    {
        ArgumentNullException.ThrowIfNull(matrix);
        var d = matrix.Diagonal();
        _inverseDiagonal = new double[d.Length];
        for (int i = 0; i < d.Length; i++)
        {
            if (!(d[i] > 0))
            {
                throw new ArgumentException($"Diagonal entry {i} is {d[i]}; an SPD matrix needs a positive diagonal.", nameof(matrix));
            }
            _inverseDiagonal[i] = 1.0 / d[i];
        }
    }

    /// <inheritdoc />
    public int Size => _inverseDiagonal.Length;

    /// <inheritdoc />
    public void Apply(double[] r, double[] z)
    {
        for (int i = 0; i < _inverseDiagonal.Length; i++)
        {
            z[i] = r[i] * _inverseDiagonal[i];
        }
    }
}
