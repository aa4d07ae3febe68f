namespace Electrostat.Analysis.Adaptivity;

/// <summary>One level of the adaptive loop: the mesh size, what was measured on it and what it cost.</summary>
/// <param name="Index">Level number, 0 for the initial mesh.</param>
/// <param name="Triangles">Triangles of the mesh.</param>
/// <param name="Vertices">Vertices of the mesh.</param>
/// <param name="Peaks">Peak |E| per material (singular-corner discs excluded).</param>
/// <param name="Capacitance">Maxwell capacitance matrix (F/m planar, F axisymmetric), or null when not computed.</param>
/// <param name="EstimatedEnergyError">Global residual estimate η (energy norm: √J, or √(J/m) planar).</param>
/// <param name="Iterations">Conjugate-gradient iterations of the design solve.</param>
/// <param name="MeshSeconds">Refinement and export time of this level's mesh, seconds.</param>
/// <param name="SolveSeconds">Design solve and capacitance solves (assembly, setup, iterations), seconds.</param>
/// <param name="EstimateSeconds">Error estimation, marking and measuring, seconds.</param>
public sealed record AdaptiveLevel(
    int Index,
    int Triangles,
    int Vertices,
    IReadOnlyList<MaterialPeak> Peaks,
    double[,]? Capacitance,
    double EstimatedEnergyError,
    int Iterations,
    double MeshSeconds,
    double SolveSeconds,
    double EstimateSeconds)
{
    /// <summary>Total time of the level, seconds.</summary>
    public double TotalSeconds => MeshSeconds + SolveSeconds + EstimateSeconds;
}
