using Electrostat.Geometry.Shapes;

namespace Electrostat.Geometry.Model;

/// <summary>
/// An unbounded domain: the design sits in open space, and the enclosure is only the truncation circle (planar) or
/// half circle centred on the axis (axisymmetric) through which the solver maps the space outside onto a finite image
/// (Kelvin transformation, Freeman and Lowther, IEEE Trans. Magn. 25(5), 1989). The circle is not a wall: no
/// potential is imposed on it, and its size changes the answer only through the mesh resolution.
/// </summary>
/// <remarks>
/// The potential at infinity is the enclosure potential in axisymmetric designs (the reference of an isolated body,
/// C = Q/V). In planar designs a 2D potential grows like ln ρ unless the net charge is zero, so infinity is left free:
/// the conductors' charges sum to zero, the physical case of a self-contained set of conductors such as a line pair.
/// </remarks>
/// <param name="Center">Centre of the truncation circle, metres (x = 0 in axisymmetric designs).</param>
/// <param name="RadiusMetres">Radius of the truncation circle, metres.</param>
public sealed record OpenSpace(Point2 Center, double RadiusMetres);
