namespace Electrostat.Fem.Problem;

/// <summary>The segment lies on the surface of conductor <paramref name="ConductorIndex"/> (index into
/// <see cref="ElectrostaticProblem.Conductors"/>).</summary>
/// <param name="ConductorIndex">Zero-based conductor index.</param>
public sealed record ConductorBoundary(int ConductorIndex) : BoundaryRole;
