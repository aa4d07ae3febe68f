using Electrostat.Meshing.Input;
using Electrostat.Meshing.Output;

namespace Electrostat.Meshing;

/// <summary>One-call entry point: graph in, quality mesh out.</summary>
public static class Mesher
{
    /// <summary>Meshes a planar graph (see <see cref="RefinableMesh.Create"/>) and exports the result.</summary>
    /// <param name="graph">Input graph, metres.</param>
    /// <param name="options">Options; null for defaults.</param>
    /// <returns>The mesh with quality statistics and provenance maps.</returns>
    public static MeshResult Generate(PlanarGraph graph, MeshOptions? options = null) =>
        RefinableMesh.Create(graph, options).Export();
}
