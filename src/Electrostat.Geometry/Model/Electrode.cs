namespace Electrostat.Geometry.Model;

/// <summary>
/// One electrically connected set of conductors: conductors that touch and carry the same fixed potential, or
/// touching floating conductors. Each electrode is one row/column of the capacitance matrix.
/// </summary>
/// <param name="Index">Position in <see cref="Design.Electrodes"/>.</param>
/// <param name="Name">Name of the first member conductor (members joined with '+' when several).</param>
/// <param name="ConductorIndices">Indices into <see cref="Design.Conductors"/>, in file order.</param>
/// <param name="PotentialVolts">Fixed potential, volts; null when floating.</param>
/// <param name="ChargeCoulombs">Total prescribed charge of a floating electrode, coulombs (per metre in planar); null when fixed.</param>
/// <param name="TouchesEnclosure">True when a member touches the enclosure (then it is at the enclosure potential).</param>
public sealed record Electrode(int Index, string Name, IReadOnlyList<int> ConductorIndices, double? PotentialVolts, double? ChargeCoulombs, bool TouchesEnclosure)
{
    /// <summary>True when the electrode potential is an unknown.</summary>
    public bool IsFloating => PotentialVolts is null;
}
