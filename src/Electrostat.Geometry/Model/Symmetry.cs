namespace Electrostat.Geometry.Model;

/// <summary>How the 2D drawing stands for the 3D device.</summary>
public enum Symmetry
{
    /// <summary>
    /// The drawing is a cross-section of a device that extends a length <see cref="Design.DepthMetres"/> out of the plane.
    /// Quantities are per metre of depth unless multiplied by the depth.
    /// </summary>
    Planar = 0,

    /// <summary>The drawing is a half-plane cut through a body of revolution: x is the radius r ≥ 0, y is the axis z.</summary>
    Axisymmetric = 1,
}
