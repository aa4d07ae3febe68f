using Electrostat.Meshing;

namespace Electrostat.Analysis.Recovery;

/// <summary>
/// The nodal field recovered from the piecewise-constant P1 field, kept separately for each material touching a
/// vertex (a "side"), and the Zienkiewicz–Zhu error indicator per triangle. Read-only.
/// </summary>
/// <remarks>
/// <para>Storage: vertex v has sides <c>SideStart[v] .. SideStart[v+1]-1</c>; side s belongs to region attribute
/// <see cref="SideRegion"/>[s] and carries the recovered field (<see cref="SideFieldXVoltsPerMetre"/>,
/// <see cref="SideFieldYVoltsPerMetre"/>) in V/m. <see cref="CornerSide"/>[3t+i] is the side used by corner i of
/// triangle t, so the recovered field inside t is the linear interpolation of its three corner sides. A vertex on an
/// interface between two materials therefore has two values and the jump of the normal field is kept.</para>
/// <para>Error indicator: η_T² = ∫_T (E* − E_h)·ε(E* − E_h) w dA with w = 1 (planar, per metre of depth) or 2πr
/// (axisymmetric), E* the recovered field and E_h the element field — the energy-norm indicator of Zienkiewicz and
/// Zhu (Int. J. Numer. Meth. Eng. 33, 1992). Units: J/m planar, J axisymmetric (twice an energy).</para>
/// </remarks>
public sealed class RecoveredField
{
    internal RecoveredField(TriangleMesh mesh, int[] sideStart, int[] sideRegion, double[] ex, double[] ey, int[] cornerSide,
        double[] errorSquared, double solutionNormSquared)
    {
        Mesh = mesh;
        SideStart = sideStart;
        SideRegion = sideRegion;
        SideFieldXVoltsPerMetre = ex;
        SideFieldYVoltsPerMetre = ey;
        CornerSide = cornerSide;
        ElementErrorSquared = errorSquared;
        double sum = 0;
        foreach (double e in errorSquared) sum += e;
        EstimatedErrorSquared = sum;
        SolutionEnergyNormSquared = solutionNormSquared;
    }

    /// <summary>The mesh the field lives on.</summary>
    public TriangleMesh Mesh { get; }

    /// <summary>CSR start of the sides of each vertex (length: vertex count + 1).</summary>
    public int[] SideStart { get; }

    /// <summary>Region attribute of each side.</summary>
    public int[] SideRegion { get; }

    /// <summary>Recovered x (or r) field component of each side, V/m.</summary>
    public double[] SideFieldXVoltsPerMetre { get; }

    /// <summary>Recovered y (or z) field component of each side, V/m.</summary>
    public double[] SideFieldYVoltsPerMetre { get; }

    /// <summary>Side used by corner i of triangle t, at index 3t + i.</summary>
    public int[] CornerSide { get; }

    /// <summary>η_T² per triangle (J/m planar, J axisymmetric); see the remarks.</summary>
    public double[] ElementErrorSquared { get; }

    /// <summary>Σ η_T², the global estimate of the squared energy-norm error of the field.</summary>
    public double EstimatedErrorSquared { get; }

    /// <summary>∫ E_h·εE_h w dA, the squared energy norm of the computed field (twice the field energy).</summary>
    public double SolutionEnergyNormSquared { get; }

    /// <summary>Estimated relative energy-norm error of the field, sqrt(Σ η_T² / ‖E_h‖²) (dimensionless).</summary>
    public double EstimatedRelativeError =>
        SolutionEnergyNormSquared > 0 ? Math.Sqrt(EstimatedErrorSquared / SolutionEnergyNormSquared) : 0;

    /// <summary>Number of sides (vertex–material pairs).</summary>
    public int SideCount => SideRegion.Length;

    /// <summary>|E*| of side s, V/m.</summary>
    /// <param name="side">Side index.</param>
    public double SideMagnitude(int side) =>
        Math.Sqrt(SideFieldXVoltsPerMetre[side] * SideFieldXVoltsPerMetre[side] + SideFieldYVoltsPerMetre[side] * SideFieldYVoltsPerMetre[side]);

    /// <summary>The side of vertex v for a region attribute, or -1 when no triangle of that region touches v.</summary>
    /// <param name="vertex">Vertex index.</param>
    /// <param name="regionAttribute">Region attribute.</param>
    public int SideOf(int vertex, int regionAttribute)
    {
        for (int s = SideStart[vertex]; s < SideStart[vertex + 1]; s++)
        {
            if (SideRegion[s] == regionAttribute) return s;
        }
        return -1;
    }

    /// <summary>Vertex index owning side s.</summary>
    /// <param name="side">Side index.</param>
    public int VertexOfSide(int side)
    {
        int idx = Array.BinarySearch(SideStart, side);
        if (idx >= 0)
        {
            // Several vertices may start at the same index only if some have no side (unused vertices); take the last.
            while (idx + 1 < SideStart.Length && SideStart[idx + 1] == side) idx++;
            return idx;
        }
        return ~idx - 1;
    }

    /// <summary>
    /// The recovered field at a point, interpolated linearly in the triangle containing it (found by a linear scan,
    /// intended for a few queries). Returns false outside the mesh.
    /// </summary>
    /// <param name="x">x (or r), metres.</param>
    /// <param name="y">y (or z), metres.</param>
    /// <param name="fieldX">x component, V/m.</param>
    /// <param name="fieldY">y component, V/m.</param>
    /// <param name="triangle">The triangle found.</param>
    public bool TryEvaluate(double x, double y, out double fieldX, out double fieldY, out int triangle)
    {
        fieldX = fieldY = 0;
        if (!Mesh.TryLocate(x, y, out triangle, out double l0, out double l1, out double l2)) return false;
        int t = triangle;
        int s0 = CornerSide[3 * t], s1 = CornerSide[3 * t + 1], s2 = CornerSide[3 * t + 2];
        fieldX = l0 * SideFieldXVoltsPerMetre[s0] + l1 * SideFieldXVoltsPerMetre[s1] + l2 * SideFieldXVoltsPerMetre[s2];
        fieldY = l0 * SideFieldYVoltsPerMetre[s0] + l1 * SideFieldYVoltsPerMetre[s1] + l2 * SideFieldYVoltsPerMetre[s2];
        return true;
    }
}
