namespace Electrostat.Meshing.Designs;

/// <summary>How curved outlines of a design are cut into straight segments before meshing (immutable).</summary>
/// <remarks>
/// An arc is cut into n equal chords, n being the largest of: the count that keeps the chord sagitta (largest gap
/// between chord and arc, R·(1 − cos(φ/2)) for a chord spanning φ) within <see cref="ChordToleranceMetres"/>; the
/// count that keeps each chord within <see cref="MaxChordAngleDegrees"/>; and the count that keeps chords no longer
/// than the local target element size. So a 0.2 mm fillet on a 100 mm part still gets several chords.
/// </remarks>
public sealed record DesignMeshSettings
{
    /// <summary>Largest sagitta of a chord, metres; null for 2e-5 of the enclosure diagonal.</summary>
    public double? ChordToleranceMetres { get; init; }

    /// <summary>Largest angle spanned by one chord, degrees (default 15°: a quarter fillet gets at least 6 chords).</summary>
    public double MaxChordAngleDegrees { get; init; } = 15;
}
