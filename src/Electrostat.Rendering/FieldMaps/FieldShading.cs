namespace Electrostat.Rendering.FieldMaps;

/// <summary>How |E| is turned into colour on the field map.</summary>
public enum FieldShading
{
    /// <summary>One colour per triangle: the exact P1 element field.</summary>
    PerElement,

    /// <summary>Colours interpolated from the recovered nodal field (per material side, so interface jumps stay sharp).</summary>
    Recovered,
}
