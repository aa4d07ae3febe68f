namespace Electrostat.Geometry.Shapes;

/// <summary>A polygon corner with an optional fillet (rounding) radius.</summary>
/// <param name="Point">Corner position, metres.</param>
/// <param name="FilletRadiusMetres">Radius of the tangent arc replacing the corner, metres; 0 keeps a sharp corner.</param>
public readonly record struct PolygonVertex(Point2 Point, double FilletRadiusMetres = 0);
