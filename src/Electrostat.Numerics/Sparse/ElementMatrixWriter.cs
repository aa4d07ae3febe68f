namespace Electrostat.Numerics.Sparse;

/// <summary>
/// Writes the dense element matrix of element <paramref name="element"/> into <paramref name="elementMatrix"/>,
/// row-major, k × k for k nodes per element, in the element's local node order. Called concurrently from
/// several threads, so it must only read shared data.
/// </summary>
/// <param name="element">Element index.</param>
/// <param name="elementMatrix">Destination of length k·k, not cleared beforehand.</param>
public delegate void ElementMatrixWriter(int element, Span<double> elementMatrix);
