namespace Electrostat.Analysis.HotSpots;

/// <summary>One local maximum of the recovered |E| (after merging neighbouring maxima).</summary>
/// <param name="Rank">1 for the highest field.</param>
/// <param name="XMetres">x (or r), metres.</param>
/// <param name="YMetres">y (or z), metres.</param>
/// <param name="FieldVoltsPerMetre">Recovered |E| in the material, V/m.</param>
/// <param name="MaterialName">Material the value belongs to (the side of the vertex), or null for a non-design region.</param>
/// <param name="RegionAttribute">Region attribute of that material side.</param>
/// <param name="Kind">Conductor surface, triple point, interface or volume.</param>
/// <param name="NearestFeature">Name of the nearest conductor ("enclosure" for the wall) or "interface a/b".</param>
/// <param name="NearestFeatureDistanceMetres">Distance to that feature, metres (0 on it).</param>
/// <param name="Margin">Local margin E_breakdown / |E| of the material (dimensionless), or null without a breakdown field.</param>
/// <param name="NearSingularCorner">True when within the report distance of a singular corner: the value is mesh-dependent.</param>
/// <param name="MergeRadiusMetres">Radius within which lower maxima were merged into this one, metres.</param>
/// <param name="MergedCount">Number of local maxima merged into this entry (itself included).</param>
public sealed record HotSpot(
    int Rank,
    double XMetres,
    double YMetres,
    double FieldVoltsPerMetre,
    string? MaterialName,
    int RegionAttribute,
    HotSpotKind Kind,
    string NearestFeature,
    double NearestFeatureDistanceMetres,
    double? Margin,
    bool NearSingularCorner,
    double MergeRadiusMetres,
    int MergedCount)
{
    /// <summary>|E| in kV/mm (for printing).</summary>
    public double FieldKilovoltsPerMillimetre => FieldVoltsPerMetre * 1e-6;
}
