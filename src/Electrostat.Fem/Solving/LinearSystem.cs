using System.Diagnostics;
using Electrostat.Fem.Assembly;
using Electrostat.Numerics.Solvers;
using Electrostat.Numerics.Sparse;

namespace Electrostat.Fem.Solving;

/// <summary>
/// One assembled reduced matrix with its preconditioner, set up once and reused for every right-hand side.
/// The first solve's report carries the assembly and setup times; later ones report 0 for them.
/// </summary>
internal sealed class LinearSystem
{
    private readonly FieldSolverOptions _options;
    private bool _setupReported;

    public LinearSystem(CompiledProblem cp, DofMap map, FieldSolverOptions options)
    {
        _options = options;
        Map = map;
        var sw = Stopwatch.StartNew();
        Matrix = SystemAssembler.Matrix(cp, map);
        AssemblySeconds = sw.Elapsed.TotalSeconds;
        sw.Restart();
        (Preconditioner, PreconditionerName) = PreconditionerFactory.Create(Matrix, options.UseMultigrid);
        SetupSeconds = sw.Elapsed.TotalSeconds;
    }

    public DofMap Map { get; }

    public CsrMatrix Matrix { get; }

    public IPreconditioner? Preconditioner { get; }

    public string PreconditionerName { get; }

    public double AssemblySeconds { get; }

    public double SetupSeconds { get; }

    /// <summary>Solves K·u = b in place of <paramref name="u"/> (initial guess in, solution out).</summary>
    public SolveReport Solve(double[] b, double[] u, double rhsSeconds)
    {
        var pcg = new PcgOptions { RelativeTolerance = _options.RelativeTolerance, MaxIterations = _options.MaxIterations, RecordHistory = false };
        PcgReport report;
        if (Map.DofCount == 0)
        {
            report = new PcgReport { Status = PcgStatus.Converged, Iterations = 0, InitialRelativeResidual = 0, FinalRelativeResidual = 0, ResidualHistory = [], Seconds = 0 };
        }
        else
        {
            report = ConjugateGradient.Solve(Matrix, b, u, Preconditioner, pcg);
        }
        bool first = !_setupReported;
        _setupReported = true;
        return new SolveReport
        {
            Unknowns = Map.DofCount,
            NonZeros = Matrix.NonZeroCount,
            Iterations = report.Iterations,
            RelativeResidual = report.FinalRelativeResidual,
            Converged = report.Converged,
            AssemblySeconds = first ? AssemblySeconds : 0,
            PreconditionerSetupSeconds = first ? SetupSeconds : 0,
            SolveSeconds = report.Seconds + rhsSeconds,
            Preconditioner = PreconditionerName,
        };
    }
}
