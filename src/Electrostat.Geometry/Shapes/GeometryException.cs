namespace Electrostat.Geometry.Shapes;

/// <summary>
/// A shape cannot be built from the given values (too few points, a fillet too large for its edges, a degenerate
/// outline). The message says what to change; <see cref="PointIndex"/> and <see cref="Location"/> locate it.
/// </summary>
public sealed class GeometryException : Exception
{
    /// <summary>Creates the exception.</summary>
    /// <param name="message">What is wrong, in words for the user.</param>
    /// <param name="pointIndex">Index of the offending input point, when one is to blame.</param>
    /// <param name="location">Coordinate of the problem, metres, when known.</param>
    /// <param name="hint">How to fix it.</param>
    public GeometryException(string message, int? pointIndex = null, Point2? location = null, string? hint = null)
        : base(message)
    {
        PointIndex = pointIndex;
        Location = location;
        Hint = hint;
    }

    /// <summary>Creates the exception with a message only.</summary>
    public GeometryException()
        : this("invalid geometry")
    {
    }

    /// <summary>Creates the exception with a message and inner exception.</summary>
    public GeometryException(string message, Exception innerException)
        : base(message, innerException)
    {
    }

    /// <summary>Index of the input point (polygon vertex or path step) to blame, if any.</summary>
    public int? PointIndex { get; }

    /// <summary>Coordinate of the problem, metres, if known.</summary>
    public Point2? Location { get; }

    /// <summary>How to fix the problem, if known.</summary>
    public string? Hint { get; }
}
