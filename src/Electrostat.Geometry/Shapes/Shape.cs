namespace Electrostat.Geometry.Shapes;

/// <summary>A region of the plane: an outer <see cref="Contour"/> minus hole contours, with exact geometry.</summary>
/// <remarks>
/// Orientation convention: <see cref="Outer"/> is counter-clockwise and every hole clockwise; the constructor
/// normalises the given contours. Holes are expected to lie inside the outer contour and not to overlap each other
/// (the loader checks this for design files).
/// </remarks>
public sealed class Shape
{
    /// <summary>Creates a shape, normalising orientations (outer counter-clockwise, holes clockwise).</summary>
    public Shape(Contour outer, IEnumerable<Contour>? holes = null)
    {
        ArgumentNullException.ThrowIfNull(outer);
        Outer = outer.WithOrientation(counterClockwise: true);
        Holes = (holes ?? []).Select(h => h.WithOrientation(counterClockwise: false)).ToArray();
    }

    /// <summary>Outer boundary, counter-clockwise.</summary>
    public Contour Outer { get; }

    /// <summary>Hole boundaries, clockwise.</summary>
    public IReadOnlyList<Contour> Holes { get; }

    /// <summary>Exact area (outer minus holes), m².</summary>
    public double Area => Outer.Area - Holes.Sum(h => h.Area);

    /// <summary>Exact bounds of the outer contour, metres.</summary>
    public BoundingBox Bounds => Outer.Bounds;

    /// <summary>All contours: the outer first, then the holes.</summary>
    public IEnumerable<Contour> Contours => Holes.Prepend(Outer);

    /// <summary>Exact point-in-shape test (inside the outer contour and inside no hole).</summary>
    public bool Contains(Point2 p) => Outer.Contains(p) && !Holes.Any(h => h.Contains(p));

    /// <summary>Exact distance from a point to the nearest boundary of the shape, metres.</summary>
    public double BoundaryDistanceTo(Point2 p) => Contours.Min(c => c.DistanceTo(p));

    /// <summary>The shape with its holes replaced.</summary>
    public Shape WithHoles(IEnumerable<Contour> holes) => new(Outer, holes);
}
