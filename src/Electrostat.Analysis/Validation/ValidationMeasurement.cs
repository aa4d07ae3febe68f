namespace Electrostat.Analysis.Validation;

/// <summary>One value measured from the solved validation designs, with the tool's own error estimate.</summary>
/// <param name="Value">The computed value (SI units of the case's quantity).</param>
/// <param name="EstimatedRelativeError">The relative error the tool reported for this value (dimensionless), or NaN
/// when the tool reports no estimate for this kind of quantity (point potentials, fitted exponents).</param>
public sealed record ValidationMeasurement(double Value, double EstimatedRelativeError);
