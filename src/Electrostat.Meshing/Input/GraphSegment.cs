namespace Electrostat.Meshing.Input;

/// <summary>An input segment between two vertices of a <see cref="PlanarGraph"/>, with a boundary tag.</summary>
/// <param name="A">Index of the first vertex.</param>
/// <param name="B">Index of the second vertex.</param>
/// <param name="Tag">Tag copied to every constrained mesh edge that lies on this segment (meaning owned by the graph's builder).</param>
public readonly record struct GraphSegment(int A, int B, int Tag);
