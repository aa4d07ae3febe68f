using Electrostat.Geometry.Loading;

namespace Electrostat.Geometry.Tests.Loading;

/// <summary>The table of malformed inputs: one case per validation rule, each asserting message and location.</summary>
public class MalformedDesignTests
{
    /// <summary>One malformed input.</summary>
    /// <param name="Edits">Replacements applied to <see cref="DesignTexts.Base"/>.</param>
    /// <param name="Message">Text the problem's message (or fix hint) must contain.</param>
    /// <param name="Needle">Text whose first occurrence in the edited file is where the problem must be located
    /// (line always; column too when <paramref name="CheckColumn"/>), or null for no file location.</param>
    /// <param name="CheckColumn">Whether the column must match the needle exactly.</param>
    /// <param name="Severity">Expected severity.</param>
    public sealed record Case((string Old, string New)[] Edits, string Message, string? Needle, bool CheckColumn, ProblemSeverity Severity = ProblemSeverity.Error);

    private const string OpenEnclosure = "\"enclosure\": { \"shape\": { \"type\": \"rectangle\", \"min\": [-50, -50], \"max\": [50, 50] }, \"potential\": 0 }";

    public static readonly Dictionary<string, Case> Cases = new()
    {
        ["json-syntax"] = new([("\"symmetry\": \"planar\",", "\"symmetry\": \"planar\"")], "JSON syntax error", "\"parameters\"", false),
        ["unknown-key"] = new([("\"potential\": \"10 kV\"", "\"potental\": \"10 kV\"")], "did you mean 'potential'?", "\"potental\"", true),
        ["unknown-top-key"] = new([("\"background\":", "\"backgroud\":")], "unknown key \"backgroud\"", "\"backgroud\"", true),
        ["missing-key"] = new([("  \"units\": \"mm\",\n", "")], "missing key \"units\"", "{", true),
        ["missing-shape"] = new([(", \"shape\": { \"type\": \"circle\", \"center\": [0, 10], \"radius\": 5 }", "")], "missing key \"shape\" in conductor \"hv\"", "{ \"name\": \"hv\"", true),
        ["wrong-type"] = new([("\"radius\": 5", "\"radius\": [5]")], "radius must be a number or a quantity string", "[5]", true),
        ["wrong-type-name"] = new([("\"name\": \"gnd\"", "\"name\": 7")], "name must be a string", "7,", true),
        ["bad-unit"] = new([("\"10 kV\"", "\"10 kW\"")], "unknown unit \"kW\"", "kW", true),
        ["unit-of-wrong-kind"] = new([("\"radius\": 5", "\"radius\": \"5 kV\"")], "\"kV\" is a potential unit", "kV\" } }", true),
        ["bad-design-units"] = new([("\"units\": \"mm\"", "\"units\": \"mmm\"")], "did you mean 'mm'?", "\"mmm\"", true),
        ["unknown-parameter"] = new([("\"center\": [0, 10]", "\"center\": [0, \"gapp + 5\"]")], "unknown parameter 'gapp'", "gapp", true),
        ["division-by-zero"] = new([("\"center\": [0, 10]", "\"center\": [0, \"10/(gap-5)\"]")], "division by zero", "/(gap", true),
        ["circular-parameter"] = new([("\"gap\": 5", "\"gap\": \"2*other\", \"other\": \"gap + 1\"")], "depends on itself", null, false),
        ["nan"] = new([("\"radius\": 5", "\"radius\": NaN")], "not a finite number", "NaN", true),
        ["absurd-magnitude"] = new([("\"radius\": 5", "\"radius\": 5e9")], "implausibly large", "5e9", true),
        ["absurd-small"] = new([("\"radius\": 5", "\"radius\": \"1e-6 um\"")], "implausibly small", "\"1e-6 um\"", true),
        ["polygon-two-points"] = new([("{ \"type\": \"rectangle\", \"min\": [-30, 20], \"max\": [30, 30] }", "{ \"type\": \"polygon\", \"points\": [[-30, 20], [30, 20]] }")], "at least 3 points", "[[-30, 20], [30, 20]]", true),
        ["polygon-zero-area"] = new([("{ \"type\": \"rectangle\", \"min\": [-30, 20], \"max\": [30, 30] }", "{ \"type\": \"polygon\", \"points\": [[-30, 20], [0, 20], [30, 20]] }")], "encloses zero area", "[-30, 20], [0", true),
        ["self-intersecting"] = new([("{ \"type\": \"rectangle\", \"min\": [-30, 20], \"max\": [30, 30] }", "{ \"type\": \"polygon\", \"points\": [[-30, 20], [30, 30], [30, 20], [-10, 30]] }")], "crosses itself", "{ \"type\": \"polygon\"", true),
        ["fillet-too-large"] = new([("{ \"type\": \"rectangle\", \"min\": [-30, 20], \"max\": [30, 30] }", "{ \"type\": \"polygon\", \"points\": [{ \"at\": [-30, 20], \"fillet\": 12 }, [30, 20], [30, 30], [-30, 30]] }")], "reduce the fillet radius at point 0 to at most 10 mm", "{ \"at\"", true),
        ["corner-radius-too-large"] = new([("\"max\": [30, 30] }", "\"max\": [30, 30], \"corner_radius\": 6 }")], "at most 5 mm", "\"corner_radius\"", false),
        ["duplicate-name"] = new([("\"name\": \"gnd\"", "\"name\": \"hv\"")], "duplicate conductor name \"hv\"", "\"hv\", \"potential\": 0", true),
        ["unknown-material"] = new([("\"material\": \"oil\"", "\"material\": \"oill\"")], "did you mean 'oil'?", "\"oill\"", true),
        ["unknown-background"] = new([("\"background\": \"oil\"", "\"background\": \"xyzzy\"")], "unknown material \"xyzzy\" for the background", "\"xyzzy\"", true),
        ["zero-permittivity"] = new([("\"relative_permittivity\": 2.2", "\"relative_permittivity\": 0")], "relative_permittivity must be greater than zero", "0, \"breakdown", true),
        ["negative-breakdown"] = new([("\"10 kV/mm\"", "\"-1 kV/mm\"")], "breakdown_field must be greater than zero", "\"-1 kV/mm\"", true),
        ["short-circuit-overlap"] = new([("\"max\": [20, 0]", "\"max\": [20, 6]")], "short circuit: conductors \"hv\" (10 kV) and \"gnd\" (0 V) overlap", "{ \"name\": \"gnd\"", true),
        ["short-circuit-touch"] = new([("\"max\": [20, 0]", "\"max\": [20, 5]")], "short circuit: conductors \"hv\" (10 kV) and \"gnd\" (0 V) touch", "{ \"name\": \"gnd\"", true),
        ["touches-enclosure"] = new([("\"center\": [0, 10]", "\"center\": [0, 45]")], "touches the enclosure", "{ \"name\": \"hv\"", true),
        ["conductor-outside"] = new([("\"center\": [0, 10]", "\"center\": [0, 70]")], "conductor \"hv\" lies (partly) outside the enclosure", "{ \"type\": \"circle\"", true),
        ["dielectric-outside"] = new([("\"max\": [30, 30]", "\"max\": [30, 60]")], "dielectric \"block\" lies (partly) outside the enclosure", "{ \"type\": \"rectangle\", \"min\": [-30, 20]", true),
        ["axisymmetric-negative-r"] = new([("\"planar\"", "\"axisymmetric\""), ("\"min\": [-50, -50]", "\"min\": [0, -50]")], "conductor \"gnd\" reaches r < 0", "{ \"type\": \"rectangle\", \"min\": [-20", true),
        ["floating-touches-fixed"] = new([("\"potential\": \"10 kV\"", "\"floating\": true"), ("\"max\": [20, 0]", "\"max\": [20, 5]")], "floating conductor \"hv\" and fixed conductor \"gnd\" touch", "{ \"name\": \"gnd\"", true),
        ["no-potential-difference"] = new([("\"potential\": \"10 kV\"", "\"potential\": 0")], "no potential difference", "[\n    { \"name\": \"hv\"", true, ProblemSeverity.Warning),
        ["partial-dielectric-overlap"] = new([("\"max\": [30, 30] } }", "\"max\": [30, 30] } },\n    { \"name\": \"slab\", \"material\": \"oil\", \"shape\": { \"type\": \"rectangle\", \"min\": [20, 25], \"max\": [40, 40] } }")], "dielectrics \"block\" and \"slab\" partly overlap", "{ \"name\": \"slab\"", true, ProblemSeverity.Warning),
        ["key-with-space-before-colon"] = new([("\"name\": \"gnd\", \"potential\": 0", "\"name\": \"gnd\", \"potential\" : 0, \"colour\" : \"r\\\"ed\"")], "unknown key \"colour\"", "\"colour\"", true),
        ["string-with-escape"] = new([("\"type\": \"circle\"", "\"type\": \"ci\\\"rcle\"")], "unknown shape type", "\"ci\\\"rcle\"", true),
        ["dielectric-inside-conductor"] = new([("\"min\": [-30, 20], \"max\": [30, 30]", "\"min\": [-10, -8], \"max\": [10, -2]")], "lies entirely inside conductors", "{ \"name\": \"block\"", true, ProblemSeverity.Warning),
        ["unknown-shape-type"] = new([("\"type\": \"circle\"", "\"type\": \"circel\"")], "did you mean 'circle'?", "\"circel\"", true),
        ["potential-and-floating"] = new([("\"potential\": \"10 kV\"", "\"potential\": \"10 kV\", \"floating\": true")], "has both \"potential\" and \"floating\"", null, false),
        ["charge-on-fixed"] = new([("\"potential\": \"10 kV\"", "\"potential\": \"10 kV\", \"charge\": \"1 nC\"")], "\"charge\" is only allowed on a floating conductor", null, false),
        ["symmetry-plane-off-edge"] = new([("\"potential\": 0 }", "\"potential\": 0, \"symmetry_planes\": [{ \"x\": 10 }] }")], "no straight enclosure edge lies on x = 10 mm", "{ \"x\": 10 }", true),
        ["hole-outside"] = new([("\"max\": [30, 30] }", "\"max\": [30, 30], \"holes\": [{ \"type\": \"circle\", \"center\": [40, 25], \"radius\": 2 }] }")], "hole 0 of dielectric \"block\" is not inside its outline", "{ \"type\": \"circle\", \"center\": [40", true),
        ["hole-touching-outline"] = new([("\"max\": [30, 30] }", "\"max\": [30, 30], \"holes\": [{ \"type\": \"circle\", \"center\": [28, 25], \"radius\": 2 }] }")], "is not inside its outline", "{ \"type\": \"circle\", \"center\": [28", true),
        ["depth-in-axisymmetric"] = new([("\"planar\",", "\"axisymmetric\", \"depth\": 10,")], "\"depth\" applies to planar designs only", "\"depth\"", true),
        ["reserved-parameter"] = new([("\"gap\": 5", "\"mm\": 5")], "parameter name \"mm\" is reserved", "\"mm\": 5", true),
        ["unknown-key-after-empty-list"] = new([("\"conductors\": [", "\"conductors\": [], \"unused\": [")], "unknown key \"unused\"", "\"unused\"", true),
        ["no-conductors"] = new([("\"conductors\": [", "\"conductors\": [], \"unused\": [")], "the design has no conductors", "[], \"unused\"", true),
        ["pair-unknown-conductor"] = new([("\"dielectrics\": [", "\"checks\": { \"pairs\": [ { \"between\": [\"hv\", \"gnx\"], \"min_clearance\": 3 } ] },\n  \"dielectrics\": [")], "unknown conductor \"gnx\"", "\"gnx\"", true),
        ["checks-unknown-material"] = new([("\"dielectrics\": [", "\"checks\": { \"materials\": { \"oli\": { \"min_margin\": 2 } } },\n  \"dielectrics\": [")], "did you mean 'oil'?", "\"oli\"", true),
        ["floating-touches-wall"] = new([("\"potential\": \"10 kV\"", "\"floating\": true"), ("\"center\": [0, 10]", "\"center\": [0, 45]")], "floating conductor \"hv\" touches the enclosure", "{ \"name\": \"hv\"", true),
        // Open space (Kelvin truncation circle): each misuse named at its key.
        ["open-with-shape"] = new([("\"potential\": 0 }", "\"open\": true, \"potential\": 0 }")], "an open enclosure is a circle set by \"radius\" or \"margin\", not by \"shape\"", "\"shape\": { \"type\": \"rectangle\", \"min\": [-50", true),
        ["open-planar-potential"] = new([(OpenEnclosure, "\"enclosure\": { \"open\": true, \"margin\": 10, \"potential\": 0 }")], "no fixed potential at infinity", "\"potential\": 0 }", true),
        ["open-no-size"] = new([(OpenEnclosure, "\"enclosure\": { \"open\": true }")], "needs \"margin\" or \"radius\"", "{ \"open\"", true),
        ["open-radius-and-margin"] = new([(OpenEnclosure, "\"enclosure\": { \"open\": true, \"margin\": 10, \"radius\": 60 }")], "has both \"radius\" and \"margin\"", "{ \"open\"", true),
        ["open-with-symmetry-plane"] = new([(OpenEnclosure, "\"enclosure\": { \"open\": true, \"margin\": 10, \"symmetry_planes\": [{ \"x\": 0 }] }")], "symmetry planes cannot be combined with an open enclosure", "{ \"x\": 0 }", true),
        ["open-circle-cuts-body"] = new([(OpenEnclosure, "\"enclosure\": { \"open\": true, \"radius\": \"sqrt(1800)\", \"center\": [0, 0] }")], "touches the open enclosure's circle", "{ \"type\": \"rectangle\", \"min\": [-30, 20]", true),
        ["open-planar-one-potential"] = new([(OpenEnclosure, "\"enclosure\": { \"open\": true, \"margin\": 10 }"), ("\"potential\": \"10 kV\"", "\"potential\": 0")], "needs conductors at two different potentials", "[\n    { \"name\": \"hv\"", true),
        ["radius-without-open"] = new([("\"potential\": 0 }", "\"potential\": 0, \"radius\": 60 }")], "\"radius\" belongs to an open enclosure", "\"radius\": 60", true),
        ["open-axisymmetric-centre-off-axis"] = new([("\"planar\"", "\"axisymmetric\""), (OpenEnclosure, "\"enclosure\": { \"open\": true, \"margin\": 10, \"center\": [5, 0] }")], "must lie on the axis", "[5, 0]", true),
        ["arc-end-off-circle"] = new([("{ \"type\": \"rectangle\", \"min\": [-30, 20], \"max\": [30, 30] }", "{ \"type\": \"path\", \"start\": [-10, 20], \"segments\": [ { \"line_to\": [10, 20] }, { \"arc_to\": [-12, 20], \"center\": [0, 20] } ] }")], "end point is 12 mm from the centre but the start is 10 mm", "[-12, 20]", true),
    };

