using Electrostat.Numerics.Multigrid;
using Electrostat.Numerics.Solvers;
using Electrostat.Numerics.Sparse;

namespace Electrostat.Fem.Solving;

/// <summary>The one place that chooses the preconditioner of the field solves.</summary>
internal static class PreconditionerFactory
{
    public static (IPreconditioner? Preconditioner, string Name) Create(CsrMatrix matrix, bool multigrid)
    {
        if (matrix.Rows == 0) return (null, "none");
        if (!multigrid) return (new JacobiPreconditioner(matrix), "Jacobi");
        var amg = SmoothedAggregationAmg.Build(matrix);
        return (amg, $"smoothed-aggregation AMG, {amg.Stats.Levels.Count} levels, operator complexity {amg.Stats.OperatorComplexity:F2}");
    }
}
