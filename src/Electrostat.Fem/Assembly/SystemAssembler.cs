using System.Diagnostics;
using Electrostat.Fem.Elements;
using Electrostat.Numerics.Parallelism;
using Electrostat.Numerics.Sparse;

namespace Electrostat.Fem.Assembly;

/// <summary>
/// Assembles the reduced system K·u = b over a <see cref="DofMap"/>, lifts known potentials to the right-hand side,
/// expands solutions back to vertices, and computes reaction charges and energies element by element.
/// </summary>
/// <remarks>
/// Reaction charges (Q = K·φ − f summed over a terminal's vertices) follow from the weak form: with v = N_i,
/// ∫ε∇φ·∇N_i dV − ∫ρN_i dV = ∮σN_i dS, the surface charge attributed to vertex i; the shape functions of a
/// conductor's vertices sum to one on its surface, so their reactions sum to its charge. They inherit the energy's
/// O(h²) accuracy, unlike a flux integral of the element field.
/// </remarks>
internal static class SystemAssembler
{
    /// <summary>Assembles the reduced stiffness matrix (F or F/m) on all cores.</summary>
    /// <remarks>
    /// Triangles are visited in the order of their first vertex along the space-filling curve of the
    /// <see cref="DofMap"/> (a counting sort, O(n)), so consecutive element scatters touch nearby matrix rows even
    /// when the mesher emitted triangles in refinement order.
    /// </remarks>
    public static CsrMatrix Matrix(CompiledProblem cp, DofMap map)
    {
        var tri = cp.Mesh.Triangles;
        int nt = cp.Mesh.TriangleCount, nv = cp.Mesh.VertexCount;
        var rank = new int[nv];
        var spatial = map.SpatialOrder;
        for (int k = 0; k < nv; k++) rank[spatial[k]] = k;
        var start = new int[nv + 1];
        for (int t = 0; t < nt; t++) start[rank[tri[3 * t]] + 1]++;
        for (int k = 0; k < nv; k++) start[k + 1] += start[k];
        var order = new int[nt];
        for (int t = 0; t < nt; t++) order[start[rank[tri[3 * t]]]++] = t;
        var connectivity = new int[3 * nt];
        for (int k = 0; k < nt; k++)
        {
            int t = order[k];
            connectivity[3 * k] = tri[3 * t];
            connectivity[3 * k + 1] = tri[3 * t + 1];
            connectivity[3 * k + 2] = tri[3 * t + 2];
        }
        var plan = CsrAssemblyPlan.Create(connectivity, 3, map.DofOfNode, map.DofCount);
        // The element kernel inlined over plain arrays: this runs once per triangle and dominates numeric assembly.
        var x = cp.Mesh.X;
        var y = cp.Mesh.Y;
        var material = cp.TriangleMaterial;
        var eps = cp.MaterialEpsilon;
        var kelvin = cp.KelvinWeights;
        bool axisymmetric = cp.Symmetry == Problem.ProblemSymmetry.Axisymmetric;
        return plan.Assemble((k, ke) =>
        {
            int a = connectivity[3 * k], b = connectivity[3 * k + 1], c = connectivity[3 * k + 2];
            double xa = x[a], ya = y[a], xb = x[b], yb = y[b], xc = x[c], yc = y[c];
            double w;
            if (kelvin is not null && !double.IsNaN(kelvin[order[k]]))
            {
                w = kelvin[order[k]];
            }
            else
            {
                double area = 0.5 * ((xb - xa) * (yc - ya) - (xc - xa) * (yb - ya));
                w = axisymmetric ? 2 * Math.PI * area * (xa + xb + xc) / 3.0 : area;
            }
            P1Triangle.Stiffness(xa, ya, xb, yb, xc, yc, eps[material[order[k]]], w, ke);
        });
    }

