using System.Globalization;
using System.Text;
using Electrostat.Geometry.Shapes;

namespace Electrostat.Geometry.Loading;

/// <summary>One problem found in a design file, located in the file and, when geometric, in the plane.</summary>
/// <param name="Severity">Error, warning or note.</param>
/// <param name="Source">File path (or "--set" for a command-line override, or the text's given name).</param>
/// <param name="JsonPath">JSON path of the offending value, e.g. <c>$.conductors[1].shape.radius</c>.</param>
/// <param name="Line">1-based line in the file, 0 when not applicable.</param>
/// <param name="Column">1-based column in the line, 0 when not applicable.</param>
/// <param name="Coordinate">Design-plane coordinate of a geometric problem, metres, when known.</param>
/// <param name="Message">What is wrong.</param>
/// <param name="Hint">How to fix it, when known.</param>
public sealed record DesignProblem(
    ProblemSeverity Severity,
    string Source,
    string JsonPath,
    int Line,
    int Column,
    Point2? Coordinate,
    string Message,
    string? Hint)
{
    /// <summary>
    /// One line for terminals: <c>file:line:col: error: message (at $.path, near (x mm, y mm)); fix: hint</c>.
    /// </summary>
    public override string ToString()
    {
        var sb = new StringBuilder(Source);
        if (Line > 0) sb.Append(CultureInfo.InvariantCulture, $":{Line}:{Math.Max(1, Column)}");
        sb.Append(": ").Append(Severity switch
        {
            ProblemSeverity.Error => "error",
            ProblemSeverity.Warning => "warning",
            _ => "note",
        });
        sb.Append(": ").Append(Message);
        var where = new List<string>();
        if (!string.IsNullOrEmpty(JsonPath)) where.Add("at " + JsonPath);
        if (Coordinate is { } c) where.Add("near " + c.ToMillimetreString());
        if (where.Count > 0) sb.Append(" (").Append(string.Join(", ", where)).Append(')');
        if (!string.IsNullOrEmpty(Hint)) sb.Append("; fix: ").Append(Hint);
        return sb.ToString();
    }
}
