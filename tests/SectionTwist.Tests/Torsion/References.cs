namespace SectionTwist.Tests.Torsion;

/// <summary>Exact and series reference values (sources named per member).</summary>
internal static class References
{
    /// <summary>
    /// Rectangle a x b (a &gt;= b), series solution: J = beta a b^3 and tau_max = T / (alpha a b^2)
    /// (Timoshenko and Goodier, Theory of Elasticity, 3rd ed., sec. 109; table in Roark, 7th ed., Table 10.1).
    /// </summary>
    public static (double Beta, double Alpha) RectangleSeries(double a, double b)
    {
        if (a < b) (a, b) = (b, a);
        double sumT = 0, sumK = 0;
        for (int n = 1; n < 400; n += 2)
        {
            sumT += Math.Tanh(n * Math.PI * a / (2 * b)) / Math.Pow(n, 5);
            double arg = n * Math.PI * a / (2 * b);
            if (arg < 700) sumK += 1 / (n * n * Math.Cosh(arg));
        }
        double beta = (1.0 / 3) * (1 - 192 / Math.Pow(Math.PI, 5) * (b / a) * sumT);
        double k = 1 - 8 / (Math.PI * Math.PI) * sumK;
        return (beta, beta / k);
    }
}
