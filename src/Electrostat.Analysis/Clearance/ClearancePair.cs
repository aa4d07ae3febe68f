using Electrostat.Geometry.Shapes;

namespace Electrostat.Analysis.Clearance;

/// <summary>The geometric clearance between two conductors at different potentials.</summary>
/// <param name="ConductorA">First conductor name (design order; the enclosure last).</param>
/// <param name="ConductorB">Second conductor name.</param>
/// <param name="VoltageDifferenceVolts">|V_A − V_B|, volts.</param>
/// <param name="DistanceMetres">Exact shortest straight distance between the outlines, metres.</param>
/// <param name="PointA">Closest point on A, metres.</param>
/// <param name="PointB">Closest point on B, metres.</param>
/// <param name="RequiredMetres">Required clearance from the design's checks (pair rule or <c>min_clearance</c>); null when none.</param>
/// <param name="Verdict">Pass/fail against <paramref name="RequiredMetres"/>; not checked without a requirement.</param>
/// <param name="PcbRequiredMetres">Spacing from the PCB spacing table for the requested category and this voltage, metres; null when no category was requested.</param>
/// <param name="PcbVerdict">Pass/fail against <paramref name="PcbRequiredMetres"/>.</param>
public sealed record ClearancePair(
    string ConductorA,
    string ConductorB,
    double VoltageDifferenceVolts,
    double DistanceMetres,
    Point2 PointA,
    Point2 PointB,
    double? RequiredMetres,
    CheckVerdict Verdict,
    double? PcbRequiredMetres,
    CheckVerdict PcbVerdict);
