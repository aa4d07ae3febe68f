namespace Electrostat.Numerics.Parallelism;

/// <summary>
/// Caps how many threads the numerical kernels split their work into, for the current logical flow of control
/// (an <see cref="AsyncLocal{T}"/> scope, so concurrent callers — e.g. sweep cases on other threads — keep their own
/// setting, and nothing process-wide is changed).
/// </summary>
/// <remarks>
/// Kernels partition their rows into <see cref="Workers"/> contiguous blocks and run one task per block, so the cap
/// bounds the threads a solve uses. Results do not depend on the cap except through the order of floating-point
/// reductions (dot products are summed per block), i.e. at round-off level.
/// </remarks>
public static class WorkerLimit
{
    private static readonly AsyncLocal<int?> Cap = new();

    /// <summary>Threads the kernels use here: the scope's cap, else the processor count; always 1 to 16.</summary>
    public static int Workers => Math.Clamp(Cap.Value ?? Environment.ProcessorCount, 1, 16);

    /// <summary>Caps the kernels at <paramref name="maxWorkers"/> threads until the returned scope is disposed.</summary>
    /// <param name="maxWorkers">At least 1.</param>
    /// <returns>The scope; dispose it to restore the previous cap.</returns>
    public static IDisposable Scope(int maxWorkers)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(maxWorkers, 1);
        var previous = Cap.Value;
        Cap.Value = maxWorkers;
        return new Restore(previous);
    }

    private sealed class Restore(int? previous) : IDisposable
    {
        private bool _disposed;

        public void Dispose()
        {
            if (_disposed) return;
            _disposed = true;
            Cap.Value = previous;
        }
    }
}
