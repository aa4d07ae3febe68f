namespace Electrostat.Fem.Solving;

/// <summary>
/// One conductor's state in a solved design. Units follow <see cref="Problem.ProblemSymmetry"/>: per metre of depth for
/// planar problems (C/m, J/m), totals for axisymmetric ones (C, J).
/// </summary>
/// <param name="Name">Conductor name.</param>
/// <param name="IsFloating">True for a floating conductor (its potential is computed).</param>
/// <param name="PotentialVolts">Its potential, volts (given, or computed when floating).</param>
/// <param name="ChargeCoulombs">Its charge from the nodal reactions (C/m planar, C axisymmetric).</param>
/// <param name="EnergyShareJoules">½·Q·V, its share of the field energy (J/m planar, J axisymmetric). With the
/// enclosure at 0 V and no volume charge, the shares add up to the field energy.</param>
public sealed record ConductorResult(string Name, bool IsFloating, double PotentialVolts, double ChargeCoulombs, double EnergyShareJoules);
