using Electrostat.Fem.Elements;
using Electrostat.Fem.Problem;
using Electrostat.Meshing.Designs;

namespace Electrostat.Analysis.Forces;

/// <summary>
/// Force on each conductor from the Maxwell stress tensor T = ε(E⊗E − ½|E|²I), integrated over a layer of elements
/// around the conductor.
/// </summary>
/// <remarks>
/// The closed-surface integral F = ∮ T·n dS over any surface enclosing only the conductor is turned, with the
/// divergence theorem and a function g equal to 1 on the conductor and 0 beyond the first layer of elements, into
/// F = −∫ T·∇g dV (charge-free material, ∇·T = 0). g is the sum of the P1 hat functions of the conductor's surface
/// vertices, so ∇g is constant per triangle and nonzero only in the triangles touching the surface. This is the
/// Maxwell-stress form of Coulomb's virtual-work method (Coulomb, IEEE Trans. Magn. 19(6), 1983); it is exact for a
/// uniform field. Axisymmetric: dV = 2πr dA and only the axial component survives. Planar results are per metre of depth.
/// </remarks>
public static class ForceCalculator
{
    /// <summary>Energy and the force on every design conductor that has a meshed surface.</summary>
    /// <param name="context">The analysis context.</param>
    public static ForceReport Compute(AnalysisContext context)
    {
        ArgumentNullException.ThrowIfNull(context);
        var sol = context.Solution;
        var mesh = context.Mesh;
        var tri = mesh.Triangles;
        bool axi = sol.Problem.Symmetry == ProblemSymmetry.Axisymmetric;
        int nk = context.Design.Conductors.Count;
        var onConductor = new bool[mesh.VertexCount];
        var forces = new List<ConductorForce>();
        for (int k = 0; k < nk; k++)
        {
            Array.Clear(onConductor);
            bool any = false;
            for (int s = 0; s < mesh.SegmentCount; s++)
            {
                int tag = mesh.SegmentTag[s];
                if (tag < 1 || tag > context.Tags.Tags.Count) continue;
                var m = context.Tags[tag];
                if (m.Kind != BoundaryKind.Conductor || m.ConductorIndex != k) continue;
                onConductor[mesh.SegmentVertices[2 * s]] = true;
                onConductor[mesh.SegmentVertices[2 * s + 1]] = true;
                any = true;
            }
            if (!any) continue;
            double fx = 0, fy = 0;
            for (int t = 0; t < mesh.TriangleCount; t++)
            {
                int a = tri[3 * t], b = tri[3 * t + 1], c = tri[3 * t + 2];
                if (!onConductor[a] && !onConductor[b] && !onConductor[c]) continue;
                double x1 = mesh.X[a], y1 = mesh.Y[a], x2 = mesh.X[b], y2 = mesh.Y[b], x3 = mesh.X[c], y3 = mesh.Y[c];
                double twiceArea = (x2 - x1) * (y3 - y1) - (x3 - x1) * (y2 - y1);
                // ∇N_i = (y_j − y_k, x_k − x_j) / 2A for the P1 hat function of corner i.
                double gx = 0, gy = 0;
                if (onConductor[a]) { gx += y2 - y3; gy += x3 - x2; }
                if (onConductor[b]) { gx += y3 - y1; gy += x1 - x3; }
                if (onConductor[c]) { gx += y1 - y2; gy += x2 - x1; }
                gx /= twiceArea;
                gy /= twiceArea;
                var eps = sol.Problem.Materials[mesh.TriangleRegion[t]].Permittivity;
                // Isotropic stress with the mean permittivity (design materials are isotropic).
                double e = 0.5 * (eps.Xx + eps.Yy) * PhysicalConstants.VacuumPermittivity;
                double ex = sol.FieldXVoltsPerMetre[t], ey = sol.FieldYVoltsPerMetre[t];
                double half = 0.5 * (ex * ex + ey * ey);
                double txx = e * (ex * ex - half), txy = e * ex * ey, tyy = e * (ey * ey - half);
                double w = 0.5 * twiceArea * (axi ? 2 * Math.PI * (x1 + x2 + x3) / 3 : 1);
                fx -= w * (txx * gx + txy * gy);
                fy -= w * (txy * gx + tyy * gy);
            }
            forces.Add(new ConductorForce(context.Design.Conductors[k].Name, k, axi ? 0 : fx, fy));
        }
        return new ForceReport(sol.EnergyJoules, sol.TotalEnergyJoules, !axi, forces);
    }
}
