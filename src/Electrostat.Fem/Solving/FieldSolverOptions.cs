namespace Electrostat.Fem.Solving;

/// <summary>Options of <see cref="FieldSolver"/> (immutable).</summary>
public sealed record FieldSolverOptions
{
    /// <summary>Conjugate gradients stop when ‖b − K·u‖₂/‖b‖₂ ≤ this value (dimensionless).</summary>
    public double RelativeTolerance { get; init; } = 1e-10;

    /// <summary>Iteration limit of one solve; a solve that reaches it is reported as not converged.</summary>
    public int MaxIterations { get; init; } = 1000;

    /// <summary>Use the algebraic multigrid preconditioner (true) or plain Jacobi scaling (false, for tiny problems and tests).</summary>
    public bool UseMultigrid { get; init; } = true;
}
