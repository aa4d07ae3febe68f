using Electrostat.Geometry.Shapes;

namespace Electrostat.Geometry.Model;

/// <summary>
/// A conductor: an equipotential body that is not meshed inside. Either held at <see cref="PotentialVolts"/>, or
/// floating (<see cref="IsFloating"/>) with a total free charge <see cref="ChargeCoulombs"/> (0 when not given).
/// </summary>
/// <remarks>
/// Conductors that touch and share the same potential (or are both floating) form one <see cref="Electrode"/>;
/// <see cref="ElectrodeIndex"/> points into <see cref="Design.Electrodes"/>.
/// </remarks>
public sealed class Conductor
{
    /// <summary>Creates a conductor.</summary>
    public Conductor(string name, Shape shape, double? potentialVolts, double? chargeCoulombs, int electrodeIndex)
    {
        ArgumentNullException.ThrowIfNull(name);
        ArgumentNullException.ThrowIfNull(shape);
        Name = name;
        Shape = shape;
        PotentialVolts = potentialVolts;
        ChargeCoulombs = chargeCoulombs;
        ElectrodeIndex = electrodeIndex;
    }

    /// <summary>Name from the design file (unique among conductors).</summary>
    public string Name { get; }

    /// <summary>Exact outline.</summary>
    public Shape Shape { get; }

    /// <summary>Fixed potential, volts; null for a floating conductor.</summary>
    public double? PotentialVolts { get; }

    /// <summary>True when the conductor's potential is an unknown of the problem.</summary>
    public bool IsFloating => PotentialVolts is null;

    /// <summary>
    /// Prescribed free charge of a floating conductor, coulombs (per metre of depth in planar designs, total in
    /// axisymmetric designs); null for fixed-potential conductors and when not given (then 0 is meant).
    /// </summary>
    public double? ChargeCoulombs { get; }

    /// <summary>Index into <see cref="Design.Electrodes"/> of the electrode this conductor belongs to.</summary>
    public int ElectrodeIndex { get; }
}
