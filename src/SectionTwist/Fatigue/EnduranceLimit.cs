namespace SectionTwist.Fatigue;

/// <summary>
/// The Marin equation S_e = k_a k_b k_c k_d k_e k_f S'_e with its factors, each with the source it comes from
/// (Budynas and Nisbett, Shigley's Mechanical Engineering Design, 10th ed., sec. 6-9 and 6-10; the constants are quoted from
/// memory: check them against your edition).
/// </summary>
public sealed record EnduranceLimit
{
    /// <summary>S'_e, Pa.</summary>
    public required double Unmodified { get; init; }
    /// <summary>The factors in order (k_a ... k_f).</summary>
    public required IReadOnlyList<FatigueFactor> Factors { get; init; }
    /// <summary>S_e, Pa.</summary>
    public double Value => Unmodified * Factors.Aggregate(1.0, (p, f) => p * f.Value);

    /// <summary>Computes the factors for a rotating round of diameter <paramref name="diameter"/>.</summary>
    /// <param name="settings">Surface, reliability and the given factors.</param>
    /// <param name="ultimate">S_ut, Pa.</param>
    /// <param name="diameter">d, m (outer diameter).</param>
    public static EnduranceLimit Compute(FatigueSettings settings, double ultimate, double diameter)
    {
        ArgumentNullException.ThrowIfNull(settings);
        double sutMpa = ultimate / 1e6;
        double se0 = settings.EnduranceLimit ?? (sutMpa <= 1400 ? 0.5 * ultimate : 700e6);
        string se0Source = settings.EnduranceLimit is null
            ? "S'e = 0.5 S_ut, at most 700 MPa (Shigley 10th ed., eq. 6-8, from memory)" : "given";
        var (a, b) = settings.Surface switch
        {
            SurfaceFinish.Ground => (1.58, -0.085),
            SurfaceFinish.Machined => (4.51, -0.265),
            SurfaceFinish.HotRolled => (57.7, -0.718),
            _ => (272.0, -0.995),
        };
        double ka = Math.Min(1, a * Math.Pow(sutMpa, b));
        double dmm = diameter * 1e3;
        double kb;
        string kbSource;
        if (dmm < 2.79) { kb = 1; kbSource = "d below 2.79 mm: 1"; }
        else if (dmm <= 51) { kb = Math.Pow(dmm / 7.62, -0.107); kbSource = "(d / 7.62 mm)^-0.107, 2.79 <= d <= 51 mm (Shigley 10th ed., eq. 6-20, from memory)"; }
        else
        {
            kb = 1.51 * Math.Pow(dmm, -0.157);
            kbSource = dmm <= 254 ? "1.51 d^-0.157 (d in mm), 51 < d <= 254 mm (Shigley 10th ed., eq. 6-20, from memory)"
                : "1.51 d^-0.157 extrapolated beyond d = 254 mm (outside the fit: an estimate)";
        }
        double ke = ReliabilityFactor(settings.Reliability);
        return new EnduranceLimit
        {
            Unmodified = se0,
            UnmodifiedSource = se0Source,
            Factors = new[]
            {
                new FatigueFactor("ka", "surface", ka, $"{a} S_ut^{b} (S_ut in MPa), {SurfaceName(settings.Surface)} (Shigley 10th ed., Table 6-2, from memory)"),
                new FatigueFactor("kb", "size", kb, kbSource),
                new FatigueFactor("kc", "load", 1, "bending; torsion enters through the von Mises stress (Shigley 10th ed., sec. 7-4)"),
                new FatigueFactor("kd", "temperature", settings.TemperatureFactor, settings.TemperatureFactor == 1 ? "room temperature (given: 1)" : "given"),
                new FatigueFactor("ke", "reliability", ke, $"reliability {settings.Reliability} (Shigley 10th ed., Table 6-5, from memory)"),
                new FatigueFactor("kf", "miscellaneous", settings.MiscellaneousFactor, settings.MiscellaneousFactor == 1 ? "none known (given: 1)" : "given"),
            }.AsReadOnly(),
        };
    }

    /// <summary>The finish's name in the shaft file.</summary>
    public static string SurfaceName(SurfaceFinish s) => s switch
    {
        SurfaceFinish.Ground => "ground",
        SurfaceFinish.HotRolled => "hot-rolled",
        SurfaceFinish.AsForged => "as-forged",
        _ => "machined or cold-drawn",
    };

    /// <summary>Where <see cref="Unmodified"/> comes from.</summary>
    public string UnmodifiedSource { get; init; } = "";

    /// <summary>k_e for the tabulated reliabilities (Shigley 10th ed., Table 6-5: k_e = 1 - 0.08 z_a, from memory).</summary>
    public static double ReliabilityFactor(double reliability) => reliability switch
    {
        0.5 => 1.000,
        0.9 => 0.897,
        0.95 => 0.868,
        0.99 => 0.814,
        0.999 => 0.753,
        0.9999 => 0.702,
        _ => throw new SectionTwistException("bad-fatigue", $"reliability {reliability}: use one of 0.5, 0.9, 0.95, 0.99, 0.999, 0.9999 (tabulated k_e)"),
    };
}

/// <summary>One endurance-limit or stress-concentration factor with its source.</summary>
/// <param name="Symbol">E.g. <c>ka</c>, <c>Kf</c>.</param>
/// <param name="Meaning">E.g. <c>surface</c>.</param>
/// <param name="Value">The factor.</param>
/// <param name="Source">Where it comes from ("from memory" where so, "given" for user input).</param>
public sealed record FatigueFactor(string Symbol, string Meaning, double Value, string Source);
