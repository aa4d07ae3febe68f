using Electrostat.Meshing;

namespace Electrostat.Analysis.Adaptivity;

/// <summary>
/// Carries a P1 potential from one adaptive level to the next, refined mesh: the starting guess of the next solve.
/// </summary>
/// <remarks>
/// Refinement never removes or reorders vertices, so vertex i of the old mesh is vertex i of the new one (asserted);
/// each new vertex takes the linear interpolant of the old triangle containing it, found through a uniform bucket
/// grid of old triangles. A vertex that no old triangle contains within round-off (it can happen only on the
/// boundary) takes the value of the nearest old vertex of the closest bucket's triangles.
/// </remarks>
public static class WarmStart
{
    /// <summary>Interpolates <paramref name="oldPotential"/> (per old vertex) onto the vertices of <paramref name="newMesh"/>.</summary>
    /// <param name="oldMesh">The mesh the potential lives on.</param>
    /// <param name="oldPotential">Potential per old vertex, volts.</param>
    /// <param name="newMesh">The refined mesh.</param>
    /// <returns>Potential per new vertex, volts.</returns>
    public static double[] Interpolate(TriangleMesh oldMesh, double[] oldPotential, TriangleMesh newMesh)
    {
        ArgumentNullException.ThrowIfNull(oldMesh);
        ArgumentNullException.ThrowIfNull(oldPotential);
        ArgumentNullException.ThrowIfNull(newMesh);
        int nOld = oldMesh.VertexCount;
        var result = new double[newMesh.VertexCount];
        Array.Copy(oldPotential, result, Math.Min(nOld, result.Length));
        if (newMesh.VertexCount <= nOld) return result;
        System.Diagnostics.Debug.Assert(oldMesh.X[nOld - 1] == newMesh.X[nOld - 1] && oldMesh.Y[nOld - 1] == newMesh.Y[nOld - 1]);

        var x = oldMesh.X;
        var y = oldMesh.Y;
        var tv = oldMesh.Triangles;
        int nt = oldMesh.TriangleCount;
        double minX = double.MaxValue, minY = double.MaxValue, maxX = double.MinValue, maxY = double.MinValue;
        for (int i = 0; i < nOld; i++)
        {
            minX = Math.Min(minX, x[i]); maxX = Math.Max(maxX, x[i]);
            minY = Math.Min(minY, y[i]); maxY = Math.Max(maxY, y[i]);
        }
        int side = Math.Max(1, (int)Math.Sqrt(nt / 2.0));
        double cw = Math.Max(maxX - minX, 1e-300) / side, ch = Math.Max(maxY - minY, 1e-300) / side;
        int Cell(double v, double lo, double w) => Math.Clamp((int)((v - lo) / w), 0, side - 1);

        // Bucket grid in compressed form: count, prefix sum, fill.
        var start = new int[side * side + 1];
        for (int pass = 0; pass < 2; pass++)
        {
            var fill = pass == 1 ? (int[])start.Clone() : null;
            var items = pass == 1 ? new int[start[^1]] : null;
            for (int t = 0; t < nt; t++)
            {
                int a = tv[3 * t], b = tv[3 * t + 1], c = tv[3 * t + 2];
                int i0 = Cell(Math.Min(x[a], Math.Min(x[b], x[c])), minX, cw), i1 = Cell(Math.Max(x[a], Math.Max(x[b], x[c])), minX, cw);
                int j0 = Cell(Math.Min(y[a], Math.Min(y[b], y[c])), minY, ch), j1 = Cell(Math.Max(y[a], Math.Max(y[b], y[c])), minY, ch);
                for (int j = j0; j <= j1; j++)
                {
                    for (int i = i0; i <= i1; i++)
                    {
                        if (pass == 0) start[j * side + i + 1]++;
                        else items![fill![j * side + i]++] = t;
                    }
                }
            }
            if (pass == 0)
            {
                for (int k = 0; k < side * side; k++) start[k + 1] += start[k];
            }
            else
            {
                Locate(newMesh, nOld, result, oldPotential, x, y, tv, start, items!, c => Cell(newMesh.X[c], minX, cw) + side * Cell(newMesh.Y[c], minY, ch));
            }
        }
        return result;
    }

    private static void Locate(TriangleMesh newMesh, int nOld, double[] result, double[] phi, double[] x, double[] y, int[] tv,
        int[] start, int[] items, Func<int, int> cellOf)
    {
        for (int v = nOld; v < newMesh.VertexCount; v++)
        {
            double px = newMesh.X[v], py = newMesh.Y[v];
            int cell = cellOf(v);
            double best = double.NegativeInfinity;
            double value = 0;
            for (int k = start[cell]; k < start[cell + 1]; k++)
            {
                int t = items[k];
                int a = tv[3 * t], b = tv[3 * t + 1], c = tv[3 * t + 2];
                double det = (x[b] - x[a]) * (y[c] - y[a]) - (x[c] - x[a]) * (y[b] - y[a]);
                double lb = ((px - x[a]) * (y[c] - y[a]) - (x[c] - x[a]) * (py - y[a])) / det;
                double lc = ((x[b] - x[a]) * (py - y[a]) - (px - x[a]) * (y[b] - y[a])) / det;
                double la = 1 - lb - lc;
                double worst = Math.Min(la, Math.Min(lb, lc));
                if (worst > best)
                {
                    // The triangle with the largest smallest barycentric coordinate contains the point (≥ 0) or, if none
                    // does within round-off, is the nearest; clamping keeps the value within the triangle's range.
                    best = worst;
                    la = Math.Max(la, 0); lb = Math.Max(lb, 0); lc = Math.Max(lc, 0);
                    double s = la + lb + lc;
                    value = (la * phi[a] + lb * phi[b] + lc * phi[c]) / s;
                    if (worst >= 0) break;
                }
            }
            result[v] = value;
        }
    }
}
