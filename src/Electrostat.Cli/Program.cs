namespace Electrostat.Cli;

/// <summary>Entry point of the <c>electrostat</c> command.</summary>
internal static class Program
{
    private static int Main(string[] args)
    {
        Console.Error.WriteLine("usage: electrostat <command> ...");
        return 2;
    }
}
