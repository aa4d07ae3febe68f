using System.Globalization;

namespace Electrostat.Geometry.Expressions;

/// <summary>
/// Evaluates arithmetic expressions over named parameters, e.g. <c>"gap + 2*r_edge"</c> or <c>"sqrt(a^2 + b^2) mm"</c>.
/// </summary>
/// <remarks>
/// Grammar (recursive descent; precedence from low to high):
/// <code>
/// quantity := expr [unit-text]
/// expr     := term (('+' | '-') term)*
/// term     := unary (('*' | '/') unary)*
/// unary    := ('-' | '+') unary | power
/// power    := primary ['^' unary]            (right-associative; -2^2 = -4)
/// primary  := number | name | name '(' expr (',' expr)* ')' | '(' expr ')'
/// </code>
/// Functions: sqrt, abs, sin, cos, tan, atan (radians), atan2(y, x), min, max (any number of arguments);
/// constant: pi. Whatever follows a complete expression is returned as unit text, so the unit applies to the
/// whole expression: <c>"gap + 1 mm"</c> means (gap + 1) mm. Errors carry the 0-based character position.
/// </remarks>
public static class ExpressionEvaluator
{
    /// <summary>Names that cannot be used as parameters: the functions and constants of the grammar.</summary>
    public static IReadOnlyCollection<string> ReservedNames { get; } =
        ["sqrt", "abs", "sin", "cos", "tan", "atan", "atan2", "min", "max", "pi"];

    /// <summary>Evaluates an expression with an optional trailing unit.</summary>
    /// <param name="text">Expression text.</param>
    /// <param name="lookup">Returns a parameter's value, or null when no parameter has that name. May throw
    /// <see cref="ExpressionException"/> (for example on a circular definition).</param>
    /// <exception cref="ExpressionException">Syntax error, unknown name, division by zero or a non-finite result.</exception>
    public static ExpressionValue Evaluate(string text, Func<string, double?> lookup)
    {
        ArgumentNullException.ThrowIfNull(text);
        ArgumentNullException.ThrowIfNull(lookup);
        var parser = new Parser(text, lookup);
        return parser.ParseQuantity();
    }

    /// <summary>True when a name is a valid parameter identifier: a letter or '_' then letters, digits or '_'.</summary>
    public static bool IsIdentifier(string name) =>
        name.Length > 0 && (char.IsAsciiLetter(name[0]) || name[0] == '_') && name.All(c => char.IsAsciiLetterOrDigit(c) || c == '_');

    private sealed class Parser(string text, Func<string, double?> lookup)
    {
        private int _pos;

        public ExpressionValue ParseQuantity()
        {
            SkipSpaces();
            if (_pos >= text.Length) throw new ExpressionException("empty expression", 0, "write a number or an expression such as \"2*gap\"");
            double value = ParseExpr();
            SkipSpaces();
            if (_pos >= text.Length) return new ExpressionValue(value, null, -1);
            char c = text[_pos];
            if (c == ')' ) throw new ExpressionException("unmatched ')'", _pos, "remove it or add the matching '('");
            if (c == ',') throw new ExpressionException("',' outside a function call", _pos);
            if (char.IsDigit(c) || c == '(' || c == '.')
                throw new ExpressionException($"missing operator before '{c}'", _pos, "write the operator explicitly, e.g. \"2*(a+b)\"");
            return new ExpressionValue(value, text[_pos..].TrimEnd(), _pos);
        }

        private double ParseExpr()
        {
            double v = ParseTerm();
            while (true)
            {
                SkipSpaces();
                if (Peek('+')) { _pos++; v += ParseTerm(); }
                else if (Peek('-')) { _pos++; v -= ParseTerm(); }
                else return v;
            }
        }

        private double ParseTerm()
        {
            double v = ParseUnary();
            while (true)
            {
                SkipSpaces();
                if (Peek('*')) { _pos++; v *= ParseUnary(); }
                else if (Peek('/'))
                {
                    int at = _pos++;
                    double d = ParseUnary();
                    if (d == 0) throw new ExpressionException("division by zero", at, "check the divisor's parameters");
                    v /= d;
                }
                else return v;
            }
        }

        private double ParseUnary()
        {
            SkipSpaces();
            if (Peek('-')) { _pos++; return -ParseUnary(); }
            if (Peek('+')) { _pos++; return ParseUnary(); }
            return ParsePower();
        }

        private double ParsePower()
        {
            double b = ParsePrimary();
            SkipSpaces();
            if (!Peek('^')) return b;
            int at = _pos++;
            double e = ParseUnary();
            double r = Math.Pow(b, e);
            if (!double.IsFinite(r)) throw new ExpressionException("power is not a finite number", at);
            return r;
        }

