namespace Electrostat.Cli.Commands;

/// <summary>A command that stops cleanly on Ctrl-C: it watches the token, writes no partial output, and lets
/// <see cref="OperationCanceledException"/> reach <see cref="CommandRunner"/>, which exits with
/// <see cref="Cancellation.ExitCode"/>.</summary>
internal interface ICancellableCommand : ICommand
{
    /// <summary>Runs the command, watching <paramref name="token"/>.</summary>
    int Run(ParsedArguments args, TextWriter stdout, TextWriter stderr, CancellationToken token);
}
