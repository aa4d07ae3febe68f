namespace Electrostat.Geometry.Shapes;

/// <summary>What a boundary segment means to the solver, beyond the region it bounds.</summary>
/// <remarks>Only enclosure segments carry a marker other than <see cref="None"/>.</remarks>
public enum BoundaryMarker
{
    /// <summary>An ordinary boundary: on the enclosure it is held at the enclosure potential.</summary>
    None = 0,

    /// <summary>A mirror plane of the physical problem: zero normal field (natural Neumann condition).</summary>
    SymmetryPlane = 1,

    /// <summary>The rotation axis r = 0 of an axisymmetric design: natural condition, never an electrode.</summary>
    Axis = 2,

    /// <summary>The truncation circle of an open domain: the solver continues the field beyond it (no condition imposed).</summary>
    OpenBoundary = 3,
}
