namespace Electrostat.Fem.Problem;

/// <summary>
/// One conductor other than the enclosure: either held at a fixed potential, or floating with a given net charge.
/// A conductor is a terminal of the capacitance matrix; its surface is every mesh segment whose tag maps to a
/// <see cref="ConductorBoundary"/> naming it.
/// </summary>
/// <remarks>
/// A floating conductor's surface nodes all share one unknown potential (degrees of freedom merged, not a penalty),
/// and its net charge enters as a right-hand-side entry of that unknown. Charge is per metre of depth for planar
/// problems and total for axisymmetric ones (see <see cref="ProblemSymmetry"/>).
/// </remarks>
public sealed record ConductorDefinition
{
    private ConductorDefinition(string name, bool isFloating, double potentialVolts, double chargeCoulombs)
    {
        Name = name;
        IsFloating = isFloating;
        PotentialVolts = potentialVolts;
        ChargeCoulombs = chargeCoulombs;
    }

    /// <summary>A conductor held at a fixed potential.</summary>
    /// <param name="name">Name shown in reports.</param>
    /// <param name="potentialVolts">Its potential, volts.</param>
    public static ConductorDefinition Fixed(string name, double potentialVolts)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(name);
        if (!double.IsFinite(potentialVolts)) throw new ArgumentOutOfRangeException(nameof(potentialVolts), $"Conductor '{name}': the potential must be a finite number of volts.");
        return new ConductorDefinition(name, false, potentialVolts, 0);
    }

    /// <summary>A floating conductor carrying a given net charge (default 0).</summary>
    /// <param name="name">Name shown in reports.</param>
    /// <param name="chargeCoulombs">Net charge: C/m for planar problems, C for axisymmetric ones.</param>
    public static ConductorDefinition Floating(string name, double chargeCoulombs = 0)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(name);
        if (!double.IsFinite(chargeCoulombs)) throw new ArgumentOutOfRangeException(nameof(chargeCoulombs), $"Conductor '{name}': the charge must be a finite number of coulombs.");
        return new ConductorDefinition(name, true, 0, chargeCoulombs);
    }

    /// <summary>Name shown in reports.</summary>
    public string Name { get; }

    /// <summary>True for a floating conductor (unknown potential, given charge).</summary>
    public bool IsFloating { get; }

    /// <summary>The fixed potential in volts (meaningful only when <see cref="IsFloating"/> is false).</summary>
    public double PotentialVolts { get; }

    /// <summary>The given net charge (meaningful only when <see cref="IsFloating"/> is true): C/m planar, C axisymmetric.</summary>
    public double ChargeCoulombs { get; }
}
