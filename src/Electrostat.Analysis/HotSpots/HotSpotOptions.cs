namespace Electrostat.Analysis.HotSpots;

/// <summary>How hot spots are chosen (immutable).</summary>
/// <remarks>
/// Merging rule: maxima are taken in decreasing order of |E|; a maximum closer than the merge radius of an already
/// listed hot spot is merged into it. The merge radius of a hot spot is the larger of
/// <see cref="MeshSizeFactor"/> × the local mesh size and <see cref="GapFraction"/> × the local gap (the distance to
/// the nearest conductor at a potential other than that of the nearest conductor). So the maxima along one rounded
/// edge become one entry, while the two ends of an electrode stay separate.
/// </remarks>
public sealed record HotSpotOptions
{
    /// <summary>How many hot spots to list (default 10).</summary>
    public int Count { get; init; } = 10;

    /// <summary>Merge radius as a multiple of the local mesh size (default 4).</summary>
    public double MeshSizeFactor { get; init; } = 4;

    /// <summary>Merge radius as a fraction of the local gap (default 0.25).</summary>
    public double GapFraction { get; init; } = 0.25;
}