    public static TheoryData<string> CaseNames() => new(Cases.Keys);

    [Theory]
    [MemberData(nameof(CaseNames))]
    public void MalformedInput_IsReportedWithMessageAndLocation(string name)
    {
        var c = Cases[name];
        string text = DesignTexts.With(c.Edits);
        var result = DesignLoader.LoadFromText(text, "case.json");
        var matches = result.Problems.Where(p => p.Severity == c.Severity &&
            (p.Message.Contains(c.Message, StringComparison.Ordinal) || (p.Hint ?? "").Contains(c.Message, StringComparison.Ordinal))).ToList();
        Assert.True(matches.Count > 0, $"no {c.Severity} containing \"{c.Message}\"; got:\n" + string.Join("\n", result.Problems));
        var p = matches[0];
        Assert.Equal("case.json", p.Source);
        Assert.StartsWith("$", p.JsonPath, StringComparison.Ordinal);
        if (c.Needle is not null)
        {
            var (line, col) = DesignTexts.Find(text, c.Needle);
            Assert.True(line == p.Line, $"expected line {line}, got {p}");
            if (c.CheckColumn) Assert.True(col == p.Column, $"expected column {col}, got {p}");
        }
        if (c.Severity == ProblemSeverity.Error) Assert.Null(result.Design);
        else Assert.NotNull(result.Design);
    }

