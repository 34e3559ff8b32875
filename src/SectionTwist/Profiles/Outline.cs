using SectionTwist.Geometry;

namespace SectionTwist.Profiles;

/// <summary>
/// A closed counter-clockwise outline given by corner points joined by lines or circular arcs, with an optional
/// fillet radius at each corner. <see cref="ToLoop"/> replaces each rounded corner by the arc of that radius tangent
/// to both neighbouring edges (lines or circles), on the side of the smaller angle, so a convex corner is rounded off
/// and a re-entrant corner gets a root fillet. Edge i runs from corner i-1 to corner i (the first edge closes the loop).
/// </summary>
internal sealed class Outline(string what)
{
    private readonly List<Corner> _corners = [];

    private readonly record struct Corner(Point2 P, double Radius, bool IsArc, Point2 Center, bool Ccw);

    /// <summary>Adds a corner reached by a straight edge.</summary>
    public Outline Line(Point2 p, double radius = 0) { _corners.Add(new Corner(p, radius, false, default, false)); return this; }

    /// <summary>Adds a corner at (x, y) reached by a straight edge.</summary>
    public Outline Line(double x, double y, double radius = 0) => Line(new Point2(x, y), radius);

    /// <summary>Adds a corner reached by an arc about <paramref name="center"/> (the point should lie on the circle).</summary>
    public Outline Arc(Point2 p, Point2 center, bool counterClockwise, double radius = 0)
    {
        _corners.Add(new Corner(p, radius, true, center, counterClockwise));
        return this;
    }

    /// <summary>Adds every corner of <paramref name="points"/> joined by lines, all with the same radius.</summary>
    public Outline Lines(IEnumerable<Point2> points, double radius = 0)
    {
        foreach (var p in points) Line(p, radius);
        return this;
    }

    /// <summary>Number of corners.</summary>
    public int Count => _corners.Count;

    /// <summary>Resolves the fillets and returns the loop; throws when a radius does not fit its corner.</summary>
    public Loop ToLoop()
    {
        int n = _corners.Count;
        if (n == 0) throw new InvalidOperationException("empty outline");
        var tin = new Point2[n];
        var tout = new Point2[n];
        var fillets = new ArcSegment?[n];
        for (int i = 0; i < n; i++)
        {
            tin[i] = tout[i] = _corners[i].P;
            if (_corners[i].Radius > 0) (tin[i], tout[i], fillets[i]) = Fillet(i);
        }
        var segments = new List<Segment>();
        for (int i = 0; i < n; i++)
        {
            int prev = (i + n - 1) % n;
            var c = _corners[i];
            Point2 a = tout[prev], b = tin[i];
            if (c.IsArc)
            {
                double original = Sweep(c.Center, _corners[prev].P, c.P, c.Ccw);
                double now = Sweep(c.Center, a, b, c.Ccw);
                if (Math.Abs(now) > Math.Abs(original) + 1e-9)
                    throw TooLarge(prev, i);
                if (Math.Abs(now) > 1e-12)
                    segments.Add(new ArcSegment(c.Center, Point2.Distance(c.Center, a), Math.Atan2(a.Y - c.Center.Y, a.X - c.Center.X), now));
            }
            else
            {
                Point2 d0 = c.P - _corners[prev].P, d1 = b - a;
                double scale = Math.Max(d0.Length, 1e-300);
                if (Point2.Dot(d0, d1) < -1e-12 * scale * scale) throw TooLarge(prev, i);
                if (d1.Length > 1e-12 * scale) segments.Add(new LineSegment(a, b));
            }
            if (fillets[i] is { } f) segments.Add(f);
        }
        return new Loop(segments);
    }

    private SectionTwistException TooLarge(int a, int b) =>
        new("bad-template-parameter",
            $"{what}: the corner radii at {_corners[a].P} and {_corners[b].P} do not fit on the edge between them; use smaller radii");

    /// <summary>Signed sweep from a to b about c in the given direction; a full turn when a and b coincide.</summary>
    private static double Sweep(Point2 c, Point2 a, Point2 b, bool ccw)
    {
        double s = ArcSegment.NormalizePositive(Math.Atan2(b.Y - c.Y, b.X - c.X) - Math.Atan2(a.Y - c.Y, a.X - c.X));
        if (!ccw) s = s == 0 ? 0 : s - 2 * Math.PI;
        if (Math.Abs(s) < 1e-13 && Point2.Distance(a, b) < 1e-12 * Point2.Distance(a, c)) s = ccw ? 2 * Math.PI : -2 * Math.PI;
        return s;
    }

