namespace SectionTwist.Geometry;

/// <summary>
/// An exact circular arc: centre, radius, start angle and signed sweep (positive = counter-clockwise), in radians.
/// </summary>
public sealed class ArcSegment : Segment
{
    /// <summary>Creates an arc. <paramref name="sweep"/> is signed: positive runs counter-clockwise.</summary>
    public ArcSegment(Point2 center, double radius, double startAngle, double sweep)
    {
        if (!(radius > 0) || double.IsInfinity(radius))
            throw new SectionTwistException("bad-arc", $"arc at {center}: radius {radius} must be positive and finite");
        if (sweep == 0 || Math.Abs(sweep) > 2 * Math.PI + 1e-12 || double.IsNaN(sweep))
            throw new SectionTwistException("bad-arc", $"arc at {center}: sweep {sweep} rad must be non-zero and at most a full turn");
        Center = center;
        Radius = radius;
        StartAngle = startAngle;
        Sweep = sweep;
        Start = PointAtAngle(startAngle);
        End = PointAtAngle(startAngle + sweep);
    }

    /// <summary>Centre of the circle.</summary>
    public Point2 Center { get; }
    /// <summary>Radius.</summary>
    public double Radius { get; }
    /// <summary>Angle of the start point, radians.</summary>
    public double StartAngle { get; }
    /// <summary>Signed sweep, radians; positive is counter-clockwise.</summary>
    public double Sweep { get; }
    /// <summary>True when the arc runs counter-clockwise.</summary>
    public bool IsCounterClockwise => Sweep > 0;

    /// <inheritdoc />
    public override Point2 Start { get; }
    /// <inheritdoc />
    public override Point2 End { get; }
    /// <inheritdoc />
    public override double Length => Radius * Math.Abs(Sweep);

    /// <inheritdoc />
    public override Box2 Bounds
    {
        get
        {
            var b = Box2.Empty.Include(Start).Include(End);
            for (int k = -4; k <= 8; k++)
            {
                double a = k * Math.PI / 2;
                if (ContainsAngle(a)) b = b.Include(PointAtAngle(a));
            }
            return b;
        }
    }

    /// <summary>Creates the arc from <paramref name="start"/> to <paramref name="end"/> with a DXF-style bulge (tan of a quarter of the included angle; negative = clockwise).</summary>
    public static ArcSegment FromBulge(Point2 start, Point2 end, double bulge)
    {
        double chord = Point2.Distance(start, end);
        if (chord == 0 || bulge == 0)
            throw new SectionTwistException("bad-arc", $"bulge arc {start} -> {end}: needs distinct points and a non-zero bulge");
        double sweep = 4 * Math.Atan(bulge);
        double r = chord / (2 * Math.Sin(Math.Abs(sweep) / 2));
        Point2 mid = Point2.Mid(start, end);
        Point2 dir = (1 / chord) * (end - start);
        Point2 left = new(-dir.Y, dir.X);
        // distance from chord midpoint to centre, signed toward the left of start->end for a CCW arc
        double h = r * Math.Cos(sweep / 2); // negative beyond a half turn: the centre crosses the chord
        Point2 c = mid + (Math.Sign(bulge) * h) * left;
        double a0 = Math.Atan2(start.Y - c.Y, start.X - c.X);
        return new ArcSegment(c, r, a0, sweep);
    }

    /// <summary>Creates the arc from <paramref name="start"/> through <paramref name="through"/> to <paramref name="end"/>.</summary>
    public static ArcSegment ThroughThreePoints(Point2 start, Point2 through, Point2 end)
    {
        double ax = start.X, ay = start.Y, bx = through.X, by = through.Y, cx = end.X, cy = end.Y;
        double d = 2 * (ax * (by - cy) + bx * (cy - ay) + cx * (ay - by));
        double scale = Math.Max(Point2.Distance(start, through), Point2.Distance(through, end));
        if (Math.Abs(d) <= 1e-14 * scale * scale)
            throw new SectionTwistException("bad-arc", $"arc through {start}, {through}, {end}: the three points are collinear; move the through point off the line, or write a straight line instead");
        double a2 = ax * ax + ay * ay, b2 = bx * bx + by * by, c2 = cx * cx + cy * cy;
        var center = new Point2((a2 * (by - cy) + b2 * (cy - ay) + c2 * (ay - by)) / d, (a2 * (cx - bx) + b2 * (ax - cx) + c2 * (bx - ax)) / d);
        double r = Point2.Distance(center, start);
        double t0 = Math.Atan2(ay - center.Y, ax - center.X);
        double ccwTo(Point2 p) => NormalizePositive(Math.Atan2(p.Y - center.Y, p.X - center.X) - t0);
        double toEnd = ccwTo(end), toMid = ccwTo(through);
        double sweep = toMid < toEnd ? toEnd : toEnd - 2 * Math.PI;
        if (Point2.Distance(start, end) == 0) sweep = 2 * Math.PI;
        return new ArcSegment(center, r, t0, sweep);
    }

