namespace SectionTwist.Plastic;

/// <summary>
/// Golden-section search for the minimum of a convex (unimodal) function on an interval (Kiefer 1953; see Press et
/// al., Numerical Recipes, 3rd ed., sec. 10.2).
/// </summary>
internal static class GoldenSection
{
    /// <summary>The minimiser of <paramref name="f"/> on [a, b] to an interval width of <paramref name="tol"/>.</summary>
    public static double Minimize(Func<double, double> f, double a, double b, double tol)
    {
        const double g = 0.6180339887498949;
        if (!(b > a)) return a;
        double x1 = b - g * (b - a), x2 = a + g * (b - a);
        double f1 = f(x1), f2 = f(x2);
        for (int it = 0; it < 200 && b - a > tol; it++)
        {
            if (f1 <= f2) { b = x2; x2 = x1; f2 = f1; x1 = b - g * (b - a); f1 = f(x1); }
            else { a = x1; x1 = x2; f1 = f2; x2 = a + g * (b - a); f2 = f(x2); }
        }
        return 0.5 * (a + b); // a minimum on an end of the interval is approached to within tol as well
    }
}