    /// <summary>
    /// The right-hand side for given terminal potentials (volts, indexed by terminal; only fixed terminals are read)
    /// and floating charges (coulombs or C/m per conductor; only floating ones are read), with or without the
    /// volume charges of the materials.
    /// </summary>
    public static double[] RightHandSide(CompiledProblem cp, DofMap map, ReadOnlySpan<double> terminalPotential,
        ReadOnlySpan<double> floatingCharge, bool includeVolumeCharge)
    {
        var b = new double[map.DofCount];
        var dof = map.DofOfNode;
        var tri = cp.Mesh.Triangles;
        Span<double> k = stackalloc double[9];
        Span<double> f = stackalloc double[3];
        if (includeVolumeCharge && cp.HasCharge)
        {
            var x = cp.Mesh.X;
            var y = cp.Mesh.Y;
            for (int t = 0; t < cp.Mesh.TriangleCount; t++)
            {
                double rho = cp.MaterialCharge[cp.TriangleMaterial[t]];
                if (rho == 0) continue;
                int n0 = tri[3 * t], n1 = tri[3 * t + 1], n2 = tri[3 * t + 2];
                f.Clear();
                P1Triangle.AddChargeLoad(cp.Symmetry, x[n0], y[n0], x[n1], y[n1], x[n2], y[n2], rho, f);
                for (int a = 0; a < 3; a++)
                {
                    int d = dof[tri[3 * t + a]];
                    if (d >= 0) b[d] += f[a];
                }
            }
        }

        // Lifting: b_free −= K_free,known · φ_known, only elements touching a terminal can contribute.
        Span<double> phi = stackalloc double[3];
        foreach (int t in cp.TerminalElements)
        {
            bool anyKnown = false;
            for (int a = 0; a < 3; a++)
            {
                int node = tri[3 * t + a];
                if (dof[node] < 0)
                {
                    phi[a] = terminalPotential[map.TerminalOfNode[node]];
                    anyKnown |= phi[a] != 0;
                }
                else
                {
                    phi[a] = 0;
                }
            }
            if (!anyKnown) continue;
            cp.ElementStiffness(t, k);
            for (int a = 0; a < 3; a++)
            {
                int d = dof[tri[3 * t + a]];
                if (d < 0) continue;
                b[d] -= k[3 * a] * phi[0] + k[3 * a + 1] * phi[1] + k[3 * a + 2] * phi[2];
            }
        }

        for (int c = 0; c < cp.ConductorCount; c++)
        {
            int d = map.FloatingDof[c];
            if (d >= 0) b[d] += floatingCharge[c];
        }
        return b;
    }

    /// <summary>Terminal potentials (volts) for the design's own values, indexed by terminal.</summary>
    public static double[] DesignPotentials(CompiledProblem cp)
    {
        var v = new double[cp.TerminalCount];
        for (int c = 0; c < cp.ConductorCount; c++) v[c] = cp.Problem.Conductors[c].PotentialVolts;
        v[cp.EnclosureTerminal] = cp.EnclosurePotential;
        v[cp.InfinityTerminal] = cp.InfinityPotential;
        return v;
    }

    /// <summary>Vertex potentials (volts) from the unknowns and the known terminal potentials.</summary>
    public static double[] Expand(DofMap map, ReadOnlySpan<double> u, ReadOnlySpan<double> terminalPotential)
    {
        var dof = map.DofOfNode;
        var phi = new double[dof.Length];
        for (int i = 0; i < dof.Length; i++)
        {
            int d = dof[i];
            phi[i] = d >= 0 ? u[d] : terminalPotential[map.TerminalOfNode[i]];
        }
        return phi;
    }

    /// <summary>Restricts vertex potentials to the unknowns (the first vertex of a merged group wins).</summary>
    public static double[] Restrict(DofMap map, ReadOnlySpan<double> phi)
    {
        var u = new double[map.DofCount];
        var seen = new bool[map.DofCount];
        var dof = map.DofOfNode;
        for (int i = 0; i < dof.Length; i++)
        {
            int d = dof[i];
            if (d >= 0 && !seen[d]) { u[d] = phi[i]; seen[d] = true; }
        }
        return u;
    }

