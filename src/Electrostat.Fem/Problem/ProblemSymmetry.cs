namespace Electrostat.Fem.Problem;

/// <summary>How the 2D mesh stands for a 3D body.</summary>
/// <remarks>
/// Convention for every quantity this layer reports (stated once, here):
/// <list type="bullet">
/// <item><see cref="Planar"/>: the cross-section of a body infinitely long in the third direction. Charges,
/// energies and capacitances are reported <b>per metre of depth</b> (C/m, J/m, F/m); totals are those values times
/// <see cref="ElectrostaticProblem.DepthMetres"/>.</item>
/// <item><see cref="Axisymmetric"/>: a body of revolution about the axis x = r = 0, with y = z. Charges, energies
/// and capacitances are <b>totals over the full 2π revolution</b> (C, J, F). The axis takes the natural condition
/// (no field crosses it), which holds by symmetry.</item>
/// </list>
/// </remarks>
public enum ProblemSymmetry
{
    /// <summary>Planar cross-section, results per metre of depth.</summary>
    Planar = 0,

    /// <summary>Body of revolution about x = r = 0, results as totals over 2π.</summary>
    Axisymmetric = 1,
}
