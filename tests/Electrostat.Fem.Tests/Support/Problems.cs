using Electrostat.Fem.Problem;
using Electrostat.Meshing;

namespace Electrostat.Fem.Tests.Support;

/// <summary>Shorthands for building test problems.</summary>
internal static class Problems
{
    public const double Eps0 = Electrostat.Fem.Elements.PhysicalConstants.VacuumPermittivity;

    public static ElectrostaticProblem Make(TriangleMesh mesh, IReadOnlyList<ConductorDefinition> conductors,
        Dictionary<int, BoundaryRole> roles, Dictionary<int, RegionMaterial>? materials = null, ProblemSymmetry symmetry = ProblemSymmetry.Planar) =>
        new()
        {
            Mesh = mesh,
            Symmetry = symmetry,
            Conductors = conductors,
            Boundaries = roles,
            Materials = materials ?? mesh.TriangleRegion.Distinct().ToDictionary(r => r, _ => RegionMaterial.Vacuum),
        };

    public static BoundaryRole On(int conductor) => new ConductorBoundary(conductor);

    public static BoundaryRole Enclosure(double v = 0) => new EnclosureBoundary(v);

    public static BoundaryRole Natural => new NaturalBoundary();
}
