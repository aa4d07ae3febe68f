using System.Globalization;
using Electrostat.Analysis.Pipeline;
using Electrostat.Analysis.Results;
using Electrostat.Analysis.Validation;

namespace Electrostat.Cli.Commands;

/// <summary>
/// <c>electrostat validate</c>: solves every case of <see cref="ValidationSuite"/> from geometries/validation/, prints
/// the comparison with the published references and optionally writes it as markdown (docs/validation.md). Exit 0 when
/// every case is within its tolerance, 1 when any is not, 2 for a usage error.
/// </summary>
internal sealed class ValidateCommand : ICommand
{
    private const string DefaultFolder = "geometries/validation";

    public string Name => "validate";

    public string Summary => "solve the reference cases and compare with published values (writes docs/validation.md)";

    public string Usage => """
        usage: electrostat validate [--out FILE.md] [--designs DIR] [--accuracy coarse|normal|fine|TOL] [--case TEXT]...
        Solves every validation case (designs in geometries/validation/, found from the current folder upwards) with
        the same pipeline as 'electrostat solve', compares each result with its published reference value and prints
        one line per case. With --out, writes the markdown table (case, source, reference, ours, relative error, the
        tool's own error estimate, tolerance, elements, time) atomically, e.g. --out docs/validation.md.
        options:
          --out FILE.md      write the markdown page
          --designs DIR      folder of the validation designs (default: geometries/validation)
          --accuracy LEVEL   accuracy level as for 'solve' (default normal)
          --case TEXT        run only the cases whose name contains TEXT (repeatable; case-insensitive)
        exit codes: 0 every case within tolerance, 1 a case outside tolerance or failed, 2 usage error.
        """;

    public OptionSpec Options { get; } = new(["out", "designs", "accuracy", "case"], [], 0, 0);

    public int Run(ParsedArguments args, TextWriter stdout, TextWriter stderr)
    {
        var accuracy = SolveCommand.ParseAccuracy(args.Values("accuracy"));
        string folder = FindFolder(Single(args.Values("designs"), "--designs"));
        string? outPath = Single(args.Values("out"), "--out");
        var filters = args.Values("case");
        var cases = ValidationSuite.Cases
            .Where(c => filters.Count == 0 || filters.Any(f => c.Name.Contains(f, StringComparison.OrdinalIgnoreCase)))
            .ToList();
        if (cases.Count == 0) throw new UsageException("no validation case matches --case " + string.Join(", ", filters));

        var rows = ValidationRunner.Run(folder, cases, accuracy, line => stderr.WriteLine(line));
        var ci = CultureInfo.InvariantCulture;
        foreach (var r in rows)
        {
            string verdict = r.Failure is not null ? "FAILED " + r.Failure
                : r.Passed ? "pass" : r.WithinTolerance ? "ESTIMATE BELOW ERROR" : "OUTSIDE TOLERANCE";
            string value = r.Measurement is null ? "-" : (r.Measurement.Value * r.Case.DisplayScale).ToString("G6", ci);
            stdout.WriteLine(string.Create(ci, $"{r.Case.Name}: reference {(r.Case.ReferenceValue * r.Case.DisplayScale).ToString("G6", ci)} {r.Case.DisplayUnit}, " +
                                 $"ours {value}, error {r.RelativeError * 100:0.###} % (tolerance {r.Case.RelativeTolerance * 100:0.##} %) {verdict}"));
        }
        int passed = rows.Count(r => r.Passed);
        stdout.WriteLine(string.Create(ci, $"{passed} of {rows.Count} cases pass."));
        if (outPath is not null)
        {
            string? dir = Path.GetDirectoryName(Path.GetFullPath(outPath));
            if (dir is not null) Directory.CreateDirectory(dir);
            AtomicFile.WriteAllText(outPath, ValidationReportWriter.ToMarkdown(rows, accuracy, DateTime.UtcNow));
            stdout.WriteLine("wrote " + outPath);
        }
        return passed == rows.Count ? ExitCodes.Ok : ExitCodes.ChecksFailed;
    }

    private static string? Single(IReadOnlyList<string> values, string option) => values.Count switch
    {
        0 => null,
        1 => values[0],
        _ => throw new UsageException(option + " given more than once"),
    };

    /// <summary>The explicit folder, or geometries/validation in the current folder or the nearest parent holding it.</summary>
    private static string FindFolder(string? explicitFolder)
    {
        if (explicitFolder is not null)
        {
            if (!Directory.Exists(explicitFolder)) throw new UsageException($"--designs: folder not found: {explicitFolder}");
            return explicitFolder;
        }
        for (var d = new DirectoryInfo(Directory.GetCurrentDirectory()); d is not null; d = d.Parent)
        {
            string candidate = Path.Combine(d.FullName, DefaultFolder);
            if (Directory.Exists(candidate)) return candidate;
        }
        throw new UsageException($"cannot find {DefaultFolder} in the current folder or above; run from the repository or pass --designs DIR");
    }
}
