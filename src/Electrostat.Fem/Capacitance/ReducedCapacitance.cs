namespace Electrostat.Fem.Capacitance;

/// <summary>
/// The capacitance seen at the driven (fixed-potential) conductors once the floating ones are eliminated at their
/// given charges: Q_a = <see cref="Matrix"/>·V_a + <see cref="ChargeOffset"/>. Units as the full matrix.
/// </summary>
/// <param name="TerminalNames">Names of the driven conductors, in row order.</param>
/// <param name="TerminalIndices">Their indices in the full matrix.</param>
/// <param name="Matrix">Schur complement C_aa − C_af·C_ff⁻¹·C_fa.</param>
/// <param name="ChargeOffset">C_af·C_ff⁻¹·Q_f, the charge induced by the floating conductors' own charges.</param>
public sealed record ReducedCapacitance(IReadOnlyList<string> TerminalNames, IReadOnlyList<int> TerminalIndices, double[,] Matrix, IReadOnlyList<double> ChargeOffset);
