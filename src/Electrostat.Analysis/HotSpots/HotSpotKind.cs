namespace Electrostat.Analysis.HotSpots;

/// <summary>Where a field hot spot sits.</summary>
public enum HotSpotKind
{
    /// <summary>On a conductor surface (or the enclosure wall) with one material around it.</summary>
    ConductorSurface = 0,

    /// <summary>Where a conductor meets two different dielectrics (triple point, triple junction).</summary>
    TriplePoint = 1,

    /// <summary>On an interface between two materials, away from conductors.</summary>
    Interface = 2,

    /// <summary>Inside a material.</summary>
    Volume = 3,
}
