namespace Electrostat.Analysis.Clearance;

/// <summary>
/// The conductor-spacing categories (columns) of IPC-2221B, Table 6-1, "Electrical Conductor Spacing".
/// </summary>
public enum SpacingCategory
{
    /// <summary>B1: internal conductors.</summary>
    B1InternalConductors,

    /// <summary>B2: external conductors, uncoated, sea level to 3050 m.</summary>
    B2ExternalUncoatedBelow3050m,

    /// <summary>B3: external conductors, uncoated, above 3050 m.</summary>
    B3ExternalUncoatedAbove3050m,

    /// <summary>B4: external conductors with permanent polymer coating (any elevation).</summary>
    B4ExternalPolymerCoated,

    /// <summary>A5: external conductors with conformal coating over assembly (any elevation).</summary>
    A5ExternalConformalCoated,

    /// <summary>A6: external component lead/termination, uncoated, sea level to 3050 m.</summary>
    A6ComponentLeadUncoated,

    /// <summary>A7: external component lead/termination, with conformal coating (any elevation).</summary>
    A7ComponentLeadConformalCoated,
}
