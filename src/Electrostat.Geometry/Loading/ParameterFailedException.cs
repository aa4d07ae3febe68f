namespace Electrostat.Geometry.Loading;

/// <summary>
/// Thrown inside expression lookups when a referenced parameter has its own (already reported) error, so the use
/// site stays quiet instead of repeating the problem.
/// </summary>
internal sealed class ParameterFailedException : Exception
{
    public ParameterFailedException()
    {
    }

    public ParameterFailedException(string message)
        : base(message)
    {
    }

    public ParameterFailedException(string message, Exception innerException)
        : base(message, innerException)
    {
    }
}
