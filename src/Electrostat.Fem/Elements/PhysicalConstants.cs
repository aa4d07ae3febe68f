namespace Electrostat.Fem.Elements;

/// <summary>Physical constants used by the field solver (SI).</summary>
public static class PhysicalConstants
{
    /// <summary>Vacuum permittivity ε0 in F/m: CODATA 2018 recommended value 8.8541878128e-12 F/m (from memory).</summary>
    public const double VacuumPermittivity = 8.8541878128e-12;
}
