namespace SectionTwist.Geometry;

/// <summary>An axis-aligned bounding box.</summary>
public readonly record struct Box2(double MinX, double MinY, double MaxX, double MaxY)
{
    /// <summary>An empty box that any union replaces.</summary>
    public static readonly Box2 Empty = new(double.PositiveInfinity, double.PositiveInfinity, double.NegativeInfinity, double.NegativeInfinity);

    /// <summary>Width.</summary>
    public double Width => MaxX - MinX;
    /// <summary>Height.</summary>
    public double Height => MaxY - MinY;
    /// <summary>Length of the diagonal.</summary>
    public double Diagonal => IsEmpty ? 0 : Math.Sqrt(Width * Width + Height * Height);
    /// <summary>True when no point was added.</summary>
    public bool IsEmpty => MinX > MaxX;
    /// <summary>Centre of the box.</summary>
    public Point2 Center => new(0.5 * (MinX + MaxX), 0.5 * (MinY + MaxY));

    /// <summary>The box grown to include <paramref name="p"/>.</summary>
    public Box2 Include(Point2 p) => new(Math.Min(MinX, p.X), Math.Min(MinY, p.Y), Math.Max(MaxX, p.X), Math.Max(MaxY, p.Y));

    /// <summary>Union of two boxes.</summary>
    public Box2 Union(Box2 o) => new(Math.Min(MinX, o.MinX), Math.Min(MinY, o.MinY), Math.Max(MaxX, o.MaxX), Math.Max(MaxY, o.MaxY));

    /// <summary>True when the boxes overlap (touching counts), after growing this box by <paramref name="tol"/>.</summary>
    public bool Intersects(Box2 o, double tol = 0) =>
        MinX - tol <= o.MaxX && o.MinX <= MaxX + tol && MinY - tol <= o.MaxY && o.MinY <= MaxY + tol;

    /// <summary>True when <paramref name="o"/> lies inside this box grown by <paramref name="tol"/>.</summary>
    public bool Contains(Box2 o, double tol = 0) =>
        o.MinX >= MinX - tol && o.MaxX <= MaxX + tol && o.MinY >= MinY - tol && o.MaxY <= MaxY + tol;
}
