using Electrostat.Geometry.Shapes;

namespace Electrostat.Analysis.Corners;

/// <summary>A sharp re-entrant corner found in the exact geometry (before any field is looked at).</summary>
/// <param name="ConductorName">Conductor name or "enclosure".</param>
/// <param name="ConductorIndex">Design conductor index, -1 for the enclosure.</param>
/// <param name="Location">Corner point, metres.</param>
/// <param name="BisectorX">Unit bisector of the field side, x.</param>
/// <param name="BisectorY">Unit bisector of the field side, y.</param>
/// <param name="FieldSideAngleRadians">β, radians.</param>
/// <param name="ShorterEdgeMetres">Length of the shorter of the two pieces meeting at the corner, metres.</param>
internal readonly record struct CornerGeometry(string ConductorName, int ConductorIndex, Point2 Location, double BisectorX, double BisectorY,
    double FieldSideAngleRadians, double ShorterEdgeMetres);
