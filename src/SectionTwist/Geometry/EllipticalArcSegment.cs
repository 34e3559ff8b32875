namespace SectionTwist.Geometry;

/// <summary>
/// An exact elliptical arc: P(u) = C + a cos(u) e1 + b sin(u) e2 with e1 at angle <see cref="Rotation"/> and e2 at
/// Rotation + 90 degrees, for u from <see cref="StartParameter"/> over the signed <see cref="Sweep"/>
/// (positive = counter-clockwise when a, b &gt; 0). The segment parameter t in [0, 1] is linear in u.
/// </summary>
public sealed class EllipticalArcSegment : Segment
{
    /// <summary>Creates an elliptical arc.</summary>
    public EllipticalArcSegment(Point2 center, double semiMajor, double semiMinor, double rotation, double startParameter, double sweep)
    {
        if (!(semiMajor > 0) || !(semiMinor > 0) || double.IsInfinity(semiMajor) || double.IsInfinity(semiMinor))
            throw new SectionTwistException("bad-ellipse", $"ellipse at {center}: semi-axes {semiMajor}, {semiMinor} must be positive and finite");
        if (sweep == 0 || Math.Abs(sweep) > 2 * Math.PI + 1e-12 || double.IsNaN(sweep))
            throw new SectionTwistException("bad-ellipse", $"ellipse at {center}: sweep {sweep} rad must be non-zero and at most a full turn");
        Center = center; SemiMajor = semiMajor; SemiMinor = semiMinor; Rotation = rotation; StartParameter = startParameter; Sweep = sweep;
        Start = PointAt(0);
        End = Math.Abs(Math.Abs(sweep) - 2 * Math.PI) < 1e-14 ? Start : PointAtParameter(startParameter + sweep);
    }

    /// <summary>A full ellipse, counter-clockwise.</summary>
    public static EllipticalArcSegment Full(Point2 center, double a, double b, double rotation = 0) => new(center, a, b, rotation, 0, 2 * Math.PI);

    /// <summary>Centre.</summary>
    public Point2 Center { get; }
    /// <summary>Semi-axis along the first direction.</summary>
    public double SemiMajor { get; }
    /// <summary>Semi-axis along the second direction.</summary>
    public double SemiMinor { get; }
    /// <summary>Angle of the first axis, radians.</summary>
    public double Rotation { get; }
    /// <summary>Start value of the ellipse parameter u, radians.</summary>
    public double StartParameter { get; }
    /// <summary>Signed sweep of u, radians.</summary>
    public double Sweep { get; }

    /// <inheritdoc />
    public override Point2 Start { get; }
    /// <inheritdoc />
    public override Point2 End { get; }

    /// <inheritdoc />
    public override double Length
    {
        get
        {
            int pieces = Math.Max(4, (int)Math.Ceiling(Math.Abs(Sweep) / (Math.PI / 8)));
            double len = 0;
            for (int k = 0; k < pieces; k++)
            {
                double t0 = (double)k / pieces, h = 0.5 / pieces;
                for (int i = 0; i < Gauss.X10.Length; i++) len += Gauss.W10[i] * h * DerivativeAt(t0 + h * (1 + Gauss.X10[i])).Length;
            }
            return len;
        }
    }

    /// <inheritdoc />
    public override Box2 Bounds
    {
        get
        {
            var b = Box2.Empty;
            var ts = Subdivide(1e-4 * SemiMinor, double.PositiveInfinity);
            foreach (var t in ts) b = b.Include(PointAt(t));
            // grow by the largest sagitta so the box contains the curve
            double g = 1e-4 * SemiMinor;
            return new Box2(b.MinX - g, b.MinY - g, b.MaxX + g, b.MaxY + g);
        }
    }

    private Point2 PointAtParameter(double u)
    {
        double c = Math.Cos(Rotation), s = Math.Sin(Rotation);
        double x = SemiMajor * Math.Cos(u), y = SemiMinor * Math.Sin(u);
        return new Point2(Center.X + c * x - s * y, Center.Y + s * x + c * y);
    }

