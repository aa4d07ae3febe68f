namespace Electrostat.Numerics.Solvers;

/// <summary>
/// A symmetric positive definite approximation M⁻¹ of the inverse of a system matrix, applied as
/// z ← M⁻¹·r. Implementations keep internal work vectors, so one instance serves one solve at a time.
/// </summary>
public interface IPreconditioner
{
    /// <summary>Length of the vectors the preconditioner acts on.</summary>
    int Size { get; }

    /// <summary>z ← M⁻¹·r. <paramref name="r"/> is not modified; <paramref name="z"/> is overwritten.</summary>
    void Apply(double[] r, double[] z);
}
