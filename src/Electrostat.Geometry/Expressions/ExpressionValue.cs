namespace Electrostat.Geometry.Expressions;

/// <summary>The number an expression evaluates to, and the unit text written after it (if any).</summary>
/// <param name="Value">The value, in the unit given by <paramref name="UnitText"/> (or the field's default unit when none).</param>
/// <param name="UnitText">Trailing unit text, e.g. "kV/mm", or null when the expression ends without one.</param>
/// <param name="UnitPosition">0-based character index where the unit text starts (-1 when none).</param>
public readonly record struct ExpressionValue(double Value, string? UnitText, int UnitPosition);
