namespace SectionTwist.Geometry;

/// <summary>A point or vector in the section plane.</summary>
/// <param name="X">x coordinate.</param>
/// <param name="Y">y coordinate.</param>
public readonly record struct Point2(double X, double Y)
{
    /// <summary>Vector sum.</summary>
    public static Point2 operator +(Point2 a, Point2 b) => new(a.X + b.X, a.Y + b.Y);
    /// <summary>Vector difference.</summary>
    public static Point2 operator -(Point2 a, Point2 b) => new(a.X - b.X, a.Y - b.Y);
    /// <summary>Scaling.</summary>
    public static Point2 operator *(double s, Point2 a) => new(s * a.X, s * a.Y);
    /// <summary>Scaling.</summary>
    public static Point2 operator *(Point2 a, double s) => new(s * a.X, s * a.Y);
    /// <summary>Negation.</summary>
    public static Point2 operator -(Point2 a) => new(-a.X, -a.Y);

    /// <summary>Euclidean length of the vector.</summary>
    public double Length => Math.Sqrt(X * X + Y * Y);

    /// <summary>Dot product.</summary>
    public static double Dot(Point2 a, Point2 b) => a.X * b.X + a.Y * b.Y;

    /// <summary>z component of the cross product a x b.</summary>
    public static double Cross(Point2 a, Point2 b) => a.X * b.Y - a.Y * b.X;

    /// <summary>Distance between two points.</summary>
    public static double Distance(Point2 a, Point2 b) => (a - b).Length;

    /// <summary>Midpoint of two points.</summary>
    public static Point2 Mid(Point2 a, Point2 b) => new(0.5 * (a.X + b.X), 0.5 * (a.Y + b.Y));

    /// <summary>The point rotated by <paramref name="angle"/> radians about the origin.</summary>
    public Point2 Rotated(double angle)
    {
        double c = Math.Cos(angle), s = Math.Sin(angle);
        return new Point2(c * X - s * Y, s * X + c * Y);
    }

    /// <inheritdoc />
    public override string ToString() =>
        string.Create(System.Globalization.CultureInfo.InvariantCulture, $"({X:G6}, {Y:G6})");
}
