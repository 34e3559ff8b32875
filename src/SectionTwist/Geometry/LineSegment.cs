namespace SectionTwist.Geometry;

/// <summary>A straight boundary piece.</summary>
public sealed class LineSegment : Segment
{
    /// <summary>Creates a line from <paramref name="start"/> to <paramref name="end"/>.</summary>
    public LineSegment(Point2 start, Point2 end)
    {
        Start = start;
        End = end;
    }

    /// <inheritdoc />
    public override Point2 Start { get; }
    /// <inheritdoc />
    public override Point2 End { get; }
    /// <inheritdoc />
    public override double Length => Point2.Distance(Start, End);
    /// <inheritdoc />
    public override Box2 Bounds => Box2.Empty.Include(Start).Include(End);

    /// <inheritdoc />
    public override Point2 PointAt(double t) => new(Start.X + t * (End.X - Start.X), Start.Y + t * (End.Y - Start.Y));
    /// <inheritdoc />
    public override Point2 DerivativeAt(double t) => End - Start;
    /// <inheritdoc />
    public override Segment Reversed() => new LineSegment(End, Start);
    /// <inheritdoc />
    public override Segment Transformed(Similarity2 transform) => new LineSegment(transform.Apply(Start), transform.Apply(End));

    /// <inheritdoc />
    public override (Point2 Point, double T) Closest(Point2 p)
    {
        Point2 d = End - Start;
        double l2 = Point2.Dot(d, d);
        double t = l2 == 0 ? 0 : Math.Clamp(Point2.Dot(p - Start, d) / l2, 0, 1);
        return (PointAt(t), t);
    }

    /// <inheritdoc />
    public override double[] Subdivide(double sagitta, double maxLength = double.PositiveInfinity)
    {
        int n = Math.Max(1, (int)Math.Ceiling(Length / maxLength - 1e-9));
        var ts = new double[n + 1];
        for (int i = 0; i <= n; i++) ts[i] = (double)i / n;
        return ts;
    }

    internal override void Accumulate(ref AreaMoments m, Point2 origin)
    {
        // The integrands are polynomials of degree <= 3 in t: two-point Gauss is exact.
        Point2 a = Start - origin, d = End - Start;
        const double g = 0.57735026918962576;
        foreach (double xi in (ReadOnlySpan<double>)[-g, g])
        {
            double t = 0.5 * (1 + xi);
            m.Add(a.X + t * d.X, a.Y + t * d.Y, 0.5 * d.X, 0.5 * d.Y);
        }
    }

    /// <inheritdoc />
    public override string ToString() => $"line {Start} -> {End}";
}
