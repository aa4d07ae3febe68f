using System.Globalization;
using Electrostat.Geometry.Expressions;
using Electrostat.Geometry.Model;
using Electrostat.Geometry.Quantities;
using Electrostat.Geometry.Shapes;
using Newtonsoft.Json.Linq;

namespace Electrostat.Geometry.Loading;

/// <summary>
/// Reads typed values out of JSON tokens, reporting every problem to the sink and returning null for a bad value,
/// so reading goes on and all problems are reported together.
/// </summary>
internal sealed class ReadContext
{
    // Plausibility limits in SI: values beyond these are almost surely unit mistakes ("absurd magnitudes").
    private const double MaxLengthMetres = 1e3;
    private const double MinSizeMetres = 1e-9;
    private const double MaxPotentialVolts = 1e8;
    private const double MaxFieldVoltsPerMetre = 1e12;
    private const double MaxChargeCoulombs = 1.0;
    private const double MaxDimensionless = 1e6;

    private readonly Dictionary<string, (JToken Token, string Text, bool FromOverride)> _parameterSource = new(StringComparer.Ordinal);
    private readonly Dictionary<string, double> _parameterValues = new(StringComparer.Ordinal);
    private readonly HashSet<string> _parameterFailed = new(StringComparer.Ordinal);
    private readonly List<string> _evaluating = [];

    public ReadContext(ProblemSink sink)
    {
        Sink = sink;
    }

    public ProblemSink Sink { get; }

    public LengthUnit Unit { get; set; } = new("m", 1.0);

    public Symmetry Symmetry { get; set; } = Symmetry.Planar;

    public IReadOnlyDictionary<string, double> ParameterValues => _parameterValues;

    public IEnumerable<string> ParameterNames => _parameterSource.Keys;

    // ---------- structure ----------

    public JObject? AsObject(JToken? token, string what)
    {
        if (token is JObject o) return o;
        if (token is not null) Sink.Error(token, $"{what} must be an object {{ ... }}, found {Describe(token)}");
        return null;
    }

    public JArray? AsArray(JToken? token, string what)
    {
        if (token is JArray a) return a;
        if (token is not null) Sink.Error(token, $"{what} must be a list [ ... ], found {Describe(token)}");
        return null;
    }

    public JToken? Required(JObject obj, string key, string what, string hint)
    {
        var t = obj[key];
        if (t is null || t.Type == JTokenType.Null)
            Sink.Error(obj, $"missing key \"{key}\" in {what}", hint);
        return t is null || t.Type == JTokenType.Null ? null : t;
    }

    public void CheckKeys(JObject obj, string what, IReadOnlyCollection<string> known)
    {
        foreach (var prop in obj.Properties())
        {
            if (known.Contains(prop.Name)) continue;
            Sink.Error(prop, $"unknown key \"{prop.Name}\" in {what}", Suggestions.Hint(prop.Name, known));
        }
    }

    public string? String(JToken? token, string what)
    {
        if (token is null) return null;
        if (token.Type == JTokenType.String)
        {
            var s = ((string?)token)!.Trim();
            if (s.Length == 0) { Sink.Error(token, $"{what} must not be empty"); return null; }
            return s;
        }
        Sink.Error(token, $"{what} must be a string in quotes, found {Describe(token)}");
        return null;
    }

    public bool? Bool(JToken? token, string what)
    {
        if (token is null) return null;
        if (token.Type == JTokenType.Boolean) return (bool)token;
        Sink.Error(token, $"{what} must be true or false, found {Describe(token)}");
        return null;
    }

    public static string Describe(JToken token) => token.Type switch
    {
        JTokenType.Object => "an object",
        JTokenType.Array => "a list",
        JTokenType.String => $"the string \"{(string?)token}\"",
        JTokenType.Integer or JTokenType.Float => $"the number {token.ToString(Newtonsoft.Json.Formatting.None)}",
        JTokenType.Boolean => (bool)token ? "true" : "false",
        JTokenType.Null => "null",
        _ => token.Type.ToString().ToLowerInvariant(),
    };

    // ---------- parameters ----------

    public void DeclareParameter(string name, JToken token, string text, bool fromOverride)
    {
        _parameterSource[name] = (token, text, fromOverride);
        _parameterValues.Remove(name);
        _parameterFailed.Remove(name);
    }

    public bool HasParameter(string name) => _parameterSource.ContainsKey(name);

