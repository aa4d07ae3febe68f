namespace Electrostat.Meshing.Designs;

/// <summary>What a tagged boundary of a design mesh is (see <see cref="BoundaryTagTable"/>).</summary>
public enum BoundaryKind
{
    /// <summary>Surface of a conductor facing a meshed region.</summary>
    Conductor = 0,

    /// <summary>The enclosure wall (outer boundary, the enclosure potential applies).</summary>
    Enclosure = 1,

    /// <summary>An enclosure edge marked as a symmetry plane (zero normal field).</summary>
    SymmetryPlane = 2,

    /// <summary>The axis r = 0 of an axisymmetric design.</summary>
    Axis = 3,

    /// <summary>Interface between two different meshed regions (material interface).</summary>
    Interface = 4,

    /// <summary>The truncation circle of a design in open space (its field continues in the image disc).</summary>
    OpenBoundary = 5,

    /// <summary>The circle of the open-space image disc, which stands for all space outside <see cref="OpenBoundary"/>.</summary>
    OpenBoundaryImage = 6,
}
