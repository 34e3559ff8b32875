namespace SectionTwist.Geometry;

/// <summary>
/// A piece of a profile boundary: a straight <see cref="LineSegment"/> or an exact circular <see cref="ArcSegment"/>,
/// parametrised by t in [0, 1] from <see cref="Start"/> to <see cref="End"/>.
/// </summary>
public abstract class Segment
{
    private protected Segment() { }

    /// <summary>First point.</summary>
    public abstract Point2 Start { get; }
    /// <summary>Last point.</summary>
    public abstract Point2 End { get; }
    /// <summary>Arc length.</summary>
    public abstract double Length { get; }
    /// <summary>Tight bounding box.</summary>
    public abstract Box2 Bounds { get; }

    /// <summary>The point at parameter <paramref name="t"/> (0 = start, 1 = end, uniform in arc length).</summary>
    public abstract Point2 PointAt(double t);

    /// <summary>dP/dt at parameter <paramref name="t"/> (its length is the segment length).</summary>
    public abstract Point2 DerivativeAt(double t);

    /// <summary>The same curve run the other way.</summary>
    public abstract Segment Reversed();

    /// <summary>The curve moved by a similarity transform (rotation, uniform scale, mirror, translation).</summary>
    public abstract Segment Transformed(Similarity2 transform);

    /// <summary>The point of the curve nearest to <paramref name="p"/> and its parameter.</summary>
    public abstract (Point2 Point, double T) Closest(Point2 p);

    /// <summary>
    /// Parameters t_0 = 0 &lt; t_1 &lt; ... &lt; t_n = 1 that split the curve into chords deviating at most
    /// <paramref name="sagitta"/> from it (a line is one chord), with at most <paramref name="maxLength"/> chord length.
    /// </summary>
    public abstract double[] Subdivide(double sagitta, double maxLength = double.PositiveInfinity);

    /// <summary>Points of the subdivision from <see cref="Subdivide"/>, start and end included.</summary>
    public IReadOnlyList<Point2> Flatten(double sagitta, double maxLength = double.PositiveInfinity)
    {
        double[] ts = Subdivide(sagitta, maxLength);
        var pts = new Point2[ts.Length];
        for (int i = 0; i < ts.Length; i++) pts[i] = i == 0 ? Start : i == ts.Length - 1 ? End : PointAt(ts[i]);
        return pts;
    }

    /// <summary>
    /// Adds this segment's contribution to the Green's-theorem boundary integrals for area and first and second
    /// moments, taken about <paramref name="origin"/>. Exact for lines; for arcs Gauss-Legendre on pieces of at most
    /// 45 degrees, accurate to rounding (the integrand is a trigonometric polynomial of low order).
    /// </summary>
    internal abstract void Accumulate(ref AreaMoments m, Point2 origin);

    /// <summary>Quadrature of the boundary integrals on pieces of at most 45 degrees of the angle parameter.</summary>
    private protected void AccumulateInPieces(ref AreaMoments m, Point2 origin, double sweep)
    {
        int pieces = Math.Max(1, (int)Math.Ceiling(Math.Abs(sweep) / (Math.PI / 4)));
        for (int k = 0; k < pieces; k++)
            AccumulateByQuadrature(ref m, origin, (double)k / pieces, (double)(k + 1) / pieces);
    }

    /// <summary>Shared quadrature of the boundary integrals over t in [t0, t1].</summary>
    private protected void AccumulateByQuadrature(ref AreaMoments m, Point2 origin, double t0, double t1)
    {
        ReadOnlySpan<double> xg = Gauss.X10;
        ReadOnlySpan<double> wg = Gauss.W10;
        double half = 0.5 * (t1 - t0), mid = 0.5 * (t1 + t0);
        for (int i = 0; i < xg.Length; i++)
        {
            double t = mid + half * xg[i];
            Point2 p = PointAt(t) - origin;
            Point2 d = DerivativeAt(t);
            double w = wg[i] * half;
            m.Add(p.X, p.Y, d.X * w, d.Y * w);
        }
    }
}

/// <summary>Gauss-Legendre nodes and weights on [-1, 1].</summary>
internal static class Gauss
{
    internal static readonly double[] X10 =
    [
        -0.9739065285171717, -0.8650633666889845, -0.6794095682990244, -0.4333953941292472, -0.1488743389816312,
        0.1488743389816312, 0.4333953941292472, 0.6794095682990244, 0.8650633666889845, 0.9739065285171717,
    ];
    internal static readonly double[] W10 =
    [
        0.0666713443086881, 0.1494513491505806, 0.2190863625159820, 0.2692667193099963, 0.2955242247147529,
        0.2955242247147529, 0.2692667193099963, 0.2190863625159820, 0.1494513491505806, 0.0666713443086881,
    ];
}
