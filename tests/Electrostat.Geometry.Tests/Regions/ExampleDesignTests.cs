using Electrostat.Geometry.Loading;
using Electrostat.Geometry.Model;
using Electrostat.Geometry.Shapes;

namespace Electrostat.Geometry.Tests.Regions;

public class ExampleDesignTests
{
    public static TheoryData<string> Examples() => new(RepoPaths.ExampleDesigns().Select(p => Path.GetRelativePath(RepoPaths.Geometries, p)));

    private static Design Load(string file)
    {
        var result = DesignLoader.Load(Path.Combine(RepoPaths.Geometries, file));
        Assert.False(result.HasErrors, string.Join("\n", result.Problems));
        return result.Design!;
    }

    [Theory]
    [MemberData(nameof(Examples))]
    public void Example_LoadsWithoutErrorsOrWarnings(string file)
    {
        var result = DesignLoader.Load(Path.Combine(RepoPaths.Geometries, file));
        Assert.False(result.HasErrors, string.Join("\n", result.Problems));
        Assert.DoesNotContain(result.Problems, p => p.Severity == ProblemSeverity.Warning);
        var d = result.Design!;
        if (!file.Contains(Path.DirectorySeparatorChar, StringComparison.Ordinal))
        {
            // The bundled scenario designs (top level of geometries/) each request margin and clearance checks.
            Assert.NotNull(d.Checks.MinMargin);
            Assert.NotNull(d.Checks.MinClearanceMetres);
        }
        // Region assembly partitions the domain: background + dielectric areas = enclosure − conductors.
        var r = d.Regions;
        double sum = r.BackgroundAreaSquareMetres + r.DielectricAreasSquareMetres.Sum();
        Assert.Equal(r.DomainAreaSquareMetres, sum, r.DomainAreaSquareMetres * 1e-9);
        Assert.Equal(r.DomainAreaSquareMetres, r.MaterialAreasSquareMetres.Values.Sum(), r.DomainAreaSquareMetres * 1e-9);
    }

    [Fact]
    public void HvElectrode_AreasMatchClosedForms()
    {
        var d = Load("hv-electrode-over-plate.json");
        // Rounded rectangle 40 × 10 mm, r = 3 mm: A = w h − (4 − π) r² (elementary geometry).
        double bar = 40e-3 * 10e-3 - (4 - Math.PI) * 9e-6;
        Assert.Equal(bar, d.Conductors[0].Shape.Area, 1e-15);
        double plate = 80e-3 * 4e-3 - (4 - Math.PI) * 4e-6; // corner radius 2 mm
        double domain = 120e-3 * 70e-3 - bar - plate;
        // Flattened arcs (chord tolerance 1e-6 of the diagonal) make the region areas slightly inexact.
        Assert.Equal(domain, d.Regions.DomainAreaSquareMetres, domain * 1e-5);
        Assert.Equal(10e-3 * 10e-3, d.Regions.DielectricAreasSquareMetres[0], 1e-12);
        Assert.Equal(0.1, d.DepthMetres, 1e-15);
        Assert.Equal(20e3, d.Conductors[0].PotentialVolts);
        Assert.Equal(3e6, d.Materials["air"].BreakdownFieldVoltsPerMetre);
        Assert.Equal(3.0, d.Checks.MarginFor("cast_epoxy"));
        Assert.Equal(2.0, d.Checks.MarginFor("air"));
        Assert.Equal(2, d.Electrodes.Count);
    }

    [Theory]
    [InlineData(0, 5, RegionKind.Dielectric, 0)] // inside the spacer
    [InlineData(0, 15, RegionKind.Conductor, 0)] // inside the bar
    [InlineData(0, -2, RegionKind.Conductor, 1)] // inside the plate
    [InlineData(30, 5, RegionKind.Background, -1)]
    [InlineData(0, 60, RegionKind.Outside, -1)]
    [InlineData(-19.5, 10.5, RegionKind.Background, -1)] // in the bar's bounding box, outside its rounded corner
    [InlineData(-19.0, 12.0, RegionKind.Conductor, 0)] // inside the rounded corner arc
    public void HvElectrode_ClassifyFollowsPriorityRule(double xMm, double yMm, RegionKind kind, int index)
    {
        var d = Load("hv-electrode-over-plate.json");
        Assert.Equal(new RegionHit(kind, index), d.Classify(xMm * 1e-3, yMm * 1e-3));
    }

