namespace Electrostat.Analysis;

/// <summary>Outcome of one acceptance check.</summary>
public enum CheckVerdict
{
    /// <summary>No requirement was given, or the quantity could not be checked (e.g. no breakdown field): never a pass.</summary>
    NotChecked = 0,

    /// <summary>The requirement is met.</summary>
    Pass = 1,

    /// <summary>The requirement is not met.</summary>
    Fail = 2,
}
