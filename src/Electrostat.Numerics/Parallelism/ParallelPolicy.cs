namespace Electrostat.Numerics.Parallelism;

/// <summary>
/// Decides when a kernel is worth running on several threads. Below a few tens of thousands of entries the
/// cost of waking a worker (microseconds) exceeds the work, so coarse multigrid levels run serially.
/// </summary>
internal static class ParallelPolicy
{
    /// <summary>Entries of work below which a kernel runs on the calling thread only.</summary>
    public const int MinimumParallelWork = 40_000;

    /// <summary>Default number of workers: the machine's processor count (or the caller's <see cref="WorkerLimit"/>),
    /// capped to keep chunks large.</summary>
    public static int DefaultWorkers => WorkerLimit.Workers;
}
