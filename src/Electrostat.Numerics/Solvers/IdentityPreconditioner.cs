namespace Electrostat.Numerics.Solvers;

/// <summary>M = I: turns preconditioned CG into plain CG (useful as a reference in tests).</summary>
/// <param name="size">Vector length.</param>
public sealed class IdentityPreconditioner(int size) : IPreconditioner
{
    /// <inheritdoc />
    public int Size { get; } = size;

    /// <inheritdoc />
    public void Apply(double[] r, double[] z) => Array.Copy(r, z, Size);
}
