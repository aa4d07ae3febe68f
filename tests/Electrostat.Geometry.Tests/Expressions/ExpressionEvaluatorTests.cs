using Electrostat.Geometry.Expressions;

namespace Electrostat.Geometry.Tests.Expressions;

public class ExpressionEvaluatorTests
{
    private static readonly Dictionary<string, double> Params = new() { ["gap"] = 2.5, ["r_edge"] = 0.5, ["n"] = 3 };

    private static ExpressionValue Eval(string text) => ExpressionEvaluator.Evaluate(text, n => Params.TryGetValue(n, out double v) ? v : null);

    [Theory]
    [InlineData("1 + 2*3", 7)]
    [InlineData("(1 + 2)*3", 9)]
    [InlineData("2^3^2", 512)] // right-associative
    [InlineData("-2^2", -4)] // unary minus binds looser than power
    [InlineData("2^-1", 0.5)]
    [InlineData("10/4/5", 0.5)] // left-associative
    [InlineData("gap + 2*r_edge", 3.5)]
    [InlineData("sqrt(n^2 + 16)", 5)]
    [InlineData("max(1, gap, n) - min(4, 2)", 1)]
    [InlineData("abs(-3) + atan(1)*4/pi", 4)]
    [InlineData("atan2(1, 1)*4", Math.PI)]
    [InlineData("cos(pi) + sin(0) + tan(0)", -1)]
    [InlineData("1.5e3", 1500)]
    [InlineData(".5", 0.5)]
    [InlineData("--3", 3)]
    public void Evaluates(string text, double expected)
    {
        var v = Eval(text);
        Assert.Equal(expected, v.Value, 12);
        Assert.Null(v.UnitText);
    }

    [Theory]
    [InlineData("5 kV", 5, "kV", 2)]
    [InlineData("3 kV/mm", 3, "kV/mm", 2)]
    [InlineData("gap + 2*r_edge mm", 3.5, "mm", 15)]
    [InlineData("20um", 20, "um", 2)]
    [InlineData("1e-3 m", 0.001, "m", 5)]
    public void SeparatesTrailingUnit(string text, double value, string unit, int position)
    {
        var v = Eval(text);
        Assert.Equal(value, v.Value, 12);
        Assert.Equal(unit, v.UnitText);
        Assert.Equal(position, v.UnitPosition);
    }

    [Theory]
    [InlineData("gap + gapp", "unknown parameter 'gapp'", 6)]
    [InlineData("1 / (gap - 2.5)", "division by zero", 2)]
    [InlineData("(1 + 2", "missing ')'", 0)]
    [InlineData("1 + 2)", "unmatched ')'", 5)]
    [InlineData("2 (3)", "missing operator", 2)]
    [InlineData("sqrt(-1)", "square root of a negative number", 0)]
    [InlineData("foo(1)", "unknown function 'foo'", 0)]
    [InlineData("1 + * 2", "unexpected '*'", 4)]
    [InlineData("", "empty expression", 0)]
    [InlineData("max()", "at least one argument", 0)]
    [InlineData("sqrt", "'sqrt' is a function", 0)]
    public void Errors_AreLocatedAtTheCharacter(string text, string message, int position)
    {
        var ex = Assert.Throws<ExpressionException>(() => Eval(text));
        Assert.Contains(message, ex.Message + " " + ex.Hint, StringComparison.Ordinal);
        Assert.Equal(position, ex.Position);
    }
}
