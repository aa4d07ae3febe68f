using System.Diagnostics;
using System.Globalization;
using Electrostat.Numerics.Multigrid;
using Electrostat.Numerics.Ordering;
using Electrostat.Numerics.Solvers;
using Electrostat.Numerics.Sparse;

namespace Electrostat.Bench;

/// <summary>
/// Suite "amg": the numerics layer alone on a generated P1 Laplace problem (see <see cref="JitteredSquare"/>).
/// Per case: symbolic + numeric assembly, AMG setup, PCG to 1e-10 relative residual from zero, then one more
/// right-hand side with the same hierarchy. Times are medians over the repeats.
/// Options: <c>--cells 126,251,501,1001</c> (cells per side; unknowns = (cells − 1)²), <c>--repeat 5</c>, and the
/// <c>--shuffle 1</c> (random dof numbering), <c>--renumber 1</c> (reverse Cuthill–McKee dof numbering), and the
/// AMG settings <c>--theta</c>, <c>--sweeps</c>, <c>--power</c>, <c>--coarsest</c> (see <see cref="AmgOptions"/>).
/// </summary>
internal sealed class AmgBench : IBenchSuite
{
    public string Name => "amg";

    public int Run(string[] args)
    {
        int[] cells = [126, 251, 501, 1001];
        int repeat = 5;
        var amgOptions = new AmgOptions();
        bool shuffle = false, renumber = false;
        for (int i = 0; i + 1 < args.Length; i += 2)
        {
            switch (args[i])
            {
                case "--cells":
                    cells = args[i + 1].Split(',').Select(s => int.Parse(s, CultureInfo.InvariantCulture)).ToArray();
                    break;
                case "--theta":
                    amgOptions = amgOptions with { StrengthThreshold = double.Parse(args[i + 1], CultureInfo.InvariantCulture) };
                    break;
                case "--sweeps":
                    amgOptions = amgOptions with { Sweeps = int.Parse(args[i + 1], CultureInfo.InvariantCulture) };
                    break;
                case "--power":
                    amgOptions = amgOptions with { SpectralRadiusIterations = int.Parse(args[i + 1], CultureInfo.InvariantCulture) };
                    break;
                case "--coarsest":
                    amgOptions = amgOptions with { CoarsestRows = int.Parse(args[i + 1], CultureInfo.InvariantCulture) };
                    break;
                case "--shuffle":
                    shuffle = args[i + 1] == "1";
                    break;
                case "--renumber":
                    renumber = args[i + 1] == "1";
                    break;
                case "--repeat":
                    repeat = int.Parse(args[i + 1], CultureInfo.InvariantCulture);
                    break;
                default:
                    Console.Error.WriteLine($"amg: unknown option {args[i]}");
                    return 2;
            }
        }
        var options = new PcgOptions { RelativeTolerance = 1e-10, MaxIterations = 200 };
        bool allConverged = true;
        foreach (int m in cells)
        {
            var problem = JitteredSquare.Create(m, shuffle: shuffle);
            var b1 = problem.UnitLoad();
            var rng = new Random(7);
            var b2 = new double[problem.DofCount];
            for (int i = 0; i < b2.Length; i++)
            {
                b2[i] = rng.NextDouble() - 0.5;
            }
            var assembly = new List<double>();
            var setup = new List<double>();
            var solve = new List<double>();
            var extra = new List<double>();
            var cpu = new List<double>();
            int iterations = 0, extraIterations = 0;
            string hierarchy = "";
            for (int r = 0; r < repeat; r++)
            {
                GC.Collect();
                var process = Process.GetCurrentProcess();
                var cpuStart = process.TotalProcessorTime;
                var clock = Stopwatch.StartNew();
                // Optional: number the dofs in reverse Cuthill-McKee order first (counted as assembly time).
                var dofOfNode = renumber ? DofOrdering.ReverseCuthillMcKee(problem.Triangles, 3, problem.DofOfNode, problem.DofCount) : problem.DofOfNode;
                var plan = CsrAssemblyPlan.Create(problem.Triangles, 3, dofOfNode, problem.DofCount);
                var a = plan.Assemble(problem.ElementStiffness);
                assembly.Add(clock.Elapsed.TotalSeconds);
                clock.Restart();
                var amg = SmoothedAggregationAmg.Build(a, amgOptions);
                setup.Add(clock.Elapsed.TotalSeconds);
                var x = new double[problem.DofCount];
                var rhs1 = renumber ? Renumbered(b1, problem.DofOfNode, dofOfNode) : b1;
                var rhs2 = renumber ? Renumbered(b2, problem.DofOfNode, dofOfNode) : b2;
                var report = ConjugateGradient.Solve(a, rhs1, x, amg, options);
                solve.Add(report.Seconds);
                process.Refresh();
                cpu.Add((process.TotalProcessorTime - cpuStart).TotalSeconds);
                var x2 = new double[problem.DofCount];
                var report2 = ConjugateGradient.Solve(a, rhs2, x2, amg, options);
                extra.Add(report2.Seconds);
                iterations = report.Iterations;
                extraIterations = report2.Iterations;
                allConverged &= report.Converged && report2.Converged;
                hierarchy = $"levels={amg.Stats.Levels.Count} operator_complexity={amg.Stats.OperatorComplexity.ToString("F3", CultureInfo.InvariantCulture)} final_residual={report.FinalRelativeResidual.ToString("E2", CultureInfo.InvariantCulture)}";
            }
            double peakMb = Process.GetCurrentProcess().PeakWorkingSet64 / (1024.0 * 1024.0);
            double asm = BenchProcess.Median(assembly), set = BenchProcess.Median(setup), sol = BenchProcess.Median(solve), ext = BenchProcess.Median(extra);
            Console.WriteLine(string.Create(CultureInfo.InvariantCulture,
                $"amg case=p1-square-{m}{(shuffle ? "-shuffled" : "")}{(renumber ? "-rcm" : "")} unknowns={problem.DofCount} iterations={iterations} setup_seconds={set:F3} solve_seconds={sol:F3} extra_rhs_seconds={ext:F3} peak_mb={peakMb:F0} assembly_seconds={asm:F3} total_seconds={asm + set + sol:F3} cpu_seconds={BenchProcess.Median(cpu):F3} load={Environment.ProcessorCount}cpu/{BenchProcess.LoadAverage()} extra_rhs_iterations={extraIterations} {hierarchy}"));
        }
        return allConverged ? 0 : 1;
    }

    /// <summary>The 1-minute load average (Linux), to show whether other processes shared the cores.</summary>

    private static double[] Renumbered(double[] b, int[] oldMap, int[] newMap)
    {
        var r = new double[b.Length];
        for (int n = 0; n < oldMap.Length; n++)
        {
            if (oldMap[n] >= 0)
            {
                r[newMap[n]] = b[oldMap[n]];
            }
        }
        return r;
    }
}
