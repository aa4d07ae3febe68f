using Electrostat.Geometry.Shapes;

namespace Electrostat.Geometry.Model;

/// <summary>
/// The outer boundary of the computed domain. Its segments are held at <see cref="PotentialVolts"/> except those
/// marked <see cref="BoundaryMarker.SymmetryPlane"/> (zero normal field) or <see cref="BoundaryMarker.Axis"/>
/// (the r = 0 axis of an axisymmetric design, marked automatically; natural condition) or
/// <see cref="BoundaryMarker.OpenBoundary"/> (the truncation circle of an open domain, see <see cref="OpenSpace"/>).
/// </summary>
/// <param name="Shape">Exact outline; segment markers carry the boundary meaning. Holes are not allowed.</param>
/// <param name="PotentialVolts">Potential of the enclosure wall, volts (usually 0: grounded).</param>
/// <param name="IsShorthandBox">True when built from the "margin" shorthand around all bodies.</param>
/// <param name="Open">Set when the design is in open space; <see cref="Shape"/> is then the truncation circle (or
/// half disc on the axis) and <see cref="PotentialVolts"/> the potential at infinity.</param>
public sealed record Enclosure(Shape Shape, double PotentialVolts, bool IsShorthandBox, OpenSpace? Open = null)
{
    /// <summary>True when the design is in open space (no grounded wall).</summary>
    public bool IsOpen => Open is not null;
}
