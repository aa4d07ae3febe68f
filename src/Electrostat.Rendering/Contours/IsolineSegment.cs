namespace Electrostat.Rendering.Contours;

/// <summary>One straight piece of an equipotential inside one triangle (design coordinates, metres).</summary>
/// <param name="LevelVolts">Potential of the line, volts.</param>
/// <param name="X0">Start x, metres.</param>
/// <param name="Y0">Start y, metres.</param>
/// <param name="X1">End x, metres.</param>
/// <param name="Y1">End y, metres.</param>
public readonly record struct IsolineSegment(double LevelVolts, double X0, double Y0, double X1, double Y1);
