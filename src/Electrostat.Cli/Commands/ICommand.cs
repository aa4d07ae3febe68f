namespace Electrostat.Cli.Commands;

/// <summary>One sub-command of <c>electrostat</c> (check, and later solve, sweep, ...). Add a class, then list it in <see cref="CommandRunner"/>.</summary>
internal interface ICommand
{
    /// <summary>The word typed after <c>electrostat</c>.</summary>
    string Name { get; }

    /// <summary>One line for the command list.</summary>
    string Summary { get; }

    /// <summary>Usage text: synopsis and options.</summary>
    string Usage { get; }

    /// <summary>Options this command accepts, for the argument parser.</summary>
    OptionSpec Options { get; }

    /// <summary>Runs the command; returns an exit code from <see cref="ExitCodes"/>.</summary>
    int Run(ParsedArguments args, TextWriter stdout, TextWriter stderr);
}
