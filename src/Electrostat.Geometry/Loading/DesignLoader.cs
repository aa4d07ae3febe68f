using System.Globalization;
using Electrostat.Geometry.Model;

namespace Electrostat.Geometry.Loading;

/// <summary>
/// Reads and validates design files (JSON with comments). The single entry point for turning a file into a
/// <see cref="Design"/>: every problem is collected and reported together, each located by file, line, column and
/// JSON path (and by a coordinate when geometric).
/// </summary>
/// <example>
/// <code>
/// var result = DesignLoader.Load("geometries/hv-electrode-over-plate.json");
/// if (result.HasErrors) { foreach (var p in result.Problems) Console.Error.WriteLine(p); return 2; }
/// Design design = result.Design!;
/// </code>
/// </example>
public static class DesignLoader
{
    /// <summary>Loads a design file.</summary>
    /// <param name="path">File path.</param>
    /// <param name="parameterOverrides">Parameter values replacing those in the file, as expression text with an
    /// optional unit (e.g. "0.8", "gap*2", "1.2 mm"), exactly as a parameter in the file would be written.</param>
    public static DesignLoadResult Load(string path, IReadOnlyDictionary<string, string>? parameterOverrides = null)
    {
        ArgumentNullException.ThrowIfNull(path);
        string text;
        if (Directory.Exists(path))
            return new DesignLoadResult(null, [new DesignProblem(ProblemSeverity.Error, path, "", 0, 0, null, "this is a folder, not a design file", "give the path of a .json design file")]);
        try
        {
            text = File.ReadAllText(path);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or NotSupportedException or ArgumentException)
        {
            var hint = e is FileNotFoundException or DirectoryNotFoundException ? "check the path" : "check that the file exists and can be read";
            return new DesignLoadResult(null, [new DesignProblem(ProblemSeverity.Error, path, "", 0, 0, null, $"cannot read the design file: {e.Message}", hint)]);
        }
        return new DesignReader(path, Path.GetFullPath(path)).Read(text, parameterOverrides);
    }

    /// <summary>Loads a design file with numeric parameter overrides (values in the file's default units).</summary>
    public static DesignLoadResult Load(string path, IReadOnlyDictionary<string, double> parameterOverrides)
    {
        ArgumentNullException.ThrowIfNull(parameterOverrides);
        return Load(path, ToText(parameterOverrides));
    }

    /// <summary>Loads a design from JSON text; <paramref name="sourceName"/> names it in messages.</summary>
    public static DesignLoadResult LoadFromText(string json, string sourceName = "<text>", IReadOnlyDictionary<string, string>? parameterOverrides = null)
    {
        ArgumentNullException.ThrowIfNull(json);
        ArgumentNullException.ThrowIfNull(sourceName);
        return new DesignReader(sourceName, null).Read(json, parameterOverrides);
    }

    private static Dictionary<string, string> ToText(IReadOnlyDictionary<string, double> values) =>
        values.ToDictionary(kv => kv.Key, kv => kv.Value.ToString("R", CultureInfo.InvariantCulture), StringComparer.Ordinal);
}