    /// <summary>Unit tangent of edge <paramref name="i"/> (which ends at corner i) at point <paramref name="q"/>.</summary>
    private Point2 Tangent(int i, Point2 q)
    {
        var c = _corners[i];
        if (!c.IsArc)
        {
            Point2 d = c.P - _corners[(i + _corners.Count - 1) % _corners.Count].P;
            return (1 / d.Length) * d;
        }
        Point2 r = q - c.Center;
        Point2 t = (1 / r.Length) * new Point2(-r.Y, r.X);
        return c.Ccw ? t : -t;
    }

    private (Point2 In, Point2 Out, ArcSegment Arc) Fillet(int i)
    {
        int n = _corners.Count, next = (i + 1) % n;
        var v = _corners[i].P;
        double r = _corners[i].Radius;
        Point2 t0 = Tangent(i, v), t1 = Tangent(next, v);
        double cross = Point2.Cross(t0, t1);
        if (Math.Abs(cross) < 1e-9)
            throw new SectionTwistException("bad-template-parameter", $"{what}: no corner to round at {v}; use radius 0 there");
        double side = cross > 0 ? 1 : -1; // left turn: centre on the left of both edges
        Point2 centre = Intersect(Offset(i, v, t0, side * r), Offset(next, v, t1, side * r), v)
            ?? throw new SectionTwistException("bad-template-parameter", $"{what}: radius {r:G4} m does not fit the corner at {v}; use a smaller radius");
        Point2 pin = Foot(i, centre, v, t0), pout = Foot(next, centre, v, t1);
        double a0 = Math.Atan2(pin.Y - centre.Y, pin.X - centre.X);
        double sweep = ArcSegment.NormalizePositive(Math.Atan2(pout.Y - centre.Y, pout.X - centre.X) - a0);
        if (side < 0) sweep -= 2 * Math.PI;
        return (pin, pout, new ArcSegment(centre, r, a0, sweep));
    }

    /// <summary>An offset edge: a line (point, direction) or a circle (centre, radius).</summary>
    private readonly record struct Curve(bool IsLine, Point2 P, Point2 D, double R);

    private Curve Offset(int i, Point2 v, Point2 t, double signedOffset)
    {
        var c = _corners[i];
        if (!c.IsArc) return new Curve(true, v + signedOffset * new Point2(-t.Y, t.X), t, 0);
        double rr = Point2.Distance(c.Center, v) + (c.Ccw ? -signedOffset : signedOffset);
        return new Curve(false, c.Center, default, rr);
    }

    private Point2 Foot(int i, Point2 centre, Point2 v, Point2 t)
    {
        var c = _corners[i];
        if (!c.IsArc) return v + Point2.Dot(centre - v, t) * t;
        Point2 d = centre - c.Center;
        return c.Center + (Point2.Distance(c.Center, v) / d.Length) * d;
    }

    /// <summary>The intersection of two curves nearest to <paramref name="near"/>, or null.</summary>
    private static Point2? Intersect(Curve a, Curve b, Point2 near)
    {
        if (!a.IsLine && b.IsLine) (a, b) = (b, a);
        if (a.IsLine && b.IsLine)
        {
            double den = Point2.Cross(a.D, b.D);
            if (Math.Abs(den) < 1e-15) return null;
            double s = Point2.Cross(b.P - a.P, b.D) / den;
            return a.P + s * a.D;
        }
        if (a.IsLine)
        {
            if (!(b.R > 0)) return null;
            Point2 f = a.P - b.P;
            double bq = Point2.Dot(f, a.D), cq = Point2.Dot(f, f) - b.R * b.R, disc = bq * bq - cq;
            if (disc < 0) return null;
            double sq = Math.Sqrt(disc);
            Point2 p1 = a.P + (-bq - sq) * a.D, p2 = a.P + (-bq + sq) * a.D;
            return Point2.Distance(p1, near) <= Point2.Distance(p2, near) ? p1 : p2;
        }
        double dist = Point2.Distance(a.P, b.P);
        if (!(a.R > 0) || !(b.R > 0) || dist == 0 || dist > a.R + b.R || dist < Math.Abs(a.R - b.R)) return null;
        double x = (dist * dist + a.R * a.R - b.R * b.R) / (2 * dist), h = Math.Sqrt(Math.Max(0, a.R * a.R - x * x));
        Point2 e = (1 / dist) * (b.P - a.P), m = a.P + x * e, nrm = new(-e.Y, e.X);
        Point2 q1 = m + h * nrm, q2 = m - h * nrm;
        return Point2.Distance(q1, near) <= Point2.Distance(q2, near) ? q1 : q2;
    }
}
