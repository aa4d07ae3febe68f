using System.Diagnostics;
using System.Globalization;
using Electrostat.Meshing;
using Electrostat.Meshing.Input;

namespace Electrostat.Bench;

/// <summary>
/// Mesher benchmark. Each case runs in a fresh child process (this program started again with <c>--child NAME</c>),
/// which meshes the case 5 times and reports the median wall time of <see cref="Mesher.Generate"/> (build, refine,
/// export with quality statistics) and the process's peak resident set (VmHWM from /proc/self/status, which
/// includes the .NET runtime itself, about 30 MB). Output: one line per case,
/// <c>mesh case=NAME triangles=N min_angle_deg=A seconds=S peak_mb=M</c>; a fitted time exponent goes to stderr.
/// </summary>
internal sealed class MeshBench : IBenchSuite
{
    /// <summary>Case name and global maximum edge length (metres) for the electrode-and-fillet design.</summary>
    private static readonly (string Name, double MaxEdgeMetres)[] Cases =
    {
        ("fillets_h0.60mm", 0.60e-3),
        ("fillets_h0.42mm", 0.42e-3),
        ("fillets_h0.30mm", 0.30e-3),
        ("fillets_h0.21mm", 0.21e-3),
        ("fillets_h0.15mm", 0.15e-3),
    };

    public string Name => "mesh";

    public int Run(string[] args)
    {
        if (args.Length >= 2 && args[0] == "--child") return RunChild(args[1]);
        var names = args.Length > 0 ? args : Cases.Select(c => c.Name).ToArray();
        var fit = new List<(double N, double S)>();
        var peaks = new List<double>();
        foreach (string name in names)
        {
            var psi = new ProcessStartInfo(Environment.ProcessPath!) { RedirectStandardOutput = true, UseShellExecute = false };
            // Started as "dotnet Electrostat.Bench.dll": the host needs the assembly path first.
            if (Path.GetFileNameWithoutExtension(Environment.ProcessPath!) == "dotnet") psi.ArgumentList.Add(typeof(MeshBench).Assembly.Location);
            psi.ArgumentList.Add("mesh");
            psi.ArgumentList.Add("--child");
            psi.ArgumentList.Add(name);
            using var p = Process.Start(psi)!;
            string output = p.StandardOutput.ReadToEnd();
            p.WaitForExit();
            Console.Write(output);
            if (p.ExitCode != 0) return p.ExitCode;
            var fields = output.Split(' ', StringSplitOptions.RemoveEmptyEntries).Select(f => f.Split('=')).Where(f => f.Length == 2).ToDictionary(f => f[0], f => f[1].Trim());
            fit.Add((double.Parse(fields["triangles"], CultureInfo.InvariantCulture), double.Parse(fields["seconds"], CultureInfo.InvariantCulture)));
            peaks.Add(double.Parse(fields["peak_mb"], CultureInfo.InvariantCulture));
        }
        if (fit.Count >= 2)
        {
            // Least-squares slope of log(seconds) against log(triangles).
            double mx = fit.Average(f => Math.Log(f.N)), my = fit.Average(f => Math.Log(f.S));
            double sxy = fit.Sum(f => (Math.Log(f.N) - mx) * (Math.Log(f.S) - my)), sxx = fit.Sum(f => Math.Pow(Math.Log(f.N) - mx, 2));
            Console.Error.WriteLine(FormattableString.Invariant($"# mesh time exponent (seconds ~ triangles^k): k = {sxy / sxx:F3}"));
            Console.Error.WriteLine(FormattableString.Invariant($"# mesh peak memory per million triangles, largest case: {peaks[^1] / (fit[^1].N / 1e6):F0} MB"));
        }
        return 0;
    }

    private static int RunChild(string name)
    {
        var c = Cases.FirstOrDefault(k => k.Name == name);
        if (c.Name is null) { Console.Error.WriteLine($"unknown mesh case '{name}'"); return 2; }
        var graph = FilletDesign();
        var options = new MeshOptions { MaxEdgeLengthMetres = c.MaxEdgeMetres, MinAngleDegrees = 28 };
        var times = new List<double>();
        var cpu = new List<double>();
        Electrostat.Meshing.Output.MeshResult? last = null;
        using var self = Process.GetCurrentProcess();
        for (int run = 0; run < 5; run++)
        {
            last = null;
            GC.Collect();
            self.Refresh();
            var cpu0 = self.TotalProcessorTime;
            var sw = Stopwatch.StartNew();
            last = Mesher.Generate(graph, options);
            sw.Stop();
            self.Refresh();
            times.Add(sw.Elapsed.TotalSeconds);
            cpu.Add((self.TotalProcessorTime - cpu0).TotalSeconds);
        }
        times.Sort();
        cpu.Sort();
        // CPU time of the process (all threads) tells the cost when other work shares the machine; stderr keeps stdout to the agreed format.
        Console.Error.WriteLine(FormattableString.Invariant($"# mesh case={name} cpu_seconds={cpu[2]:F3} wall_seconds_min={times[0]:F3} wall_seconds_max={times[4]:F3}"));
        Console.WriteLine(FormattableString.Invariant(
            $"mesh case={name} triangles={last!.Mesh.TriangleCount} min_angle_deg={last.Quality.MinAngleDegrees:F2} seconds={times[2]:F3} peak_mb={BenchProcess.PeakMegabytes():F0}"));
        return 0;
    }

