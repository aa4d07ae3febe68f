namespace Electrostat.Analysis.Pipeline;

/// <summary>
/// How hard the solve pipeline works: the adaptive tolerance, the element budget and how finely curves are cut.
/// </summary>
/// <param name="Name">"coarse", "normal", "fine" or "custom".</param>
/// <param name="RelativeTolerance">Stopping tolerance of the adaptive loop (dimensionless).</param>
/// <param name="MaxTriangles">Element budget.</param>
/// <param name="ChordToleranceFraction">Largest chord sagitta as a fraction of the enclosure diagonal (dimensionless).</param>
/// <param name="MaxChordAngleDegrees">Largest angle spanned by one chord of an arc, degrees.</param>
public sealed record AccuracyLevel(string Name, double RelativeTolerance, int MaxTriangles, double ChordToleranceFraction, double MaxChordAngleDegrees)
{
    /// <summary>2 % tolerance, 50 000 triangles, the mesher's default sagitta bound but at most 5° per chord (with the
    /// mesher's 15° the validation wires, 24 chords on a 1 mm radius, came out 0.15–0.17 % low against an estimate of
    /// 0.07 %: the chord error, which refinement never changes, exceeded the estimate; at 5° they bracket).</summary>
    public static AccuracyLevel Coarse { get; } = new("coarse", 0.02, 50_000, 2e-5, 5);

    /// <summary>0.5 % tolerance (the default), 200 000 triangles, curves cut ten times finer than the mesher's default
    /// (a faceted electrode has weakly singular vertices; on the coaxial validation case the default cut alone put
    /// the surface peak 0.7 % high).</summary>
    public static AccuracyLevel Normal { get; } = new("normal", 0.005, 200_000, 2e-6, 5);

    /// <summary>0.1 % tolerance, 1 000 000 triangles, finest curve cut.</summary>
    public static AccuracyLevel Fine { get; } = new("fine", 0.001, 1_000_000, 5e-7, 3);

    /// <summary>A custom tolerance with the budget and curve cut of the nearest named level.</summary>
    /// <param name="relativeTolerance">Tolerance, dimensionless (e.g. 0.01 for 1 %).</param>
    public static AccuracyLevel Custom(double relativeTolerance)
    {
        if (!(relativeTolerance > 0 && relativeTolerance < 1))
            throw new ArgumentOutOfRangeException(nameof(relativeTolerance), relativeTolerance, "The tolerance must be between 0 and 1 (e.g. 0.005 for 0.5 %).");
        var near = relativeTolerance >= 0.01 ? Coarse : relativeTolerance >= 0.002 ? Normal : Fine;
        return near with { Name = "custom", RelativeTolerance = relativeTolerance };
    }
}
