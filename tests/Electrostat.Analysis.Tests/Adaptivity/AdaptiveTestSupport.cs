using Electrostat.Analysis.Adaptivity;
using Electrostat.Geometry.Loading;
using Electrostat.Geometry.Model;
using Electrostat.Meshing.Designs;

namespace Electrostat.Analysis.Tests.Adaptivity;

/// <summary>Loads designs from geometries/ and runs the adaptive loop on them.</summary>
internal static class AdaptiveTestSupport
{
    public static string Root => RepoPaths.Root;

    public static Design Load(string relativePath)
    {
        var result = DesignLoader.Load(Path.Combine(Root, relativePath));
        Assert.False(result.HasErrors, string.Join("\n", result.Errors));
        return result.Design!;
    }

    public static AdaptiveResult Adapt(Design design, AdaptiveOptions options)
    {
        var (input, mesh) = DesignMesher.Create(design, null, new DesignMeshSettings { ChordToleranceMetres = 2e-6 * design.Bounds.Diagonal, MaxChordAngleDegrees = 5 });
        return AdaptiveSolver.Run(design, input, mesh, options);
    }

}
