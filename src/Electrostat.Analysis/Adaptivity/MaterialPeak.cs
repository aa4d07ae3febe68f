namespace Electrostat.Analysis.Adaptivity;

/// <summary>The largest field magnitude found in one material on one mesh, and where.</summary>
/// <param name="MaterialName">Design material name.</param>
/// <param name="FieldVoltsPerMetre">Peak |E|, V/m.</param>
/// <param name="XMetres">Location x (r for axisymmetric), metres.</param>
/// <param name="YMetres">Location y (z for axisymmetric), metres.</param>
/// <param name="OnConductorSurface">True when the peak is a conductor-surface value (from the surface charge), false
/// when it is the field of a triangle (reported at its centroid).</param>
public sealed record MaterialPeak(string MaterialName, double FieldVoltsPerMetre, double XMetres, double YMetres, bool OnConductorSurface);
