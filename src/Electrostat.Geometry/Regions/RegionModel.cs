using Electrostat.Geometry.Model;
using Electrostat.Geometry.Shapes;
using NetTopologySuite.Geometries;
using NetTopologySuite.Operation.Distance;
using NetTopologySuite.Operation.Overlay;
using NetTopologySuite.Operation.OverlayNG;

namespace Electrostat.Geometry.Regions;

/// <summary>
/// Region assembly of a <see cref="Design"/>: the domain (enclosure minus conductors) split into material regions by
/// the priority rule, with areas and distances. Computed with NetTopologySuite on shapes flattened to a chord
/// tolerance of 1e-6 of the enclosure diagonal, so areas carry a relative error of order 1e-6.
/// </summary>
public sealed class RegionModel
{
    private readonly Polygon[] _conductors;

    internal RegionModel(Design design)
    {
        ChordToleranceMetres = 1e-6 * design.Bounds.Diagonal;
        var enclosure = NtsShapes.ToPolygon(design.Enclosure.Shape, ChordToleranceMetres);
        _conductors = design.Conductors.Select(c => NtsShapes.ToPolygon(c.Shape, ChordToleranceMetres)).ToArray();
        NetTopologySuite.Geometries.Geometry domain = enclosure;
        foreach (var c in _conductors) domain = Op(domain, c, SpatialFunction.Difference);
        DomainAreaSquareMetres = domain.Area;

        // Later dielectrics win: walk from last to first, removing what later ones already claimed.
        var visible = new double[design.Dielectrics.Count];
        NetTopologySuite.Geometries.Geometry claimed = NtsShapes.Factory.CreatePolygon();
        for (int j = design.Dielectrics.Count - 1; j >= 0; j--)
        {
            var poly = NtsShapes.ToPolygon(design.Dielectrics[j].Shape, ChordToleranceMetres);
            var inDomain = Op(poly, domain, SpatialFunction.Intersection);
            var own = Op(inDomain, claimed, SpatialFunction.Difference);
            visible[j] = own.Area;
            claimed = Op(claimed, inDomain, SpatialFunction.Union);
        }
        DielectricAreasSquareMetres = visible;
        BackgroundAreaSquareMetres = Math.Max(0, DomainAreaSquareMetres - claimed.Area);

        var byMaterial = new Dictionary<string, double>(StringComparer.Ordinal);
        void Add(string name, double a) => byMaterial[name] = byMaterial.GetValueOrDefault(name) + a;
        if (BackgroundAreaSquareMetres > 0) Add(design.BackgroundMaterial.Name, BackgroundAreaSquareMetres);
        for (int j = 0; j < visible.Length; j++) Add(design.Dielectrics[j].Material.Name, visible[j]);
        MaterialAreasSquareMetres = byMaterial;
        ConductorAreasSquareMetres = design.Conductors.Select(c => c.Shape.Area).ToArray();
    }

    /// <summary>A boolean operation keeping only the areal part (touching bodies can leave lines and points behind).</summary>
    private static NetTopologySuite.Geometries.Geometry Op(NetTopologySuite.Geometries.Geometry a, NetTopologySuite.Geometries.Geometry b, SpatialFunction f)
    {
        var r = OverlayNGRobust.Overlay(a, b, f);
        if (r is Polygon or MultiPolygon) return r;
        var polys = new List<Polygon>();
        for (int i = 0; i < r.NumGeometries; i++)
        {
            var g = r.GetGeometryN(i);
            if (g is Polygon p) polys.Add(p);
            else if (g is MultiPolygon mp) polys.AddRange(mp.Geometries.Cast<Polygon>());
        }
        return NtsShapes.Factory.CreateMultiPolygon(polys.ToArray());
    }

    /// <summary>Chord tolerance used to flatten arcs for these computations, metres.</summary>
    public double ChordToleranceMetres { get; }

    /// <summary>Area of the domain (enclosure minus conductors), m².</summary>
    public double DomainAreaSquareMetres { get; }

    /// <summary>Area filled by the background material, m².</summary>
    public double BackgroundAreaSquareMetres { get; }

    /// <summary>Area each dielectric actually fills after the priority rule (inside the domain, not covered by later ones), m².</summary>
    public IReadOnlyList<double> DielectricAreasSquareMetres { get; }

    /// <summary>Exact area of each conductor's shape, m².</summary>
    public IReadOnlyList<double> ConductorAreasSquareMetres { get; }

    /// <summary>Area per material name (background included), m².</summary>
    public IReadOnlyDictionary<string, double> MaterialAreasSquareMetres { get; }

    /// <summary>
    /// Shortest straight distance between two conductors, metres, with the nearest points (ignores whatever lies between).
    /// Accurate to the chord tolerance.
    /// </summary>
    public (double DistanceMetres, Point2 OnA, Point2 OnB) ConductorClearance(int conductorA, int conductorB)
    {
        var a = _conductors[conductorA];
        var b = _conductors[conductorB];
        if (a.Intersects(b))
        {
            var p = NtsShapes.ToPoint(a.Intersection(b).InteriorPoint.Coordinate);
            return (0, p, p);
        }
        // Indexed facet distance: the naive polygon distance is quadratic in the vertex count of finely flattened arcs.
        var pts = IndexedFacetDistance.NearestPoints(a, b);
        return (pts[0].Distance(pts[1]), NtsShapes.ToPoint(pts[0]), NtsShapes.ToPoint(pts[1]));
    }
}
