namespace Electrostat.Analysis.Forces;

/// <summary>The electrostatic force on one conductor.</summary>
/// <param name="ConductorName">Conductor name.</param>
/// <param name="ConductorIndex">Index into <c>Design.Conductors</c>.</param>
/// <param name="ForceXNewtons">x component: N per metre of depth (planar); 0 for axisymmetric (no net radial force on a body of revolution).</param>
/// <param name="ForceYNewtons">y component (planar, N/m) or axial z component (axisymmetric, total N).</param>
public sealed record ConductorForce(string ConductorName, int ConductorIndex, double ForceXNewtons, double ForceYNewtons)
{
    /// <summary>Magnitude of the force (N/m planar, N axisymmetric).</summary>
    public double MagnitudeNewtons => Math.Sqrt(ForceXNewtons * ForceXNewtons + ForceYNewtons * ForceYNewtons);
}
