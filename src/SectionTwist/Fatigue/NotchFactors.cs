namespace SectionTwist.Fatigue;

/// <summary>
/// Stress-concentration estimates and notch sensitivity: first-iteration K_t, K_ts of common shaft features (Shigley 10th ed.,
/// Table 7-1) and the Neuber notch sensitivity q = 1 / (1 + sqrt(a) / sqrt(r)) with sqrt(a) from S_ut (Shigley 10th ed.,
/// eq. 6-34 and 6-35, Kuhn-Hardrath fit); all from memory: check them against your edition. Fatigue factors K_f = 1 + q (K_t - 1).
/// </summary>
public static class NotchFactors
{
    /// <summary>First-iteration (K_t, K_ts, r/d) of a feature, or null for <see cref="NotchFeature.None"/>.</summary>
    public static (double Kt, double Kts, double RadiusRatio)? Estimate(NotchFeature feature) => feature switch
    {
        NotchFeature.ShoulderSharp => (2.7, 2.2, 0.02),
        NotchFeature.ShoulderRounded => (1.7, 1.5, 0.1),
        NotchFeature.KeyseatEndMill => (2.14, 3.0, 0.02),
        NotchFeature.RetainingRingGroove => (5.0, 3.0, double.NaN),
        _ => null,
    };

    /// <summary>The feature's name in the shaft file, e.g. <c>shoulder-rounded</c>.</summary>
    public static string Name(NotchFeature feature) => feature switch
    {
        NotchFeature.ShoulderSharp => "shoulder-sharp",
        NotchFeature.ShoulderRounded => "shoulder-rounded",
        NotchFeature.KeyseatEndMill => "keyseat-end-mill",
        NotchFeature.RetainingRingGroove => "ring-groove",
        _ => "none",
    };

    /// <summary>
    /// Neuber notch sensitivity for steel, q = 1 / (1 + sqrt(a / r)); null outside the fit's range 340..1700 MPa of S_ut (then
    /// use q = 1, which is conservative).
    /// </summary>
    /// <param name="ultimate">S_ut, Pa.</param>
    /// <param name="radius">Notch radius, m.</param>
    /// <param name="torsion">True for the torsion fit.</param>
    public static double? Sensitivity(double ultimate, double radius, bool torsion)
    {
        double s = ultimate / 6.894757e6;   // kpsi
        if (!(s >= 50 && s <= 250) || !(radius > 0)) return null;
        double sqrtA = torsion
            ? 0.190 - 2.51e-3 * s + 1.35e-5 * s * s - 2.67e-8 * s * s * s
            : 0.246 - 3.08e-3 * s + 1.51e-5 * s * s - 2.67e-8 * s * s * s;   // sqrt(in)
        double rIn = radius / 0.0254;
        return 1 / (1 + sqrtA / Math.Sqrt(rIn));
    }
}
