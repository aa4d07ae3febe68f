using Electrostat.Analysis;
using Electrostat.Analysis.Pipeline;
using Electrostat.Fem.Capacitance;
using Electrostat.Fem.Solving;
using Electrostat.Geometry.Loading;
using Electrostat.Geometry.Model;
using Electrostat.Meshing;
using Electrostat.Meshing.Designs;

namespace Electrostat.Rendering.Tests.Support;

/// <summary>Test designs with closed-form fields, meshed and solved by the project's own layers.</summary>
internal static class Designs
{
    /// <summary>Plate gap d = 4 mm, plate at 10 kV over a grounded wall, side walls are symmetry planes: φ = V·y/d.</summary>
    public const string ParallelPlates = """
    {
      "title": "Plate gap",
      "units": "mm", "symmetry": "planar",
      "materials": { "gas": { "relative_permittivity": 1.0, "breakdown_field": "3 kV/mm" } },
      "background": "gas",
      "enclosure": {
        "shape": { "type": "rectangle", "min": [0, 0], "max": [10, 5] },
        "potential": 0,
        "symmetry_planes": [ { "x": 0 }, { "x": 10 }, { "y": 5 } ]
      },
      "conductors": [
        { "name": "plate", "potential": "10 kV", "shape": { "type": "rectangle", "min": [0, 4], "max": [10, 5] } }
      ],
      "checks": { "min_margin": 1.0 }
    }
    """;

    /// <summary>Coaxial cylinders a = 2 mm at 1 kV inside b = 10 mm at 0 V: φ = V ln(b/r) / ln(b/a).</summary>
    public const string Coax = """
    {
      "title": "Coaxial gap",
      "units": "mm", "symmetry": "planar",
      "materials": { "gas": { "relative_permittivity": 2.0, "breakdown_field": "3 kV/mm" } },
      "background": "gas",
      "enclosure": { "shape": { "type": "circle", "center": [0, 0], "radius": 10 }, "potential": 0 },
      "conductors": [ { "name": "inner", "potential": "1 kV", "shape": { "type": "circle", "center": [0, 0], "radius": 2 } } ],
      "checks": { "min_margin": 1.0 }
    }
    """;

    public const double CoaxA = 2e-3, CoaxB = 10e-3, CoaxV = 1000;

    public static Design Load(string json)
    {
        var r = DesignLoader.LoadFromText(json);
        Assert.False(r.HasErrors, string.Join("\n", r.Errors.Select(e => e.ToString())));
        return r.Design!;
    }

    /// <summary>Meshes with the given options, solves once, returns the context and the capacitance matrix.</summary>
    public static (AnalysisContext Context, CapacitanceMatrixResult Capacitance) Solve(string json, MeshOptions options)
    {
        var design = Load(json);
        var (input, result) = DesignMesher.Generate(design, options);
        var built = DesignProblemBuilder.Build(design, input, result.Mesh);
        var solver = new FieldSolver(built.Problem);
        var solution = solver.Solve();
        return (new AnalysisContext(design, built.Tags, built.Regions, solution), solver.ComputeCapacitanceMatrix());
    }

    public static AnalysisContext Plates() => Solve(ParallelPlates, new MeshOptions { MaxEdgeLengthMetres = 0.5e-3 }).Context;

    public static AnalysisContext CoaxContext() => Solve(Coax, new MeshOptions
    {
        SizeFunction = (x, y) => 0.25e-3 * (0.5 + Math.Sqrt(x * x + y * y) / CoaxA),
    }).Context;
}
