namespace Electrostat.Meshing.Designs;

/// <summary>Which design entity an input segment of a design graph was cut from.</summary>
/// <param name="Entity">Enclosure, conductor or dielectric.</param>
/// <param name="EntityIndex">Index of the conductor or dielectric (0 for the enclosure).</param>
/// <param name="ContourIndex">Contour of the entity's shape (0 = outer, 1.. = holes).</param>
/// <param name="CurveIndex">Curve segment within the contour.</param>
public readonly record struct SegmentSource(SourceEntity Entity, int EntityIndex, int ContourIndex, int CurveIndex);
