namespace Electrostat.Meshing.Designs;

/// <summary>Meaning of one segment tag of a design mesh.</summary>
/// <param name="Tag">The tag value found in <see cref="TriangleMesh.SegmentTag"/>.</param>
/// <param name="Kind">What the boundary is.</param>
/// <param name="ConductorIndex">For <see cref="BoundaryKind.Conductor"/>: index into <c>Design.Conductors</c>; otherwise -1.</param>
/// <param name="ElectrodeIndex">For <see cref="BoundaryKind.Conductor"/>: index into <c>Design.Electrodes</c>; otherwise -1.</param>
/// <param name="RegionA">For <see cref="BoundaryKind.Interface"/>: the smaller region attribute of the two sides; otherwise -1.</param>
/// <param name="RegionB">For <see cref="BoundaryKind.Interface"/>: the larger region attribute of the two sides; otherwise -1.</param>
public sealed record BoundaryTag(int Tag, BoundaryKind Kind, int ConductorIndex, int ElectrodeIndex, int RegionA, int RegionB);
