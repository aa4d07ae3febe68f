namespace Electrostat.Geometry.Model;

/// <summary>The length unit that bare numbers in a design file are read in.</summary>
/// <param name="Symbol">Symbol as written in the file (m, cm, mm, um, in, mil).</param>
/// <param name="Metres">Metres per unit.</param>
public sealed record LengthUnit(string Symbol, double Metres);
