using System.Globalization;
using Electrostat.Geometry.Loading;
using Electrostat.Geometry.Model;
using Electrostat.Geometry.Quantities;
using Electrostat.Geometry.Shapes;

namespace Electrostat.Cli.Commands;

/// <summary><c>electrostat check DESIGN</c>: validates a design file and prints what it describes.</summary>
internal sealed class CheckCommand : ICommand
{
    public string Name => "check";

    public string Summary => "validate a design file and summarise it (no solving)";

    public string Usage => """
        usage: electrostat check DESIGN.json [--set name=value]... [--json | --quiet]

        Reads and validates the design, then prints its symmetry, units, parameters, materials, conductors,
        region areas, requested checks and any warnings. Exit code 0 when the design is valid, 2 when it has
        errors (listed on stderr with file, line, column and JSON path).

        options:
          --set name=value   override a parameter (repeatable); the value is written as in the file,
                             e.g. --set gap=12 or --set "v_hv=25 kV"
          --json             print {valid, problems (file, line, column, JSON path, fix), design summary in SI units}
                             on stdout and nothing else; exit codes unchanged
          --quiet            print nothing on stdout; problems still go to stderr, exit codes unchanged

        examples:
          electrostat check geometries/hv-electrode-over-plate.json
          electrostat check my-design.json --set gap=8 --json
        """;

    public OptionSpec Options { get; } = new(["set"], ["json", "quiet"], 1, 1);

    public int Run(ParsedArguments args, TextWriter stdout, TextWriter stderr)
    {
        var overrides = DesignInput.ParseOverrides(args.Values("set"));
        bool json = args.Has("json"), quiet = args.Has("quiet");
        if (json && quiet) throw new UsageException("--json and --quiet cannot be combined");
        if (json)
        {
            // Machine-readable: the verdict, every problem with its location and the summary, on stdout only.
            var loaded = DesignLoader.Load(args.Positionals[0], overrides);
            stdout.Write(CheckJson.Write(loaded));
            return loaded.Design is null ? ExitCodes.InputError : ExitCodes.Ok;
        }
        var result = DesignInput.Load(args.Positionals[0], overrides, stderr);
        if (result.Design is null) return ExitCodes.InputError;
        if (!quiet) WriteSummary(result.Design, args.Positionals[0], result.Remarks.ToList(), stdout);
        return ExitCodes.Ok;
    }