    /// <summary>Peak resident set size of this process, MB (VmHWM), or the GC's total committed bytes if /proc is unavailable.</summary>

    /// <summary>
    /// A 100 mm × 60 mm enclosure (tag 1) holding a dielectric slab (region 2, interface tag 5), a bar electrode with
    /// 0.2 mm fillets (tag 2), a round electrode of radius 5 mm (tag 3) and a blade with a 0.1 mm tip fillet (tag 4).
    /// Electrodes are holes; the gas is region 1. Arcs are cut into chords with at most 2 µm sagitta.
    /// </summary>
    internal static PlanarGraph FilletDesign()
    {
        const double Sagitta = 2e-6;
        var g = new PlanarGraph();
        // Enclosure with the slab's interface line across it (x from 0 to 0.1 m at y = 45 mm and 50 mm).
        var e = new[] { (0.0, 0.0), (0.1, 0.0), (0.1, 0.045), (0.1, 0.05), (0.1, 0.06), (0.0, 0.06), (0.0, 0.05), (0.0, 0.045) };
        int first = g.VertexCount;
        foreach (var (x, y) in e) g.AddVertex(x, y);
        for (int i = 0; i < e.Length; i++) g.AddSegment(first + i, first + (i + 1) % e.Length, 1);
        g.AddSegment(first + 7, first + 2, 5);
        g.AddSegment(first + 6, first + 3, 5);
        g.AddRegion(new RegionSeed(0.001, 0.001, 1));
        g.AddRegion(new RegionSeed(0.001, 0.0475, 2));
        g.AddRegion(new RegionSeed(0.001, 0.059, 1));

        g.AddPolygon(RoundedRect(0.02, 0.02, 0.06, 0.03, 0.2e-3, Sagitta), 2);
        g.AddHole(0.04, 0.025);
        g.AddPolygon(Arc(0.075, 0.03, 0.005, 0, 2 * Math.PI, Sagitta, closed: true), 3);
        g.AddHole(0.075, 0.03);
        // Blade: a narrow wedge pointing down with a 0.1 mm round tip at (0.03, 0.008).
        var tip = Arc(0.03, 0.008, 0.1e-3, 0, -Math.PI, Sagitta, closed: false);
        var bladePts = new List<(double, double)> { (0.033, 0.015) };
        bladePts.AddRange(tip.Select(p => p));
        bladePts.Add((0.027, 0.015));
        // Tip arc from angle 0 (right) clockwise to -π (left); straight flanks join it tangentially enough for a test design.
        g.AddPolygon(Reverse(bladePts), 4);
        g.AddHole(0.03, 0.012);
        return g;
    }

    private static List<(double, double)> Reverse(List<(double, double)> p)
    {
        // Make the polygon counter-clockwise (orientation does not matter to the mesher, but keep outlines tidy).
        double a = 0;
        for (int i = 0; i < p.Count; i++) a += p[i].Item1 * p[(i + 1) % p.Count].Item2 - p[(i + 1) % p.Count].Item1 * p[i].Item2;
        if (a < 0) p.Reverse();
        return p;
    }

    private static List<(double X, double Y)> RoundedRect(double x0, double y0, double x1, double y1, double r, double sagitta)
    {
        var pts = new List<(double, double)>();
        pts.AddRange(Arc(x1 - r, y0 + r, r, -Math.PI / 2, 0, sagitta, false));
        pts.AddRange(Arc(x1 - r, y1 - r, r, 0, Math.PI / 2, sagitta, false));
        pts.AddRange(Arc(x0 + r, y1 - r, r, Math.PI / 2, Math.PI, sagitta, false));
        pts.AddRange(Arc(x0 + r, y0 + r, r, Math.PI, 1.5 * Math.PI, sagitta, false));
        return pts;
    }

    /// <summary>Points on an arc from angle a0 to a1 (radians) with chord sagitta at most <paramref name="sagitta"/> metres and at least 4 chords.</summary>
    private static List<(double X, double Y)> Arc(double cx, double cy, double r, double a0, double a1, double sagitta, bool closed)
    {
        double step = 2 * Math.Acos(Math.Max(-1, 1 - sagitta / r));
        int n = Math.Max(4, (int)Math.Ceiling(Math.Abs(a1 - a0) / step));
        var pts = new List<(double, double)>();
        int count = closed ? n : n + 1;
        for (int i = 0; i < count; i++)
        {
            double a = a0 + (a1 - a0) * i / n;
            pts.Add((cx + r * Math.Cos(a), cy + r * Math.Sin(a)));
        }
        return pts;
    }
}
