namespace Electrostat.Geometry.Expressions;

/// <summary>An expression cannot be read or evaluated; <see cref="Position"/> is the 0-based character index to blame.</summary>
public sealed class ExpressionException : Exception
{
    /// <summary>Creates the exception.</summary>
    /// <param name="message">What is wrong.</param>
    /// <param name="position">0-based index of the offending character in the expression text.</param>
    /// <param name="hint">How to fix it, if known.</param>
    public ExpressionException(string message, int position, string? hint = null)
        : base(message)
    {
        Position = position;
        Hint = hint;
    }

    /// <summary>Creates the exception with a message only (position 0).</summary>
    public ExpressionException()
        : this("invalid expression", 0)
    {
    }

    /// <summary>Creates the exception with a message and an inner exception (position 0).</summary>
    public ExpressionException(string message, Exception innerException)
        : base(message, innerException)
    {
    }

    /// <summary>0-based character index in the expression text.</summary>
    public int Position { get; }

    /// <summary>How to fix the expression, if known.</summary>
    public string? Hint { get; }
}
