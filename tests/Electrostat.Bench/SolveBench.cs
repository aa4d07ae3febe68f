using System.Diagnostics;
using System.Globalization;
using Electrostat.Fem.Problem;
using Electrostat.Fem.Solving;

namespace Electrostat.Bench;

/// <summary>
/// Suite "solve": the whole FEM chain on a planar two-conductor, two-dielectric design (see
/// <see cref="SolveBenchProblem"/>). Per case, <c>seconds</c> is validation + assembly + AMG setup + the first solve
/// (to 1e-10 relative residual) including its post-processing (charges, field, energy): the wall time of
/// <c>new FieldSolver(p).Solve()</c>. <c>extra_rhs_seconds</c> is the cost of one more right-hand side on the same
/// matrix and hierarchy: the capacitance-matrix time divided by its two columns. Medians over the repeats.
/// <c>peak_mb</c> is the process's peak resident set (VmHWM) during the case, reset before it via /proc/self/clear_refs.
/// Extra fields after the required ones: <c>cpu_seconds</c> (process CPU time of the first solve, all threads: on a
/// shared machine the wall time can be several times this) and <c>load_average</c> (1-minute load at the end of the case),
/// then the breakdown of the last repeat.
/// After the structured sizes, one case on a mesh made by the project's mesher (<see cref="SolveBenchMeshedProblem"/>,
/// mesh time excluded). Options: <c>--cells 125,250,500,1001</c>, <c>--repeat 5</c>, <c>--meshed-edge 2.8e-5</c>
/// (max edge in metres of the meshed case; 0 skips it).
/// </summary>
internal sealed class SolveBench : IBenchSuite
{
    public string Name => "solve";

    public int Run(string[] args)
    {
        int[] cells = [125, 250, 500, 1001];
        int repeat = 5;
        double meshedEdge = 2.8e-5;
        for (int i = 0; i + 1 < args.Length; i += 2)
        {
            switch (args[i])
            {
                case "--cells":
                    cells = args[i + 1].Split(',').Select(s => int.Parse(s, CultureInfo.InvariantCulture)).ToArray();
                    break;
                case "--repeat":
                    repeat = int.Parse(args[i + 1], CultureInfo.InvariantCulture);
                    break;
                case "--meshed-edge":
                    meshedEdge = double.Parse(args[i + 1], CultureInfo.InvariantCulture);
                    break;
                default:
                    Console.Error.WriteLine($"solve: unknown option {args[i]}");
                    return 2;
            }
        }
        bool ok = true;
        var cases = cells.Select(m => ($"structured-two-plates-{m}", (Func<ElectrostaticProblem>)(() => SolveBenchProblem.Create(m)))).ToList();
        if (meshedEdge > 0)
        {
            cases.Add(($"meshed-two-electrodes-h{meshedEdge * 1e6:F0}um", () => SolveBenchMeshedProblem.Create(meshedEdge)));
        }
        foreach (var (name, create) in cases)
        {
            var problem = create();
            GC.Collect();
            BenchProcess.ResetPeak();
            var first = new List<double>();
            var firstCpu = new List<double>();
            var extra = new List<double>();
            var perTerminal = new List<double>();
            SolveReport? report = null;
            double cap = 0;
            for (int r = 0; r < repeat; r++)
            {
                GC.Collect();
                var process = Process.GetCurrentProcess();
                var cpu0 = process.TotalProcessorTime;
                var clock = Stopwatch.StartNew();
                var solver = new FieldSolver(problem);
                var sol = solver.Solve();
                first.Add(clock.Elapsed.TotalSeconds);
                process.Refresh();
                firstCpu.Add((process.TotalProcessorTime - cpu0).TotalSeconds);
                clock.Restart();
                var cm = solver.ComputeCapacitanceMatrix();
                perTerminal.Add(clock.Elapsed.TotalSeconds / cm.Count);
                // The cost of one more right-hand side: the columns that were solved (one comes by superposition of
                // the design solution and costs no solve).
                var solved = cm.ColumnReports.Where(c => c.Iterations > 0).ToList();
                extra.Add(solved.Count > 0 ? solved.Average(c => c.SolveSeconds) : 0);
                report = sol.Report;
                cap = cm.Maxwell[0, 0];
                ok &= sol.Report.Converged && cm.ColumnReports.All(c => c.Converged) && cm.PassesPhysicsChecks;
            }
            double peakMb = BenchProcess.PeakMegabytes();
            Console.WriteLine(string.Create(CultureInfo.InvariantCulture,
                $"solve case={name} unknowns={report!.Unknowns} iterations={report.Iterations} seconds={BenchProcess.Median(first):F3} extra_rhs_seconds={BenchProcess.Median(extra):F3} capacitance_per_terminal_seconds={BenchProcess.Median(perTerminal):F3} peak_mb={peakMb:F0} cpu_seconds={BenchProcess.Median(firstCpu):F3} load_average={BenchProcess.LoadAverage()} assembly_seconds={report.AssemblySeconds:F3} setup_seconds={report.PreconditionerSetupSeconds:F3} cg_seconds={report.SolveSeconds:F3} residual={report.RelativeResidual:E2} c11={cap:E6}"));
        }
        return ok ? 0 : 1;
    }

    /// <summary>The 1-minute load average (Linux), to tell a contended machine from a slow solver.</summary>
}
