namespace Electrostat.Meshing;

/// <summary>
/// The requested mesh would need more triangles than <see cref="MeshOptions.MaxTriangles"/> allows. The message says
/// how to proceed (coarser size, larger budget); it is meant to be shown as is.
/// </summary>
public sealed class MeshBudgetExceededException : Exception
{
    /// <summary>Creates the exception.</summary>
    /// <param name="budget">The triangle budget that was exceeded.</param>
    public MeshBudgetExceededException(int budget)
        : base($"The mesh needs more than {budget:N0} triangles (the budget). Increase the element size (global, per region or the size function), relax the grading, or raise the triangle budget.")
    {
        Budget = budget;
    }

    /// <summary>The triangle budget that was exceeded.</summary>
    public int Budget { get; }
}