    /// <summary>Creates the arc about <paramref name="center"/> from <paramref name="start"/> to the angle of <paramref name="end"/>, turning counter-clockwise or clockwise.</summary>
    public static ArcSegment FromCenter(Point2 center, Point2 start, Point2 end, bool counterClockwise)
    {
        double r = Point2.Distance(center, start);
        double a0 = Math.Atan2(start.Y - center.Y, start.X - center.X);
        double a1 = Math.Atan2(end.Y - center.Y, end.X - center.X);
        double sweep = NormalizePositive(a1 - a0);
        if (sweep < 1e-14) sweep = 2 * Math.PI;
        if (!counterClockwise) sweep -= 2 * Math.PI;
        return new ArcSegment(center, r, a0, sweep);
    }

    /// <summary>A full circle starting at angle 0, counter-clockwise.</summary>
    public static ArcSegment Circle(Point2 center, double radius) => new(center, radius, 0, 2 * Math.PI);

    /// <summary>Angle reduced to [0, 2 pi).</summary>
    internal static double NormalizePositive(double a)
    {
        a %= 2 * Math.PI;
        return a < 0 ? a + 2 * Math.PI : a;
    }

    /// <summary>True when the direction <paramref name="angle"/> lies on the arc.</summary>
    public bool ContainsAngle(double angle)
    {
        double d = Sweep > 0 ? NormalizePositive(angle - StartAngle) : NormalizePositive(StartAngle - angle);
        return d <= Math.Abs(Sweep) + 1e-15;
    }

    private Point2 PointAtAngle(double a) => new(Center.X + Radius * Math.Cos(a), Center.Y + Radius * Math.Sin(a));

    /// <inheritdoc />
    public override Point2 PointAt(double t) => t == 0 ? Start : t == 1 ? End : PointAtAngle(StartAngle + t * Sweep);

    /// <inheritdoc />
    public override Point2 DerivativeAt(double t)
    {
        double a = StartAngle + t * Sweep;
        return new Point2(-Radius * Sweep * Math.Sin(a), Radius * Sweep * Math.Cos(a));
    }

    /// <inheritdoc />
    public override Segment Reversed() => new ArcSegment(Center, Radius, StartAngle + Sweep, -Sweep);

    /// <inheritdoc />
    public override Segment Transformed(Similarity2 transform)
    {
        var c = transform.Apply(Center);
        double a0 = transform.ApplyAngle(StartAngle);
        double sweep = transform.Mirror ? -Sweep : Sweep;
        return new ArcSegment(c, Radius * transform.Scale, a0, sweep);
    }

    /// <inheritdoc />
    public override (Point2 Point, double T) Closest(Point2 p)
    {
        double a = Math.Atan2(p.Y - Center.Y, p.X - Center.X);
        if (ContainsAngle(a))
        {
            double d = Sweep > 0 ? NormalizePositive(a - StartAngle) : NormalizePositive(StartAngle - a);
            double t = Math.Clamp(d / Math.Abs(Sweep), 0, 1);
            return (PointAt(t), t);
        }
        return Point2.Distance(p, Start) <= Point2.Distance(p, End) ? (Start, 0) : (End, 1);
    }

    /// <inheritdoc />
    public override double[] Subdivide(double sagitta, double maxLength = double.PositiveInfinity)
    {
        // sagitta of a chord subtending angle a: r (1 - cos(a/2))
        double amax = sagitta >= Radius ? Math.PI / 2 : 2 * Math.Acos(1 - sagitta / Radius);
        amax = Math.Min(amax, Math.PI / 2);
        if (maxLength < double.PositiveInfinity) amax = Math.Min(amax, 2 * Math.Asin(Math.Min(1, maxLength / (2 * Radius))));
        amax = Math.Max(amax, 1e-6); // a zero or denormal tolerance must not ask for unbounded pieces
        int n = (int)Math.Clamp(Math.Ceiling(Math.Abs(Sweep) / amax - 1e-9), 1, 1_000_000);
        if (Math.Abs(Sweep) > Math.PI * 1.999) n = Math.Max(n, 3);
        var ts = new double[n + 1];
        for (int i = 0; i <= n; i++) ts[i] = (double)i / n;
        return ts;
    }

    internal override void Accumulate(ref AreaMoments m, Point2 origin) => AccumulateInPieces(ref m, origin, Sweep);

    /// <inheritdoc />
    public override string ToString() =>
        $"arc centre {Center} r={Radius:G6} from {Start} to {End} ({(Sweep > 0 ? "ccw" : "cw")})";
}
