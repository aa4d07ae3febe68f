namespace Electrostat.Meshing.Output;

/// <summary>Why a triangle was left below the minimum-angle bound.</summary>
public enum SkipCause
{
    /// <summary>Not skipped by the refiner (should not happen for a below-bound triangle; reported for honesty).</summary>
    Unexplained = 0,

    /// <summary>Next to an input angle smaller than the bound (two segments meeting at a small angle).</summary>
    SmallInputAngle = 1,

    /// <summary>Fixing it would put a Steiner point on a protected segment.</summary>
    ProtectedSegment = 2,

    /// <summary>Fixing it would need a subsegment shorter than the resolution limit (1e-10 of the domain size).</summary>
    TinyFeature = 3,

    /// <summary>A geometric degeneracy prevented the insertion.</summary>
    Degenerate = 4,
}
