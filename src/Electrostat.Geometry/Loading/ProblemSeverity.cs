namespace Electrostat.Geometry.Loading;

/// <summary>How serious a design problem is.</summary>
public enum ProblemSeverity
{
    /// <summary>Information the user may want (e.g. conductors merged into one electrode).</summary>
    Note = 0,

    /// <summary>The design is usable but probably not what was meant.</summary>
    Warning = 1,

    /// <summary>The design cannot be used until this is fixed.</summary>
    Error = 2,
}