    /// <summary>Evaluates every declared parameter so each reports its own problems once.</summary>
    public void EvaluateAllParameters()
    {
        foreach (var name in _parameterSource.Keys.ToList())
        {
            try
            {
                Lookup(name);
            }
            catch (ParameterFailedException)
            {
                // already reported at the parameter's own location
            }
        }
    }

    private double? Lookup(string name)
    {
        if (_parameterValues.TryGetValue(name, out double v)) return v;
        if (_parameterFailed.Contains(name)) throw new ParameterFailedException(name);
        if (!_parameterSource.TryGetValue(name, out var src)) return null;
        if (_evaluating.Contains(name))
        {
            string chain = string.Join(" -> ", _evaluating.Append(name));
            throw new ExpressionException($"parameter '{name}' depends on itself ({chain})", 0, "break the circular definition");
        }
        _evaluating.Add(name);
        try
        {
            double? value = EvaluateParameter(name, src.Token, src.Text);
            if (value is null)
            {
                _parameterFailed.Add(name);
                throw new ParameterFailedException(name);
            }
            _parameterValues[name] = value.Value;
            return value;
        }
        catch (ParameterFailedException)
        {
            _parameterFailed.Add(name);
            throw;
        }
        finally
        {
            _evaluating.RemoveAt(_evaluating.Count - 1);
        }
    }

    /// <summary>A parameter's value in the file's default units: a unit suffix converts to the default unit of its kind.</summary>
    private double? EvaluateParameter(string name, JToken token, string text)
    {
        ExpressionValue ev;
        try
        {
            ev = ExpressionEvaluator.Evaluate(text, Lookup);
        }
        catch (ExpressionException e)
        {
            ParameterError(name, token, $"parameter '{name}': {e.Message}", e.Hint, e.Position);
            return null;
        }
        if (ev.UnitText is null) return ev.Value;
        if (!UnitTable.TryParse(ev.UnitText, out var kind, out double factor))
        {
            ParameterError(name, token, $"parameter '{name}': unknown unit \"{ev.UnitText}\"",
                "use a length (mm, um, in, mil, m), potential (V, kV), field (kV/mm, V/m), charge (nC) or angle (deg, rad) unit",
                ev.UnitPosition);
            return null;
        }
        double si = ev.Value * factor;
        return kind switch
        {
            QuantityKind.Length => si / Unit.Metres,
            QuantityKind.Angle => si * 180 / Math.PI,
            _ => si,
        };
    }

    /// <summary>A problem in a parameter's value: located in the file, or on the command line for a --set override.</summary>
    private void ParameterError(string name, JToken token, string message, string? hint, int charOffset)
    {
        if (_parameterSource.TryGetValue(name, out var src) && src.FromOverride)
        {
            Sink.Add(new DesignProblem(ProblemSeverity.Error, "--set", name, 0, 0, null,
                $"--set {name}={src.Text}: {message} (at character {charOffset + 1})", hint));
            return;
        }
        Sink.Error(token, message, hint, charOffset: token.Type == JTokenType.String ? charOffset : -1);
    }

    private void ReportExpression(JToken token, string message, ExpressionException e)
    {
        Sink.Error(token, message, e.Hint, charOffset: token.Type == JTokenType.String ? e.Position : -1);
    }

    // ---------- quantities ----------

