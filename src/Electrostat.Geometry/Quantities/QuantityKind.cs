namespace Electrostat.Geometry.Quantities;

/// <summary>The physical dimension of a numeric field in the design file, which decides its units.</summary>
/// <remarks>
/// Default units for bare numbers: lengths in the design's <c>units</c>, potential in V, field in V/m, charge in C,
/// angles in degrees; dimensionless values take no unit.
/// </remarks>
public enum QuantityKind
{
    /// <summary>A pure number (relative permittivity, margin factor).</summary>
    Dimensionless = 0,

    /// <summary>A length; SI unit metre.</summary>
    Length = 1,

    /// <summary>An electric potential; SI unit volt.</summary>
    Potential = 2,

    /// <summary>An electric field strength; SI unit volt per metre.</summary>
    Field = 3,

    /// <summary>An electric charge; SI unit coulomb (per metre of depth in planar designs).</summary>
    Charge = 4,

    /// <summary>An angle; SI unit radian (bare numbers in the file are degrees).</summary>
    Angle = 5,
}
