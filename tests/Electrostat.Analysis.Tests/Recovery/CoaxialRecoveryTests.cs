using Electrostat.Analysis.HotSpots;
using Electrostat.Analysis.Surface;
using Electrostat.Analysis.Tests.Support;
using Electrostat.Meshing;

namespace Electrostat.Analysis.Tests.Recovery;

/// <summary>Coaxial cylinders: E(r) = V / (r ln(b/a)) (Griffiths, Introduction to Electrodynamics, §2.3 / §4.4).</summary>
public class CoaxialRecoveryTests
{
    private const double A = 2e-3, B = 10e-3, V = 1000;

    private const string Coax = """
    {
      "units": "mm", "symmetry": "planar",
      "materials": { "gas": { "relative_permittivity": 2.0, "breakdown_field": "3 kV/mm" } },
      "background": "gas",
      "enclosure": { "shape": { "type": "circle", "center": [0, 0], "radius": 10 }, "potential": 0 },
      "conductors": [ { "name": "inner", "potential": "1 kV", "shape": { "type": "circle", "center": [0, 0], "radius": 2 } } ],
      "checks": { "min_margin": 1.0 }
    }
    """;

    private static double Exact(double r) => V / (r * Math.Log(B / A));

    private static AnalysisContext Solve(double h) => SolvedDesign.Solve(Coax, new MeshOptions
    {
        SizeFunction = (x, y) => h * (0.25 + Math.Sqrt(x * x + y * y) / A),
    });

    [Fact]
    public void RecoveredSurfaceField_IsMoreAccurateThanElementField_AndConverges()
    {
        // Recovered surface field at r = a against the closed form, on two meshes: the error must fall with h.
        double ErrorOf(AnalysisContext ctx)
        {
            var profile = SurfaceFieldProfiler.Profile(ctx).Single(p => p.ConductorName == "inner");
            return profile.Samples.Max(s => Math.Abs(s.FieldVoltsPerMetre / Exact(A) - 1));
        }
        var coarse = Solve(0.4e-3);
        var fine = Solve(0.1e-3);
        double ec = ErrorOf(coarse), ef = ErrorOf(fine);
        Assert.True(ef < 0.005, $"fine-mesh surface field error {ef:P3}");
        Assert.True(ef < 0.7 * ec, $"errors {ec:P3} -> {ef:P3}: not converging");
        // The element field in the first layer is the field about a third of an element away: clearly worse.
        var sol = fine.Solution;
        double elementPeak = Enumerable.Range(0, sol.Mesh.TriangleCount).Max(sol.FieldMagnitude);
        Assert.True(Math.Abs(elementPeak / Exact(A) - 1) > ef);
    }

    [Fact]
    public void SurfaceChargeIntegral_MatchesGaussLawCharge()
    {
        // Q' = 2π ε V / ln(b/a) per metre (Gauss's law on the coaxial field).
        var ctx = Solve(0.2e-3);
        double q = 2 * Math.PI * 2 * 8.8541878128e-12 * V / Math.Log(B / A);
        var profile = SurfaceFieldProfiler.Profile(ctx).Single(p => p.ConductorName == "inner");
        Assert.True(Math.Abs(profile.IntegratedChargeCoulombs / q - 1) < 0.01, $"∮σ = {profile.IntegratedChargeCoulombs:E5}, Q' = {q:E5}");
        // The wall carries the opposite charge.
        var wall = SurfaceFieldProfiler.Profile(ctx).Single(p => p.ConductorName == "enclosure");
        Assert.True(Math.Abs(wall.IntegratedChargeCoulombs / -q - 1) < 0.01);
        Assert.Contains("arc_length_m", profile.ToCsv(), StringComparison.Ordinal);
    }

    [Fact]
    public void ZienkiewiczZhuEstimate_TracksTrueEnergyError()
    {
        // True squared energy-norm error ∫ ε|E − E_h|² dA from the closed form (7-point-free: the midpoint rule on the
        // fine mesh of each triangle is accurate enough for an effectivity check); the estimator must be within a
        // factor 2 of it (ZZ 1992 report effectivities close to 1 for smooth solutions).
        var ctx = Solve(0.3e-3);
        var sol = ctx.Solution;
        var m = sol.Mesh;
        double eps = 2 * 8.8541878128e-12, trueErr = 0;
        for (int t = 0; t < m.TriangleCount; t++)
        {
            int a = m.Triangles[3 * t], b = m.Triangles[3 * t + 1], c = m.Triangles[3 * t + 2];
            double area = 0.5 * ((m.X[b] - m.X[a]) * (m.Y[c] - m.Y[a]) - (m.X[c] - m.X[a]) * (m.Y[b] - m.Y[a]));
            // Edge-midpoint rule (exact for quadratics) on the smooth exact field.
            for (int i = 0; i < 3; i++)
            {
                int p = m.Triangles[3 * t + i], q = m.Triangles[3 * t + (i + 1) % 3];
                double x = 0.5 * (m.X[p] + m.X[q]), y = 0.5 * (m.Y[p] + m.Y[q]);
                double r = Math.Sqrt(x * x + y * y), e = Exact(r);
                double dx = e * x / r - sol.FieldXVoltsPerMetre[t], dy = e * y / r - sol.FieldYVoltsPerMetre[t];
                trueErr += area / 3 * eps * (dx * dx + dy * dy);
            }
        }
        double effectivity = Math.Sqrt(ctx.Recovered.EstimatedErrorSquared / trueErr);
        Assert.InRange(effectivity, 0.5, 2.0);
        Assert.InRange(ctx.Recovered.EstimatedRelativeError, 1e-4, 0.2);
    }

    [Fact]
    public void HotSpots_LieOnInnerConductor_MergedAndRanked()
    {
        var ctx = Solve(0.3e-3);
        var spots = HotSpotFinder.Find(ctx, []);
        Assert.NotEmpty(spots);
        var top = spots[0];
        Assert.Equal(HotSpotKind.ConductorSurface, top.Kind);
        Assert.Equal("inner", top.NearestFeature);
        Assert.Equal("gas", top.MaterialName);
        Assert.True(Math.Abs(Math.Sqrt(top.XMetres * top.XMetres + top.YMetres * top.YMetres) - A) < 1e-6);
        Assert.True(Math.Abs(top.FieldVoltsPerMetre / Exact(A) - 1) < 0.02);
        Assert.Equal(3e6 / top.FieldVoltsPerMetre, top.Margin!.Value, 1e-9);
        // Merging: no two listed spots closer than the merge radius of the higher one.
        for (int i = 0; i < spots.Count; i++)
            for (int j = i + 1; j < spots.Count; j++)
                Assert.True(Math.Sqrt(Math.Pow(spots[i].XMetres - spots[j].XMetres, 2) + Math.Pow(spots[i].YMetres - spots[j].YMetres, 2)) > spots[i].MergeRadiusMetres);
        Assert.True(spots.Zip(spots.Skip(1)).All(p => p.First.FieldVoltsPerMetre >= p.Second.FieldVoltsPerMetre));
    }
}
