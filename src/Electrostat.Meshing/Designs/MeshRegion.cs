using Electrostat.Geometry.Model;

namespace Electrostat.Meshing.Designs;

/// <summary>Meaning of a region attribute in a mesh built from a design.</summary>
/// <param name="Attribute">The value in <see cref="TriangleMesh.TriangleRegion"/>: 0 for the background material, j + 1 for dielectric j.</param>
/// <param name="DielectricIndex">Index into <c>Design.Dielectrics</c>, or -1 for the background.</param>
/// <param name="Material">The material filling the region.</param>
public sealed record MeshRegion(int Attribute, int DielectricIndex, Material Material);
