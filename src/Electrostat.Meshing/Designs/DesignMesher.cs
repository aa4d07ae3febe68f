using Electrostat.Geometry.Model;
using Electrostat.Meshing.Output;

namespace Electrostat.Meshing.Designs;

/// <summary>Meshes a design: <see cref="DesignGraphBuilder"/> then <see cref="RefinableMesh"/>.</summary>
public static class DesignMesher
{
    /// <summary>Builds the graph of a design and meshes it; the returned object can be refined further and exported.</summary>
    /// <param name="design">The design.</param>
    /// <param name="options">Mesh options; null for defaults.</param>
    /// <param name="settings">Curve cutting settings; null for defaults.</param>
    /// <returns>The input tables and the refinable mesh.</returns>
    public static (DesignMeshInput Input, RefinableMesh Mesh) Create(Design design, MeshOptions? options = null, DesignMeshSettings? settings = null)
    {
        var input = DesignGraphBuilder.Build(design, options, settings);
        if (input.ProtectedTags.Count > 0)
        {
            options ??= new MeshOptions();
            options = options with { ProtectedTags = new HashSet<int>(options.ProtectedTags.Concat(input.ProtectedTags)) };
        }
        return (input, RefinableMesh.Create(input.Graph, options));
    }

    /// <summary>Builds, meshes and exports in one call.</summary>
    /// <param name="design">The design.</param>
    /// <param name="options">Mesh options; null for defaults.</param>
    /// <param name="settings">Curve cutting settings; null for defaults.</param>
    /// <returns>The input tables and the mesh.</returns>
    public static (DesignMeshInput Input, MeshResult Result) Generate(Design design, MeshOptions? options = null, DesignMeshSettings? settings = null)
    {
        var (input, mesh) = Create(design, options, settings);
        return (input, mesh.Export());
    }
}
