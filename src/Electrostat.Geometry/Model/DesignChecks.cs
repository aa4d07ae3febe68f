namespace Electrostat.Geometry.Model;

/// <summary>Acceptance limits requested in the design file's <c>checks</c> block.</summary>
/// <remarks>
/// The margin of a material is its breakdown field divided by the peak field found in it (dimensionless; 2.0 means the
/// field may double before breakdown). Clearance is the shortest straight distance between conductors, metres.
/// </remarks>
/// <param name="MinMargin">Required margin in every material with a breakdown field; null for no check.</param>
/// <param name="MinClearanceMetres">Required clearance between conductors at different potentials, metres; null for no check.</param>
/// <param name="MaterialMinMargins">Per-material overrides of <paramref name="MinMargin"/>, by material name.</param>
/// <param name="PairClearances">Per-pair overrides of <paramref name="MinClearanceMetres"/>.</param>
public sealed record DesignChecks(
    double? MinMargin,
    double? MinClearanceMetres,
    IReadOnlyDictionary<string, double> MaterialMinMargins,
    IReadOnlyList<ClearanceRule> PairClearances)
{
    /// <summary>No checks requested.</summary>
    public static DesignChecks None { get; } = new(null, null, new Dictionary<string, double>(), []);

    /// <summary>Required margin for a material: its override if given, else <see cref="MinMargin"/>.</summary>
    public double? MarginFor(string materialName) =>
        MaterialMinMargins.TryGetValue(materialName, out double m) ? m : MinMargin;

    /// <summary>Required clearance between two conductors: a pair rule if given (either order), else <see cref="MinClearanceMetres"/>.</summary>
    public double? ClearanceFor(string conductorA, string conductorB)
    {
        foreach (var rule in PairClearances)
        {
            if ((rule.ConductorA == conductorA && rule.ConductorB == conductorB) ||
                (rule.ConductorA == conductorB && rule.ConductorB == conductorA))
                return rule.MinClearanceMetres;
        }
        return MinClearanceMetres;
    }
}
