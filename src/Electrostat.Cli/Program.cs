namespace Electrostat.Cli;

/// <summary>Entry point of the <c>electrostat</c> command.</summary>
internal static class Program
{
    private static int Main(string[] args)
    {
        // Ctrl-C: commands that watch a token stop cleanly (no partial files, exit 130); for the others, and on a
        // second Ctrl-C, the default applies (the process ends; their files are written atomically, so none is half-written).
        using var cts = new CancellationTokenSource();
        bool cancellable = CommandRunner.SupportsCancellation(args);
        Console.CancelKeyPress += (_, e) =>
        {
            if (!cancellable || cts.IsCancellationRequested) return;
            e.Cancel = true;
            Console.Error.WriteLine("electrostat: stopping after the cases in progress (Ctrl-C again to abort at once) ...");
            cts.Cancel();
        };
        return CommandRunner.Run(args, Console.Out, Console.Error, cts.Token);
    }
}
