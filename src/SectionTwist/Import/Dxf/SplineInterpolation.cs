using SectionTwist.Geometry;

namespace SectionTwist.Import.Dxf;

/// <summary>
/// Global interpolation of points by a B-spline of degree p (Piegl and Tiller, The NURBS Book, 2nd ed., section 9.2.1):
/// chord-length parameters (eq. 9.5), knots by averaging (eq. 9.8), and the collocation system solved by Gaussian
/// elimination without pivoting, which is stable for this totally positive banded matrix (The NURBS Book, section 9.2.1;
/// de Boor, A Practical Guide to Splines, ch. XIII).
/// </summary>
internal static class SplineInterpolation
{
    public static NurbsCurve Interpolate(IReadOnlyList<Point2> fit, int degree)
    {
        var q = new List<Point2> { fit[0] };
        for (int i = 1; i < fit.Count; i++) if (fit[i] != q[^1]) q.Add(fit[i]);
        int n = q.Count - 1;
        if (n < 1) throw new SectionTwistException("bad-spline", "a fit-point spline needs at least two distinct points");
        int p = Math.Clamp(degree, 1, n);
        // chord-length parameters
        var ub = new double[n + 1];
        double total = 0;
        for (int i = 1; i <= n; i++) total += Point2.Distance(q[i], q[i - 1]);
        for (int i = 1; i < n; i++) ub[i] = ub[i - 1] + Point2.Distance(q[i], q[i - 1]) / total;
        ub[n] = 1;
        // averaged knots
        var U = new double[n + p + 2];
        for (int i = 0; i <= p; i++) { U[i] = 0; U[n + 1 + i] = 1; }
        for (int j = 1; j <= n - p; j++)
        {
            double s = 0;
            for (int i = j; i < j + p; i++) s += ub[i];
            U[j + p] = s / p;
        }
        // banded collocation matrix: row i has basis values N_{lo..lo+p}(ub[i])
        var rows = new double[n + 1][];
        var lo = new int[n + 1];
        for (int i = 0; i <= n; i++)
        {
            int span = FindSpan(n, p, ub[i], U);
            lo[i] = span - p;
            rows[i] = Basis(span, ub[i], p, U);
        }
        var bx = q.Select(t => t.X).ToArray();
        var by = q.Select(t => t.Y).ToArray();
        // eliminate below the diagonal (band: row i covers columns lo[i] .. lo[i] + p)
        for (int k = 0; k <= n; k++)
        {
            double piv = Get(rows, lo, k, k, p);
            if (Math.Abs(piv) < 1e-14) throw new SectionTwistException("bad-spline", "the fit points of a spline cannot be interpolated (repeated or degenerate points)");
            for (int i = k + 1; i <= n && lo[i] <= k; i++)
            {
                double f = Get(rows, lo, i, k, p) / piv;
                if (f == 0) continue;
                for (int c = k; c <= Math.Min(n, lo[k] + p); c++) Set(rows, lo, i, c, p, Get(rows, lo, i, c, p) - f * Get(rows, lo, k, c, p));
                bx[i] -= f * bx[k]; by[i] -= f * by[k];
            }
        }
        var ctrl = new Point2[n + 1];
        for (int k = n; k >= 0; k--)
        {
            double sx = bx[k], sy = by[k];
            for (int c = k + 1; c <= Math.Min(n, lo[k] + p); c++) { double a = Get(rows, lo, k, c, p); sx -= a * ctrl[c].X; sy -= a * ctrl[c].Y; }
            double d = Get(rows, lo, k, k, p);
            ctrl[k] = new Point2(sx / d, sy / d);
        }
        ctrl[0] = q[0];
        ctrl[n] = q[n];
        return new NurbsCurve(p, U, ctrl, null);
    }

    private static double Get(double[][] rows, int[] lo, int r, int c, int p) => c < lo[r] || c > lo[r] + p ? 0 : rows[r][c - lo[r]];

    private static void Set(double[][] rows, int[] lo, int r, int c, int p, double v)
    {
        if (c >= lo[r] && c <= lo[r] + p) rows[r][c - lo[r]] = v;
    }

    private static int FindSpan(int n, int p, double u, double[] U)
    {
        if (u >= U[n + 1]) return n;
        int low = p, high = n + 1;
        while (high - low > 1) { int mid = (low + high) / 2; if (u < U[mid]) high = mid; else low = mid; }
        return low;
    }

    /// <summary>Non-zero basis functions N_{span-p..span, p}(u), The NURBS Book algorithm A2.2.</summary>
    private static double[] Basis(int span, double u, int p, double[] U)
    {
        var N = new double[p + 1];
        var left = new double[p + 1];
        var right = new double[p + 1];
        N[0] = 1;
        for (int j = 1; j <= p; j++)
        {
            left[j] = u - U[span + 1 - j];
            right[j] = U[span + j] - u;
            double saved = 0;
            for (int r = 0; r < j; r++)
            {
                double temp = N[r] / (right[r + 1] + left[j - r]);
                N[r] = saved + right[r + 1] * temp;
                saved = left[j - r] * temp;
            }
            N[j] = saved;
        }
        return N;
    }
}
