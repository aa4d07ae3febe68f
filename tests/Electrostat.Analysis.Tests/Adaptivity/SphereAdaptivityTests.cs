using Electrostat.Analysis.Adaptivity;

namespace Electrostat.Analysis.Tests.Adaptivity;

public class SphereAdaptivityTests
{
    // Concentric spheres a = 5 mm at 1 V inside b = 20 mm grounded (geometries/validation/concentric-spheres.json),
    // axisymmetric. Closed forms from Gauss's law (Griffiths, Introduction to Electrodynamics, ch. 2):
    // E(a) = V·b/(a(b − a)), C = 4π ε0 a b/(b − a).
    private const double A = 5e-3, B = 20e-3, V = 1.0, Eps0 = 8.8541878128e-12;

    [Fact]
    public void Adapted_PeakAndCapacitance_WithinHalfPercent()
    {
        var design = AdaptiveTestSupport.Load("geometries/validation/concentric-spheres.json");
        var result = AdaptiveTestSupport.Adapt(design, new AdaptiveOptions());
        double exactE = V * B / (A * (B - A));
        double exactC = 4 * Math.PI * Eps0 * A * B / (B - A);
        var pe = result.PeakErrors.Values.Single();
        var ce = result.CapacitanceErrors![0, 0];
        Assert.True(result.Converged, result.StopReason);
        Assert.True(Math.Abs(pe.Value - exactE) / exactE < 0.005, $"peak {pe.Value} vs {exactE}");
        Assert.True(Math.Abs(ce.Value - exactC) / exactC < 0.005, $"capacitance {ce.Value} vs {exactC}");
        Assert.True(pe.RelativeError >= Math.Abs(pe.Value - exactE) / exactE, $"estimate {pe.RelativeError} does not bracket");
    }
}
