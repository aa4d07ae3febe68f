namespace Electrostat.Cli;

/// <summary>The command line is wrong; the message says how, and the runner prints the usage.</summary>
internal sealed class UsageException : Exception
{
    public UsageException()
    {
    }

    public UsageException(string message)
        : base(message)
    {
    }

    public UsageException(string message, Exception innerException)
        : base(message, innerException)
    {
    }
}
