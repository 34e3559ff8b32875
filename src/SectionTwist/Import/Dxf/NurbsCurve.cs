using SectionTwist.Geometry;

namespace SectionTwist.Import.Dxf;

/// <summary>
/// A planar NURBS curve of degree p with knot vector U (n + p + 1 knots), control points and optional weights.
/// Points are evaluated by de Boor's algorithm in homogeneous coordinates (Piegl and Tiller, The NURBS Book,
/// 2nd ed., section 2.2 algorithm A2.1 FindSpan, and section 4.2; de Boor, A Practical Guide to Splines, ch. X).
/// An affine map acts on a NURBS curve through its control points (affine invariance, The NURBS Book section 4.2).
/// </summary>
internal sealed class NurbsCurve
{
    public NurbsCurve(int degree, double[] knots, Point2[] control, double[]? weights)
    {
        Degree = degree; Knots = knots; Control = control; Weights = weights;
    }

    public int Degree { get; }
    public double[] Knots { get; }
    public Point2[] Control { get; }
    public double[]? Weights { get; }

    public double Start => Knots[Degree];
    public double End => Knots[Control.Length];

    /// <summary>Checks counts, ordering and weights; returns a reason when the data cannot define a curve.</summary>
    public static string? Check(int degree, double[] knots, int nCtrl, double[]? weights)
    {
        if (degree < 1 || degree > 25) return $"degree {degree} (expected 1 to 25)";
        if (nCtrl < degree + 1) return $"{nCtrl} control points for degree {degree} (need at least {degree + 1})";
        if (knots.Length != nCtrl + degree + 1) return $"{knots.Length} knots for {nCtrl} control points of degree {degree} (expected {nCtrl + degree + 1})";
        for (int i = 1; i < knots.Length; i++)
            if (!(knots[i] >= knots[i - 1])) return $"knot {i + 1} ({knots[i]}) is smaller than knot {i}";
        if (!(knots[nCtrl] > knots[degree])) return "an empty parameter range";
        if (weights is not null)
        {
            if (weights.Length != nCtrl) return $"{weights.Length} weights for {nCtrl} control points";
            if (weights.Any(w => !(w > 0) || !double.IsFinite(w))) return "a weight that is not positive";
        }
        return null;
    }

    public NurbsCurve Transformed(Affine2 m) => new(Degree, Knots, Control.Select(m.Apply).ToArray(), Weights);

    public Box2 ControlBounds
    {
        get { var b = Box2.Empty; foreach (var p in Control) b = b.Include(p); return b; }
    }

    /// <summary>Knot span index k with U[k] &lt;= u &lt; U[k+1] (last non-empty span at the end), The NURBS Book A2.1.</summary>
    private int FindSpan(double u)
    {
        int n = Control.Length - 1, p = Degree;
        if (u >= Knots[n + 1]) { int k = n; while (k > p && Knots[k] >= Knots[n + 1]) k--; return k; }
        if (u <= Knots[p]) { int k = p; while (k < n && Knots[k + 1] <= Knots[p]) k++; return k; }
        int lo = p, hi = n + 1;
        while (hi - lo > 1) { int mid = (lo + hi) / 2; if (u < Knots[mid]) hi = mid; else lo = mid; }
        return lo;
    }

    /// <summary>The point at parameter u by de Boor's recurrence on homogeneous control points.</summary>
    public Point2 Evaluate(double u)
    {
        int p = Degree, k = FindSpan(u);
        Span<double> x = stackalloc double[p + 1], y = stackalloc double[p + 1], w = stackalloc double[p + 1];
        for (int j = 0; j <= p; j++)
        {
            int idx = k - p + j;
            double wt = Weights?[idx] ?? 1;
            x[j] = Control[idx].X * wt; y[j] = Control[idx].Y * wt; w[j] = wt;
        }
        for (int r = 1; r <= p; r++)
            for (int j = p; j >= r; j--)
            {
                int i = k - p + j;
                double den = Knots[i + p - r + 1] - Knots[i];
                double a = den == 0 ? 0 : (u - Knots[i]) / den;
                x[j] = (1 - a) * x[j - 1] + a * x[j];
                y[j] = (1 - a) * y[j - 1] + a * y[j];
                w[j] = (1 - a) * w[j - 1] + a * w[j];
            }
        return new Point2(x[p] / w[p], y[p] / w[p]);
    }

    /// <summary>
    /// A polyline within <paramref name="tol"/> of the curve: each non-empty knot span is cut into 2p pieces, then
    /// pieces are halved while the curve point at their middle or quarters lies farther than tol from the chord.
    /// Throws when more than <paramref name="maxPoints"/> points would be needed.
    /// </summary>
    public List<Point2> Flatten(double tol, int maxPoints)
    {
        var pts = new List<Point2> { Evaluate(Start) };
        int n = Control.Length;
        for (int k = Degree; k < n; k++)
        {
            double a = Knots[k], b = Knots[k + 1];
            if (!(b > a)) continue;
            int pieces = 2 * Degree;
            Point2 prev = Evaluate(a);
            for (int i = 1; i <= pieces; i++)
            {
                double u0 = a + (b - a) * (i - 1) / pieces, u1 = i == pieces ? b : a + (b - a) * i / pieces;
                Point2 next = Evaluate(u1);
                Refine(u0, prev, u1, next, tol, 0, pts, maxPoints);
                pts.Add(next);
                prev = next;
            }
        }
        return pts;
    }

    private void Refine(double u0, Point2 p0, double u1, Point2 p1, double tol, int depth, List<Point2> pts, int maxPoints)
    {
        if (pts.Count > maxPoints)
            throw new SectionTwistException("dxf-too-large", $"a spline needs more than {maxPoints} points at the requested accuracy; loosen the spline tolerance");
        double um = 0.5 * (u0 + u1);
        Point2 pm = Evaluate(um);
        if (depth >= 24) return;
        if (Deviation(pm, p0, p1) <= tol && Deviation(Evaluate(0.5 * (u0 + um)), p0, p1) <= tol && Deviation(Evaluate(0.5 * (um + u1)), p0, p1) <= tol)
            return;
        Refine(u0, p0, um, pm, tol, depth + 1, pts, maxPoints);
        pts.Add(pm);
        Refine(um, pm, u1, p1, tol, depth + 1, pts, maxPoints);
    }

    private static double Deviation(Point2 p, Point2 a, Point2 b)
    {
        Point2 d = b - a;
        double l = d.Length;
        return l == 0 ? Point2.Distance(p, a) : Math.Abs(Point2.Cross(d, p - a)) / l;
    }
}
