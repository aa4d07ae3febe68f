namespace Electrostat.Fem.Problem;

/// <summary>The segment lies on the enclosure, the reference conductor held at <paramref name="PotentialVolts"/>
/// (0 V unless stated). The enclosure is not a terminal of the capacitance matrix; its capacitances are the
/// "to-enclosure" values.</summary>
/// <param name="PotentialVolts">Enclosure potential, volts.</param>
public sealed record EnclosureBoundary(double PotentialVolts = 0) : BoundaryRole;
