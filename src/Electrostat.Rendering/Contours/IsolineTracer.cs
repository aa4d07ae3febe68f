namespace Electrostat.Rendering.Contours;

/// <summary>
/// Equipotentials of a P1 (piecewise-linear) potential, traced exactly by marching triangles.
/// </summary>
/// <remarks>
/// In a linear triangle the level set φ = c is a straight segment joining the two edge points where φ crosses c
/// (linear interpolation along the edge is exact for P1). A vertex lying exactly on the level is treated as slightly
/// above it (the usual symbolic perturbation), so every crossing is counted once and no degenerate point segments
/// appear; a triangle with all three corners on the level (a conductor face) yields nothing.
/// </remarks>
public static class IsolineTracer
{
    /// <summary>Traces every level through every triangle.</summary>
    /// <param name="x">Vertex x, metres.</param>
    /// <param name="y">Vertex y, metres.</param>
    /// <param name="triangles">Three vertex indices per triangle.</param>
    /// <param name="potentialVolts">Potential per vertex, volts.</param>
    /// <param name="levelsVolts">Levels to trace, volts.</param>
    /// <returns>The segments, level by level, triangle by triangle.</returns>
    public static IReadOnlyList<IsolineSegment> Trace(ReadOnlySpan<double> x, ReadOnlySpan<double> y, ReadOnlySpan<int> triangles,
        ReadOnlySpan<double> potentialVolts, IReadOnlyList<double> levelsVolts)
    {
        ArgumentNullException.ThrowIfNull(levelsVolts);
        var result = new List<IsolineSegment>();
        int count = triangles.Length / 3;
        Span<double> px = stackalloc double[2];
        Span<double> py = stackalloc double[2];
        foreach (double c in levelsVolts)
        {
            for (int t = 0; t < count; t++)
            {
                int n = 0;
                for (int e = 0; e < 3; e++)
                {
                    int a = triangles[3 * t + e], b = triangles[3 * t + (e + 1) % 3];
                    double fa = potentialVolts[a] - c, fb = potentialVolts[b] - c;
                    bool aAbove = fa >= 0, bAbove = fb >= 0;
                    if (aAbove == bAbove) continue;
                    double s = fa / (fa - fb);
                    if (n < 2)
                    {
                        px[n] = x[a] + s * (x[b] - x[a]);
                        py[n] = y[a] + s * (y[b] - y[a]);
                    }
                    n++;
                }
                // A plane crosses a triangle's boundary an even number of times: 0 or 2.
                System.Diagnostics.Debug.Assert(n == 0 || n == 2);
                if (n == 2) result.Add(new IsolineSegment(c, px[0], py[0], px[1], py[1]));
            }
        }
        return result;
    }
}