    /// <summary>Reads a quantity and returns it in SI units (angles in radians), or null after reporting a problem.</summary>
    /// <param name="token">The JSON value (number or string); null means absent (no problem reported).</param>
    /// <param name="kind">Physical dimension.</param>
    /// <param name="what">Name for messages, e.g. "radius".</param>
    /// <param name="positive">Require a value &gt; 0 (sizes, permittivities).</param>
    /// <param name="nonNegative">Require a value ≥ 0.</param>
    public double? Quantity(JToken? token, QuantityKind kind, string what, bool positive = false, bool nonNegative = false)
    {
        if (token is null) return null;
        double value;
        double defaultFactor = kind switch
        {
            QuantityKind.Length => Unit.Metres,
            QuantityKind.Angle => Math.PI / 180,
            _ => 1.0,
        };
        if (token.Type is JTokenType.Integer or JTokenType.Float)
        {
            value = (double)token * defaultFactor;
        }
        else if (token.Type == JTokenType.String)
        {
            string text = (string)token!;
            ExpressionValue ev;
            try
            {
                ev = ExpressionEvaluator.Evaluate(text, Lookup);
            }
            catch (ExpressionException e)
            {
                ReportExpression(token, $"{what}: {e.Message}", e);
                return null;
            }
            catch (ParameterFailedException)
            {
                return null;
            }
            if (ev.UnitText is null)
            {
                value = ev.Value * defaultFactor;
            }
            else
            {
                if (!UnitTable.TryParse(ev.UnitText, out var unitKind, out double factor) || unitKind != kind)
                {
                    string found = UnitTable.TryParse(ev.UnitText, out var k2, out _) ? $"\"{ev.UnitText}\" is a {UnitTable.NameOf(k2)} unit" : $"unknown unit \"{ev.UnitText}\"";
                    string hint = kind == QuantityKind.Dimensionless
                        ? "write a plain number without a unit"
                        : $"{what} takes a {UnitTable.NameOf(kind)} unit: {UnitTable.ExamplesFor(kind)}";
                    Sink.Error(token, $"{what}: {found}", hint, charOffset: ev.UnitPosition);
                    return null;
                }
                if (kind == QuantityKind.Charge && ev.UnitText.Contains('/', StringComparison.Ordinal) && Symmetry == Symmetry.Axisymmetric)
                {
                    Sink.Error(token, $"{what}: charge per length \"{ev.UnitText}\" has no meaning in an axisymmetric design",
                        "give the total charge, e.g. \"2 nC\"", charOffset: ev.UnitPosition);
                    return null;
                }
                value = ev.Value * factor;
            }
        }
        else
        {
            string example = kind switch
            {
                QuantityKind.Length => "\"2.5 mm\"",
                QuantityKind.Potential => "\"5 kV\"",
                QuantityKind.Field => "\"3 kV/mm\"",
                QuantityKind.Charge => "\"1 nC\"",
                QuantityKind.Angle => "90",
                _ => "4.4",
            };
            Sink.Error(token, $"{what} must be a number or a quantity string, found {Describe(token)}", $"write e.g. {example}");
            return null;
        }
        return CheckMagnitude(token, kind, what, value, positive, nonNegative);
    }

    private double? CheckMagnitude(JToken token, QuantityKind kind, string what, double value, bool positive, bool nonNegative)
    {
        if (!double.IsFinite(value))
        {
            Sink.Error(token, $"{what} is not a finite number", "give a finite value");
            return null;
        }
        if (positive && !(value > 0))
        {
            Sink.Error(token, $"{what} must be greater than zero, got {UnitTable.Format(value, kind)}", "give a positive value");
            return null;
        }
        if (nonNegative && value < 0)
        {
            Sink.Error(token, $"{what} must not be negative, got {UnitTable.Format(value, kind)}", "give zero or a positive value");
            return null;
        }
        double a = Math.Abs(value);
        (double max, string unitWord) = kind switch
        {
            QuantityKind.Length => (MaxLengthMetres, "1 km"),
            QuantityKind.Potential => (MaxPotentialVolts, "100 MV"),
            QuantityKind.Field => (MaxFieldVoltsPerMetre, "1e12 V/m"),
            QuantityKind.Charge => (MaxChargeCoulombs, "1 C"),
            QuantityKind.Angle => (4 * Math.PI, "720 deg"),
            _ => (MaxDimensionless, "1e6"),
        };
        if (a > max)
        {
            Sink.Error(token, string.Create(CultureInfo.InvariantCulture, $"{what} = {UnitTable.Format(value, kind)} is implausibly large (limit {unitWord})"),
                kind == QuantityKind.Length ? $"check the units: bare lengths are in \"{Unit.Symbol}\"" : "check the value and its unit");
            return null;
        }
        if (kind == QuantityKind.Length && positive && a < MinSizeMetres)
        {
            Sink.Error(token, $"{what} = {UnitTable.Format(value, kind)} is implausibly small (below 1 nm)", $"check the units: bare lengths are in \"{Unit.Symbol}\"");
            return null;
        }
        return value;
    }

    /// <summary>Reads a point [x, y] of two lengths, in metres.</summary>
    public Point2? Point(JToken? token, string what)
    {
        if (token is null) return null;
        if (token is not JArray a || a.Count != 2)
        {
            Sink.Error(token, $"{what} must be a point [x, y], found {Describe(token)}", "write two coordinates, e.g. [0, 2.5]");
            return null;
        }
        var x = Quantity(a[0], QuantityKind.Length, $"{what} x");
        var y = Quantity(a[1], QuantityKind.Length, $"{what} y");
        return x is null || y is null ? null : new Point2(x.Value, y.Value);
    }
}