    [Fact]
    public void BaseDesign_IsValidWithoutProblemsOtherThanNone()
    {
        var result = DesignLoader.LoadFromText(DesignTexts.Base, "base.json");
        Assert.False(result.HasErrors, string.Join("\n", result.Problems));
        Assert.Empty(result.Problems);
    }

    [Fact]
    public void SeveralProblems_AreAllReportedTogether()
    {
        string text = DesignTexts.With(("\"10 kV\"", "\"10 kW\""), ("\"material\": \"oil\"", "\"material\": \"oill\""), ("\"radius\": 5", "\"radius\": -5"));
        var result = DesignLoader.LoadFromText(text, "many.json");
        Assert.True(result.Errors.Count() >= 3, string.Join("\n", result.Problems));
    }

    [Fact]
    public void GeometricProblems_AreReportedAlongsideSyntaxLevelOnes()
    {
        // A misspelt key and a short circuit in the same file: both come in one run.
        string text = DesignTexts.With(("\"background\":", "\"backgroud\":"), ("\"max\": [20, 0]", "\"max\": [20, 6]"));
        var errors = DesignLoader.LoadFromText(text).Errors.Select(e => e.Message).ToList();
        Assert.Contains(errors, m => m.Contains("unknown key \"backgroud\"", StringComparison.Ordinal));
        Assert.Contains(errors, m => m.Contains("short circuit", StringComparison.Ordinal));
    }

