namespace Electrostat.Numerics.Multigrid;

/// <summary>Size of one level of the multigrid hierarchy.</summary>
/// <param name="Level">0 for the finest.</param>
/// <param name="Rows">Number of unknowns on the level.</param>
/// <param name="NonZeros">Stored entries of the level matrix.</param>
public sealed record AmgLevelStats(int Level, int Rows, long NonZeros);
