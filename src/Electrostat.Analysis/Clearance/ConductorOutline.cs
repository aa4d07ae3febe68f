using Electrostat.Geometry.Model;
using Electrostat.Geometry.Shapes;

namespace Electrostat.Analysis.Clearance;

/// <summary>
/// The exact outline of one conductor of a design (or of the enclosure wall, without its symmetry-plane and axis
/// pieces) with its potential, for distance queries.
/// </summary>
/// <param name="Name">Conductor name, or <see cref="EnclosureName"/>.</param>
/// <param name="ConductorIndex">Index into <c>Design.Conductors</c>, or -1 for the enclosure.</param>
/// <param name="PotentialVolts">Potential, volts (computed for floating conductors).</param>
/// <param name="Segments">The exact boundary pieces, metres.</param>
public sealed record ConductorOutline(string Name, int ConductorIndex, double PotentialVolts, IReadOnlyList<CurveSegment> Segments)
{
    /// <summary>Name used for the enclosure wall in clearance and hot-spot reports.</summary>
    public const string EnclosureName = "enclosure";

    /// <summary>Outlines of every conductor and the enclosure wall of a design.</summary>
    /// <param name="design">The design.</param>
    /// <param name="potentialVolts">Potential of design conductor k, volts.</param>
    /// <returns>Conductors in design order, then the enclosure (when any of its wall is held at its potential).</returns>
    public static IReadOnlyList<ConductorOutline> Of(Design design, Func<int, double> potentialVolts)
    {
        ArgumentNullException.ThrowIfNull(design);
        ArgumentNullException.ThrowIfNull(potentialVolts);
        var list = new List<ConductorOutline>();
        for (int k = 0; k < design.Conductors.Count; k++)
        {
            var c = design.Conductors[k];
            list.Add(new ConductorOutline(c.Name, k, potentialVolts(k), c.Shape.Contours.SelectMany(x => x.Segments).ToArray()));
        }
        var wall = design.Enclosure.Shape.Contours.SelectMany(x => x.Segments).Where(s => s.Marker == BoundaryMarker.None).ToArray();
        if (wall.Length > 0) list.Add(new ConductorOutline(EnclosureName, -1, design.Enclosure.PotentialVolts, wall));
        return list;
    }

    /// <summary>Exact distance from a point to this outline, metres, and the closest point.</summary>
    /// <param name="p">The point, metres.</param>
    public (double Distance, Point2 Closest) DistanceTo(Point2 p)
    {
        double best = double.PositiveInfinity;
        var at = p;
        foreach (var s in Segments)
        {
            var q = SegmentDistance.ClosestPoint(s, p);
            double d = q.DistanceTo(p);
            if (d < best) { best = d; at = q; }
        }
        return (best, at);
    }

    /// <summary>Exact minimum distance between this outline and another, metres, with the closest points.</summary>
    /// <param name="other">The other outline.</param>
    public (double Distance, Point2 OnThis, Point2 OnOther) DistanceTo(ConductorOutline other)
    {
        ArgumentNullException.ThrowIfNull(other);
        var best = (Distance: double.PositiveInfinity, OnThis: default(Point2), OnOther: default(Point2));
        foreach (var a in Segments)
        {
            foreach (var b in other.Segments)
            {
                var r = SegmentDistance.Between(a, b);
                if (r.Distance < best.Distance) best = (r.Distance, r.A, r.B);
            }
        }
        return best;
    }
}