    [Fact]
    public void Feedthrough_MarksAxisAndJoinsFlangeToWall()
    {
        var d = Load("feedthrough-axisymmetric.json");
        Assert.Equal(Symmetry.Axisymmetric, d.Symmetry);
        var axis = d.Enclosure.Shape.Outer.Segments.Where(s => s.Marker == BoundaryMarker.Axis).ToList();
        var seg = Assert.Single(axis);
        Assert.Equal(0, seg.Start.X);
        Assert.Equal(0, seg.End.X);
        var flange = d.Conductors.Single(c => c.Name == "flange");
        Assert.True(d.Electrodes[flange.ElectrodeIndex].TouchesEnclosure);
        Assert.Equal(new RegionHit(RegionKind.Conductor, 0), d.Classify(2e-3, 0));
        Assert.Equal(RegionKind.Dielectric, d.Classify(6e-3, 0).Kind);
        Assert.Equal("bushing", d.Dielectrics[d.Classify(6e-3, -10e-3).Index].Name);
        Assert.Equal("oil", d.Dielectrics[d.Classify(30e-3, -20e-3).Index].Name);
        Assert.Equal(RegionKind.Background, d.Classify(30e-3, 20e-3).Kind);
        Assert.Equal("air", d.MaterialAt(30e-3, 20e-3)!.Name);
        // Grading ring: circle of radius 3 mm around (14, 24) mm.
        Assert.Equal(RegionKind.Conductor, d.Classify(14e-3 + 2.999e-3, 24e-3).Kind);
        Assert.Equal(RegionKind.Background, d.Classify(14e-3 + 3.001e-3, 24e-3).Kind);
        Assert.Equal(Math.PI * 9e-6, d.Regions.ConductorAreasSquareMetres[2], 1e-15);
    }

    [Fact]
    public void Sensor_HasFloatingFingerAndPerPairClearance()
    {
        var d = Load("capacitive-sensor-pcb.json");
        var finger = d.Conductors.Single(c => c.Name == "finger");
        Assert.True(finger.IsFloating);
        Assert.Equal(0.0, finger.ChargeCoulombs);
        Assert.Equal(70e-6, d.Parameters["copper"] * 1e-3, 1e-15);
        Assert.Equal(2e-3, d.Checks.ClearanceFor("finger", "pad_left"));
        Assert.Equal(0.5e-3, d.Checks.ClearanceFor("pad_center", "pad_left"));
        Assert.Equal(5, d.Electrodes.Count);
        // Pads 4 mm wide with 1 mm gaps: the left and centre pads are 1 mm apart.
        var (dist, _, _) = d.Regions.ConductorClearance(0, 1);
        Assert.Equal(1e-3, dist, 1e-12);
    }

    [Fact]
    public void ValidationCases_HaveExactAnnulusAreas()
    {
        // Elementary geometry: annulus π(b² − a²); the axisymmetric half-annulus is half of it.
        var coax = Load(Path.Combine("validation", "coaxial-cylinders.json"));
        Assert.Equal(Math.PI * (100 - 4) * 1e-6, coax.Enclosure.Shape.Area - coax.Conductors[0].Shape.Area, 1e-15);
        var spheres = Load(Path.Combine("validation", "concentric-spheres.json"));
        Assert.Equal(0.5 * Math.PI * (400 - 25) * 1e-6, spheres.Enclosure.Shape.Area - spheres.Conductors[0].Shape.Area, 1e-15);
        Assert.Single(spheres.Enclosure.Shape.Outer.Segments, s => s.Marker == BoundaryMarker.Axis);
        Assert.Equal(1.0, spheres.BackgroundMaterial.RelativePermittivity);
        var plates = Load(Path.Combine("validation", "layered-plate-capacitor.json"));
        Assert.Equal(3, plates.Enclosure.Shape.Outer.Segments.Count(s => s.Marker == BoundaryMarker.SymmetryPlane));
        var wall = Assert.Single(plates.Enclosure.Shape.Outer.Segments, s => s.Marker == BoundaryMarker.None);
        Assert.Equal(0, wall.Start.Y);
        Assert.Equal(0, wall.End.Y);
        Assert.False(plates.Electrodes[0].TouchesEnclosure); // touching mirror planes is not touching the wall
    }

    [Fact]
    public void InvalidExamples_ReportEveryIndependentMistake()
    {
        var typos = DesignLoader.Load(Path.Combine(RepoPaths.Geometries, "invalid", "typos-and-units.json"));
        var messages = typos.Errors.Select(e => e.Message).ToList();
        Assert.Equal(4, messages.Count);
        Assert.Contains(messages, m => m.Contains("breakdown_feild", StringComparison.Ordinal));
        Assert.Contains(messages, m => m.Contains("unknown unit \"kW\"", StringComparison.Ordinal));
        Assert.Contains(messages, m => m.Contains("unknown parameter 'gapp'", StringComparison.Ordinal));
        Assert.Contains(messages, m => m.Contains("fillet radius 4 mm at point 0 is too large", StringComparison.Ordinal));
        Assert.All(typos.Errors, e => Assert.True(e.Line > 0 && e.Column > 0));
        var shortCircuit = DesignLoader.Load(Path.Combine(RepoPaths.Geometries, "invalid", "short-circuit.json"));
        var e = Assert.Single(shortCircuit.Errors);
        Assert.Contains("short circuit", e.Message, StringComparison.Ordinal);
        Assert.NotNull(e.Coordinate);
    }
}
