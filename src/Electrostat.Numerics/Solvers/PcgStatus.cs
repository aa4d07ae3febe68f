namespace Electrostat.Numerics.Solvers;

/// <summary>How a conjugate-gradient solve ended.</summary>
public enum PcgStatus
{
    /// <summary>The relative residual reached the tolerance.</summary>
    Converged,

    /// <summary>The iteration limit was reached first; the solution is the last iterate.</summary>
    MaxIterationsReached,

    /// <summary>
    /// pᵀAp or rᵀM⁻¹r was not positive: the matrix or the preconditioner is not SPD (or the system is singular
    /// and the right-hand side is outside its range). The solution is the last iterate.
    /// </summary>
    Breakdown,
}
