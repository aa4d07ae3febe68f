namespace Electrostat.Geometry.Model;

/// <summary>Which kind of region a point of the plane belongs to.</summary>
public enum RegionKind
{
    /// <summary>Outside the enclosure: not part of the domain.</summary>
    Outside = 0,

    /// <summary>Inside a conductor: not meshed.</summary>
    Conductor = 1,

    /// <summary>Inside a dielectric body.</summary>
    Dielectric = 2,

    /// <summary>Inside the enclosure, in no conductor or dielectric: background material.</summary>
    Background = 3,
}
