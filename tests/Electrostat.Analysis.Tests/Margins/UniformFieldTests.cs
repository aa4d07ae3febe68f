using Electrostat.Analysis.Forces;
using Electrostat.Analysis.Margins;
using Electrostat.Analysis.Tests.Support;
using Electrostat.Meshing;

namespace Electrostat.Analysis.Tests.Margins;

/// <summary>Parallel plates with two dielectric layers: the field in each layer is uniform and known in closed form.</summary>
public class UniformFieldTests
{
    // Strip of a wide plate capacitor cut out by mirror planes (so the field is exactly uniform): lower plate = the
    // grounded wall y = 0, upper plate at 10 kV, layer of εr = 4 (d1 = 0.4 mm) under air (d2 = 0.6 mm).
    private const string Layered = """
    {
      "units": "mm", "symmetry": "planar",
      "parameters": { "w": 4, "d1": 0.4, "d2": 0.6, "plate": 0.5 },
      "materials": {
        "gas": { "relative_permittivity": 1.0, "breakdown_field": "30 kV/mm" },
        "film": { "relative_permittivity": 4.0, "breakdown_field": "10 kV/mm" }
      },
      "background": "gas",
      "enclosure": {
        "shape": { "type": "rectangle", "min": [0, 0], "max": ["w", "d1 + d2 + plate"] },
        "potential": 0,
        "symmetry_planes": [ { "x": 0 }, { "x": "w" }, { "y": "d1 + d2 + plate" } ]
      },
      "conductors": [
        { "name": "upper", "potential": "10 kV", "shape": { "type": "rectangle", "min": [0, "d1 + d2"], "max": ["w", "d1 + d2 + plate"] } }
      ],
      "dielectrics": [ { "name": "layer", "material": "film", "shape": { "type": "rectangle", "min": [0, 0], "max": ["w", "d1"] } } ],
      "checks": { "min_margin": 2.0, "materials": { "film": { "min_margin": 3.0 } } }
    }
    """;

    private static readonly MeshOptions Options = new() { MaxEdgeLengthMetres = 0.2e-3 };

    [Fact]
    public void TwoLayerMargins_MatchSeriesLayerHandCalculation()
    {
        // Layers in series (Griffiths, Introduction to Electrodynamics, §4.4: D is the same in both layers):
        // E_film = V / (d1 + d2·ε_film/ε_gas), E_gas = ε_film/ε_gas · E_film.
        const double v = 10e3, d1 = 0.4e-3, d2 = 0.6e-3, epsFilm = 4, epsGas = 1;
        double eFilm = v / (d1 + d2 * epsFilm / epsGas);
        double eGas = epsFilm / epsGas * eFilm;
        var ctx = SolvedDesign.Solve(Layered, Options);
        var report = MarginChecker.Check(ctx, []);
        var film = report.Materials.Single(m => m.MaterialName == "film");
        var gas = report.Materials.Single(m => m.MaterialName == "gas");
        // P1 reproduces a piecewise-linear potential exactly and the patch fit reproduces constants, so the only
        // error is the linear solver's (relative tolerance well below 1e-6).
        Assert.Equal(eFilm, film.PeakFieldVoltsPerMetre, eFilm * 1e-6);
        Assert.Equal(eGas, gas.PeakFieldVoltsPerMetre, eGas * 1e-6);
        Assert.Equal(10e6 / eFilm, film.Margin!.Value, 1e-5);
        Assert.Equal(30e6 / eGas, gas.Margin!.Value, 1e-5);
        // film: 10 kV/mm / 3.57 kV/mm = 2.8 < 3 (override) → fail; gas: 30 / 14.3 = 2.1 ≥ 2 → pass.
        Assert.Equal(3.0, film.RequiredMargin);
        Assert.Equal(2.0, gas.RequiredMargin);
        Assert.Equal(CheckVerdict.Fail, film.Verdict);
        Assert.Equal(CheckVerdict.Pass, gas.Verdict);
        Assert.Equal(CheckVerdict.Fail, report.Verdict);
    }

    [Fact]
    public void MaterialWithoutBreakdownField_IsNotChecked_NeverPasses()
    {
        var ctx = SolvedDesign.Solve(Layered.Replace(", \"breakdown_field\": \"30 kV/mm\"", "", StringComparison.Ordinal)
            .Replace("\"min_margin\": 3.0", "\"min_margin\": 1.0", StringComparison.Ordinal), Options);
        var report = MarginChecker.Check(ctx, []);
        var gas = report.Materials.Single(m => m.MaterialName == "gas");
        Assert.Null(gas.Margin);
        Assert.Equal(CheckVerdict.NotChecked, gas.Verdict);
        Assert.Equal(CheckVerdict.Pass, report.Materials.Single(m => m.MaterialName == "film").Verdict);
        Assert.Equal(CheckVerdict.Pass, report.Verdict);
    }

    [Fact]
    public void ParallelPlateForce_EqualsMaxwellPressure()
    {
        // Pressure on a plate facing a field E in a medium ε: F/A = εE²/2 = D²/(2ε) (Griffiths §2.5.3 and §4.4),
        // attracting the plates. Per metre of depth on a strip of width w: F' = w·ε_gas·E_gas²/2.
        const double w = 4e-3, v = 10e3, d1 = 0.4e-3, d2 = 0.6e-3;
        double eGas = 4 * v / (d1 + d2 * 4);
        double expected = w * 8.8541878128e-12 * eGas * eGas / 2;
        var ctx = SolvedDesign.Solve(Layered, Options);
        var forces = ForceCalculator.Compute(ctx);
        var upper = forces.Forces.Single(f => f.ConductorName == "upper");
        Assert.True(forces.PerMetreOfDepth);
        Assert.True(Math.Abs(-upper.ForceYNewtons / expected - 1) < 0.01, $"F'y = {upper.ForceYNewtons} N/m, expected −{expected}");
        Assert.True(Math.Abs(upper.ForceXNewtons) < 1e-3 * expected);
        // Energy ½CV² with C' = ε0 w / (d1/4 + d2).
        double c = 8.8541878128e-12 * w / (d1 / 4 + d2);
        Assert.Equal(0.5 * c * v * v, forces.EnergyJoules, 0.5 * c * v * v * 1e-6);
    }
}
