using Electrostat.Geometry.Shapes;

namespace Electrostat.Analysis.Corners;

/// <summary>
/// A sharp conductor corner whose field-side angle β exceeds 180°: the exact field there is infinite and grows as
/// r^(π/β − 1) towards the corner (Jackson, Classical Electrodynamics, 3rd ed., §2.11), so no mesh gives a converged
/// peak. The corner is reported with the field at a stated distance instead of a maximum.
/// </summary>
/// <param name="ConductorName">The conductor (or "enclosure").</param>
/// <param name="ConductorIndex">Index into <c>Design.Conductors</c>, -1 for the enclosure wall.</param>
/// <param name="Location">The corner, metres.</param>
/// <param name="FieldSideAngleDegrees">β, the angle of the field region at the corner, degrees (&gt; 180).</param>
/// <param name="FieldExponent">π/β − 1 (negative): |E| ∝ r^FieldExponent near the corner.</param>
/// <param name="LocalGapMetres">Distance from the corner to the nearest conductor at another potential, metres.</param>
/// <param name="SuggestedFilletRadiusMetres">Suggested fillet radius (see <see cref="SingularCornerDetector"/>), metres.</param>
/// <param name="ReportDistanceMetres">δ: distance from the corner, along the bisector of the field side, where the field is reported; also the radius within which field values are excluded from material peaks. Metres.</param>
/// <param name="FieldAtReportDistanceVoltsPerMetre">Recovered |E| at δ on the bisector, V/m; null when the point is outside the mesh.</param>
/// <param name="MaterialName">Material at the report point, or null.</param>
/// <param name="ResolvedByMesh">True when the mesh near the corner is finer than δ/2, so the value at δ is resolved.</param>
/// <param name="Warning">One-line warning for the user, naming the corner, the conductor and the fix.</param>
public sealed record SingularCorner(
    string ConductorName,
    int ConductorIndex,
    Point2 Location,
    double FieldSideAngleDegrees,
    double FieldExponent,
    double LocalGapMetres,
    double SuggestedFilletRadiusMetres,
    double ReportDistanceMetres,
    double? FieldAtReportDistanceVoltsPerMetre,
    string? MaterialName,
    bool ResolvedByMesh,
    string Warning)
{
    /// <summary>Field at δ in kV/mm (for printing), or null.</summary>
    public double? FieldAtReportDistanceKilovoltsPerMillimetre => FieldAtReportDistanceVoltsPerMetre * 1e-6;
}
