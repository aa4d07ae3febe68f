namespace Electrostat.Cli;

/// <summary>Entry point of the <c>electrostat</c> command.</summary>
internal static class Program
{
    private static int Main(string[] args) => CommandRunner.Run(args, Console.Out, Console.Error);
}
