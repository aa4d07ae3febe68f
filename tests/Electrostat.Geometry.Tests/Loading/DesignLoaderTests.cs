using Electrostat.Geometry.Loading;
using Electrostat.Geometry.Model;
using Electrostat.Geometry.Shapes;

namespace Electrostat.Geometry.Tests.Loading;

public class DesignLoaderTests
{
    private static Design Valid(string text, IReadOnlyDictionary<string, string>? overrides = null)
    {
        var result = DesignLoader.LoadFromText(text, "t.json", overrides);
        Assert.False(result.HasErrors, string.Join("\n", result.Problems));
        return result.Design!;
    }

    [Fact]
    public void Override_ReplacesParameterAndMovesGeometry()
    {
        string text = DesignTexts.With(("\"center\": [0, 10]", "\"center\": [0, \"gap + 5\"]"));
        var d = Valid(text, new Dictionary<string, string> { ["gap"] = "8" });
        Assert.Equal(8, d.Parameters["gap"]);
        Assert.Equal(13e-3 - 5e-3, d.Conductors[0].Shape.Bounds.MinY, 1e-15);
        var withUnit = Valid(text, new Dictionary<string, string> { ["gap"] = "0.8 cm" });
        Assert.Equal(8, withUnit.Parameters["gap"], 1e-12);
    }

    [Fact]
    public void NumericOverride_IsInDefaultUnits()
    {
        string path = Path.Combine(Path.GetTempPath(), $"electrostat-override-{Guid.NewGuid():N}.json");
        File.WriteAllText(path, DesignTexts.With(("\"center\": [0, 10]", "\"center\": [0, \"gap + 5\"]")));
        try
        {
            var result = DesignLoader.Load(path, new Dictionary<string, double> { ["gap"] = 7.5 });
            Assert.False(result.HasErrors, string.Join("\n", result.Problems));
            Assert.Equal(7.5, result.Design!.Parameters["gap"]);
            Assert.Equal(Path.GetFullPath(path), result.Design.SourcePath);
        }
        finally
        {
            File.Delete(path);
        }
    }

    [Fact]
    public void Override_OfUnknownParameter_SuggestsName()
    {
        var result = DesignLoader.LoadFromText(DesignTexts.Base, "t.json", new Dictionary<string, string> { ["gapp"] = "3" });
        var p = Assert.Single(result.Errors);
        Assert.Equal("--set", p.Source);
        Assert.Contains("did you mean 'gap'?", p.Hint, StringComparison.Ordinal);
    }

