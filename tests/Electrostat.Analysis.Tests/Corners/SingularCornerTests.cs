using Electrostat.Analysis.Corners;
using Electrostat.Analysis.Tests.Support;
using Electrostat.Meshing;

namespace Electrostat.Analysis.Tests.Corners;

public class SingularCornerTests
{
    // An L-shaped conductor in a grounded box: five convex corners (field-side angle 270°) and one concave (90°).
    private const string LShape = """
    {
      "units": "mm", "symmetry": "planar",
      "materials": { "gas": { "relative_permittivity": 1.0, "breakdown_field": "3 kV/mm" } },
      "background": "gas",
      "enclosure": { "shape": { "type": "rectangle", "min": [0, 0], "max": [10, 10] }, "potential": 0 },
      "conductors": [ { "name": "ell", "potential": "1 kV",
        "shape": { "type": "polygon", "points": [[3, 3], [7, 3], [7, 5], [5, 5], [5, 7], [3, 7]] } } ],
      "checks": { "min_margin": 1.0 }
    }
    """;

    [Fact]
    public void LShape_FlagsTheFiveConvexCorners_NotTheConcaveOne()
    {
        var design = SolvedDesign.Load(LShape);
        var corners = SingularCornerDetector.FindCornerPoints(design);
        Assert.Equal(5, corners.Count);
        Assert.DoesNotContain(corners, c => Math.Abs(c.X - 5e-3) < 1e-12 && Math.Abs(c.Y - 5e-3) < 1e-12);
        Assert.All(corners, c => Assert.Equal(270, c.AngleDegrees, 9));
    }

    [Fact]
    public void ReentrantCorner_RecoveredFieldOnBisector_ScalesAsRToMinusOneThird()
    {
        // Near a corner with field-side angle β the potential is φ ≈ a r^(π/β) sin(πθ/β) + …, so |E| ∝ r^(π/β − 1);
        // for β = 3π/2, |E| ∝ r^(−1/3) and halving r multiplies |E| by 2^(1/3) (Jackson, Classical Electrodynamics,
        // 3rd ed., §2.11). The next term of the series is r^(4/3−1) = r^(1/3), so at r/L = 1e-3 (L = 2 mm, the edge
        // length) the ratio departs from 2^(1/3) by about (r/L)^(2/3)·(1 − 2^(−2/3)) ≈ 0.4% times an O(1) constant;
        // with the mesh ten times finer than r there, a 1% tolerance covers discretisation and that term.
        double cx = 7e-3, cy = 5e-3;
        var ctx = SolvedDesign.Solve(LShape, new MeshOptions
        {
            SizeFunction = (x, y) => Math.Max(1.5e-7, 0.1 * Math.Sqrt((x - cx) * (x - cx) + (y - cy) * (y - cy))),
            MaxEdgeLengthMetres = 0.5e-3,
        });
        var corners = SingularCornerDetector.Detect(ctx);
        var corner = corners.Single(c => Math.Abs(c.Location.X - cx) < 1e-12 && Math.Abs(c.Location.Y - cy) < 1e-12);
        Assert.Equal(-1.0 / 3, corner.FieldExponent, 12);
        Assert.Equal("ell", corner.ConductorName);
        Assert.Contains("mesh-dependent", corner.Warning, StringComparison.Ordinal);
        Assert.Contains("fillet", corner.Warning, StringComparison.Ordinal);
        // Local gap: 3 mm to the wall; suggested fillet 0.3 mm, report distance 0.15 mm.
        Assert.Equal(3e-3, corner.LocalGapMetres, 12);
        Assert.Equal(0.3e-3, corner.SuggestedFilletRadiusMetres, 12);
        Assert.True(corner.ResolvedByMesh);
        Assert.NotNull(corner.FieldAtReportDistanceVoltsPerMetre);

        double b = Math.Sqrt(0.5);
        double Field(double r)
        {
            Assert.True(ctx.Recovered.TryEvaluate(cx + r * b, cy + r * b, out double ex, out double ey, out _));
            return Math.Sqrt(ex * ex + ey * ey);
        }
        foreach (double r in new[] { 8e-6, 4e-6 })
        {
            double ratio = Field(r / 2) / Field(r);
            Assert.True(Math.Abs(ratio / Math.Cbrt(2) - 1) < 0.01, $"r = {r:E1} m: ratio {ratio:F4}, expected {Math.Cbrt(2):F4}");
        }
        // The corner is excluded from the material peak: the margin uses fields at least δ away.
        var margins = Electrostat.Analysis.Margins.MarginChecker.Check(ctx, corners);
        var gas = margins.Materials.Single();
        Assert.True(gas.PeakFieldVoltsPerMetre < Field(2e-6));
        Assert.NotNull(gas.SingularCornerFieldVoltsPerMetre);
    }
}
