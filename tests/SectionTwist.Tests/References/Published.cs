namespace SectionTwist.Tests.References;

/// <summary>
/// The test project's own copies of published reference values, written here from the sources named beside each one
/// and independent of the production code (which holds its own copies for <c>sectiontwist verify</c> and the
/// templates). <see cref="ReferenceValueTests"/> holds the production copies to these.
/// </summary>
internal static class Published
{
    public const string TimoshenkoGoodier = "Timoshenko and Goodier, Theory of Elasticity, 3rd ed., ch. 10";
    public const string RectangleSource = "Timoshenko and Goodier, 3rd ed., sec. 109 (series); Roark 7th ed., Table 10.1";
    public const string Roark = "Roark's Formulas for Stress and Strain, 7th ed. (Young and Budynas), Table 10.1";

    // ---- exact solutions, Timoshenko and Goodier ch. 10 (J in m^4, peak shear per unit torque in 1/m^3) ----

    /// <summary>Solid circle of diameter d: J = pi d^4 / 32, tau = 16 T / (pi d^3) (sec. 104, the circular shaft).</summary>
    public static (double J, double Tau) Circle(double d) => (Math.PI * d * d * d * d / 32, 16 / (Math.PI * d * d * d));

    /// <summary>Hollow circle D, d: J = pi (D^4 - d^4) / 32, tau = 16 T D / (pi (D^4 - d^4)) (sec. 104 and 115).</summary>
    public static (double J, double Tau) Tube(double outer, double inner)
    {
        double k = Math.Pow(outer, 4) - Math.Pow(inner, 4);
        return (Math.PI * k / 32, 16 * outer / (Math.PI * k));
    }

    /// <summary>Ellipse warping constant from the exact warping function psi = -k x y, k = (a^2 - b^2)/(a^2 + b^2): Iw = k^2 pi a^3 b^3 / 24 (sec. 105).</summary>
    public static double EllipseWarpingConstant(double a, double b)
    {
        double k = (a * a - b * b) / (a * a + b * b);
        return k * k * Math.PI * a * a * a * b * b * b / 24;
    }

    /// <summary>
    /// Cantilever in non-uniform torsion, warping restrained at the root, end torque T: phi(L) = T/(GJ) (L - a tanh(L/a)),
    /// a = sqrt(E Iw / (G J)) (Vlasov, Thin-Walled Elastic Beams, 2nd ed., ch. 5).
    /// </summary>
    public static double RestrainedCantileverTwist(double t, double l, double g, double j, double e, double iw)
    {
        double a = Math.Sqrt(e * iw / (g * j));
        return t / (g * j) * (l - a * Math.Tanh(l / a));
    }

    /// <summary>Ellipse, semi-axes a &gt;= b: J = pi a^3 b^3 / (a^2 + b^2), tau = 2 T / (pi a b^2) (sec. 105).</summary>
    public static (double J, double Tau) Ellipse(double a, double b) =>
        (Math.PI * a * a * a * b * b * b / (a * a + b * b), 2 / (Math.PI * a * b * b));

    /// <summary>Equilateral triangle of side a: J = sqrt(3) a^4 / 80, tau = 20 T / a^3 at mid-side (sec. 106).</summary>
    public static (double J, double Tau) EquilateralTriangle(double a) => (Math.Sqrt(3) * a * a * a * a / 80, 20 / (a * a * a));

    /// <summary>
    /// Rectangle of sides a &gt;= b (sec. 109): J = beta a b^3 and tau_max = T / (alpha a b^2) at the middle of the long side,
    /// beta = (1/3) [1 - (192 / pi^5) (b/a) sum over odd n of tanh(n pi a / 2b) / n^5],
    /// k = 1 - (8 / pi^2) sum over odd n of 1 / (n^2 cosh(n pi a / 2b)), alpha = beta / k.
    /// The sums run until the next term no longer changes them.
    /// </summary>
    public static (double Beta, double Alpha) Rectangle(double a, double b)
    {
        if (a < b) (a, b) = (b, a);
        double t = 0, c = 0;
        for (int n = 1; ; n += 2)
        {
            double x = n * Math.PI * a / (2 * b);
            double dt = Math.Tanh(x) / ((double)n * n * n * n * n);
            double dc = x > 700 ? 0 : 1 / ((double)n * n * Math.Cosh(x));
            if (t + dt == t && c + dc == c) break;
            t += dt; c += dc;
        }
        double beta = (1 - 192 / Math.Pow(Math.PI, 5) * (b / a) * t) / 3;
        double k = 1 - 8 / (Math.PI * Math.PI) * c;
        return (beta, beta / k);
    }

    /// <summary>J of an a x b rectangle from <see cref="Rectangle"/>.</summary>
    public static double RectangleJ(double a, double b) => Rectangle(a, b).Beta * Math.Max(a, b) * Math.Pow(Math.Min(a, b), 3);

