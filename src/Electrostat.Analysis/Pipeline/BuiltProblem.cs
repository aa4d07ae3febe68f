using Electrostat.Fem.Problem;
using Electrostat.Meshing.Designs;

namespace Electrostat.Analysis.Pipeline;

/// <summary>
/// A design turned into a field problem on one mesh, with the maps back to the design: which electrode each terminal
/// is and which design material each region attribute is.
/// </summary>
/// <param name="Problem">The field problem (SI units; see <see cref="ProblemSymmetry"/> for per-metre versus totals).</param>
/// <param name="TerminalElectrodes">For each conductor of <see cref="ElectrostaticProblem.Conductors"/> (a capacitance
/// terminal), the index into <c>Design.Electrodes</c> of the electrode it stands for.</param>
/// <param name="Regions">Meaning of every region attribute present in the mesh (material, dielectric index).</param>
/// <param name="Tags">Meaning of every segment tag.</param>
public sealed record BuiltProblem(
    ElectrostaticProblem Problem,
    IReadOnlyList<int> TerminalElectrodes,
    IReadOnlyList<MeshRegion> Regions,
    BoundaryTagTable Tags)
{
    /// <summary>The design material of a region attribute.</summary>
    /// <param name="attribute">Region attribute from <c>TriangleMesh.TriangleRegion</c>.</param>
    public Electrostat.Geometry.Model.Material MaterialOf(int attribute)
    {
        foreach (var r in Regions)
        {
            if (r.Attribute == attribute) return r.Material;
        }
        throw new ArgumentOutOfRangeException(nameof(attribute), attribute, "No such region attribute in this mesh.");
    }
}
