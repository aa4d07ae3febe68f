namespace Electrostat.Bench;

/// <summary>
/// Benchmark entry point. Usage: <c>dotnet run -c Release --project tests/Electrostat.Bench -- SUITE [options]</c>.
/// Each suite prints one machine-readable line per case; see docs/performance.md.
/// </summary>
internal static class Program
{
    private static int Main(string[] args)
    {
        var suites = typeof(Program).Assembly.GetTypes()
            .Where(t => typeof(IBenchSuite).IsAssignableFrom(t) && t is { IsAbstract: false, IsInterface: false })
            .Select(t => (IBenchSuite)Activator.CreateInstance(t)!)
            .ToDictionary(s => s.Name, StringComparer.OrdinalIgnoreCase);
        if (args.Length == 0 || !suites.TryGetValue(args[0], out var suite))
        {
            Console.Error.WriteLine($"usage: Electrostat.Bench <{string.Join('|', suites.Keys.Order())}> [options]");
            return 2;
        }
        return suite.Run(args[1..]);
    }
}
