using Electrostat.Analysis.Adaptivity;
using Xunit.Abstractions;

namespace Electrostat.Analysis.Tests.Adaptivity;

public class CoaxialAdaptivityTests(ITestOutputHelper output)
{
    // Coaxial cylinders a = 2 mm, b = 10 mm, 1 V (geometries/validation/coaxial-cylinders.json). Closed forms from
    // Gauss's law (Griffiths, Introduction to Electrodynamics, ch. 2): E(a) = V/(a ln(b/a)), C' = 2π ε0/ln(b/a).
    private const double A = 2e-3, B = 10e-3, V = 1.0, Eps0 = 8.8541878128e-12;

    [Fact]
    public void Adapted_PeakAndCapacitance_WithinHalfPercent_AndEstimateBracketsTrueError()
    {
        var design = AdaptiveTestSupport.Load("geometries/validation/coaxial-cylinders.json");
        // The whole pipeline at its default (normal) accuracy, as `electrostat solve` runs it.
        var outcome = Electrostat.Analysis.Pipeline.SolvePipeline.Run(design);
        var result = outcome.Adaptive;
        foreach (var l in result.Levels)
        {
            output.WriteLine($"level {l.Index}: {l.Triangles} tri, peak {l.Peaks[0].FieldVoltsPerMetre:G8} at ({l.Peaks[0].XMetres:G4},{l.Peaks[0].YMetres:G4}) surf={l.Peaks[0].OnConductorSurface}, C {l.Capacitance![0, 0]:G8}, eta {l.EstimatedEnergyError:G3}, it {l.Iterations}, mesh {l.MeshSeconds:F3} solve {l.SolveSeconds:F3} est {l.EstimateSeconds:F3}");
        }
        output.WriteLine(result.StopReason);
        double exactE = V / (A * Math.Log(B / A));
        double exactC = 2 * Math.PI * Eps0 / Math.Log(B / A);
        var pe = result.PeakErrors["vacuum_gap"];
        var ce = result.CapacitanceErrors![0, 0];
        double trueE = Math.Abs(pe.Value - exactE) / exactE;
        double trueC = Math.Abs(ce.Value - exactC) / exactC;
        output.WriteLine($"E {pe.Value:G8} exact {exactE:G8} true {trueE:E2} est {pe.RelativeError:E2} ({pe.Method})");
        output.WriteLine($"C {ce.Value:G8} exact {exactC:G8} true {trueC:E2} est {ce.RelativeError:E2} ({ce.Method})");
        Assert.True(result.Converged, result.StopReason);
        Assert.True(trueE < 0.005, $"peak error {trueE:P3}");
        Assert.True(trueC < 0.005, $"capacitance error {trueC:P3}");
        Assert.True(pe.RelativeError >= trueE, $"peak estimate {pe.RelativeError:E2} below true error {trueE:E2}");
        Assert.True(ce.RelativeError >= trueC, $"capacitance estimate {ce.RelativeError:E2} below true error {trueC:E2}");
    }
}
