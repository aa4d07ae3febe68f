using Electrostat.Geometry.Shapes;
using Newtonsoft.Json;
using Newtonsoft.Json.Linq;

namespace Electrostat.Geometry.Loading;

/// <summary>Collects problems and turns JSON tokens into file locations.</summary>
internal sealed class ProblemSink(string source)
{
    private readonly List<DesignProblem> _problems = [];
    private string[] _lines = [];

    /// <summary>The file's text, so token starts can be found exactly rather than estimated.</summary>
    public void SetText(string text) => _lines = text.Split('\n');

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
        var (line, column) = StartOf(token, _lines);
        if (charOffset >= 0 && token is JValue { Type: JTokenType.String }) column += 1 + charOffset;
        _problems.Add(new DesignProblem(severity, Source, PathOf(token), line, column, at, message, hint));
    }

    /// <summary>
    /// 1-based line and column where a token starts. Newtonsoft records the position at the end of a value (the closing
    /// quote of a string, the last character of a number), just after a property name and at the opening bracket of a
    /// container. With the file's lines at hand we scan back to the token's first character; without them we estimate
    /// from the token's length.
    /// </summary>
    public static (int Line, int Column) StartOf(JToken token, string[] lines)
    {
        if (token is not IJsonLineInfo li || !li.HasLineInfo()) return (0, 0);
        int col = li.LinePosition;
        int lineNo = li.LineNumber;
        string? line = lineNo >= 1 && lineNo <= lines.Length ? lines[lineNo - 1] : null;
        switch (token)
        {
            case JProperty p:
                if (line is not null && FindQuotedStartBefore(line, Math.Min(col, line.Length) - 1) is int ps) return (lineNo, ps + 1);
                col -= p.Name.Length + 2;
                break;
            case JValue { Type: JTokenType.String } s:
                if (line is not null && col - 1 < line.Length && col >= 1 && line[col - 1] == '"' && FindOpeningQuote(line, col - 2) is int qs) return (lineNo, qs + 1);
                col -= ((string?)s.Value ?? "").Length + 1;
                break;
            case JValue v:
                if (line is not null && col >= 1 && col <= line.Length)
                {
                    int i = col - 1;
                    while (i > 0 && IsBareChar(line[i - 1])) i--;
                    return (lineNo, i + 1);
                }
                col -= v.ToString(Formatting.None).Length - 1;
                break;
        }
        return (lineNo, Math.Max(1, col));
    }

    private static bool IsBareChar(char c) => char.IsAsciiLetterOrDigit(c) || c is '.' or '+' or '-';

    /// <summary>0-based index of the opening quote of the string whose closing quote is at index <paramref name="end"/> + 1.</summary>
    private static int? FindOpeningQuote(string line, int end)
    {
        for (int i = end; i >= 0; i--)
        {
            if (line[i] != '"') continue;
            int backslashes = 0;
            for (int k = i - 1; k >= 0 && line[k] == '\\'; k--) backslashes++;
            if (backslashes % 2 == 0) return i;
        }
        return null;
    }

    /// <summary>0-based index of the opening quote of the last quoted name ending at or before index <paramref name="from"/>.</summary>
    private static int? FindQuotedStartBefore(string line, int from)
    {
        int i = from;
        while (i >= 0 && line[i] != '"') i--;
        if (i <= 0) return null;
        return FindOpeningQuote(line, i - 1);
    }
}
