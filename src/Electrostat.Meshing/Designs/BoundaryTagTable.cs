namespace Electrostat.Meshing.Designs;

/// <summary>
/// The published meaning of every segment tag in a mesh built from a design: tag → conductor k, enclosure, symmetry
/// plane, axis, or interface between regions a and b. Tags are 1, 2, 3, … in order of first appearance.
/// </summary>
public sealed class BoundaryTagTable
{
    private readonly List<BoundaryTag> _tags = new();
    private readonly Dictionary<(BoundaryKind, int, int, int), int> _index = new();

    /// <summary>All tags in order (entry i has tag i + 1).</summary>
    public IReadOnlyList<BoundaryTag> Tags => _tags;

    /// <summary>The meaning of a tag.</summary>
    /// <param name="tag">Tag value (1-based).</param>
    public BoundaryTag this[int tag] => _tags[tag - 1];

    /// <summary>Tags of a given kind.</summary>
    /// <param name="kind">The kind.</param>
    /// <returns>Matching tags.</returns>
    public IEnumerable<BoundaryTag> OfKind(BoundaryKind kind) => _tags.Where(t => t.Kind == kind);

    /// <summary>The tag of conductor k's surface, or null if it has no meshed neighbour.</summary>
    /// <param name="conductorIndex">Index into <c>Design.Conductors</c>.</param>
    /// <returns>The tag or null.</returns>
    public int? ConductorTag(int conductorIndex) =>
        _index.TryGetValue((BoundaryKind.Conductor, conductorIndex, -1, -1), out int t) ? t : null;

    internal int GetOrAdd(BoundaryKind kind, int conductor, int electrode, int regionA, int regionB)
    {
        var key = (kind, conductor, regionA, regionB);
        if (_index.TryGetValue(key, out int tag)) return tag;
        tag = _tags.Count + 1;
        _tags.Add(new BoundaryTag(tag, kind, conductor, electrode, regionA, regionB));
        _index[key] = tag;
        return tag;
    }
}
