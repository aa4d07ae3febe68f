using CsCheck;
using Electrostat.Meshing.Core;
using Electrostat.Meshing.Input;

namespace Electrostat.Meshing.Tests;

public class LocalFeatureSizeTests
{
    /// <summary>The bucket-grid search must equal the brute-force definition (nearest other vertex or non-incident segment).</summary>
    [Fact]
    public void GridSearch_EqualsBruteForce()
    {
        var gen = Gen.Select(Gen.Double[0, 1].Array[4, 60], Gen.Double[0, 1].Array[60], Gen.Int[0, 5]);
        gen.Sample((xs, ys, scaleExp) =>
        {
            double s = Math.Pow(10, scaleExp - 3);
            var g = new PlanarGraph();
            for (int i = 0; i < xs.Length; i++) g.AddVertex(xs[i] * s, ys[i] * s * 0.3);
            for (int i = 0; i + 1 < xs.Length; i += 2) g.AddSegment(i, i + 1, 0);
            var fast = SizeField.LocalFeatureSizes(g);
            for (int v = 0; v < g.VertexCount; v++)
            {
                double best = double.PositiveInfinity;
                for (int w = 0; w < g.VertexCount; w++)
                    if (w != v) best = Math.Min(best, Math.Sqrt(Math.Pow(g.X[w] - g.X[v], 2) + Math.Pow(g.Y[w] - g.Y[v], 2)));
                foreach (var seg in g.Segments)
                {
                    if (seg.A == v || seg.B == v) continue;
                    double ax = g.X[seg.A], ay = g.Y[seg.A], dx = g.X[seg.B] - ax, dy = g.Y[seg.B] - ay;
                    double t = Math.Clamp(((g.X[v] - ax) * dx + (g.Y[v] - ay) * dy) / (dx * dx + dy * dy), 0, 1);
                    best = Math.Min(best, Math.Sqrt(Math.Pow(ax + t * dx - g.X[v], 2) + Math.Pow(ay + t * dy - g.Y[v], 2)));
                }
                if (Math.Abs(fast[v] - best) > 1e-12 * s) return false;
            }
            return true;
        }, iter: 300);
    }
}
