namespace Electrostat.Cli;

/// <summary>Process exit codes of the <c>electrostat</c> command.</summary>
internal static class ExitCodes
{
    /// <summary>The command did its job (for <c>check</c>: the design is valid).</summary>
    public const int Ok = 0;

    /// <summary>An unexpected internal failure (a bug): reported with a short message, never a stack trace.</summary>
    public const int InternalError = 1;

    /// <summary>The input is wrong: bad arguments, unreadable or invalid design file.</summary>
    public const int InputError = 2;
}
