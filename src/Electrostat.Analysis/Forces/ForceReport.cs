namespace Electrostat.Analysis.Forces;

/// <summary>Stored energy and the force on each conductor.</summary>
/// <param name="EnergyJoules">Field energy ½∫D·E dV: J per metre of depth (planar) or J (axisymmetric).</param>
/// <param name="TotalEnergyJoules">Total energy: the planar value times the design depth, J.</param>
/// <param name="PerMetreOfDepth">True for planar designs: forces and <paramref name="EnergyJoules"/> are per metre of depth.</param>
/// <param name="Forces">Force per design conductor with a meshed surface.</param>
public sealed record ForceReport(double EnergyJoules, double TotalEnergyJoules, bool PerMetreOfDepth, IReadOnlyList<ConductorForce> Forces);
