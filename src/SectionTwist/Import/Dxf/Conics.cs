using SectionTwist.Geometry;

namespace SectionTwist.Import.Dxf;

/// <summary>Exact circular and elliptical arcs under affine maps.</summary>
internal static class Conics
{
    /// <summary>
    /// The arc P(u) = c + cos(u) p + sin(u) q for u from <paramref name="u0"/> over <paramref name="sweep"/>, where p and q
    /// are conjugate semi-diameters. The principal axes follow from t0 = atan2(2 p.q, |p|^2 - |q|^2) / 2, which makes
    /// A = cos(t0) p + sin(t0) q and B = -sin(t0) p + cos(t0) q perpendicular (classical conjugate-diameter construction).
    /// Returns an <see cref="ArcSegment"/> when the result is a circle.
    /// </summary>
    public static Segment Arc(Point2 c, Point2 p, Point2 q, double u0, double sweep)
    {
        double pp = Point2.Dot(p, p), qq = Point2.Dot(q, q), pq = Point2.Dot(p, q);
        double scale = Math.Max(pp, qq);
        if (Math.Abs(pp - qq) <= 1e-13 * scale && Math.Abs(pq) <= 1e-13 * scale)
        {
            double r = Math.Sqrt(0.5 * (pp + qq));
            double alpha = Math.Atan2(p.Y, p.X);
            bool ccw = Point2.Cross(p, q) > 0;
            return ccw ? new ArcSegment(c, r, alpha + u0, sweep) : new ArcSegment(c, r, alpha - u0, -sweep);
        }
        double t0 = 0.5 * Math.Atan2(2 * pq, pp - qq);
        double ct = Math.Cos(t0), st = Math.Sin(t0);
        Point2 a = ct * p + st * q, b = -st * p + ct * q;
        double rot = Math.Atan2(a.Y, a.X);
        var e2 = new Point2(-Math.Sin(rot), Math.Cos(rot));
        double sa = a.Length, sb = b.Length;
        if (!(Math.Min(sa, sb) >= 1e-3 * Math.Max(sa, sb)) || !double.IsFinite(sa + sb + c.X + c.Y))
            throw new SectionTwistException("dxf-degenerate", $"an arc becomes an ellipse with axes {sa:G3} and {sb:G3} (axis ratio below 1:1000: extreme insert scale or a tilted extrusion); fix the insert or the extrusion");
        // P = c + cos(u - t0) A + sin(u - t0) B; B = +-|B| e2
        return Point2.Dot(b, e2) >= 0
            ? new EllipticalArcSegment(c, sa, sb, rot, u0 - t0, sweep)
            : new EllipticalArcSegment(c, sa, sb, rot, t0 - u0, -sweep);
    }

    /// <summary>A segment mapped by an affine map: similarities keep arcs exact via <see cref="Segment.Transformed"/>; other maps turn arcs into elliptical arcs.</summary>
    public static Segment Map(Segment s, Affine2 m)
    {
        if (s is LineSegment) return new LineSegment(m.Apply(s.Start), m.Apply(s.End));
        if (m.TrySimilarity(out var sim)) return s.Transformed(sim);
        switch (s)
        {
            case ArcSegment a:
                return Arc(m.Apply(a.Center), m.ApplyVector(new Point2(a.Radius, 0)), m.ApplyVector(new Point2(0, a.Radius)), a.StartAngle, a.Sweep);
            case EllipticalArcSegment e:
            {
                double c = Math.Cos(e.Rotation), sn = Math.Sin(e.Rotation);
                var p = new Point2(e.SemiMajor * c, e.SemiMajor * sn);
                var q = new Point2(-e.SemiMinor * sn, e.SemiMinor * c);
                return Arc(m.Apply(e.Center), m.ApplyVector(p), m.ApplyVector(q), e.StartParameter, e.Sweep);
            }
            default:
                throw new InvalidOperationException($"unexpected segment type {s.GetType().Name}");
        }
    }
}
