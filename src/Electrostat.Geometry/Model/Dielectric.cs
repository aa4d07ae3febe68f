using Electrostat.Geometry.Shapes;

namespace Electrostat.Geometry.Model;

/// <summary>A dielectric body: a shape filled with a material.</summary>
/// <remarks>
/// Overlap rule: conductors win over dielectrics; among dielectrics the later entry in <see cref="Design.Dielectrics"/>
/// (file order) wins where they overlap.
/// </remarks>
/// <param name="Name">Name from the design file (unique among dielectrics).</param>
/// <param name="Material">The filling material.</param>
/// <param name="Shape">Exact outline.</param>
public sealed record Dielectric(string Name, Material Material, Shape Shape)
{
    /// <summary>Name of the filling material (key into <see cref="Design.Materials"/>).</summary>
    public string MaterialName => Material.Name;
}
