using Electrostat.Analysis.Pipeline;
using Electrostat.Fem.Problem;
using Electrostat.Fem.Solving;

namespace Electrostat.Analysis.Adaptivity;

/// <summary>
/// The peak |E| per material used by the adaptive loop's stopping rule: the larger of the triangle fields in the
/// material and the conductor-surface fields next to it, outside the exclusion discs of singular corners.
/// </summary>
/// <remarks>
/// <para>Why not just the largest triangle field: a P1 triangle carries the field at roughly its centroid, a third
/// of its height away from the conductor, so at a curved electrode the triangle peak is low by about h/(3R) and
/// converges only as O(h). The conductor-surface field is instead taken from the surface charge given by the
/// nodal reactions (the "consistent flux" of Carey, Chow and Seager, "Approximate boundary-flux calculations",
/// Comput. Methods Appl. Mech. Eng. 50:107–120, 1985), which converges like the energy, O(h²) on smooth surfaces:
/// at a conductor vertex i, σ_i = R_i / ∫N_i dS with R_i = Σ_T (K_T φ − f_T)_i over the triangles around i and the
/// integral over the conductor edges at i (weighted by 2πr for axisymmetric problems), and E = σ/ε with ε the
/// measure-weighted permittivity of the adjacent material(s): one common normal field is assumed on both sides of a
/// triple point. Single-vertex values are smoothed over the vertex and its two neighbours along the conductor (see
/// the code for the measured reason).</para>
/// <para>Per material, the surface value counts for each material that touches the vertex through a conductor edge.</para>
/// </remarks>
public static class PeakFieldMeter
{
    /// <summary>Measures the peaks.</summary>
    /// <param name="built">The problem and its design maps.</param>
    /// <param name="solution">The solution of <paramref name="built"/>.</param>
    /// <param name="edges">Edge adjacency of the mesh.</param>
    /// <param name="exclusions">Discs left out (singular corners).</param>
    /// <returns>One peak per design material present in the mesh, in order of material name.</returns>
    public static IReadOnlyList<MaterialPeak> Measure(BuiltProblem built, FieldSolution solution, MeshEdges edges, IReadOnlyList<ExclusionDisc> exclusions)
    {
        ArgumentNullException.ThrowIfNull(built);
        ArgumentNullException.ThrowIfNull(solution);
        ArgumentNullException.ThrowIfNull(edges);
        ArgumentNullException.ThrowIfNull(exclusions);
        var problem = solution.Problem;
        var mesh = problem.Mesh;
        var x = mesh.X;
        var y = mesh.Y;
        var tv = mesh.Triangles;
        var reg = mesh.TriangleRegion;
        int nt = mesh.TriangleCount;
        bool axi = problem.Symmetry == ProblemSymmetry.Axisymmetric;
        const double eps0 = 8.8541878128e-12;

        var names = new Dictionary<int, string>();
        foreach (var r in built.Regions) names[r.Attribute] = r.Material.Name;
        var best = new Dictionary<string, MaterialPeak>(StringComparer.Ordinal);
        void Offer(string name, double e, double px, double py, bool surface)
        {
            if (Excluded(exclusions, px, py)) return;
            if (!best.TryGetValue(name, out var b) || e > b.FieldVoltsPerMetre) best[name] = new MaterialPeak(name, e, px, py, surface);
        }

        for (int t = 0; t < nt; t++)
        {
            if (!names.TryGetValue(reg[t], out var name)) continue;
            int a = tv[3 * t], b = tv[3 * t + 1], c = tv[3 * t + 2];
            Offer(name, solution.FieldMagnitude(t), (x[a] + x[b] + x[c]) / 3, (y[a] + y[b] + y[c]) / 3, false);
        }

        var conductorTags = new HashSet<int>(problem.Boundaries.Where(kv => kv.Value is ConductorBoundary || kv.Value is EnclosureBoundary).Select(kv => kv.Key));
        if (conductorTags.Count == 0) return best.Values.OrderBy(p => p.MaterialName, StringComparer.Ordinal).ToArray();

        // Conductor edges and the ε-weighted boundary mass matrix M_ij = Σ_e ε_e ∫ N_i N_j dS (weighted by 2πr when
        // axisymmetric): the surface field E solves M·E = R, R the nodal reactions.
        int nv = mesh.VertexCount;
        var onConductor = new bool[nv];
        var diag = new double[nv];
        var edgeList = new List<(int P, int Q, double Off)>();
        var touching = new Dictionary<int, List<int>>();
        for (int t = 0; t < nt; t++)
        {
            for (int i = 0; i < 3; i++)
            {
                int code = 3 * t + i;
                if (edges.Neighbour[code] >= 0 || !conductorTags.Contains(edges.Tag[code])) continue;
                int p = tv[3 * t + (i + 1) % 3], q = tv[3 * t + (i + 2) % 3];
                double len = Math.Sqrt((x[q] - x[p]) * (x[q] - x[p]) + (y[q] - y[p]) * (y[q] - y[p]));
                var m = problem.Materials[reg[t]].Permittivity;
                double eps = eps0 * 0.5 * (m.Xx + m.Yy);
                // ∫N_p² dS = len/3, ∫N_p N_q dS = len/6 planar; with 2πr: 2π·len·(3r_p + r_q)/12 and 2π·len·(r_p + r_q)/12.
                double mpp = axi ? 2 * Math.PI * len * (3 * x[p] + x[q]) / 12 : len / 3;
                double mqq = axi ? 2 * Math.PI * len * (x[p] + 3 * x[q]) / 12 : len / 3;
                double mpq = axi ? 2 * Math.PI * len * (x[p] + x[q]) / 12 : len / 6;
                diag[p] += eps * mpp;
                diag[q] += eps * mqq;
                edgeList.Add((p, q, eps * mpq));
                foreach (int v in (ReadOnlySpan<int>)[p, q])
                {
                    onConductor[v] = true;
                    if (!touching.TryGetValue(v, out var list)) touching[v] = list = new List<int>(2);
                    if (!list.Contains(reg[t])) list.Add(reg[t]);
                }
            }
        }
        var reaction = new double[nv];
        var phi = solution.PotentialVolts;
        for (int t = 0; t < nt; t++)
        {
            int a = tv[3 * t], b = tv[3 * t + 1], c = tv[3 * t + 2];
            if (!onConductor[a] && !onConductor[b] && !onConductor[c]) continue;
            double det = (x[b] - x[a]) * (y[c] - y[a]) - (x[c] - x[a]) * (y[b] - y[a]);
            double area = 0.5 * det;
            double w = axi ? 2 * Math.PI * area * (x[a] + x[b] + x[c]) / 3 : area;
            var mat = problem.Materials[reg[t]];
            var k = mat.Permittivity;
            // D = ε0·εr·∇φ (note: ∇φ, so that K·φ is Σ W ∇N_i·D); ∇N_i = (y_j − y_k, x_k − x_j)/det.
            double gx = -solution.FieldXVoltsPerMetre[t], gy = -solution.FieldYVoltsPerMetre[t];
            double dx = eps0 * (k.Xx * gx + k.Xy * gy), dy = eps0 * (k.Xy * gx + k.Yy * gy);
            ReadOnlySpan<int> v = [a, b, c];
            for (int i = 0; i < 3; i++)
            {
                int vi = v[i], vj = v[(i + 1) % 3], vk = v[(i + 2) % 3];
                if (!onConductor[vi]) continue;
                double nxg = (y[vj] - y[vk]) / det, nyg = (x[vk] - x[vj]) / det;
                reaction[vi] += w * (nxg * dx + nyg * dy);
                double rho = mat.ChargeDensityCoulombsPerCubicMetre;
                if (rho != 0)
                {
                    // ∫N_i dV: A/3 planar; 2π·A·(2r_i + r_j + r_k)/12 axisymmetric.
                    reaction[vi] -= rho * (axi ? 2 * Math.PI * area * (2 * x[vi] + x[vj] + x[vk]) / 12 : area / 3);
                }
            }
        }
        // Surface field at a vertex: the charge of the vertex and its two neighbours along the conductor divided by
        // their ε-weighted surface measure (lumped rows of M). Single-vertex values oscillate by a few per cent where
        // boundary edges change length (measured on the coaxial case: +3 % at a vertex between a split and an unsplit
        // chord, with the consistent or the lumped mass alike); the three-vertex window cancels that pairwise imbalance
        // and stays O(h²) for a smooth surface charge.
        var rowSum = (double[])diag.Clone();
        foreach (var (p, q, off) in edgeList)
        {
            rowSum[p] += off;
            rowSum[q] += off;
        }
        var sumR = new double[nv];
        var sumW = new double[nv];
        foreach (var v in touching.Keys)
        {
            sumR[v] = reaction[v];
            sumW[v] = rowSum[v];
        }
        foreach (var (p, q, _) in edgeList)
        {
            sumR[p] += reaction[q];
            sumW[p] += rowSum[q];
            sumR[q] += reaction[p];
            sumW[q] += rowSum[p];
        }
        var field = new double[nv];
        foreach (var v in touching.Keys) field[v] = sumW[v] > 0 ? sumR[v] / sumW[v] : 0;
        foreach (var (v, list) in touching)
        {
            // The axis (r = 0) has zero weight in axisymmetric problems and is skipped.
            if (!(diag[v] > 0)) continue;
            double e = Math.Abs(field[v]);
            if (!double.IsFinite(e)) continue;
            foreach (int r in list)
            {
                if (names.TryGetValue(r, out var name)) Offer(name, e, x[v], y[v], true);
            }
        }
        return best.Values.OrderBy(p => p.MaterialName, StringComparer.Ordinal).ToArray();
    }

    private static bool Excluded(IReadOnlyList<ExclusionDisc> discs, double x, double y)
    {
        for (int i = 0; i < discs.Count; i++)
        {
            if (discs[i].Contains(x, y)) return true;
        }
        return false;
    }
}
