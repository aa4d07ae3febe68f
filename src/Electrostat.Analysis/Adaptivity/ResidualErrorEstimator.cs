using Electrostat.Fem.Problem;
using Electrostat.Fem.Solving;

namespace Electrostat.Analysis.Adaptivity;

/// <summary>
/// Residual a-posteriori error indicator per triangle for the P1 potential, in the energy norm
/// ‖ε^½∇e‖ (Verfürth, "A Review of A Posteriori Error Estimation and Adaptive Mesh-Refinement Techniques", 1996,
/// §1.2): η_T² = h_T²‖ρ‖²_T/ε_T + Σ_{e ⊂ ∂T} ½·h_e·‖[D·n]_e‖²_e / ε_e.
/// </summary>
/// <remarks>
/// <para>[D·n] is the jump of the normal displacement D = ε0·εr·E across an interior edge (interfaces included, so the
/// permittivity weights the jump), and D·n itself on a natural boundary (symmetry plane), where it should vanish.
/// Conductor and enclosure edges (Dirichlet) contribute nothing. ε_e is the larger absolute permittivity of the two
/// sides, which keeps the indicator an upper-bound-type quantity in both materials. The ½ shares an interior edge
/// between its two triangles; boundary edges count fully.</para>
/// <para>Axisymmetric problems weight each edge and element integral by 2πr (r at the midpoint or centroid), the
/// measure of the energy norm in the meridian plane. Triangles of a Kelvin image region (open space) are estimated
/// like the rest, because the map keeps the energy: planar images have the same ε; axisymmetric images carry
/// ε·R²/ρ'², so their edge terms are weighed by R²/ρ'² at the edge midpoint. The element residual ∇ε'·∇φ_h of the
/// varying image permittivity is left out, like the 1/r term of the axisymmetric operator elsewhere.
/// Only relative values matter for marking; <see cref="Estimate"/> also returns the global estimate η = (Σ η_T²)^½.</para>
/// </remarks>
public static class ResidualErrorEstimator
{
    /// <summary>Computes η_T² for every triangle.</summary>
    /// <param name="solution">The solved problem.</param>
    /// <param name="edges">Edge adjacency of the solution's mesh.</param>
    /// <param name="etaSquared">Output, one value per triangle (energy-norm units squared: J, or J/m for planar).</param>
    /// <returns>The global estimate η (square root of the sum).</returns>
    public static double Estimate(FieldSolution solution, MeshEdges edges, double[] etaSquared)
    {
        ArgumentNullException.ThrowIfNull(solution);
        ArgumentNullException.ThrowIfNull(edges);
        ArgumentNullException.ThrowIfNull(etaSquared);
        var problem = solution.Problem;
        var mesh = problem.Mesh;
        int nt = mesh.TriangleCount;
        if (etaSquared.Length != nt) throw new ArgumentException("One value per triangle is needed.", nameof(etaSquared));
        bool axi = problem.Symmetry == ProblemSymmetry.Axisymmetric;
        int kelvinRegion = problem.OpenBoundary?.ExteriorRegion ?? int.MinValue;
        const double eps0 = 8.8541878128e-12;
        var reg = mesh.TriangleRegion;
        var tv = mesh.Triangles;
        var x = mesh.X;
        var y = mesh.Y;
        var ex = solution.FieldXVoltsPerMetre;
        var ey = solution.FieldYVoltsPerMetre;

        // Region lookups once: the dictionary is slow in the edge loop.
        int maxReg = 0;
        for (int t = 0; t < nt; t++) maxReg = Math.Max(maxReg, reg[t]);
        var tensor = new PermittivityTensor[maxReg + 1];
        var rho = new double[maxReg + 1];
        foreach (var (attr, m) in problem.Materials)
        {
            if (attr < 0 || attr > maxReg) continue;
            tensor[attr] = m.Permittivity;
            rho[attr] = m.ChargeDensityCoulombsPerCubicMetre;
        }
        var natural = new HashSet<int>(problem.Boundaries.Where(b => b.Value is NaturalBoundary).Select(b => b.Key));

        // The axisymmetric Kelvin image carries ε·R²/ρ'² (see KelvinOpenBoundary): its flux jumps are weighed with that
        // factor at the edge midpoint, continuous across the edge; the planar image keeps ε (conformal invariance).
        var kelvin = problem.OpenBoundary;
        bool scaleImage = kelvin is not null && axi;
        double KelvinFactor(double px, double py)
        {
            double dx = px - kelvin!.ExteriorCentreX, dy = py - kelvin.ExteriorCentreY;
            return kelvin.RadiusMetres * kelvin.RadiusMetres / Math.Max(dx * dx + dy * dy, 1e-30 * kelvin.RadiusMetres * kelvin.RadiusMetres);
        }

        Array.Clear(etaSquared);
        for (int t = 0; t < nt; t++)
        {
            bool image = reg[t] == kelvinRegion;
            var et = tensor[reg[t]];
            double epsT = eps0 * Math.Max(et.Xx, et.Yy);
            int a = tv[3 * t], b = tv[3 * t + 1], c = tv[3 * t + 2];
            if (rho[reg[t]] != 0)
            {
                double area = 0.5 * Math.Abs((x[b] - x[a]) * (y[c] - y[a]) - (x[c] - x[a]) * (y[b] - y[a]));
                double h2 = MaxEdgeSquared(x, y, a, b, c);
                double w = axi ? 2 * Math.PI * (x[a] + x[b] + x[c]) / 3 : 1;
                etaSquared[t] += h2 * rho[reg[t]] * rho[reg[t]] * area * w / epsT;
            }
            double dxT = eps0 * (et.Xx * ex[t] + et.Xy * ey[t]);
            double dyT = eps0 * (et.Xy * ex[t] + et.Yy * ey[t]);
            for (int i = 0; i < 3; i++)
            {
                int code = 3 * t + i;
                int nb = edges.Neighbour[code];
                if (nb >= 0 && nb < code) continue; // each interior edge once, from its lower code
                int p = tv[3 * t + (i + 1) % 3], q = tv[3 * t + (i + 2) % 3];
                double tx = x[q] - x[p], ty = y[q] - y[p];
                double len = Math.Sqrt(tx * tx + ty * ty);
                // Outward unit normal of t: the counter-clockwise edge direction turned clockwise.
                double nx = ty / len, ny = -tx / len;
                double w = axi ? Math.PI * (x[p] + x[q]) : 1; // 2π·r at the midpoint
                // In the image, D and the energy weight both scale with the Kelvin factor k: η² ∝ (k·jump)²/(k·ε).
                if (image && scaleImage) w *= KelvinFactor(0.5 * (x[p] + x[q]), 0.5 * (y[p] + y[q]));
                if (nb < 0)
                {
                    if (!natural.Contains(edges.Tag[code])) continue;
                    double jump = dxT * nx + dyT * ny;
                    etaSquared[t] += len * jump * jump * len * w / epsT;
                    continue;
                }
                int u = nb / 3;
                var eu = tensor[reg[u]];
                double dxU = eps0 * (eu.Xx * ex[u] + eu.Xy * ey[u]);
                double dyU = eps0 * (eu.Xy * ex[u] + eu.Yy * ey[u]);
                double j = (dxT - dxU) * nx + (dyT - dyU) * ny;
                double epsE = Math.Max(epsT, eps0 * Math.Max(eu.Xx, eu.Yy));
                double share = 0.5 * len * j * j * len * w / epsE;
                etaSquared[t] += share;
                etaSquared[u] += share;
            }
        }
        double sum = 0;
        for (int t = 0; t < nt; t++) sum += etaSquared[t];
        return Math.Sqrt(sum);
    }

    private static double MaxEdgeSquared(double[] x, double[] y, int a, int b, int c)
    {
        double ab = (x[b] - x[a]) * (x[b] - x[a]) + (y[b] - y[a]) * (y[b] - y[a]);
        double bc = (x[c] - x[b]) * (x[c] - x[b]) + (y[c] - y[b]) * (y[c] - y[b]);
        double ca = (x[a] - x[c]) * (x[a] - x[c]) + (y[a] - y[c]) * (y[a] - y[c]);
        return Math.Max(ab, Math.Max(bc, ca));
    }
}
