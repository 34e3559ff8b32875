namespace SectionTwist.Geometry;

/// <summary>
/// Area properties of a profile, SI units (m^2, m, m^4). Second moments are about centroidal axes parallel to x and y.
/// </summary>
/// <param name="Area">Net area, m^2.</param>
/// <param name="Centroid">Centroid, m.</param>
/// <param name="Ixx">Second moment about the centroidal x axis, integral of y^2 dA, m^4.</param>
/// <param name="Iyy">Second moment about the centroidal y axis, integral of x^2 dA, m^4.</param>
/// <param name="Ixy">Product of inertia about the centroid, integral of x y dA, m^4.</param>
public sealed record SectionProperties(double Area, Point2 Centroid, double Ixx, double Iyy, double Ixy)
{
    /// <summary>Polar moment about the centroid, Ixx + Iyy, m^4 (equals J only for round sections).</summary>
    public double PolarMoment => Ixx + Iyy;

    /// <summary>Larger principal second moment, m^4.</summary>
    public double I1 => 0.5 * (Ixx + Iyy) + Math.Sqrt(0.25 * (Ixx - Iyy) * (Ixx - Iyy) + Ixy * Ixy);

    /// <summary>Smaller principal second moment, m^4.</summary>
    public double I2 => 0.5 * (Ixx + Iyy) - Math.Sqrt(0.25 * (Ixx - Iyy) * (Ixx - Iyy) + Ixy * Ixy);

    /// <summary>
    /// Angle from the x axis to the principal axis about which the second moment is <see cref="I1"/>, radians, in
    /// (-pi/2, pi/2]; 0 when <see cref="HasPrincipalAxes"/> is false (every centroidal axis is then principal).
    /// </summary>
    public double PrincipalAngle => HasPrincipalAxes ? 0.5 * Math.Atan2(0.0 - 2 * Ixy, Ixx - Iyy) : 0; // 0.0 - x: no -0, so pi/2 not -pi/2

    /// <summary>
    /// False when I1 = I2 to the accuracy of the computation (a circle, a square, a regular polygon, ...): then no axis is
    /// singled out and a principal angle would be round-off.
    /// </summary>
    public bool HasPrincipalAxes => I1 - I2 > PrincipalTolerance * (Math.Abs(Ixx) + Math.Abs(Iyy));

    /// <summary>Relative difference of I1 and I2 below which they count as equal (round-off of the boundary integrals).</summary>
    internal const double PrincipalTolerance = 1e-10;

    /// <summary>Relative size below which a centroid coordinate (of the part size) or Ixy (of Ixx + Iyy) is round-off and set to 0.</summary>
    internal const double RoundOff = 1e-12;

    internal static SectionProperties Compute(Profile profile)
    {
        var o = profile.Bounds.Center;
        var m = new AreaMoments();
        foreach (var loop in profile.Loops)
        {
            var lm = loop.Moments(o);
            m.AddScaled(lm, 1);
        }
        double a = m.A;
        if (!(a > 0)) throw new SectionTwistException("zero-area", $"{profile.Name}: the profile has no area");
        double xc = m.Sy / a, yc = m.Sx / a;
        double ixx = m.Ixx - a * yc * yc, iyy = m.Iyy - a * xc * xc, ixy = m.Ixy - a * xc * yc;
        // zero in exact arithmetic (a symmetric section) is printed as zero, not as 1e-16 of the part size
        double size = Math.Max(profile.Bounds.Width, profile.Bounds.Height);
        var centroid = new Point2(Units.NumberText.Clean(o.X + xc, size, RoundOff), Units.NumberText.Clean(o.Y + yc, size, RoundOff));
        return new SectionProperties(a, centroid, ixx, iyy, Units.NumberText.Clean(ixy, Math.Abs(ixx) + Math.Abs(iyy), RoundOff));
    }
}
