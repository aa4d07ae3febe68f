using System.Diagnostics;
using Electrostat.Fem.Assembly;
using Electrostat.Fem.Capacitance;
using Electrostat.Fem.Problem;

namespace Electrostat.Fem.Solving;

/// <summary>
/// Solves an <see cref="ElectrostaticProblem"/>: the design's own potentials (<see cref="Solve"/>) and the Maxwell
/// capacitance matrix (<see cref="ComputeCapacitanceMatrix"/>). The problem is validated once, on construction;
/// user errors throw <see cref="FieldProblemException"/> with a message naming the place and the fix.
/// </summary>
/// <remarks>
/// Each assembled matrix and its preconditioner are kept and reused: the capacitance columns share one, and when the
/// design has no floating conductor the design solve shares it too. Nothing is solved behind the caller's back; each
/// call solves exactly what it says. An instance is not thread-safe (the preconditioner keeps work vectors); use one
/// solver per thread.
/// </remarks>
public sealed class FieldSolver
{
    private readonly CompiledProblem _cp;
    private readonly FieldSolverOptions _options;
    private LinearSystem? _designSystem;
    private LinearSystem? _allFixedSystem;

    /// <summary>The latest <see cref="Solve"/> result, which <see cref="ComputeCapacitanceMatrix"/> reuses as one of
    /// its columns by superposition (see <see cref="CapacitanceMatrixResult"/>); null before the first solve.</summary>
    internal FieldSolution? LastDesignSolution { get; private set; }

    /// <summary>Validates and prepares the problem.</summary>
    /// <param name="problem">The field problem.</param>
    /// <param name="options">Solver options; defaults when null.</param>
    /// <exception cref="FieldProblemException">The problem is inconsistent (message says where and how to fix).</exception>
    public FieldSolver(ElectrostaticProblem problem, FieldSolverOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(problem);
        _options = options ?? new FieldSolverOptions();
        if (!(_options.RelativeTolerance > 0) || _options.MaxIterations < 1)
        {
            throw new ArgumentException("The relative tolerance must be positive and the iteration limit at least 1.", nameof(options));
        }
        _cp = CompiledProblem.Compile(problem);
    }

    /// <summary>The problem being solved.</summary>
    public ElectrostaticProblem Problem => _cp.Problem;

    private bool HasFloating => _cp.Problem.Conductors.Any(c => c.IsFloating);

    internal CompiledProblem Compiled => _cp;

    private LinearSystem DesignSystem()
    {
        if (_designSystem is null)
        {
            _designSystem = !HasFloating && _allFixedSystem is not null
                ? _allFixedSystem
                : new LinearSystem(_cp, DofMap.Build(_cp, floatingAsFixed: false), _options);
        }
        return _designSystem;
    }

    internal LinearSystem AllFixedSystem()
    {
        if (_allFixedSystem is null)
        {
            _allFixedSystem = !HasFloating && _designSystem is not null
                ? _designSystem
                : new LinearSystem(_cp, DofMap.Build(_cp, floatingAsFixed: true), _options);
        }
        return _allFixedSystem;
    }

    /// <summary>
    /// Solves for the design's own potentials: fixed conductors at their potentials, floating ones at their charges,
    /// the enclosure at its potential, volume charges included.
    /// </summary>
    /// <param name="initialPotentialVolts">Optional warm start: a potential per mesh vertex (e.g. the previous
    /// adaptive step's solution interpolated onto this mesh); null starts from zero.</param>
    public FieldSolution Solve(double[]? initialPotentialVolts = null)
    {
        var mesh = _cp.Mesh;
        if (initialPotentialVolts is not null && initialPotentialVolts.Length != mesh.VertexCount)
        {
            throw new ArgumentException($"The initial guess has {initialPotentialVolts.Length} values but the mesh has {mesh.VertexCount} vertices.", nameof(initialPotentialVolts));
        }
        var sys = DesignSystem();
        var sw = Stopwatch.StartNew();
        var terminalV = SystemAssembler.DesignPotentials(_cp);
        var charges = new double[_cp.ConductorCount];
        for (int c = 0; c < charges.Length; c++) charges[c] = _cp.Problem.Conductors[c].ChargeCoulombs;
        var b = SystemAssembler.RightHandSide(_cp, sys.Map, terminalV, charges, includeVolumeCharge: true);
        var u = initialPotentialVolts is null ? new double[sys.Map.DofCount] : SystemAssembler.Restrict(sys.Map, initialPotentialVolts);
        double rhsSeconds = sw.Elapsed.TotalSeconds;
        var report = sys.Solve(b, u, rhsSeconds);
        sw.Restart();

        var phi = SystemAssembler.Expand(sys.Map, u, terminalV);
        var q = SystemAssembler.TerminalCharges(_cp, phi, includeVolumeCharge: true);
        var conductors = new ConductorResult[_cp.ConductorCount];
        for (int c = 0; c < conductors.Length; c++)
        {
            var def = _cp.Problem.Conductors[c];
            double v = def.IsFloating ? phi[FirstNodeOf(c)] : def.PotentialVolts;
            conductors[c] = new ConductorResult(def.Name, def.IsFloating, v, q[c], 0.5 * q[c] * v);
        }
        var ex = new double[mesh.TriangleCount];
        var ey = new double[mesh.TriangleCount];
        double energy = SystemAssembler.Energy(_cp, phi, ex, ey);
        report = report with { SolveSeconds = report.SolveSeconds + sw.Elapsed.TotalSeconds };
        var solution = new FieldSolution(_cp.Problem, phi, ex, ey, conductors, q[_cp.EnclosureTerminal], q[_cp.InfinityTerminal], energy, report);
        LastDesignSolution = solution;
        return solution;
    }

    /// <summary>
    /// Computes the Maxwell capacitance matrix with every conductor as a terminal (floating ones included), from one
    /// solve per conductor sharing one matrix and one preconditioner; see <see cref="CapacitanceMatrixResult"/>.
    /// After <see cref="Solve"/>, one column comes from the design solution by superposition instead of a solve, when
    /// the problem is linear and homogeneous in the terminal potentials (no volume charge, one reference potential).
    /// </summary>
    public CapacitanceMatrixResult ComputeCapacitanceMatrix() => CapacitanceCalculator.Compute(this);

    private int FirstNodeOf(int conductor)
    {
        var t = _cp.NodeTerminal;
        for (int i = 0; i < t.Length; i++)
        {
            if (t[i] == conductor) return i;
        }
        throw new UnreachableException("every conductor has a vertex (checked on compile)");
    }
}