    [Fact]
    public void Override_WithBadExpression_IsReportedAgainstTheCommandLine()
    {
        var result = DesignLoader.LoadFromText(DesignTexts.Base, "t.json", new Dictionary<string, string> { ["gap"] = "2 * wdth" });
        var p = Assert.Single(result.Errors);
        Assert.Equal("--set", p.Source);
        Assert.Equal("gap", p.JsonPath);
        Assert.Contains("unknown parameter 'wdth'", p.Message, StringComparison.Ordinal);
        Assert.Contains("at character 5", p.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void ParameterWithUnit_IsConvertedToDesignUnits()
    {
        // 25.4 mm is exactly 1 in (NIST SP 811, appendix B), so in an inch design gap = 1.
        string text = DesignTexts.With(("\"units\": \"mm\"", "\"units\": \"in\""), ("\"gap\": 5", "\"gap\": \"25.4 mm\""),
            ("\"min\": [-50, -50], \"max\": [50, 50]", "\"min\": [-5, -5], \"max\": [5, 5]"),
            ("\"center\": [0, 10], \"radius\": 5", "\"center\": [0, \"gap + 1\"], \"radius\": 0.5"),
            ("\"min\": [-20, -10], \"max\": [20, 0]", "\"min\": [-2, -1], \"max\": [2, 0]"),
            ("\"min\": [-30, 20], \"max\": [30, 30]", "\"min\": [-3, 3], \"max\": [3, 4]"));
        var d = Valid(text);
        Assert.Equal(1.0, d.Parameters["gap"], 1e-12);
        Assert.Equal(2 * 0.0254, d.Conductors[0].Shape.Bounds.MaxY - 0.5 * 0.0254, 1e-12);
        Assert.Equal(1.0, d.DepthMetres); // default depth: per-metre values equal totals
    }

    [Fact]
    public void TouchingConductorsAtSamePotential_AreMergedWithNote()
    {
        string text = DesignTexts.With(("\"potential\": \"10 kV\"", "\"potential\": 0"), ("\"max\": [20, 0]", "\"max\": [20, 5]"),
            ("\"enclosure\": { \"shape\"", "\"enclosure\": { \"potential\": \"1 kV\", \"shape\""), (", \"potential\": 0 },\n  \"conductors\"", " },\n  \"conductors\""));
        var result = DesignLoader.LoadFromText(text);
        Assert.False(result.HasErrors, string.Join("\n", result.Problems));
        var d = result.Design!;
        Assert.Single(d.Electrodes);
        Assert.Equal("hv+gnd", d.Electrodes[0].Name);
        Assert.Equal(0, d.Conductors[1].ElectrodeIndex);
        Assert.Contains(result.Problems, p => p.Severity == ProblemSeverity.Note && p.Message.Contains("merged into one electrode", StringComparison.Ordinal));
    }

    [Fact]
    public void ShorthandBox_SurroundsBodiesWithMargin()
    {
        string text = DesignTexts.With(("\"shape\": { \"type\": \"rectangle\", \"min\": [-50, -50], \"max\": [50, 50] }, \"potential\": 0", "\"margin\": 10"));
        var d = Valid(text);
        Assert.True(d.Enclosure.IsShorthandBox);
        // Bodies span x in [-30, 30] mm and y in [-10, 30] mm.
        Assert.Equal(new BoundingBox(-40e-3, -20e-3, 40e-3, 40e-3), d.Bounds);
    }

    [Fact]
    public void ShorthandBox_IsCutBackToAMirrorPlaneAtTheBodiesEdge()
    {
        // Bodies span y in [-10, 30] mm; a mirror plane at y = -10 mm becomes the box's lower edge (a half model).
        string text = DesignTexts.With(("\"shape\": { \"type\": \"rectangle\", \"min\": [-50, -50], \"max\": [50, 50] }, \"potential\": 0", "\"margin\": 10, \"symmetry_planes\": [{ \"y\": -10 }]"));
        var d = Valid(text);
        Assert.Equal(new BoundingBox(-40e-3, -10e-3, 40e-3, 40e-3), d.Bounds);
        var plane = Assert.Single(d.Enclosure.Shape.Outer.Segments, s => s.Marker == BoundaryMarker.SymmetryPlane);
        Assert.Equal(-10e-3, plane.Start.Y, 1e-15);
        Assert.False(d.Electrodes[1].TouchesEnclosure); // the plate rests on the mirror plane, not on the wall
    }

    [Fact]
    public void AxisymmetricShorthandBox_StartsOnAxisAndMarksIt()
    {
        string text = DesignTexts.With(("\"planar\"", "\"axisymmetric\""),
            ("\"shape\": { \"type\": \"rectangle\", \"min\": [-50, -50], \"max\": [50, 50] }, \"potential\": 0", "\"margin\": 10"),
            ("\"min\": [-20, -10], \"max\": [20, 0]", "\"min\": [0, -10], \"max\": [20, 0]"),
            ("\"min\": [-30, 20], \"max\": [30, 30]", "\"min\": [0, 20], \"max\": [30, 30]"),
            ("\"center\": [0, 10]", "\"center\": [8, 10]"));
        var d = Valid(text);
        Assert.Equal(0, d.Bounds.MinX);
        Assert.Single(d.Enclosure.Shape.Outer.Segments, s => s.Marker == BoundaryMarker.Axis);
    }

    [Fact]
    public void SymmetryPlane_MarksMatchingEnclosureEdge()
    {
        string text = DesignTexts.With(("\"min\": [-50, -50], \"max\": [50, 50] }, \"potential\": 0", "\"min\": [-50, -50], \"max\": [50, 50] }, \"potential\": 0, \"symmetry_planes\": [{ \"y\": -50 }]"));
        var d = Valid(text);
        var marked = Assert.Single(d.Enclosure.Shape.Outer.Segments, s => s.Marker == BoundaryMarker.SymmetryPlane);
        Assert.Equal(-0.05, marked.Start.Y, 1e-15);
        Assert.Equal(-0.05, marked.End.Y, 1e-15);
    }

    [Fact]
    public void FloatingConductor_TakesChargePerMetreInPlanar()
    {
        string text = DesignTexts.With(("\"potential\": \"10 kV\"", "\"floating\": true, \"charge\": \"2 nC/m\""),
            ("\"name\": \"gnd\", \"potential\": 0", "\"name\": \"gnd\", \"potential\": \"1 kV\""));
        var d = Valid(text);
        Assert.True(d.Conductors[0].IsFloating);
        Assert.Equal(2e-9, d.Conductors[0].ChargeCoulombs!.Value, 1e-21);
        Assert.True(d.Electrodes[0].IsFloating);
    }

    [Fact]
    public void PathShape_WithArcsAndHoles_HasExactArea()
    {
        // Half disc of radius 10 mm (path: diameter + 180° arc) with a 2 mm circular hole: π·100/2 − π·4 mm².
        string text = DesignTexts.With(("{ \"type\": \"rectangle\", \"min\": [-30, 20], \"max\": [30, 30] }",
            "{ \"type\": \"path\", \"start\": [-10, 20], \"segments\": [ { \"line_to\": [10, 20] }, { \"arc_to\": [-10, 20], \"center\": [0, 20] } ], \"holes\": [ { \"type\": \"circle\", \"center\": [0, 25], \"radius\": 2 } ] }"));
        var d = Valid(text);
        var shape = d.Dielectrics[0].Shape;
        Assert.Equal((Math.PI * 100 / 2 - Math.PI * 4) * 1e-6, shape.Area, 1e-15);
        Assert.Equal(RegionKind.Background, d.Classify(0, 25e-3).Kind); // inside the hole
        Assert.Equal(RegionKind.Dielectric, d.Classify(0, 29.9e-3).Kind);
    }

    [Fact]
    public void Comments_AreAllowed()
    {
        var d = Valid("// header\n" + DesignTexts.Base.Replace("\"units\": \"mm\",", "\"units\": \"mm\", /* inline */", StringComparison.Ordinal));
        Assert.Equal("mm", d.Units.Symbol);
    }

    [Fact]
    public void EnclosureMadeOnlyOfMirrorPlanes_HasNoWall()
    {
        string text = DesignTexts.With(("\"max\": [50, 50] }, \"potential\": 0", "\"max\": [50, 50] }, \"potential\": 0, \"symmetry_planes\": [{ \"x\": -50 }, { \"x\": 50 }, { \"y\": -50 }, { \"y\": 50 }]"));
        var d = Valid(text);
        Assert.All(d.Enclosure.Shape.Outer.Segments, s => Assert.Equal(BoundaryMarker.SymmetryPlane, s.Marker));
    }

    [Fact]
    public void ConductorOnSymmetryPlane_IsAllowedAtAnyPotential()
    {
        // The 10 kV circle touches the enclosure's top edge, which is a mirror plane, not a 0 V wall.
        string text = DesignTexts.With(("\"center\": [0, 10]", "\"center\": [0, 45]"),
            ("\"max\": [50, 50] }, \"potential\": 0", "\"max\": [50, 50] }, \"potential\": 0, \"symmetry_planes\": [{ \"y\": 50 }]"));
        var d = Valid(text);
        Assert.False(d.Electrodes[0].TouchesEnclosure);
    }

    [Fact]
    public void AxisDeclaredAsSymmetryPlane_GetsNoteNotError()
    {
        string text = DesignTexts.With(("\"planar\"", "\"axisymmetric\""), ("\"min\": [-50, -50]", "\"min\": [0, -50]"),
            ("\"potential\": 0 },\n", "\"potential\": 0, \"symmetry_planes\": [{ \"x\": 0 }] },\n"),
            ("\"min\": [-20, -10]", "\"min\": [0, -10]"), ("\"min\": [-30, 20]", "\"min\": [0, 20]"), ("\"center\": [0, 10]", "\"center\": [8, 10]"));
        var result = DesignLoader.LoadFromText(text);
        Assert.False(result.HasErrors, string.Join("\n", result.Problems));
        Assert.Contains(result.Problems, p => p.Severity == ProblemSeverity.Note && p.Message.Contains("axis", StringComparison.Ordinal));
    }

    [Fact]
    public void Problem_ToString_IsOneLocatedLine()
    {
        var p = new DesignProblem(ProblemSeverity.Error, "d.json", "$.conductors[0].shape", 12, 7, new Point2(0.001, -0.0025), "outline crosses itself", "move the points");
        Assert.Equal("d.json:12:7: error: outline crosses itself (at $.conductors[0].shape, near (1 mm, -2.5 mm)); fix: move the points", p.ToString());
    }

    [Fact]
    public void ConductorInsideHoleOfAnother_IsNotAShortCircuit()
    {
        const string text = """
            {
              "units": "mm", "symmetry": "planar",
              "enclosure": { "margin": 5 },
              "conductors": [
                { "name": "shield", "potential": 0, "shape": { "type": "circle", "center": [0, 0], "radius": 10,
                  "holes": [ { "type": "circle", "center": [0, 0], "radius": 8 } ] } },
                { "name": "core", "potential": "1 kV", "shape": { "type": "circle", "center": [0, 0], "radius": 2 } }
              ]
            }
            """;
        var d = Valid(text);
        Assert.Equal(RegionKind.Background, d.Classify(5e-3, 0).Kind);
        Assert.Equal(new RegionHit(RegionKind.Conductor, 0), d.Classify(9e-3, 0));
        Assert.Equal(new RegionHit(RegionKind.Conductor, 1), d.Classify(1e-3, 0));
        var (gap, _, _) = d.Regions.ConductorClearance(0, 1);
        Assert.Equal(6e-3, gap, d.Regions.ChordToleranceMetres); // flattened arcs: within the chord tolerance
        Assert.Equal(2, d.Electrodes.Count);
    }

    [Theory]
    [InlineData("5.001", false)] // 1 um gap in a 141 mm diagonal box: a gap (contact tolerance 1e-6 of the diagonal)
    [InlineData("5.00001", true)] // 10 nm: contact
    public void ContactTolerance_SeparatesThinGapsFromContacts(string centerY, bool shorted)
    {
        string text = DesignTexts.With(("\"center\": [0, 10]", $"\"center\": [0, {centerY}]"));
        var result = DesignLoader.LoadFromText(text);
        Assert.Equal(shorted, result.Errors.Any(e => e.Message.Contains("short circuit", StringComparison.Ordinal)));
    }
}
