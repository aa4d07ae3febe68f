using System.Diagnostics;
using Electrostat.Numerics.Sparse;
using Electrostat.Numerics.Vectors;

namespace Electrostat.Numerics.Solvers;

/// <summary>
/// Preconditioned conjugate gradients for a symmetric positive definite A (Hestenes and Stiefel 1952,
/// "Methods of conjugate gradients for solving linear systems", J. Res. NBS 49:409–436; preconditioned form
/// as in Saad, "Iterative Methods for Sparse Linear Systems", 2nd ed. 2003, Algorithm 9.1).
/// </summary>
/// <remarks>
/// Stopping rule: ‖b − A·x‖₂ ≤ tol·‖b‖₂. When the recursively updated residual meets it, the true residual is
/// recomputed; if rounding has made them drift apart, the iteration restarts from the true residual (at most
/// three times), so a reported convergence is always a verified one. Non-convergence is not an exception:
/// the report says what happened and the caller decides.
/// </remarks>
public static class ConjugateGradient
{
    /// <summary>
    /// Solves A·x = b. On entry <paramref name="x"/> is the initial guess (warm start; pass zeros for none);
    /// on exit it holds the last iterate.
    /// </summary>
    /// <param name="matrix">Square SPD matrix A.</param>
    /// <param name="b">Right-hand side.</param>
    /// <param name="x">Initial guess in, solution out.</param>
    /// <param name="preconditioner">M⁻¹ (SPD), or null for plain CG.</param>
    /// <param name="options">Stopping rule; defaults to relative residual 1e-10.</param>
    public static PcgReport Solve(CsrMatrix matrix, double[] b, double[] x, IPreconditioner? preconditioner = null, PcgOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(matrix);
        ArgumentNullException.ThrowIfNull(b);
        ArgumentNullException.ThrowIfNull(x);
        options ??= new PcgOptions();
        int n = matrix.Rows;
        if (matrix.Columns != n)
        {
            throw new ArgumentException($"CG needs a square matrix (got {matrix.Rows} x {matrix.Columns}).", nameof(matrix));
        }
        if (b.Length != n || x.Length != n)
        {
            throw new ArgumentException($"b and x must have length {n} (got {b.Length}, {x.Length}).");
        }
        if (preconditioner is not null && preconditioner.Size != n)
        {
            throw new ArgumentException($"The preconditioner acts on length {preconditioner.Size}, the matrix has {n} rows.", nameof(preconditioner));
        }
        if (!(options.RelativeTolerance > 0) || options.MaxIterations < 0)
        {
            throw new ArgumentException("RelativeTolerance must be positive and MaxIterations non-negative.", nameof(options));
        }
        preconditioner ??= new IdentityPreconditioner(n);

        var clock = Stopwatch.StartNew();
        var history = new List<double>();
        double bNorm = VectorKernels.Norm2(b);
        if (bNorm == 0)
        {
            // b = 0 has the exact solution x = 0; a relative residual is meaningless, so report zero.
            Array.Clear(x);
            return Report(PcgStatus.Converged, 0, 0, 0, history, clock);
        }

        var r = new double[n];
        var z = new double[n];
        var p = new double[n];
        var q = new double[n];
        matrix.Residual(b, x, r);
        double rel0 = VectorKernels.Norm2(r) / bNorm;
        double tol = options.RelativeTolerance;
        if (rel0 <= tol)
        {
            return Report(PcgStatus.Converged, 0, rel0, rel0, history, clock);
        }

        preconditioner.Apply(r, z);
        Array.Copy(z, p, n);
        double rz = VectorKernels.Dot(r, z);
        int restarts = 0;
        int iteration = 0;
        var status = PcgStatus.MaxIterationsReached;
        double trueRel = rel0;
        bool trueKnown = true;
        while (iteration < options.MaxIterations)
        {
            if (!(rz > 0))
            {
                status = PcgStatus.Breakdown;
                break;
            }
            matrix.Multiply(p, q);
            double pq = VectorKernels.Dot(p, q);
            if (!(pq > 0))
            {
                status = PcgStatus.Breakdown;
                break;
            }
            double alpha = rz / pq;
            double rr = VectorKernels.UpdateSolutionAndResidual(alpha, p, q, x, r);
            iteration++;
            trueKnown = false;
            double rel = Math.Sqrt(rr) / bNorm;
            if (options.RecordHistory)
            {
                history.Add(rel);
            }
            if (rel <= tol)
            {
                matrix.Residual(b, x, r);
                trueRel = VectorKernels.Norm2(r) / bNorm;
                trueKnown = true;
                if (trueRel <= tol)
                {
                    status = PcgStatus.Converged;
                    break;
                }
                if (++restarts > 3)
                {
                    break;
                }
                // Restart from the true residual: the recursion has lost orthogonality to rounding.
                preconditioner.Apply(r, z);
                Array.Copy(z, p, n);
                rz = VectorKernels.Dot(r, z);
                continue;
            }
            preconditioner.Apply(r, z);
            double rzNew = VectorKernels.Dot(r, z);
            double beta = rzNew / rz;
            rz = rzNew;
            VectorKernels.Xpby(z, beta, p);
        }
        if (!trueKnown)
        {
            matrix.Residual(b, x, r);
            trueRel = VectorKernels.Norm2(r) / bNorm;
        }
        return Report(status, iteration, rel0, trueRel, history, clock);
    }

    private static PcgReport Report(PcgStatus status, int iterations, double rel0, double rel, List<double> history, Stopwatch clock) => new()
    {
        Status = status,
        Iterations = iterations,
        InitialRelativeResidual = rel0,
        FinalRelativeResidual = rel,
        ResidualHistory = history,
        Seconds = clock.Elapsed.TotalSeconds,
    };
}
