using Electrostat.Geometry.Shapes;
using NetTopologySuite.Geometries;

namespace Electrostat.Geometry.Regions;

/// <summary>Conversions between exact shapes and NetTopologySuite polygons (flattened).</summary>
internal static class NtsShapes
{
    public static readonly GeometryFactory Factory = new(new PrecisionModel(), 0);

    public static LinearRing ToRing(Contour contour, double chordToleranceMetres)
    {
        var pts = contour.Flatten(chordToleranceMetres);
        var coords = new Coordinate[pts.Count + 1];
        for (int i = 0; i < pts.Count; i++) coords[i] = new Coordinate(pts[i].X, pts[i].Y);
        coords[^1] = coords[0];
        return Factory.CreateLinearRing(coords);
    }

    public static Polygon ToPolygon(Shape shape, double chordToleranceMetres) =>
        Factory.CreatePolygon(ToRing(shape.Outer, chordToleranceMetres), shape.Holes.Select(h => ToRing(h, chordToleranceMetres)).ToArray());

    public static Polygon ToPolygon(Contour contour, double chordToleranceMetres) =>
        Factory.CreatePolygon(ToRing(contour, chordToleranceMetres));

    public static Point2 ToPoint(Coordinate c) => new(c.X, c.Y);
}
