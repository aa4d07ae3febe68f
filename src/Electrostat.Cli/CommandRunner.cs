using Electrostat.Cli.Commands;

namespace Electrostat.Cli;

/// <summary>Dispatches <c>electrostat &lt;command&gt; ...</c> to a command class; the only place that catches everything.</summary>
internal static class CommandRunner
{
    /// <summary>Every command, in the order shown by <c>electrostat help</c>.</summary>
    public static IReadOnlyList<ICommand> Commands { get; } = [new InitCommand(), new CheckCommand(), new SolveCommand(), new SweepCommand(), new ValidateCommand(), new MaterialsCommand()];

    /// <summary>Runs the command line; never throws, never prints a stack trace.</summary>
    public static int Run(IReadOnlyList<string> args, TextWriter stdout, TextWriter stderr) => Run(args, stdout, stderr, CancellationToken.None);

    /// <summary>True when the command named by the arguments stops cleanly on cancellation (Ctrl-C handling in Program).</summary>
    public static bool SupportsCancellation(IReadOnlyList<string> args) => args.Count > 0 && Find(args[0]) is ICancellableCommand;

    /// <summary>Runs the command line with a cancellation token (Ctrl-C); a cancelled run exits with <see cref="Cancellation.ExitCode"/>.</summary>
    public static int Run(IReadOnlyList<string> args, TextWriter stdout, TextWriter stderr, CancellationToken token)
    {
        ArgumentNullException.ThrowIfNull(args);
        if (args.Count == 0 || args[0] is "help" or "--help" or "-h")
        {
            if (args.Count > 1 && Find(args[1]) is { } c)
            {
                stdout.WriteLine(c.Usage);
                return ExitCodes.Ok;
            }
            PrintCommandList(args.Count == 0 ? stderr : stdout);
            return args.Count == 0 ? ExitCodes.InputError : ExitCodes.Ok;
        }
        if (args[0] == "--version")
        {
            stdout.WriteLine("electrostat " + typeof(CommandRunner).Assembly.GetName().Version?.ToString(3));
            return ExitCodes.Ok;
        }
        var command = Find(args[0]);
        if (command is null)
        {
            string? near = Commands.Select(c => c.Name).OrderBy(n => Distance(n, args[0])).FirstOrDefault(n => Distance(n, args[0]) <= 2);
            stderr.WriteLine($"electrostat: unknown command \"{args[0]}\"" + (near is null ? "" : $"; did you mean \"{near}\"?"));
            PrintCommandList(stderr);
            return ExitCodes.InputError;
        }
        var rest = args.Skip(1).ToList();
        if (rest.Contains("--help") || rest.Contains("-h"))
        {
            stdout.WriteLine(command.Usage);
            return ExitCodes.Ok;
        }
        try
        {
            var parsed = ParsedArguments.Parse(rest, command.Options);
            return command is ICancellableCommand cc ? cc.Run(parsed, stdout, stderr, token) : command.Run(parsed, stdout, stderr);
        }
        catch (OperationCanceledException) when (token.IsCancellationRequested)
        {
            stderr.WriteLine($"electrostat {command.Name}: {Cancellation.Message}");
            return Cancellation.ExitCode;
        }
        catch (UsageException e)
        {
            stderr.WriteLine($"electrostat {command.Name}: {e.Message}");
            stderr.WriteLine(command.Usage);
            return ExitCodes.InputError;
        }
#pragma warning disable CA1031 // The top level must turn any failure into one clear line instead of a stack trace.
        catch (Exception e)
#pragma warning restore CA1031
        {
            stderr.WriteLine($"electrostat {command.Name}: internal error ({e.GetType().Name}: {e.Message}).");
            stderr.WriteLine("This is a bug in electrostat, not in your design; please report it with the design file"
                + " (set ELECTROSTAT_TRACE=1 to add the program's trace to the report).");
            if (Environment.GetEnvironmentVariable("ELECTROSTAT_TRACE") == "1") stderr.WriteLine(e.ToString());
            return ExitCodes.InternalError;
        }
    }

    private static ICommand? Find(string name) => Commands.FirstOrDefault(c => c.Name == name);

    private static void PrintCommandList(TextWriter w)
    {
        w.WriteLine("usage: electrostat <command> [options]");
        w.WriteLine();
        w.WriteLine("commands:");
        foreach (var c in Commands) w.WriteLine($"  {c.Name,-10} {c.Summary}");
        w.WriteLine();
        w.WriteLine("Run 'electrostat <command> --help' for the options of a command.");
        w.WriteLine();
        w.WriteLine("examples:");
        w.WriteLine("  electrostat init my-gap.json                                  write a starter design");
        w.WriteLine("  electrostat solve my-gap.json --accuracy coarse               peak fields, margins, capacitance");
        w.WriteLine("  electrostat sweep my-gap.json --vary gap=2..12 --goal \"margin >= 2\"   smallest gap with margin 2");
        w.WriteLine("  electrostat materials                                         built-in material presets");
        w.WriteLine();
        w.WriteLine("exit codes: 0 pass, 1 check failed (or goal not met), 2 input error, 3 solver failure, 130 cancelled.");
    }

    private static int Distance(string a, string b)
    {
        var d = new int[a.Length + 1, b.Length + 1];
        for (int i = 0; i <= a.Length; i++) d[i, 0] = i;
        for (int j = 0; j <= b.Length; j++) d[0, j] = j;
        for (int i = 1; i <= a.Length; i++)
            for (int j = 1; j <= b.Length; j++)
                d[i, j] = Math.Min(Math.Min(d[i - 1, j] + 1, d[i, j - 1] + 1), d[i - 1, j - 1] + (a[i - 1] == b[j - 1] ? 0 : 1));
        return d[a.Length, b.Length];
    }
}
