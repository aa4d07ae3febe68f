namespace Electrostat.Rendering.Contours;

/// <summary>Round values (1, 2 or 5 × 10ⁿ steps) for equipotential levels and axis ticks.</summary>
public static class RoundSteps
{
    /// <summary>The round step (1, 2, 2.5 or 5 × 10ⁿ) giving about <paramref name="targetCount"/> intervals over the span.</summary>
    /// <param name="span">Length of the range (same unit as the result), positive.</param>
    /// <param name="targetCount">Wanted number of intervals, at least 1.</param>
    public static double Step(double span, int targetCount)
    {
        if (!(span > 0) || double.IsInfinity(span)) return 1;
        double raw = span / Math.Max(targetCount, 1);
        double decade = Math.Pow(10, Math.Floor(Math.Log10(raw)));
        double f = raw / decade;
        double nice = f <= 1 ? 1 : f <= 2 ? 2 : f <= 2.5 ? 2.5 : f <= 5 ? 5 : 10;
        return nice * decade;
    }

    /// <summary>
    /// Multiples of the round step strictly inside (min, max): the equipotentials worth drawing (the extremes are
    /// the conductors themselves).
    /// </summary>
    /// <param name="min">Lowest value.</param>
    /// <param name="max">Highest value.</param>
    /// <param name="targetCount">Wanted number of intervals.</param>
    public static IReadOnlyList<double> Inside(double min, double max, int targetCount)
    {
        var levels = new List<double>();
        if (!(max > min)) return levels;
        double step = Step(max - min, targetCount);
        double first = Math.Ceiling(min / step) * step;
        // Relative guard so that a level equal to an extreme up to rounding is left out.
        double guard = 1e-9 * (max - min);
        for (int k = 0; ; k++)
        {
            double v = first + k * step;
            if (v >= max - guard) break;
            if (v > min + guard) levels.Add(Math.Abs(v) < guard ? 0 : v);
        }
        return levels;
    }
}
