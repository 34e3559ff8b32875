using SectionTwist.Geometry;

namespace SectionTwist.Import.Dxf;

/// <summary>
/// Replaces a NURBS curve by circular arcs (and lines where it is straight) that stay within a tolerance of it:
/// each knot span is cut into four, and a piece is the arc through the curve's points at its ends and middle when
/// seven more curve points on the piece lie within the tolerance of that arc; otherwise it is halved (adaptive
/// subdivision, in the spirit of arc-spline approximation: Meek and Walton, "Approximating smooth planar curves by arc
/// splines", J. Comput. Appl. Math. 59, 1995). Arcs converge with the cube of the piece length where chords converge
/// with its square, so a tolerance far below the requested accuracy of J costs few pieces and adds no false corners.
/// </summary>
internal static class SplineArcs
{
    /// <summary>Most pieces one spline may become.</summary>
    private const int MaxPieces = 200_000;

    /// <summary>Arcs and lines within <paramref name="tol"/> of a NURBS curve, span by span (kinks at knots are kept).</summary>
    public static List<Segment> Fit(NurbsCurve curve, double tol)
    {
        var breaks = new List<double>();
        for (int k = curve.Degree; k < curve.Control.Length; k++)
            if (curve.Knots[k + 1] > curve.Knots[k]) { if (breaks.Count == 0) breaks.Add(curve.Knots[k]); breaks.Add(curve.Knots[k + 1]); }
        return Fit(curve.Evaluate, breaks, tol);
    }

    /// <summary>Arcs and lines within <paramref name="tol"/> of a smooth segment (an elliptical arc whose ends must move).</summary>
    public static List<Segment> Fit(Segment s, double tol) => Fit(s.PointAt, [0, 1], tol);

    /// <summary>
    /// Arcs and lines within <paramref name="tol"/> of the curve <paramref name="eval"/> over the parameter
    /// <paramref name="breaks"/> (smooth between breaks). Consecutive pieces share their end points exactly.
    /// </summary>
    public static List<Segment> Fit(Func<double, Point2> eval, IReadOnlyList<double> breaks, double tol)
    {
        var list = new List<Segment>();
        for (int k = 0; k + 1 < breaks.Count; k++)
        {
            double a = breaks[k], b = breaks[k + 1];
            Point2 prev = eval(a);
            for (int i = 1; i <= 4; i++)
            {
                double u0 = a + (b - a) * (i - 1) / 4, u1 = i == 4 ? b : a + (b - a) * i / 4;
                Point2 next = eval(u1);
                Piece(eval, u0, prev, u1, next, tol, 0, list);
                prev = next;
            }
        }
        return list;
    }

    private static void Piece(Func<double, Point2> c, double u0, Point2 p0, double u1, Point2 p1, double tol, int depth, List<Segment> into)
    {
        if (into.Count > MaxPieces)
            throw new SectionTwistException("dxf-too-large", $"a spline needs more than {MaxPieces} arcs at the requested accuracy; simplify the spline");
        double um = 0.5 * (u0 + u1);
        Point2 pm = c(um);
        if (p0 == p1 && pm == p0) return; // a zero-length piece
        if (depth < 40 && p0 != p1)
        {
            if (TryLine(c, u0, p0, u1, p1, tol, out var line)) { into.Add(line); return; }
            if (TryArc(c, u0, p0, pm, u1, p1, tol, out var arc)) { into.Add(arc); return; }
        }
        else if (depth >= 40)
        {
            if (p0 != p1) into.Add(new LineSegment(p0, p1));
            return;
        }
        Piece(c, u0, p0, um, pm, tol, depth + 1, into);
        Piece(c, um, pm, u1, p1, tol, depth + 1, into);
    }

    private static bool TryLine(Func<double, Point2> c, double u0, Point2 p0, double u1, Point2 p1, double tol, out Segment line)
    {
        line = null!;
        Point2 d = p1 - p0;
        double l = d.Length;
        for (int k = 1; k < 8; k++)
        {
            var p = c(u0 + (u1 - u0) * k / 8);
            if (Math.Abs(Point2.Cross(d, p - p0)) / l > tol) return false;
            double s = Point2.Dot(d, p - p0) / (l * l);
            if (s < -1e-9 || s > 1 + 1e-9) return false;
        }
        line = new LineSegment(p0, p1);
        return true;
    }

    private static bool TryArc(Func<double, Point2> c, double u0, Point2 p0, Point2 pm, double u1, Point2 p1, double tol, out Segment arc)
    {
        arc = null!;
        ArcSegment a;
        try { a = ArcSegment.ThroughThreePoints(p0, pm, p1); }
        catch (SectionTwistException) { return false; }
        if (Math.Abs(a.Sweep) > Math.PI / 2 || !double.IsFinite(a.Radius)) return false;
        for (int k = 1; k < 8; k++)
        {
            if (k == 4) continue;
            var p = c(u0 + (u1 - u0) * k / 8);
            var (q, _) = a.Closest(p);
            if (Point2.Distance(p, q) > tol) return false;
        }
        arc = a;
        return true;
    }
}
