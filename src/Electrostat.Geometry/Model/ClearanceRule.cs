namespace Electrostat.Geometry.Model;

/// <summary>A minimum clearance required between two named conductors, overriding the design-wide value.</summary>
/// <param name="ConductorA">First conductor name.</param>
/// <param name="ConductorB">Second conductor name.</param>
/// <param name="MinClearanceMetres">Minimum straight-line distance through the domain, metres.</param>
public sealed record ClearanceRule(string ConductorA, string ConductorB, double MinClearanceMetres);
