using System.Numerics;
using System.Runtime.InteropServices;
using Electrostat.Numerics.Parallelism;

namespace Electrostat.Numerics.Vectors;

/// <summary>
/// Dense vector kernels (dot, axpy and fused updates) vectorised with <see cref="Vector{T}"/> and split over
/// the processor cores for long vectors. Reductions are summed in a fixed chunk order, so results are
/// reproducible run to run on the same machine.
/// </summary>
public static class VectorKernels
{
    /// <summary>Returns the Euclidean inner product x·y.</summary>
    public static double Dot(ReadOnlySpan<double> x, ReadOnlySpan<double> y)
    {
        if (x.Length != y.Length)
        {
            throw new ArgumentException($"Vector lengths differ ({x.Length} vs {y.Length}).", nameof(y));
        }
        return DotSerial(x, y);
    }

    /// <summary>Returns x·y, split over the cores when the vectors are long.</summary>
    public static double Dot(double[] x, double[] y)
    {
        if (x.Length != y.Length)
        {
            throw new ArgumentException($"Vector lengths differ ({x.Length} vs {y.Length}).", nameof(y));
        }
        int n = x.Length;
        if (n < ParallelPolicy.MinimumParallelWork * 2)
        {
            return DotSerial(x, y);
        }
        var parts = RowPartition.Even(n, ParallelPolicy.DefaultWorkers);
        var partial = new double[parts.Count];
        Parallel.For(0, parts.Count, k =>
        {
            int s = parts.Start(k);
            partial[k] = DotSerial(x.AsSpan(s, parts.End(k) - s), y.AsSpan(s, parts.End(k) - s));
        });
        double sum = 0;
        foreach (double p in partial)
        {
            sum += p;
        }
        return sum;
    }

    /// <summary>Returns the Euclidean norm ‖x‖₂.</summary>
    public static double Norm2(double[] x) => Math.Sqrt(Dot(x, x));

    /// <summary>y ← y + a·x.</summary>
    public static void Axpy(double a, double[] x, double[] y)
    {
        if (x.Length != y.Length)
        {
            throw new ArgumentException($"Vector lengths differ ({x.Length} vs {y.Length}).", nameof(y));
        }
        ForChunks(x.Length, (s, e) => AxpySerial(a, x.AsSpan(s, e - s), y.AsSpan(s, e - s)));
    }

    /// <summary>y ← x + b·y (the search-direction update of conjugate gradients).</summary>
    public static void Xpby(double[] x, double b, double[] y)
    {
        if (x.Length != y.Length)
        {
            throw new ArgumentException($"Vector lengths differ ({x.Length} vs {y.Length}).", nameof(y));
        }
        ForChunks(x.Length, (s, e) => XpbySerial(x.AsSpan(s, e - s), b, y.AsSpan(s, e - s)));
    }

    /// <summary>Serial vectorised x·y.</summary>
    internal static double DotSerial(ReadOnlySpan<double> x, ReadOnlySpan<double> y)
    {
        int n = x.Length;
        int i = 0;
        double sum = 0;
        if (Vector.IsHardwareAccelerated && n >= 4 * Vector<double>.Count)
        {
            var vx = MemoryMarshal.Cast<double, Vector<double>>(x);
            var vy = MemoryMarshal.Cast<double, Vector<double>>(y);
            Vector<double> a0 = Vector<double>.Zero, a1 = Vector<double>.Zero;
            int m = vx.Length;
            int j = 0;
            // Two accumulators hide the latency of the fused multiply-add chain.
            for (; j + 1 < m; j += 2)
            {
                a0 += vx[j] * vy[j];
                a1 += vx[j + 1] * vy[j + 1];
            }
            for (; j < m; j++)
            {
                a0 += vx[j] * vy[j];
            }
            sum = Vector.Sum(a0 + a1);
            i = m * Vector<double>.Count;
        }
        for (; i < n; i++)
        {
            sum += x[i] * y[i];
        }
        return sum;
    }