    /// <inheritdoc />
    public override Point2 PointAt(double t) => t == 1 && End != default ? End : PointAtParameter(StartParameter + t * Sweep);

    /// <inheritdoc />
    public override Point2 DerivativeAt(double t)
    {
        double u = StartParameter + t * Sweep;
        double c = Math.Cos(Rotation), s = Math.Sin(Rotation);
        double dx = -SemiMajor * Math.Sin(u) * Sweep, dy = SemiMinor * Math.Cos(u) * Sweep;
        return new Point2(c * dx - s * dy, s * dx + c * dy);
    }

    /// <inheritdoc />
    public override Segment Reversed() => new EllipticalArcSegment(Center, SemiMajor, SemiMinor, Rotation, StartParameter + Sweep, -Sweep);

    /// <inheritdoc />
    public override Segment Transformed(Similarity2 transform)
    {
        var c = transform.Apply(Center);
        double rot = transform.ApplyAngle(Rotation);
        // A mirror reverses the sense of the second axis: u -> -u keeps the same points with e2 flipped.
        return transform.Mirror
            ? new EllipticalArcSegment(c, SemiMajor * transform.Scale, SemiMinor * transform.Scale, rot, -StartParameter, -Sweep)
            : new EllipticalArcSegment(c, SemiMajor * transform.Scale, SemiMinor * transform.Scale, rot, StartParameter, Sweep);
    }

    /// <inheritdoc />
    public override (Point2 Point, double T) Closest(Point2 p)
    {
        var ts = Subdivide(1e-3 * SemiMinor, double.PositiveInfinity);
        double best = double.PositiveInfinity, bt = 0;
        foreach (var t in ts) { double d = Point2.Distance(p, PointAt(t)); if (d < best) { best = d; bt = t; } }
        double step = 1.0 / ts.Length;
        for (int it = 0; it < 60 && step > 1e-15; it++)
        {
            double tl = Math.Max(0, bt - step), tr = Math.Min(1, bt + step);
            double dl = Point2.Distance(p, PointAt(tl)), dr = Point2.Distance(p, PointAt(tr));
            if (dl < best) { best = dl; bt = tl; } else if (dr < best) { best = dr; bt = tr; } else step *= 0.5;
        }
        return (PointAt(bt), bt);
    }

    /// <inheritdoc />
    public override double[] Subdivide(double sagitta, double maxLength = double.PositiveInfinity)
    {
        // The ellipse is the image of the circle of radius a under a map that never lengthens a distance (scale 1 along
        // the major axis, b/a across). A parameter step du leaves the circle's chord within a (1 - cos(du/2)) of its arc,
        // so the ellipse's chord is as close to its arc. A curve smaller than the tolerance needs only the quarter chords.
        double rmax = Math.Max(SemiMajor, SemiMinor);
        double du = sagitta >= rmax ? Math.PI / 2 : Math.Min(Math.PI / 4, 2 * Math.Acos(1 - sagitta / rmax));
        if (maxLength < double.PositiveInfinity) du = Math.Min(du, maxLength / rmax);
        du = Math.Max(du, 1e-6); // a zero tolerance or an extreme axis ratio must not ask for unbounded pieces
        int n = (int)Math.Clamp(Math.Ceiling(Math.Abs(Sweep) / du - 1e-9), 2, 1_000_000);
        if (Math.Abs(Sweep) > 1.999 * Math.PI) n = Math.Max(n, 4);
        var ts = new double[n + 1];
        for (int i = 0; i <= n; i++) ts[i] = (double)i / n;
        return ts;
    }

    internal override void Accumulate(ref AreaMoments m, Point2 origin) => AccumulateInPieces(ref m, origin, Sweep);

    /// <inheritdoc />
    public override string ToString() => $"ellipse arc centre {Center} a={SemiMajor:G6} b={SemiMinor:G6}";
}
