namespace Electrostat.Fem.Problem;

/// <summary>
/// What a tagged mesh segment means to the field problem. Every segment tag in the mesh must be given a role
/// (except the two arc tags of a <see cref="KelvinOpenBoundary"/>), so that a forgotten conductor never silently
/// turns into a symmetry plane.
/// </summary>
public abstract record BoundaryRole;
