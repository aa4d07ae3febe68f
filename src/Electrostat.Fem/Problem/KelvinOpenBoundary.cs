namespace Electrostat.Fem.Problem;

/// <summary>
/// Open outer boundary by the Kelvin transformation (Freeman and Lowther, "A novel mapping technique for open
/// boundary finite element solutions to Poisson's equation", IEEE Trans. Magn. 25(5), 1989).
/// </summary>
/// <remarks>
/// <para>The mesh holds two pieces: the interior, bounded outside by a circle (planar) or half circle (axisymmetric,
/// centred on the axis) of radius R about <see cref="InteriorCentreX"/>, <see cref="InteriorCentreY"/>, with segment
/// tag <see cref="InteriorArcTag"/>; and a separate disk (half disk) of the same radius about
/// <see cref="ExteriorCentreX"/>, <see cref="ExteriorCentreY"/>, region <see cref="ExteriorRegion"/>, bounded by tag
/// <see cref="ExteriorArcTag"/>, that stands for all space outside the circle. A point at distance ρ from the interior
/// centre maps to distance ρ' = R²/ρ from the exterior centre along the same direction; the circle maps to itself and
/// infinity maps to the exterior centre, which must be a mesh vertex.</para>
/// <para>Both arcs must carry the same vertices at the same angles (mesh them as protected segments); each matched
/// pair is merged into one degree of freedom. Give the exterior region, in <see cref="ElectrostaticProblem.Materials"/>,
/// the material of the space outside the circle (usually vacuum, without volume charge); the arc tags need no entry in
/// <see cref="ElectrostaticProblem.Boundaries"/>.</para>
/// <para>Permittivity of the exterior image. The energy ½∫ε|∇φ|²dV is kept. The inversion is conformal with length
/// scale λ = R²/ρ'² (|dx| = λ|dx'|), so |∇φ|² = |∇'φ|²/λ² and, per unit length of a 2D slice, dA = λ²dA': in the
/// planar case the two factors cancel and the image carries the same ε (Laplace's equation is conformally invariant
/// in 2D). In 3D, dV = λ³dV', leaving ε' = ε·R²/ρ'²; the axisymmetric image therefore carries ε·R²/ρ'² with the usual
/// 2πr' weighting, integrated numerically per element.</para>
/// <para>The point at infinity: axisymmetric problems hold it at <see cref="PotentialAtInfinityVolts"/> (the usual
/// reference of an isolated body, C = Q/V). Planar problems leave it free: a 2D potential grows like log ρ unless the
/// net charge is zero, so a free image centre means "no net flux to infinity", the physical case of a self-contained
/// set of conductors.</para>
/// </remarks>
/// <param name="InteriorArcTag">Segment tag of the interior region's outer circle.</param>
/// <param name="ExteriorArcTag">Segment tag of the exterior image disk's circle.</param>
/// <param name="ExteriorRegion">Region attribute of the exterior image disk's triangles.</param>
/// <param name="RadiusMetres">Circle radius R, metres.</param>
/// <param name="InteriorCentreX">Interior circle centre x (r = 0 for axisymmetric), metres.</param>
/// <param name="InteriorCentreY">Interior circle centre y, metres.</param>
/// <param name="ExteriorCentreX">Image disk centre x (r = 0 for axisymmetric), metres.</param>
/// <param name="ExteriorCentreY">Image disk centre y, metres.</param>
/// <param name="PotentialAtInfinityVolts">Potential at infinity for axisymmetric problems, volts.</param>
public sealed record KelvinOpenBoundary(
    int InteriorArcTag,
    int ExteriorArcTag,
    int ExteriorRegion,
    double RadiusMetres,
    double InteriorCentreX,
    double InteriorCentreY,
    double ExteriorCentreX,
    double ExteriorCentreY,
    double PotentialAtInfinityVolts = 0);