    internal static void WriteSummary(Design d, string path, IReadOnlyList<DesignProblem> remarks, TextWriter w)
    {
        var c = CultureInfo.InvariantCulture;
        string Len(double m) => UnitTable.Format(m, QuantityKind.Length);
        string Pot(double v) => UnitTable.Format(v, QuantityKind.Potential);
        string Area(double a) => d.Units.Symbol == "m" ? string.Create(c, $"{a:G6} m^2") : string.Create(c, $"{a / (d.Units.Metres * d.Units.Metres):G6} {d.Units.Symbol}^2");

        w.WriteLine($"design     {path}");
        if (d.Title is not null) w.WriteLine($"title      {d.Title}");
        w.WriteLine(d.Symmetry == Symmetry.Planar
            ? $"symmetry   planar, depth {Len(d.DepthMetres)} (charges and capacitances per metre unless multiplied by the depth)"
            : "symmetry   axisymmetric (x = r >= 0, y = z; totals over the full revolution)");
        w.WriteLine($"units      {d.Units.Symbol} (bare lengths)");

        if (d.Parameters.Count > 0)
        {
            w.WriteLine("parameters");
            foreach (var (name, value) in d.Parameters) w.WriteLine(string.Create(c, $"  {name,-24} {value:G8}"));
        }

        w.WriteLine("materials");
        foreach (var m in d.Materials.Values)
        {
            string bd = m.BreakdownFieldVoltsPerMetre is double e ? UnitTable.Format(e, QuantityKind.Field) : "none (no margin check)";
            double area = d.Regions.MaterialAreasSquareMetres.GetValueOrDefault(m.Name);
            string bg = ReferenceEquals(m, d.BackgroundMaterial) || m.Name == d.BackgroundMaterial.Name ? "  [background]" : "";
            w.WriteLine(string.Create(c, $"  {m.Name,-20} eps_r {m.RelativePermittivity,-8:G6} breakdown {bd,-14} area {Area(area)}{bg}"));
        }

        w.WriteLine("conductors");
        for (int i = 0; i < d.Conductors.Count; i++)
        {
            var k = d.Conductors[i];
            string pot = k.PotentialVolts is double v ? Pot(v) : $"floating, charge {UnitTable.Format(k.ChargeCoulombs ?? 0, QuantityKind.Charge)}";
            w.WriteLine(string.Create(c, $"  {k.Name,-20} {pot,-26} electrode {k.ElectrodeIndex}  area {Area(k.Shape.Area)}"));
        }
        var merged = d.Electrodes.Where(e => e.ConductorIndices.Count > 1 || e.TouchesEnclosure).ToList();
        foreach (var e in merged)
            w.WriteLine($"  electrode {e.Index} = {e.Name}{(e.TouchesEnclosure ? " (joined to the enclosure wall)" : "")}");

        if (d.Dielectrics.Count > 0)
        {
            w.WriteLine("dielectrics (later entries win where they overlap)");
            for (int j = 0; j < d.Dielectrics.Count; j++)
            {
                var di = d.Dielectrics[j];
                w.WriteLine($"  {di.Name,-20} {di.Material.Name,-16} area {Area(d.Regions.DielectricAreasSquareMetres[j])}");
            }
        }

        var b = d.Bounds;
        var markers = d.Enclosure.Shape.Outer.Segments.GroupBy(s => s.Marker).ToDictionary(g => g.Key, g => g.Count());
        string extra = string.Join("", new[]
        {
            markers.TryGetValue(BoundaryMarker.SymmetryPlane, out int sp) ? $", {sp} symmetry-plane edge(s)" : "",
            markers.TryGetValue(BoundaryMarker.Axis, out int ax) ? $", {ax} axis edge(s)" : "",
        });
        if (d.Enclosure.Open is { } open)
        {
            w.WriteLine($"enclosure  open space: truncation circle of radius {Len(open.RadiusMetres)} about ({string.Create(c, $"{open.Center.X / d.Units.Metres:G6}, {open.Center.Y / d.Units.Metres:G6}")}) {d.Units.Symbol}, "
                + (d.Symmetry == Symmetry.Axisymmetric ? $"infinity at {Pot(d.Enclosure.PotentialVolts)}" : "infinity free (charges sum to zero)"));
        }
        else
        {
            w.WriteLine($"enclosure  {(d.Enclosure.IsShorthandBox ? "box" : "outline")} {Len(b.Width)} x {Len(b.Height)} at {Pot(d.Enclosure.PotentialVolts)}{extra}");
        }
        w.WriteLine($"regions    domain {Area(d.Regions.DomainAreaSquareMetres)}, background {Area(d.Regions.BackgroundAreaSquareMetres)}");

        var ch = d.Checks;
        var parts = new List<string>();
        if (ch.MinMargin is double mm) parts.Add(string.Create(c, $"min margin {mm:G4}"));
        foreach (var (mat, v) in ch.MaterialMinMargins) parts.Add(string.Create(c, $"{mat} margin {v:G4}"));
        if (ch.MinClearanceMetres is double cl) parts.Add($"min clearance {Len(cl)}");
        foreach (var r in ch.PairClearances) parts.Add($"{r.ConductorA}-{r.ConductorB} clearance {Len(r.MinClearanceMetres)}");
        w.WriteLine($"checks     {(parts.Count == 0 ? "none requested" : string.Join("; ", parts))}");

        foreach (var p in remarks) w.WriteLine(p.ToString());
        int warnings = remarks.Count(p => p.Severity == ProblemSeverity.Warning);
        int notes = remarks.Count - warnings;
        w.WriteLine($"valid: 0 errors, {warnings} warning{(warnings == 1 ? "" : "s")}, {notes} note{(notes == 1 ? "" : "s")}");
    }
}
