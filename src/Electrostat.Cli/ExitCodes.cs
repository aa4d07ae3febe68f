namespace Electrostat.Cli;

/// <summary>Process exit codes of the <c>electrostat</c> command.</summary>
internal static class ExitCodes
{
    /// <summary>The command did its job (for <c>check</c>: the design is valid).</summary>
    public const int Ok = 0;

    /// <summary>An unexpected internal failure (a bug): reported with a short message, never a stack trace.</summary>
    public const int InternalError = 1;

    /// <summary><c>solve</c>: the computation ran but a margin or clearance check failed.</summary>
    public const int ChecksFailed = 1;

    /// <summary>The solver failed (a linear solve did not converge, or no figure could be computed).</summary>
    public const int SolverFailure = 3;

    /// <summary>The input is wrong: bad arguments, unreadable or invalid design file.</summary>
    public const int InputError = 2;
}
