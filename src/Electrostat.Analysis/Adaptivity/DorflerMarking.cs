namespace Electrostat.Analysis.Adaptivity;

/// <summary>
/// Bulk (Dörfler) marking: the smallest set of triangles, taken in decreasing order of η_T², whose indicators sum to
/// at least θ times the total (Dörfler, "A convergent adaptive algorithm for Poisson's equation", SIAM J. Numer.
/// Anal. 33(3):1106–1124, 1996).
/// </summary>
public static class DorflerMarking
{
    /// <summary>Marks triangles.</summary>
    /// <param name="etaSquared">Indicator η_T² per triangle (non-negative).</param>
    /// <param name="theta">Bulk fraction θ in (0, 1].</param>
    /// <param name="minimumCount">Mark at least this many (the largest), so that every level grows the mesh enough to
    /// keep the loop's total cost a bounded multiple of the last level.</param>
    /// <param name="maximumCount">Mark at most this many (the element budget).</param>
    /// <returns>Marked triangle indices, largest indicator first.</returns>
    public static int[] Mark(ReadOnlySpan<double> etaSquared, double theta, int minimumCount, int maximumCount)
    {
        if (!(theta > 0 && theta <= 1)) throw new ArgumentOutOfRangeException(nameof(theta), theta, "θ must be in (0, 1].");
        int n = etaSquared.Length;
        var order = new int[n];
        var keys = new double[n];
        double total = 0;
        for (int t = 0; t < n; t++)
        {
            order[t] = t;
            keys[t] = -etaSquared[t];
            total += etaSquared[t];
        }
        Array.Sort(keys, order);
        double goal = theta * total;
        double acc = 0;
        int count = 0;
        while (count < n && (acc < goal || count < minimumCount) && count < maximumCount)
        {
            acc -= keys[count];
            count++;
        }
        return order[..count];
    }
}
