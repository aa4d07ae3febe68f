namespace Electrostat.Geometry.Shapes;

/// <summary>An axis-aligned box, metres. An empty box has Min &gt; Max.</summary>
/// <param name="MinX">Smallest x, metres.</param>
/// <param name="MinY">Smallest y, metres.</param>
/// <param name="MaxX">Largest x, metres.</param>
/// <param name="MaxY">Largest y, metres.</param>
public readonly record struct BoundingBox(double MinX, double MinY, double MaxX, double MaxY)
{
    /// <summary>The empty box (identity of <see cref="Union(BoundingBox)"/>).</summary>
    public static BoundingBox Empty => new(double.PositiveInfinity, double.PositiveInfinity, double.NegativeInfinity, double.NegativeInfinity);

    /// <summary>True when the box contains no point.</summary>
    public bool IsEmpty => MinX > MaxX || MinY > MaxY;

    /// <summary>Width (x extent), metres.</summary>
    public double Width => IsEmpty ? 0 : MaxX - MinX;

    /// <summary>Height (y extent), metres.</summary>
    public double Height => IsEmpty ? 0 : MaxY - MinY;

    /// <summary>Length of the diagonal, metres; a natural length scale of the geometry.</summary>
    public double Diagonal => Math.Sqrt(Width * Width + Height * Height);

    /// <summary>Smallest box holding both boxes.</summary>
    public BoundingBox Union(BoundingBox other) =>
        new(Math.Min(MinX, other.MinX), Math.Min(MinY, other.MinY), Math.Max(MaxX, other.MaxX), Math.Max(MaxY, other.MaxY));

    /// <summary>Smallest box holding this box and a point.</summary>
    public BoundingBox Include(Point2 p) =>
        new(Math.Min(MinX, p.X), Math.Min(MinY, p.Y), Math.Max(MaxX, p.X), Math.Max(MaxY, p.Y));

    /// <summary>The box grown by a margin on every side, metres.</summary>
    public BoundingBox Inflate(double marginMetres) =>
        new(MinX - marginMetres, MinY - marginMetres, MaxX + marginMetres, MaxY + marginMetres);
}
