using Electrostat.Geometry.Shapes;

namespace Electrostat.Geometry.Model;

/// <summary>
/// The outer boundary of the computed domain. Its segments are held at <see cref="PotentialVolts"/> except those
/// marked <see cref="BoundaryMarker.SymmetryPlane"/> (zero normal field) or <see cref="BoundaryMarker.Axis"/>
/// (the r = 0 axis of an axisymmetric design, marked automatically; natural condition).
/// </summary>
/// <param name="Shape">Exact outline; segment markers carry the boundary meaning. Holes are not allowed.</param>
/// <param name="PotentialVolts">Potential of the enclosure wall, volts (usually 0: grounded).</param>
/// <param name="IsShorthandBox">True when built from the "margin" shorthand around all bodies.</param>
public sealed record Enclosure(Shape Shape, double PotentialVolts, bool IsShorthandBox);
