namespace SectionTwist.Torsion;

/// <summary>
/// The 6-node isoparametric triangle: reference coordinates (r, s), L1 = 1 - r - s, L2 = r, L3 = s; nodes 0-2 at the
/// corners and 3-5 at the mid-sides of edges 01, 12, 20 (Zienkiewicz, Taylor and Zhu, The Finite Element Method: Its
/// Basis and Fundamentals, 7th ed., sec. 6.5). Quadrature rules from Dunavant (1985), "High degree efficient symmetrical
/// Gaussian quadrature rules for the triangle", Int. J. Numer. Meth. Eng. 21.
/// </summary>
internal static class P2Triangle
{
    /// <summary>A quadrature rule on the reference triangle (weights sum to 1/2, the reference area).</summary>
    internal sealed class Rule
    {
        public Rule(double[] r, double[] s, double[] w)
        {
            R = r; S = s; W = w;
            int n = r.Length;
            N = new double[n * 6]; Dr = new double[n * 6]; Ds = new double[n * 6];
            for (int q = 0; q < n; q++)
            {
                Shape(r[q], s[q], N.AsSpan(q * 6, 6));
                ShapeDerivatives(r[q], s[q], Dr.AsSpan(q * 6, 6), Ds.AsSpan(q * 6, 6));
            }
        }

        public double[] R { get; }
        public double[] S { get; }
        public double[] W { get; }
        /// <summary>Shape values, 6 per point.</summary>
        public double[] N { get; }
        /// <summary>dN/dr, 6 per point.</summary>
        public double[] Dr { get; }
        /// <summary>dN/ds, 6 per point.</summary>
        public double[] Ds { get; }
        public int Count => W.Length;
    }

    /// <summary>Degree-2 rule, 3 points (exact for the stiffness and load of straight-sided elements).</summary>
    public static readonly Rule Degree2 = new(
        [1.0 / 6, 2.0 / 3, 1.0 / 6],
        [1.0 / 6, 1.0 / 6, 2.0 / 3],
        [1.0 / 6, 1.0 / 6, 1.0 / 6]);

    /// <summary>Degree-5 rule, 7 points (Dunavant), for curved elements.</summary>
    public static readonly Rule Degree5 = MakeDegree5();

    private static Rule MakeDegree5()
    {
        double a1 = 0.059715871789770, b1 = 0.470142064105115;
        double a2 = 0.797426985353087, b2 = 0.101286507323456;
        double w0 = 0.225, w1 = 0.132394152788506, w2 = 0.125939180544827;
        double[] l1 = [1.0 / 3, a1, b1, b1, a2, b2, b2];
        double[] l2 = [1.0 / 3, b1, a1, b1, b2, a2, b2];
        double[] w = [w0, w1, w1, w1, w2, w2, w2];
        var r = new double[7]; var s = new double[7];
        for (int i = 0; i < 7; i++) { r[i] = l2[i]; s[i] = 1 - l1[i] - l2[i]; w[i] *= 0.5; }
        return new Rule(r, s, w);
    }

    /// <summary>Shape function values at (r, s).</summary>
    public static void Shape(double r, double s, Span<double> n)
    {
        double l1 = 1 - r - s, l2 = r, l3 = s;
        n[0] = l1 * (2 * l1 - 1); n[1] = l2 * (2 * l2 - 1); n[2] = l3 * (2 * l3 - 1);
        n[3] = 4 * l1 * l2; n[4] = 4 * l2 * l3; n[5] = 4 * l3 * l1;
    }

    /// <summary>Shape function derivatives with respect to r and s.</summary>
    public static void ShapeDerivatives(double r, double s, Span<double> dr, Span<double> ds)
    {
        double l1 = 1 - r - s;
        dr[0] = -(4 * l1 - 1); ds[0] = -(4 * l1 - 1);
        dr[1] = 4 * r - 1; ds[1] = 0;
        dr[2] = 0; ds[2] = 4 * s - 1;
        dr[3] = 4 * (l1 - r); ds[3] = -4 * r;
        dr[4] = 4 * s; ds[4] = 4 * r;
        dr[5] = -4 * s; ds[5] = 4 * (l1 - s);
    }

    /// <summary>True when the mid-side nodes sit at the edge midpoints (affine map, constant Jacobian).</summary>
    public static bool IsStraight(ReadOnlySpan<double> x, ReadOnlySpan<double> y)
    {
        double scale = Math.Abs(x[1] - x[0]) + Math.Abs(y[1] - y[0]) + Math.Abs(x[2] - x[0]) + Math.Abs(y[2] - y[0]);
        double tol = 1e-12 * scale;
        return Math.Abs(x[3] - 0.5 * (x[0] + x[1])) <= tol && Math.Abs(y[3] - 0.5 * (y[0] + y[1])) <= tol &&
               Math.Abs(x[4] - 0.5 * (x[1] + x[2])) <= tol && Math.Abs(y[4] - 0.5 * (y[1] + y[2])) <= tol &&
               Math.Abs(x[5] - 0.5 * (x[2] + x[0])) <= tol && Math.Abs(y[5] - 0.5 * (y[2] + y[0])) <= tol;
    }

    /// <summary>det J at a quadrature point, computed as <see cref="Gradients"/> computes it (the same value), without the derivatives.</summary>
    public static double Determinant(Rule rule, int q, ReadOnlySpan<double> x, ReadOnlySpan<double> y)
    {
        var dr = rule.Dr.AsSpan(q * 6, 6);
        var ds = rule.Ds.AsSpan(q * 6, 6);
        double xr = 0, xs = 0, yr = 0, ys = 0;
        for (int a = 0; a < 6; a++) { xr += dr[a] * x[a]; xs += ds[a] * x[a]; yr += dr[a] * y[a]; ys += ds[a] * y[a]; }
        return xr * ys - xs * yr;
    }

    /// <summary>
    /// Jacobian at a quadrature point: returns det J and writes the global shape derivatives dN/dx, dN/dy.
    /// </summary>
    public static double Gradients(Rule rule, int q, ReadOnlySpan<double> x, ReadOnlySpan<double> y, Span<double> dx, Span<double> dy)
    {
        var dr = rule.Dr.AsSpan(q * 6, 6);
        var ds = rule.Ds.AsSpan(q * 6, 6);
        double xr = 0, xs = 0, yr = 0, ys = 0;
        for (int a = 0; a < 6; a++) { xr += dr[a] * x[a]; xs += ds[a] * x[a]; yr += dr[a] * y[a]; ys += ds[a] * y[a]; }
        double det = xr * ys - xs * yr;
        double inv = 1 / det;
        for (int a = 0; a < 6; a++)
        {
            dx[a] = (ys * dr[a] - yr * ds[a]) * inv;
            dy[a] = (-xs * dr[a] + xr * ds[a]) * inv;
        }
        return det;
    }
}
