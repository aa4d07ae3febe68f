namespace Electrostat.Cli;

/// <summary>Ctrl-C handling: the exit code and message of a cancelled run.</summary>
internal static class Cancellation
{
    /// <summary>Exit code of a run cancelled by the user (128 + SIGINT, the shell convention).</summary>
    public const int ExitCode = 130;

    /// <summary>Printed on stderr when a run is cancelled.</summary>
    public const string Message = "cancelled; no result files were written (files from earlier runs are unchanged).";
}
