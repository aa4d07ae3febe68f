namespace Electrostat.Analysis.Pipeline;

/// <summary>
/// The numerical solution failed (a linear solve did not converge, or the result broke a physics check badly enough
/// that no figure can be reported). Not a user error in the design file; the command maps it to exit code 3.
/// </summary>
public sealed class SolveFailedException : Exception
{
    /// <summary>Creates the exception.</summary>
    /// <param name="message">What failed, in one sentence.</param>
    public SolveFailedException(string message) : base(message)
    {
    }

    /// <summary>Creates the exception with no message (prefer the message overload).</summary>
    public SolveFailedException()
    {
    }

    /// <summary>Creates the exception with a cause.</summary>
    /// <param name="message">What failed.</param>
    /// <param name="innerException">The cause.</param>
    public SolveFailedException(string message, Exception innerException) : base(message, innerException)
    {
    }
}