    /// <summary>
    /// Reaction charge of every terminal: the sum over its vertices of (K·φ − f)_i, coulombs (planar: C/m),
    /// indexed by terminal. Uses the terminals of the geometry (before merging).
    /// </summary>
    public static double[] TerminalCharges(CompiledProblem cp, ReadOnlySpan<double> phi, bool includeVolumeCharge)
    {
        var q = new double[cp.TerminalCount];
        var tri = cp.Mesh.Triangles;
        var x = cp.Mesh.X;
        var y = cp.Mesh.Y;
        var term = cp.NodeTerminal;
        Span<double> k = stackalloc double[9];
        Span<double> f = stackalloc double[3];
        foreach (int t in cp.TerminalElements)
        {
            int n0 = tri[3 * t], n1 = tri[3 * t + 1], n2 = tri[3 * t + 2];
            cp.ElementStiffness(t, k);
            f.Clear();
            double rho = cp.MaterialCharge[cp.TriangleMaterial[t]];
            if (includeVolumeCharge && rho != 0)
            {
                P1Triangle.AddChargeLoad(cp.Symmetry, x[n0], y[n0], x[n1], y[n1], x[n2], y[n2], rho, f);
            }
            double p0 = phi[n0], p1 = phi[n1], p2 = phi[n2];
            for (int a = 0; a < 3; a++)
            {
                int tt = term[tri[3 * t + a]];
                if (tt < 0) continue;
                q[tt] += k[3 * a] * p0 + k[3 * a + 1] * p1 + k[3 * a + 2] * p2 - f[a];
            }
        }
        return q;
    }

    /// <summary>
    /// Field energy W = ½Σ_e W_e·(∇φ·ε∇φ) = ½Σ φ_eᵀK_eφ_e, joules (planar: J/m), on all cores; when
    /// <paramref name="fieldX"/> and <paramref name="fieldY"/> are given, also stores E = −∇φ per triangle (V/m).
    /// </summary>
    public static double Energy(CompiledProblem cp, double[] phi, double[]? fieldX = null, double[]? fieldY = null)
    {
        int n = cp.Mesh.TriangleCount;
        int parts = n > 50_000 ? WorkerLimit.Workers : 1;
        var sums = new double[parts];
        var tri = cp.Mesh.Triangles;
        var x = cp.Mesh.X;
        var y = cp.Mesh.Y;
        var mat = cp.TriangleMaterial;
        var eps = cp.MaterialEpsilon;
        var kelvin = cp.KelvinWeights;
        bool axisymmetric = cp.Symmetry == Problem.ProblemSymmetry.Axisymmetric;
        Parallel.For(0, parts, p =>
        {
            int start = (int)((long)n * p / parts), end = (int)((long)n * (p + 1) / parts);
            double s = 0;
            for (int t = start; t < end; t++)
            {
                int a = tri[3 * t], b = tri[3 * t + 1], c = tri[3 * t + 2];
                double xa = x[a], ya = y[a], xb = x[b], yb = y[b], xc = x[c], yc = y[c];
                double twiceArea = (xb - xa) * (yc - ya) - (xc - xa) * (yb - ya);
                double inv = 1.0 / twiceArea;
                double pa = phi[a], pb = phi[b], pc = phi[c];
                double gx = ((yb - yc) * pa + (yc - ya) * pb + (ya - yb) * pc) * inv;
                double gy = ((xc - xb) * pa + (xa - xc) * pb + (xb - xa) * pc) * inv;
                if (fieldX is not null)
                {
                    fieldX[t] = -gx;
                    fieldY![t] = -gy;
                }
                double w = kelvin is not null && !double.IsNaN(kelvin[t]) ? kelvin[t]
                    : axisymmetric ? Math.PI * twiceArea * (xa + xb + xc) / 3.0 : 0.5 * twiceArea;
                var e = eps[mat[t]];
                s += w * (e.Xx * gx * gx + 2 * e.Xy * gx * gy + e.Yy * gy * gy);
            }
            sums[p] = s;
        });
        double total = 0;
        foreach (double v in sums) total += v;
        Debug.Assert(total >= 0, "the permittivity is positive definite");
        return 0.5 * total;
    }
}
