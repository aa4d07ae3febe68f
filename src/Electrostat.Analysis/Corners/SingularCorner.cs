using Electrostat.Geometry.Shapes;

namespace Electrostat.Analysis.Corners;

/// <summary>
/// A point where the exact field is infinite, so no mesh gives a converged peak: a sharp conductor corner whose
/// field-side angle β exceeds 180° (|E| grows as r^(π/β − 1); Jackson, Classical Electrodynamics, 3rd ed., §2.11), or a
/// triple junction where a dielectric meets a conductor at an angle that makes the leading exponent of
/// <see cref="WedgeExponent"/> fall below 1. It is reported with the field at a stated distance instead of a maximum.
/// </summary>
/// <param name="ConductorName">The conductor (or "enclosure").</param>
/// <param name="ConductorIndex">Index into <c>Design.Conductors</c>, -1 for the enclosure wall.</param>
/// <param name="Location">The corner, metres.</param>
/// <param name="FieldSideAngleDegrees">β, the angle of the field region at the corner, degrees (&gt; 180 for a corner).</param>
/// <param name="FieldExponent">λ − 1 (negative): |E| ∝ r^FieldExponent near the point; π/β − 1 for a corner in one material.</param>
/// <param name="LocalGapMetres">Distance from the corner to the nearest conductor at another potential, metres.</param>
/// <param name="SuggestedFilletRadiusMetres">Suggested fillet radius (see <see cref="SingularCornerDetector"/>), metres; 0 for a triple junction (the remedy there is the contact angle).</param>
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
    /// <summary>A sharp conductor corner (the default) or a triple junction (a dielectric interface meeting a
    /// conductor at an angle that makes the field singular).</summary>
    public SingularPointKind Kind { get; init; } = SingularPointKind.ConductorCorner;

    /// <summary>Field at δ in kV/mm (for printing), or null.</summary>
    public double? FieldAtReportDistanceKilovoltsPerMillimetre => FieldAtReportDistanceVoltsPerMetre * 1e-6;
}
