namespace Electrostat.Analysis.Corners;

/// <summary>What makes a <see cref="SingularCorner"/> singular.</summary>
public enum SingularPointKind
{
    /// <summary>A sharp conductor corner with a field-side angle above 180°.</summary>
    ConductorCorner = 0,

    /// <summary>A dielectric interface meeting a conductor (a triple junction) at a singular angle.</summary>
    TripleJunction = 1,
}
