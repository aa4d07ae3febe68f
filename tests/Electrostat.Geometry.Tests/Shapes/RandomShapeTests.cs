using Electrostat.Geometry.Shapes;
using NetTopologySuite.Algorithm.Locate;
using NetTopologySuite.Geometries;

namespace Electrostat.Geometry.Tests.Shapes;

/// <summary>
/// Random star-shaped polygons with random fillets: the exact area (Green's theorem over lines and arcs) and exact
/// point-in-contour test agree with NetTopologySuite on a very fine flattening, an independent implementation.
/// </summary>
public class RandomShapeTests
{
    private static readonly GeometryFactory Factory = new();

    private static Contour RandomFilletedStar(Random rng)
    {
        int n = rng.Next(3, 9);
        var angles = Enumerable.Range(0, n).Select(k => 2 * Math.PI * (k + 0.2 + 0.6 * rng.NextDouble()) / n).ToArray();
        var pts = angles.Select(a => { double r = 0.5 + rng.NextDouble(); return new Point2(r * Math.Cos(a), r * Math.Sin(a)); }).ToArray();
        // Fillet radii small enough for the shortest adjacent edge: d = r / tan(θ/2) must fit in half of each edge.
        var vertices = new PolygonVertex[n];
        for (int i = 0; i < n; i++)
        {
            var p = pts[i];
            var a = pts[(i + n - 1) % n];
            var b = pts[(i + 1) % n];
            var u1 = a - p;
            var u2 = b - p;
            double theta = Math.Acos(Math.Clamp(Point2.Dot(u1, u2) / (u1.Length * u2.Length), -1, 1));
            double room = 0.45 * Math.Min(u1.Length, u2.Length);
            double rMax = room * Math.Tan(theta / 2);
            vertices[i] = new PolygonVertex(p, rng.NextDouble() < 0.3 ? 0 : rMax * rng.NextDouble());
        }
        return ShapeFactory.Polygon(vertices);
    }

    [Fact]
    public void ExactAreaAndContains_AgreeWithNts()
    {
        var rng = new Random(20261201);
        for (int trial = 0; trial < 100; trial++)
        {
            var c = RandomFilletedStar(rng);
            var flat = c.Flatten(1e-7);
            var ring = Factory.CreateLinearRing(flat.Append(flat[0]).Select(p => new Coordinate(p.X, p.Y)).ToArray());
            var poly = Factory.CreatePolygon(ring);
            // Chords of sagitta ≤ 1e-7 change the area by at most (2/3)·1e-7 per unit of arc length.
            Assert.Equal(poly.Area, c.Area, 1e-6);
            var locator = new IndexedPointInAreaLocator(poly);
            for (int k = 0; k < 50; k++)
            {
                var p = new Point2(-1.6 + 3.2 * rng.NextDouble(), -1.6 + 3.2 * rng.NextDouble());
                if (c.DistanceTo(p) < 1e-6) continue; // too close to call on a flattened copy
                bool nts = locator.Locate(new Coordinate(p.X, p.Y)) == Location.Interior;
                Assert.True(nts == c.Contains(p), $"trial {trial}: point {p}");
            }
        }
    }
}
