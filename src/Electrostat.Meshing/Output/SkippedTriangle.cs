namespace Electrostat.Meshing.Output;

/// <summary>A triangle left below the minimum-angle bound, and why the mesher could not improve it.</summary>
/// <param name="Triangle">Triangle index in the exported mesh.</param>
/// <param name="MinAngleDegrees">Its smallest angle, degrees.</param>
/// <param name="Reason">Why it was left.</param>
public readonly record struct SkippedTriangle(int Triangle, double MinAngleDegrees, SkipCause Reason);
