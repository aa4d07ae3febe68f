namespace Electrostat.Fem.Problem;

/// <summary>
/// The natural condition: no constraint. On an outer edge it means zero normal electric displacement (a symmetry
/// plane, or the axis r = 0 of an axisymmetric problem); on an internal edge (a dielectric interface) it means the
/// normal displacement is continuous, which the weak form gives for free.
/// </summary>
public sealed record NaturalBoundary : BoundaryRole;
