namespace Electrostat.Analysis.Surface;

/// <summary>The field at one point of a conductor surface, on the side of one material.</summary>
/// <param name="Piece">Index of the connected piece of the conductor's meshed surface (arc length restarts on each).</param>
/// <param name="ArcLengthMetres">Distance along the surface from the start of the piece, metres.</param>
/// <param name="XMetres">x (or r), metres.</param>
/// <param name="YMetres">y (or z), metres.</param>
/// <param name="FieldVoltsPerMetre">Recovered |E| on the field side, V/m.</param>
/// <param name="NormalFieldVoltsPerMetre">E·n with n the unit normal pointing out of the conductor into the material, V/m.</param>
/// <param name="SurfaceChargeDensityCoulombsPerSquareMetre">σ = ε E·n, C/m² (ε of the material on the field side).</param>
/// <param name="MaterialName">Material on the field side (null for a non-design region).</param>
public readonly record struct SurfaceFieldSample(
    int Piece,
    double ArcLengthMetres,
    double XMetres,
    double YMetres,
    double FieldVoltsPerMetre,
    double NormalFieldVoltsPerMetre,
    double SurfaceChargeDensityCoulombsPerSquareMetre,
    string? MaterialName);
