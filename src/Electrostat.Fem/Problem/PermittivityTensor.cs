namespace Electrostat.Fem.Problem;

/// <summary>
/// A symmetric, positive-definite relative permittivity tensor in the mesh's (x, y) axes, dimensionless.
/// For axisymmetric problems x is r and y is z. The absolute permittivity is ε0 times this tensor.
/// </summary>
/// <param name="Xx">Relative permittivity along x.</param>
/// <param name="Xy">Off-diagonal coupling (the tensor is symmetric, so yx = xy).</param>
/// <param name="Yy">Relative permittivity along y.</param>
public readonly record struct PermittivityTensor(double Xx, double Xy, double Yy)
{
    /// <summary>An isotropic tensor εr·I.</summary>
    /// <param name="relativePermittivity">εr, dimensionless.</param>
    public static PermittivityTensor Isotropic(double relativePermittivity) => new(relativePermittivity, 0, relativePermittivity);

    /// <summary>True when the tensor is symmetric positive definite (both eigenvalues &gt; 0) and finite.</summary>
    public bool IsPositiveDefinite =>
        double.IsFinite(Xx) && double.IsFinite(Xy) && double.IsFinite(Yy) && Xx > 0 && Xx * Yy - Xy * Xy > 0;

    /// <summary>True when the tensor is a multiple of the identity.</summary>
    public bool IsIsotropic => Xy == 0 && Xx == Yy;
}
