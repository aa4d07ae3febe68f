namespace Electrostat.Analysis.Adaptivity;

/// <summary>
/// A small disc around a singular point (a sharp re-entrant conductor corner) left out of the peak-field
/// convergence test, because the exact field there is unbounded and the discrete peak only grows with refinement.
/// </summary>
/// <param name="XMetres">Centre x (r for axisymmetric), metres.</param>
/// <param name="YMetres">Centre y (z for axisymmetric), metres.</param>
/// <param name="RadiusMetres">Radius, metres.</param>
/// <param name="Label">What the point is, for reports (e.g. "corner of hv_bar at (20, 10) mm").</param>
public sealed record ExclusionDisc(double XMetres, double YMetres, double RadiusMetres, string Label)
{
    /// <summary>True when (x, y) lies in the disc.</summary>
    /// <param name="x">x, metres.</param>
    /// <param name="y">y, metres.</param>
    public bool Contains(double x, double y) =>
        (x - XMetres) * (x - XMetres) + (y - YMetres) * (y - YMetres) <= RadiusMetres * RadiusMetres;
}
