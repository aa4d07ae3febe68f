namespace Electrostat.Fem.Assembly;

/// <summary>
/// A user-caused problem with the field problem (a region without a material, a segment tag without a role, two
/// conductors touching, no reference potential, ...). The message names the place and the fix; it is meant to be
/// shown to the user as it is, without a stack trace.
/// </summary>
public sealed class FieldProblemException : Exception
{
    /// <summary>Creates the exception with a user-facing message.</summary>
    /// <param name="message">What is wrong, where, and how to fix it.</param>
    public FieldProblemException(string message) : base(message)
    {
    }

    /// <summary>Creates the exception with no message (prefer the message overload).</summary>
    public FieldProblemException()
    {
    }

    /// <summary>Creates the exception with a user-facing message and an inner cause.</summary>
    /// <param name="message">What is wrong, where, and how to fix it.</param>
    /// <param name="innerException">The cause.</param>
    public FieldProblemException(string message, Exception innerException) : base(message, innerException)
    {
    }
}