    [Fact]
    public void GeometricProblem_CarriesCoordinate()
    {
        string text = DesignTexts.With(("{ \"type\": \"rectangle\", \"min\": [-30, 20], \"max\": [30, 30] }", "{ \"type\": \"polygon\", \"points\": [[-30, 20], [30, 30], [30, 20], [-10, 30]] }"));
        var p = DesignLoader.LoadFromText(text).Errors.Single(e => e.Message.Contains("crosses itself", StringComparison.Ordinal));
        // Edges (-30,20)-(30,30) and (30,20)-(-10,30) cross where 20 + (x+30)/6 = 20 + (30-x)/4, at (6, 26) mm.
        Assert.NotNull(p.Coordinate);
        Assert.Equal(0.006, p.Coordinate!.Value.X, 1e-9);
        Assert.Equal(0.026, p.Coordinate.Value.Y, 1e-9);
        Assert.Contains("near (6 mm, 26 mm)", p.ToString(), StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("", "the design file is empty")]
    [InlineData("  // only a comment\n", "holds no JSON value")]
    [InlineData("[1, 2]", "the design file must be an object")]
    [InlineData("{ \"units\": \"mm\", \"units\": \"m\" }", "JSON syntax error")]
    public void DegenerateFiles_GiveOneClearProblem(string text, string message)
    {
        var result = DesignLoader.LoadFromText(text, "x.json");
        Assert.Contains(result.Errors, p => p.Message.Contains(message, StringComparison.Ordinal));
    }

    [Fact]
    public void Folder_IsOneClearProblem()
    {
        var p = Assert.Single(DesignLoader.Load(Path.GetTempPath()).Problems);
        Assert.Contains("folder", p.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void MissingFile_IsOneClearProblem()
    {
        var result = DesignLoader.Load(Path.Combine(Path.GetTempPath(), "no-such-design-9f3a.json"));
        var p = Assert.Single(result.Problems);
        Assert.Contains("cannot read the design file", p.Message, StringComparison.Ordinal);
    }
}
