using Electrostat.Geometry.Model;

namespace Electrostat.Meshing.Designs;

/// <summary>
/// The extra piece of a mesh for a design in open space: a disc (planar) or half disc on the axis (axisymmetric) of
/// the truncation radius, placed beside the design, that stands for all space outside the truncation circle under
/// the Kelvin map ρ' = R²/ρ (see <see cref="OpenSpace"/>). Both circles carry the same vertices at the same angles;
/// their segments are protected so that refinement never splits one without the other.
/// </summary>
/// <param name="InteriorTag">Segment tag of the truncation circle (kind <see cref="BoundaryKind.OpenBoundary"/>).</param>
/// <param name="ImageTag">Segment tag of the image disc's circle (kind <see cref="BoundaryKind.OpenBoundaryImage"/>).</param>
/// <param name="ImageRegion">Region attribute of the image disc's triangles; not a design region (absent from
/// <see cref="DesignMeshInput.Regions"/>), so analysis and pictures leave it out.</param>
/// <param name="RadiusMetres">Radius R of both circles, metres.</param>
/// <param name="CenterX">Truncation circle centre x, metres.</param>
/// <param name="CenterY">Truncation circle centre y, metres.</param>
/// <param name="ImageCenterX">Image disc centre x (the point at infinity), metres; a mesh vertex.</param>
/// <param name="ImageCenterY">Image disc centre y, metres.</param>
/// <param name="Material">The material of the space outside the circle (the design's background).</param>
public sealed record OpenSpaceImage(
    int InteriorTag,
    int ImageTag,
    int ImageRegion,
    double RadiusMetres,
    double CenterX,
    double CenterY,
    double ImageCenterX,
    double ImageCenterY,
    Material Material);
