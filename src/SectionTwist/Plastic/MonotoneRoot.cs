namespace SectionTwist.Plastic;

/// <summary>
/// The sign change of a non-decreasing function of one variable on an interval (the root of the derivative of a convex
/// function: its minimiser): bracketing outward from a start value in growing steps, then the Illinois variant of
/// regula falsi, which keeps a bracket and converges superlinearly on smooth functions (Dowell and Jarratt, "A modified
/// regula falsi method for computing the root of an equation", BIT 11 (1971) 168-174; Press et al., Numerical Recipes,
/// 3rd ed., sec. 9.2). A jump of the function (a kink of the convex function) is located like a root.
/// </summary>
internal static class MonotoneRoot
{
    /// <summary>
    /// An x in [<paramref name="lo"/>, <paramref name="hi"/>] where the non-decreasing <paramref name="g"/> changes sign,
    /// to within <paramref name="tol"/>; <paramref name="lo"/> when g is positive there, <paramref name="hi"/> when g is
    /// negative there. <paramref name="start"/> (clamped to the interval) is the first value tried: a good guess saves
    /// function values.
    /// </summary>
    public static double Find(Func<double, double> g, double lo, double hi, double start, double tol)
    {
        if (!(hi > lo)) return lo;
        tol = Math.Max(tol, 4 * double.Epsilon * Math.Max(Math.Abs(lo), Math.Abs(hi)));
        double x0 = Math.Clamp(start, lo, hi), g0 = g(x0);
        if (g0 == 0) return x0;
        // bracket: a with g(a) < 0, b with g(b) > 0
        double a, ga, b, gb;
        double step = Math.Max(4 * tol, 1e-3 * (hi - lo));
        if (g0 > 0)
        {
            b = x0; gb = g0;
            while (true)
            {
                if (b <= lo) return lo;
                a = Math.Max(lo, b - step);
                ga = g(a);
                if (ga <= 0) break;
                b = a; gb = ga; step *= 4;
            }
            if (ga == 0) return a;
        }
        else
        {
            a = x0; ga = g0;
            while (true)
            {
                if (a >= hi) return hi;
                b = Math.Min(hi, a + step);
                gb = g(b);
                if (gb >= 0) break;
                a = b; ga = gb; step *= 4;
            }
            if (gb == 0) return b;
        }
        int side = 0;
        for (int it = 0; it < 200 && b - a > tol; it++)
        {
            double x = b - gb * (b - a) / (gb - ga);
            // stay strictly inside the bracket, at least a quarter of the tolerance from its ends
            x = Math.Clamp(x, a + 0.25 * tol, b - 0.25 * tol);
            double gx = g(x);
            if (gx == 0) return x;
            if (gx < 0)
            {
                a = x; ga = gx;
                if (side == -1) gb *= 0.5; // Illinois: halve the stale end's value so the bracket shrinks from both sides
                side = -1;
            }
            else
            {
                b = x; gb = gx;
                if (side == 1) ga *= 0.5;
                side = 1;
            }
        }
        return -ga <= gb ? a : b;
    }
}
