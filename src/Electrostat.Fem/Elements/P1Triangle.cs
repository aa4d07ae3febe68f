using System.Runtime.CompilerServices;
using Electrostat.Fem.Problem;

namespace Electrostat.Fem.Elements;

/// <summary>
/// Linear (P1) triangle kernels: shape-function gradients, element stiffness, consistent charge load and field.
/// </summary>
/// <remarks>
/// For vertices 1, 2, 3 in counter-clockwise order, 2A = (x2−x1)(y3−y1) − (x3−x1)(y2−y1) &gt; 0 and
/// ∇N_i = (b_i, c_i)/(2A) with b_i = y_j − y_k, c_i = x_k − x_j for (i, j, k) cyclic. The gradients are constant, so the
/// weak form a(u, v) = ∫ ε ∇u·∇v w dA reduces to K_ij = W·(∇N_i·ε∇N_j) with W = ∫_T w dA the element's weight:
/// W = A for planar problems (per metre of depth) and W = 2π·A·(r1 + r2 + r3)/3 for axisymmetric ones (w = 2πr; the
/// centroid rule is exact for a linear integrand, so the r-weighting is integrated exactly and results are totals).
/// </remarks>
public static class P1Triangle
{
    /// <summary>Twice the signed area of the triangle, m² (positive when counter-clockwise).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static double TwiceArea(double x1, double y1, double x2, double y2, double x3, double y3) =>
        (x2 - x1) * (y3 - y1) - (x3 - x1) * (y2 - y1);

    /// <summary>
    /// The element weight W = ∫_T w dA: A (m²) for planar, 2π·A·r̄ (m³) for axisymmetric, exact in both cases.
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static double Weight(ProblemSymmetry symmetry, double x1, double y1, double x2, double y2, double x3, double y3)
    {
        double area = 0.5 * TwiceArea(x1, y1, x2, y2, x3, y3);
        return symmetry == ProblemSymmetry.Planar ? area : 2 * Math.PI * area * (x1 + x2 + x3) / 3.0;
    }

    /// <summary>
    /// Writes the 3×3 element stiffness K_ij = W·(∇N_i·ε∇N_j) row-major into <paramref name="k"/>.
    /// </summary>
    /// <param name="x1">Vertex 1 x, metres.</param>
    /// <param name="y1">Vertex 1 y, metres.</param>
    /// <param name="x2">Vertex 2 x, metres.</param>
    /// <param name="y2">Vertex 2 y, metres.</param>
    /// <param name="x3">Vertex 3 x, metres.</param>
    /// <param name="y3">Vertex 3 y, metres.</param>
    /// <param name="epsilon">Absolute permittivity tensor, F/m (ε0 times the relative tensor).</param>
    /// <param name="weight">The element weight W from <see cref="Weight"/> (or a numerically integrated weight).</param>
    /// <param name="k">Destination, 9 entries, F (planar: F/m).</param>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static void Stiffness(double x1, double y1, double x2, double y2, double x3, double y3,
        in PermittivityTensor epsilon, double weight, Span<double> k)
    {
        double twiceArea = TwiceArea(x1, y1, x2, y2, x3, y3);
        double b1 = y2 - y3, b2 = y3 - y1, b3 = y1 - y2;
        double c1 = x3 - x2, c2 = x1 - x3, c3 = x2 - x1;
        double s = weight / (twiceArea * twiceArea);
        double exx = epsilon.Xx * s, exy = epsilon.Xy * s, eyy = epsilon.Yy * s;
        // K_ij = s·(exx b_i b_j + exy (b_i c_j + c_i b_j) + eyy c_i c_j)
        double k11 = exx * b1 * b1 + 2 * exy * b1 * c1 + eyy * c1 * c1;
        double k22 = exx * b2 * b2 + 2 * exy * b2 * c2 + eyy * c2 * c2;
        double k33 = exx * b3 * b3 + 2 * exy * b3 * c3 + eyy * c3 * c3;
        double k12 = exx * b1 * b2 + exy * (b1 * c2 + c1 * b2) + eyy * c1 * c2;
        double k13 = exx * b1 * b3 + exy * (b1 * c3 + c1 * b3) + eyy * c1 * c3;
        double k23 = exx * b2 * b3 + exy * (b2 * c3 + c2 * b3) + eyy * c2 * c3;
        k[0] = k11; k[1] = k12; k[2] = k13;
        k[3] = k12; k[4] = k22; k[5] = k23;
        k[6] = k13; k[7] = k23; k[8] = k33;
    }

    /// <summary>
    /// Adds the consistent load f_i = ∫_T ρ N_i w dA of a uniform charge density ρ (C/m³) to <paramref name="f"/>:
    /// planar ρA/3 (C/m); axisymmetric 2πρA(2r_i + r_j + r_k)/12 (C), from ∫N_iN_j dA = A(1 + δ_ij)/12 — both exact.
    /// </summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static void AddChargeLoad(ProblemSymmetry symmetry, double x1, double y1, double x2, double y2, double x3, double y3,
        double chargeDensity, Span<double> f)
    {
        double area = 0.5 * TwiceArea(x1, y1, x2, y2, x3, y3);
        if (symmetry == ProblemSymmetry.Planar)
        {
            double q = chargeDensity * area / 3.0;
            f[0] += q; f[1] += q; f[2] += q;
        }
        else
        {
            double s = 2 * Math.PI * chargeDensity * area / 12.0;
            double sum = x1 + x2 + x3;
            f[0] += s * (x1 + sum); f[1] += s * (x2 + sum); f[2] += s * (x3 + sum);
        }
    }

    /// <summary>The element's electric field E = −∇φ, V/m, from its three vertex potentials (volts).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static (double Ex, double Ey) Field(double x1, double y1, double x2, double y2, double x3, double y3,
        double phi1, double phi2, double phi3)
    {
        double inv = 1.0 / TwiceArea(x1, y1, x2, y2, x3, y3);
        double gx = ((y2 - y3) * phi1 + (y3 - y1) * phi2 + (y1 - y2) * phi3) * inv;
        double gy = ((x3 - x2) * phi1 + (x1 - x3) * phi2 + (x2 - x1) * phi3) * inv;
        return (-gx, -gy);
    }
}
