using Electrostat.Geometry.Shapes;
using Newtonsoft.Json;
using Newtonsoft.Json.Linq;

namespace Electrostat.Geometry.Loading;

/// <summary>Collects problems and turns JSON tokens into file locations.</summary>
internal sealed class ProblemSink(string source)
{
    private readonly List<DesignProblem> _problems = [];

    public string Source { get; } = source;

    public IReadOnlyList<DesignProblem> Problems => _problems;

    public bool HasErrors => _problems.Any(p => p.Severity == ProblemSeverity.Error);

    public int ErrorCount => _problems.Count(p => p.Severity == ProblemSeverity.Error);

    public static string PathOf(JToken token) => token.Path.Length == 0 ? "$" : token.Path.StartsWith('[') ? "$" + token.Path : "$." + token.Path;

    public void Error(JToken? token, string message, string? hint = null, Point2? at = null, int charOffset = -1) =>
        Add(ProblemSeverity.Error, token, message, hint, at, charOffset);

    public void Warning(JToken? token, string message, string? hint = null, Point2? at = null) =>
        Add(ProblemSeverity.Warning, token, message, hint, at, -1);

    public void Note(JToken? token, string message, string? hint = null, Point2? at = null) =>
        Add(ProblemSeverity.Note, token, message, hint, at, -1);

    public void Add(DesignProblem problem) => _problems.Add(problem);

    public void Add(ProblemSeverity severity, JToken? token, string message, string? hint, Point2? at, int charOffset)
    {
        if (token is null)
        {
            _problems.Add(new DesignProblem(severity, Source, "$", 0, 0, at, message, hint));
            return;
        }
        var (line, column) = StartOf(token);
        if (charOffset >= 0 && token is JValue { Type: JTokenType.String }) column += 1 + charOffset;
        _problems.Add(new DesignProblem(severity, Source, PathOf(token), line, column, at, message, hint));
    }

    /// <summary>
    /// 1-based line and column where a token starts. Newtonsoft records the position at the end of a value (the closing
    /// quote of a string, the last character of a number), at the ':' of a property and at the opening bracket of a
    /// container; we step back by the token's length (escape sequences in strings make this approximate).
    /// </summary>
    public static (int Line, int Column) StartOf(JToken token)
    {
        if (token is not IJsonLineInfo li || !li.HasLineInfo()) return (0, 0);
        int col = li.LinePosition;
        switch (token)
        {
            case JProperty p:
                col -= p.Name.Length + 2;
                break;
            case JValue { Type: JTokenType.String } s:
                col -= ((string?)s.Value ?? "").Length + 1;
                break;
            case JValue v:
                col -= v.ToString(Formatting.None).Length - 1;
                break;
        }
        return (li.LineNumber, Math.Max(1, col));
    }
}
