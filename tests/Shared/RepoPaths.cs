namespace Electrostat.TestSupport;

/// <summary>
/// Finds files of the repository from a test's output folder: the root is the first folder above it that holds
/// Electrostat.sln. One copy, compiled into every test and benchmark project (see Directory.Build.props).
/// </summary>
internal static class RepoPaths
{
    /// <summary>The repository root.</summary>
    public static string Root { get; } = FindRoot();

    /// <summary>The example designs folder.</summary>
    public static string Geometries => Path.Combine(Root, "geometries");

    /// <summary>A path below the root, from a relative path.</summary>
    public static string File(string relative) => Path.Combine(Root, relative);

    /// <summary>Every design file under geometries/ except the deliberately invalid ones, in ordinal order.</summary>
    public static IEnumerable<string> ExampleDesigns() =>
        Directory.EnumerateFiles(Geometries, "*.json", SearchOption.AllDirectories)
            .Where(p => !p.Contains(Path.DirectorySeparatorChar + "invalid" + Path.DirectorySeparatorChar, StringComparison.Ordinal))
            .OrderBy(p => p, StringComparer.Ordinal);

    private static string FindRoot()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !System.IO.File.Exists(Path.Combine(dir.FullName, "Electrostat.sln"))) dir = dir.Parent;
        return dir?.FullName ?? throw new InvalidOperationException("repository root (Electrostat.sln) not found above " + AppContext.BaseDirectory);
    }
}
