namespace Electrostat.Geometry.Model;

/// <summary>Result of <see cref="Design.Classify(double, double)"/>.</summary>
/// <param name="Kind">Kind of region.</param>
/// <param name="Index">Index into <see cref="Design.Conductors"/> or <see cref="Design.Dielectrics"/> for those kinds, else -1.</param>
public readonly record struct RegionHit(RegionKind Kind, int Index);
