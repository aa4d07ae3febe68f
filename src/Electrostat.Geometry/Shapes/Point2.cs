namespace Electrostat.Geometry.Shapes;

/// <summary>A point (or vector) in the design plane, coordinates in metres.</summary>
/// <remarks>For axisymmetric designs <see cref="X"/> is the radius r ≥ 0 and <see cref="Y"/> is the axial coordinate z.</remarks>
/// <param name="X">x (or r) coordinate, metres.</param>
/// <param name="Y">y (or z) coordinate, metres.</param>
public readonly record struct Point2(double X, double Y)
{
    /// <summary>Vector sum.</summary>
    public static Point2 operator +(Point2 a, Point2 b) => new(a.X + b.X, a.Y + b.Y);

    /// <summary>Vector difference.</summary>
    public static Point2 operator -(Point2 a, Point2 b) => new(a.X - b.X, a.Y - b.Y);

    /// <summary>Scaling by a factor.</summary>
    public static Point2 operator *(double s, Point2 a) => new(s * a.X, s * a.Y);

    /// <summary>Euclidean length of the vector from the origin to this point, metres.</summary>
    public double Length => Math.Sqrt(X * X + Y * Y);

    /// <summary>Euclidean distance to another point, metres.</summary>
    public double DistanceTo(Point2 other) => (this - other).Length;

    /// <summary>Dot product.</summary>
    public static double Dot(Point2 a, Point2 b) => a.X * b.X + a.Y * b.Y;

    /// <summary>z component of the cross product a × b (positive when b is counter-clockwise from a).</summary>
    public static double Cross(Point2 a, Point2 b) => a.X * b.Y - a.Y * b.X;

    /// <summary>Formats the point for messages, in millimetres with up to 6 significant digits.</summary>
    public string ToMillimetreString() =>
        string.Create(System.Globalization.CultureInfo.InvariantCulture, $"({X * 1e3:G6} mm, {Y * 1e3:G6} mm)");

    /// <inheritdoc />
    public override string ToString() =>
        string.Create(System.Globalization.CultureInfo.InvariantCulture, $"({X:G9}, {Y:G9})");
}
