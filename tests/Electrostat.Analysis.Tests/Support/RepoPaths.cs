namespace Electrostat.Analysis.Tests.Support;

/// <summary>Finds files of the repository from the test's output folder.</summary>
internal static class RepoPaths
{
    public static string Root { get; } = FindRoot();

    public static string Geometries => Path.Combine(Root, "geometries");

    private static string FindRoot()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "Electrostat.sln"))) dir = dir.Parent;
        return dir?.FullName ?? throw new InvalidOperationException("repository root (Electrostat.sln) not found above " + AppContext.BaseDirectory);
    }
}
