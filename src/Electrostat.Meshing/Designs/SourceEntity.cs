namespace Electrostat.Meshing.Designs;

/// <summary>Kind of design entity a boundary piece comes from.</summary>
public enum SourceEntity
{
    /// <summary>The enclosure.</summary>
    Enclosure = 0,

    /// <summary>A conductor.</summary>
    Conductor = 1,

    /// <summary>A dielectric body.</summary>
    Dielectric = 2,
}