    /// <summary>Roark 7th ed. Table 10.1 (also Hearn, Mechanics of Materials, Table 5.1): a/b, beta, alpha to 4 decimals.</summary>
    public static readonly (double Ratio, double Beta, double Alpha)[] RoarkRectangleTable =
    [
        (1, 0.1406, 0.2082), (1.5, 0.1958, 0.2310), (2, 0.2287, 0.2459), (2.5, 0.2494, 0.2576), (3, 0.2633, 0.2672),
        (4, 0.2808, 0.2817), (5, 0.2913, 0.2915), (6, 0.2983, 0.2984), (10, 0.3123, 0.3123),
    ];

    // ---- Roark 7th ed. Table 10.1 curve fits, K = 2 C r^4 (fit accuracy about 0.3-2 % against fine numerical solutions) ----

    /// <summary>Two opposite flats of depth h each on a shaft of radius r, x = h/r, 0 &lt;= x &lt;= 0.8.</summary>
    public static double TwoFlatsJ(double r, double h)
    {
        double x = h / r;
        return 2 * r * r * r * r * (0.7854 - 0.4053 * x - 3.5810 * x * x + 5.2708 * x * x * x - 2.0772 * x * x * x * x);
    }

    /// <summary>Four flats of depth h, x = h/r &lt;= 0.293.</summary>
    public static double FourFlatsJ(double r, double h)
    {
        double x = h / r;
        return 2 * r * r * r * r * (0.7854 - 0.7 * x - 7.7982 * x * x + 14.578 * x * x * x);
    }

    /// <summary>
    /// Two (n = 2) or four (n = 4) keyways of width w and depth t from the outer radius r: s = (w/2)/t, x = t/r;
    /// two: 0.2 &lt;= x &lt;= 0.5, 0.5 &lt;= s &lt;= 1.5; four: 0.2 &lt;= x &lt;= 0.4, 0.5 &lt;= s &lt;= 1.2.
    /// </summary>
    public static double KeywaysJ(int n, double r, double w, double t)
    {
        double s = w / 2 / t, x = t / r;
        (double c2, double c3, double c4) = n == 2
            ? (-0.0795 + 0.1286 * s - 0.1169 * s * s, -1.4126 - 3.8589 * s + 1.3292 * s * s, 0.7098 + 4.1936 * s - 1.1053 * s * s)
            : (-0.1496 + 0.2773 * s - 0.211 * s * s, -2.9138 - 8.2354 * s + 2.5782 * s * s, 2.2991 + 12.097 * s - 2.2838 * s * s);
        return 2 * r * r * r * r * (0.7854 + c2 * x + c3 * x * x + c4 * x * x * x);
    }

    // ---- standards ----

    /// <summary>
    /// DIN 6885-1 / ISO 773 parallel keys (copy of the standard's table): shaft diameter over..up to (mm), key width b,
    /// height h and shaft keyseat depth t1 (mm).
    /// </summary>
    public static readonly (double Over, double UpTo, double B, double H, double T1)[] Din6885 =
    [
        (6, 8, 2, 2, 1.2), (8, 10, 3, 3, 1.8), (10, 12, 4, 4, 2.5), (12, 17, 5, 5, 3.0), (17, 22, 6, 6, 3.5),
        (22, 30, 8, 7, 4.0), (30, 38, 10, 8, 5.0), (38, 44, 12, 8, 5.0), (44, 50, 14, 9, 5.5), (50, 58, 16, 10, 6.0),
        (58, 65, 18, 11, 7.0), (65, 75, 20, 12, 7.5), (75, 85, 22, 14, 9.0), (85, 95, 25, 14, 9.0), (95, 110, 28, 16, 10),
    ];

    /// <summary>
    /// Keyseat floor radius range by key width, ISO 773 / DIN 6885-1, FROM MEMORY (not checked against the standard's
    /// text): widths from..to (mm), r min, r max (mm).
    /// </summary>
    public static readonly (double BFrom, double BTo, double RMin, double RMax)[] KeyseatRadiusFromMemory =
    [
        (2, 4, 0.08, 0.16), (5, 8, 0.16, 0.25), (10, 18, 0.25, 0.40), (20, 32, 0.40, 0.60), (36, 50, 0.70, 1.00),
    ];

    /// <summary>ISO 14 straight-sided splines checked against a copy of the standard's table: series, N, d, D, B (mm).</summary>
    public static readonly (string Series, int N, double D1, double D2, double B)[] Iso14Checked =
    [
        ("light", 6, 23, 26, 6), ("light", 6, 28, 32, 7), ("light", 8, 32, 36, 6), ("light", 8, 42, 46, 8), ("light", 10, 72, 78, 12),
        ("medium", 6, 11, 14, 3), ("medium", 6, 16, 20, 4), ("medium", 8, 36, 42, 7), ("medium", 10, 82, 92, 12),
    ];
}
