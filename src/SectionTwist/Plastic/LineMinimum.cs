namespace SectionTwist.Plastic;

/// <summary>
/// The minimum of a convex (unimodal) function of one variable on an interval, by Brent's method: parabolic
/// interpolation through the three best points, with a golden-section step whenever the parabola is not trusted
/// (R. P. Brent, Algorithms for Minimization without Derivatives, 1973, ch. 5; Press et al., Numerical Recipes, 3rd ed.,
/// sec. 10.3). On the smooth energies of the plastic solves it needs about a third of the function values of a plain
/// golden-section search to the same interval width, and never more than that search plus one step in four.
/// </summary>
internal static class LineMinimum
{
    private const double Golden = 0.3819660112501051; // (3 - sqrt 5) / 2

    /// <summary>
    /// A minimiser of <paramref name="f"/> on [a, b], located to within <paramref name="tol"/> (the final bracket is at
    /// most that wide; a minimum on an end of the interval is approached to within it as well).
    /// </summary>
    public static double Minimize(Func<double, double> f, double a, double b, double tol)
    {
        if (!(b > a)) return a;
        double tol1 = 0.25 * Math.Max(tol, 4 * double.Epsilon), tol2 = 2 * tol1;
        double x = a + Golden * (b - a), w = x, v = x;
        double fx = f(x), fw = fx, fv = fx;
        double d = 0, e = 0;
        for (int it = 0; it < 300; it++)
        {
            double xm = 0.5 * (a + b);
            if (Math.Abs(x - xm) <= tol2 - 0.5 * (b - a)) break;
            bool golden = true;
            if (Math.Abs(e) > tol1)
            {
                // parabola through (v, fv), (w, fw), (x, fx)
                double r = (x - w) * (fx - fv), q = (x - v) * (fx - fw), p = (x - v) * q - (x - w) * r;
                q = 2 * (q - r);
                if (q > 0) p = -p; else q = -q;
                double eOld = e;
                e = d;
                if (Math.Abs(p) < Math.Abs(0.5 * q * eOld) && p > q * (a - x) && p < q * (b - x))
                {
                    d = p / q;
                    double u0 = x + d;
                    if (u0 - a < tol2 || b - u0 < tol2) d = xm >= x ? tol1 : -tol1;
                    golden = false;
                }
            }
            if (golden)
            {
                e = x >= xm ? a - x : b - x;
                d = Golden * e;
            }
            double u = Math.Abs(d) >= tol1 ? x + d : x + (d >= 0 ? tol1 : -tol1);
            double fu = f(u);
            if (fu <= fx)
            {
                if (u >= x) a = x; else b = x;
                v = w; fv = fw; w = x; fw = fx; x = u; fx = fu;
            }
            else
            {
                if (u < x) a = u; else b = u;
                if (fu <= fw || w == x) { v = w; fv = fw; w = u; fw = fu; }
                else if (fu <= fv || v == x || v == w) { v = u; fv = fu; }
            }
        }
        return x;
    }
}
