namespace Electrostat.Cli.Templates;

/// <summary>The starter designs written by <c>electrostat init</c>, embedded in the tool as JSON-with-comments files.</summary>
internal static class StarterTemplates
{
    /// <summary>Template names with one line each, in the order listed by <c>init --help</c>; the first is the default.</summary>
    public static IReadOnlyList<(string Name, string Summary)> All { get; } =
    [
        ("electrode-pair", "planar: 6 kV bar facing a grounded bar in air; margin and clearance checks"),
        ("sensor", "planar: two-pad capacitive sensor on FR-4 with a grounded target above"),
        ("axisymmetric", "axisymmetric: rod with a rounded end above a grounded plane in transformer oil"),
        ("open-space", "axisymmetric, open space: 60 kV terminal with a grading ring above a grounded disc in air"),
    ];

    /// <summary>The template's text, or null for an unknown name.</summary>
    public static string? Text(string name)
    {
        using var stream = typeof(StarterTemplates).Assembly.GetManifestResourceStream($"Electrostat.Templates.{name}.json");
        if (stream is null) return null;
        using var reader = new StreamReader(stream);
        return reader.ReadToEnd();
    }
}