        private double ParsePrimary()
        {
            SkipSpaces();
            if (_pos >= text.Length) throw new ExpressionException("expression ends too early", _pos, "complete the expression");
            char c = text[_pos];
            if (char.IsDigit(c) || c == '.') return ParseNumber();
            if (c == '(')
            {
                int open = _pos++;
                double v = ParseExpr();
                SkipSpaces();
                if (!Peek(')')) throw new ExpressionException("missing ')'", open, "close the parenthesis opened here");
                _pos++;
                return v;
            }
            if (IsNameStart(c))
            {
                int start = _pos;
                string name = ReadName();
                SkipSpaces();
                if (Peek('(')) return ParseCall(name, start);
                if (name == "pi") return Math.PI;
                double? value = lookup(name);
                if (value is null)
                {
                    throw new ExpressionException($"unknown parameter '{name}'", start,
                        ExpressionReservedHint(name) ?? "define it under \"parameters\" or correct the spelling");
                }
                return value.Value;
            }
            throw new ExpressionException($"unexpected '{c}'", _pos, "expected a number, a parameter name or '('");
        }

        private static string? ExpressionReservedHint(string name) =>
            ReservedNames.Contains(name) ? $"'{name}' is a function: call it with parentheses" : null;

        private double ParseCall(string name, int start)
        {
            _pos++; // '('
            var args = new List<double>();
            SkipSpaces();
            if (!Peek(')'))
            {
                while (true)
                {
                    args.Add(ParseExpr());
                    SkipSpaces();
                    if (Peek(',')) { _pos++; continue; }
                    if (Peek(')')) break;
                    throw new ExpressionException($"missing ')' after the arguments of {name}", _pos);
                }
            }
            _pos++; // ')'
            double Arg(int count)
            {
                if (args.Count != count) throw new ExpressionException($"{name} takes {count} argument(s), got {args.Count}", start);
                return args[0];
            }
            double r = name switch
            {
                "sqrt" => Sqrt(Arg(1), start),
                "abs" => Math.Abs(Arg(1)),
                "sin" => Math.Sin(Arg(1)),
                "cos" => Math.Cos(Arg(1)),
                "tan" => Math.Tan(Arg(1)),
                "atan" => Math.Atan(Arg(1)),
                "atan2" => Atan2(args, start),
                "min" => args.Count > 0 ? args.Min() : throw new ExpressionException("min needs at least one argument", start),
                "max" => args.Count > 0 ? args.Max() : throw new ExpressionException("max needs at least one argument", start),
                _ => throw new ExpressionException($"unknown function '{name}'", start, "available: sqrt, abs, sin, cos, tan, atan, atan2, min, max"),
            };
            if (!double.IsFinite(r)) throw new ExpressionException($"{name}(...) is not a finite number", start);
            return r;
        }

        private static double Sqrt(double x, int at) =>
            x >= 0 ? Math.Sqrt(x) : throw new ExpressionException("square root of a negative number", at);

        private static double Atan2(List<double> args, int at) =>
            args.Count == 2 ? Math.Atan2(args[0], args[1]) : throw new ExpressionException($"atan2 takes 2 arguments, got {args.Count}", at);

        private double ParseNumber()
        {
            int start = _pos;
            while (_pos < text.Length && char.IsDigit(text[_pos])) _pos++;
            if (_pos < text.Length && text[_pos] == '.')
            {
                _pos++;
                while (_pos < text.Length && char.IsDigit(text[_pos])) _pos++;
            }
            // Exponent only when digits follow, so "2em" stays "2" + "em".
            if (_pos < text.Length && (text[_pos] == 'e' || text[_pos] == 'E'))
            {
                int save = _pos++;
                if (_pos < text.Length && (text[_pos] == '+' || text[_pos] == '-')) _pos++;
                if (_pos < text.Length && char.IsDigit(text[_pos]))
                    while (_pos < text.Length && char.IsDigit(text[_pos])) _pos++;
                else
                    _pos = save;
            }
            string s = text[start.._pos];
            if (!double.TryParse(s, NumberStyles.Float, CultureInfo.InvariantCulture, out double v))
                throw new ExpressionException($"'{s}' is not a number", start);
            if (!double.IsFinite(v)) throw new ExpressionException($"'{s}' is too large", start);
            return v;
        }

        private string ReadName()
        {
            int start = _pos;
            while (_pos < text.Length && (char.IsAsciiLetterOrDigit(text[_pos]) || text[_pos] == '_')) _pos++;
            return text[start.._pos];
        }

        private static bool IsNameStart(char c) => char.IsAsciiLetter(c) || c == '_';

        private bool Peek(char c) => _pos < text.Length && text[_pos] == c;

        private void SkipSpaces()
        {
            while (_pos < text.Length && char.IsWhiteSpace(text[_pos])) _pos++;
        }
    }
}