    /// <summary>Serial vectorised y ← y + a·x.</summary>
    internal static void AxpySerial(double a, ReadOnlySpan<double> x, Span<double> y)
    {
        int n = x.Length;
        int i = 0;
        if (Vector.IsHardwareAccelerated)
        {
            var vx = MemoryMarshal.Cast<double, Vector<double>>(x);
            var vy = MemoryMarshal.Cast<double, Vector<double>>(y);
            var va = new Vector<double>(a);
            for (int j = 0; j < vx.Length; j++)
            {
                vy[j] += va * vx[j];
            }
            i = vx.Length * Vector<double>.Count;
        }
        for (; i < n; i++)
        {
            y[i] += a * x[i];
        }
    }

    /// <summary>Serial vectorised y ← x + b·y.</summary>
    internal static void XpbySerial(ReadOnlySpan<double> x, double b, Span<double> y)
    {
        int n = x.Length;
        int i = 0;
        if (Vector.IsHardwareAccelerated)
        {
            var vx = MemoryMarshal.Cast<double, Vector<double>>(x);
            var vy = MemoryMarshal.Cast<double, Vector<double>>(y);
            var vb = new Vector<double>(b);
            for (int j = 0; j < vx.Length; j++)
            {
                vy[j] = vx[j] + vb * vy[j];
            }
            i = vx.Length * Vector<double>.Count;
        }
        for (; i < n; i++)
        {
            y[i] = x[i] + b * y[i];
        }
    }

    /// <summary>
    /// Fused conjugate-gradient update: x ← x + a·p, r ← r − a·q; returns r·r after the update.
    /// One pass over four vectors instead of three passes.
    /// </summary>
    internal static double UpdateSolutionAndResidual(double a, double[] p, double[] q, double[] x, double[] r)
    {
        int n = x.Length;
        if (n < ParallelPolicy.MinimumParallelWork * 2)
        {
            return UpdateSerial(a, p, q, x, r, 0, n);
        }
        var parts = RowPartition.Even(n, ParallelPolicy.DefaultWorkers);
        var partial = new double[parts.Count];
        Parallel.For(0, parts.Count, k => partial[k] = UpdateSerial(a, p, q, x, r, parts.Start(k), parts.End(k)));
        double sum = 0;
        foreach (double v in partial)
        {
            sum += v;
        }
        return sum;
    }

    private static double UpdateSerial(double a, double[] p, double[] q, double[] x, double[] r, int start, int end)
    {
        int len = end - start;
        var ps = p.AsSpan(start, len);
        var qs = q.AsSpan(start, len);
        var xs = x.AsSpan(start, len);
        var rs = r.AsSpan(start, len);
        int i = 0;
        double sum = 0;
        if (Vector.IsHardwareAccelerated)
        {
            var vp = MemoryMarshal.Cast<double, Vector<double>>(ps);
            var vq = MemoryMarshal.Cast<double, Vector<double>>(qs);
            var vx = MemoryMarshal.Cast<double, Vector<double>>(xs);
            var vr = MemoryMarshal.Cast<double, Vector<double>>(rs);
            var va = new Vector<double>(a);
            var acc = Vector<double>.Zero;
            for (int j = 0; j < vp.Length; j++)
            {
                vx[j] += va * vp[j];
                var rn = vr[j] - va * vq[j];
                vr[j] = rn;
                acc += rn * rn;
            }
            sum = Vector.Sum(acc);
            i = vp.Length * Vector<double>.Count;
        }
        for (; i < len; i++)
        {
            xs[i] += a * ps[i];
            double rn = rs[i] - a * qs[i];
            rs[i] = rn;
            sum += rn * rn;
        }
        return sum;
    }

    /// <summary>Runs <paramref name="body"/>(start, end) over even chunks of [0, n), in parallel when long.</summary>
    internal static void ForChunks(int n, Action<int, int> body)
    {
        if (n < ParallelPolicy.MinimumParallelWork * 2)
        {
            body(0, n);
            return;
        }
        var parts = RowPartition.Even(n, ParallelPolicy.DefaultWorkers);
        Parallel.For(0, parts.Count, k => body(parts.Start(k), parts.End(k)));
    }
}
