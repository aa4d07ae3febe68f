namespace Electrostat.Meshing.Input;

/// <summary>
/// A point inside a region of the planar graph, with the attribute that every triangle reached from it by flood fill
/// (without crossing a segment) receives, and an optional maximum edge length for that region.
/// </summary>
/// <param name="X">x coordinate, metres.</param>
/// <param name="Y">y coordinate, metres.</param>
/// <param name="Attribute">Region attribute copied to <see cref="TriangleMesh.TriangleRegion"/>.</param>
/// <param name="MaxEdgeLengthMetres">Largest allowed triangle edge in this region, metres; null for no region limit.</param>
public readonly record struct RegionSeed(double X, double Y, int Attribute, double? MaxEdgeLengthMetres = null);
