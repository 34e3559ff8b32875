namespace SectionTwist.Bending;

/// <summary>
/// Components of a direction in the transverse plane. A direction along an axis (0, 90, 180 or 270 deg) gets exact
/// components: cos(-90 deg) in floating point is 6E-17, which would put a force of round-off size into the other plane
/// and print bearing forces such as -2E-14 N where the answer is zero.
/// </summary>
internal static class PlaneDirection
{
    /// <summary>Below this size a cosine or sine is the round-off of an axis direction, taken as zero.</summary>
    private const double AxisTolerance = 1e-14;

    /// <summary>The cosine and sine of <paramref name="angle"/> (rad from +Y toward +Z), exact along the axes.</summary>
    public static (double Cos, double Sin) Of(double angle)
    {
        var (s, c) = Math.SinCos(angle);
        if (Math.Abs(c) < AxisTolerance) return (0, Math.Sign(s));
        if (Math.Abs(s) < AxisTolerance) return (Math.Sign(c), 0);
        return (c, s);
    }
}
