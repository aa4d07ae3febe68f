namespace Electrostat.Meshing;

/// <summary>
/// Immutable settings of the quality mesher. Lengths are in metres.
/// </summary>
/// <remarks>
/// The target element size at a point is the smallest of <see cref="MaxEdgeLengthMetres"/>, the region seed's
/// size, <see cref="SizeFunction"/> and the automatic grading size; a triangle whose longest edge exceeds the target
/// at its centroid is split. Independently, a triangle whose smallest angle is below <see cref="MinAngleDegrees"/>
/// is split, except where an input angle is too small for that to succeed (those are skipped and reported).
/// </remarks>
public sealed record MeshOptions
{
    /// <summary>Minimum angle bound in degrees (default 28; accepted range 0 to 33.5).</summary>
    public double MinAngleDegrees { get; init; } = 28.0;

    /// <summary>Largest allowed edge length anywhere, metres; null for no global limit.</summary>
    public double? MaxEdgeLengthMetres { get; init; }

    /// <summary>Target edge length h(x, y) in metres at a point (x, y) in metres; null for none. Must be positive and finite.</summary>
    public Func<double, double, double>? SizeFunction { get; init; }

    /// <summary>
    /// Automatic grading from local feature size: the target size may grow away from a small feature by at most
    /// (GradingRatio − 1) times the distance, so h(x) ≤ lfs(v) + (GradingRatio − 1)·|x − v| for every input vertex v.
    /// Null switches automatic grading off (Delaunay refinement still grades by the quality bound alone). Must be above 1.
    /// </summary>
    public double? GradingRatio { get; init; } = 1.5;

    /// <summary>Largest number of triangles the mesher may create; exceeding it throws <see cref="MeshBudgetExceededException"/>.</summary>
    public int MaxTriangles { get; init; } = 20_000_000;

    /// <summary>
    /// Segment tags whose segments must not receive Steiner points (for example a boundary whose node set must match
    /// another boundary). Encroachment of such a segment is not repaired; triangles that cannot be improved because of
    /// it are skipped and reported.
    /// </summary>
    public IReadOnlySet<int> ProtectedTags { get; init; } = new HashSet<int>();

    /// <summary>Checks the values and throws <see cref="ArgumentException"/> with the fix if one is out of range.</summary>
    public void Check()
    {
        // 33.5° is the largest bound at which our randomized stress runs (600 random polygons with holes, 1e-6 to 1e3 m)
        // always terminated; at 34° some ran away until the triangle budget stopped them.
        if (!(MinAngleDegrees >= 0 && MinAngleDegrees <= 33.5))
            throw new ArgumentException($"Minimum angle {MinAngleDegrees}° is out of range; use 0 to 33.5 degrees (28 is the default; above about 33.5 Delaunay refinement may not terminate).");
        if (MaxEdgeLengthMetres is { } h && !(h > 0 && double.IsFinite(h)))
            throw new ArgumentException($"Maximum edge length {h} m must be positive and finite.");
        if (GradingRatio is { } g && !(g > 1 && double.IsFinite(g)))
            throw new ArgumentException($"Grading ratio {g} must be above 1 (for example 1.5), or null to switch grading off.");
        if (MaxTriangles < 1)
            throw new ArgumentException($"Triangle budget {MaxTriangles} must be at least 1.");
    }
}
