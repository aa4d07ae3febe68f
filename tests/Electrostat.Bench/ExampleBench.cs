using System.Diagnostics;
using System.Globalization;
using Electrostat.Analysis.Pipeline;
using Electrostat.Geometry.Loading;

namespace Electrostat.Bench;

/// <summary>
/// The whole solve pipeline (mesh, adaptive solve with capacitance matrix, analysis) on every design in geometries/
/// (except geometries/invalid) at default accuracy. Each design runs in a fresh child process (this program started
/// again with <c>--child PATH</c>) that solves it twice: the first run pays the JIT (reported on stderr as
/// cold_seconds), the second is the figure on stdout. Output, one line per design:
/// <c>examples case=NAME triangles=N levels=L seconds=S adapt_overhead=X peak_mb=M</c>, where adapt_overhead is the
/// adaptive loop's total time divided by its final level's solve time, and peak_mb the process's peak resident set.
/// </summary>
internal sealed class ExampleBench : IBenchSuite
{
    public string Name => "examples";

    public int Run(string[] args)
    {
        if (args.Length >= 2 && args[0] == "--child") return RunChild(args[1]);
        var designs = args.Length > 0 ? args : RepoPaths.ExampleDesigns().ToArray();
        foreach (string path in designs)
        {
            var psi = new ProcessStartInfo(Environment.ProcessPath!) { RedirectStandardOutput = true, UseShellExecute = false };
            if (Path.GetFileNameWithoutExtension(Environment.ProcessPath!) == "dotnet") psi.ArgumentList.Add(typeof(ExampleBench).Assembly.Location);
            psi.ArgumentList.Add("examples");
            psi.ArgumentList.Add("--child");
            psi.ArgumentList.Add(path);
            using var p = Process.Start(psi)!;
            Console.Write(p.StandardOutput.ReadToEnd());
            p.WaitForExit();
            if (p.ExitCode != 0) return p.ExitCode;
        }
        return 0;
    }

    private static int RunChild(string path)
    {
        var loaded = DesignLoader.Load(path);
        if (loaded.Design is null)
        {
            Console.Error.WriteLine($"examples: {path} is not a valid design");
            return 2;
        }
        var cold = Stopwatch.StartNew();
        SolvePipeline.Run(loaded.Design);
        double coldSeconds = cold.Elapsed.TotalSeconds;
        GC.Collect();
        using var self = Process.GetCurrentProcess();
        self.Refresh();
        var cpu0 = self.TotalProcessorTime;
        var sw = Stopwatch.StartNew();
        var outcome = SolvePipeline.Run(loaded.Design);
        double seconds = sw.Elapsed.TotalSeconds;
        self.Refresh();
        double cpu = (self.TotalProcessorTime - cpu0).TotalSeconds;
        var a = outcome.Adaptive;
        string name = Path.GetFileNameWithoutExtension(path);
        Console.Error.WriteLine(FormattableString.Invariant(
            $"# examples case={name} cold_seconds={coldSeconds:F3} cpu_seconds={cpu:F3} final_solve_seconds={a.FinalSolveSeconds:F3} converged={a.Converged} load_avg={BenchProcess.LoadAverage()}"));
        Console.WriteLine(FormattableString.Invariant(
            $"examples case={name} triangles={a.Mesh.Mesh.TriangleCount} levels={a.Levels.Count} seconds={seconds:F3} adapt_overhead={a.AdaptOverhead:F2} peak_mb={BenchProcess.PeakMegabytes():F0}"));
        return 0;
    }
}
