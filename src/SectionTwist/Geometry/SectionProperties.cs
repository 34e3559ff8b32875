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

    /// <summary>Angle from the x axis to the principal axis about which the second moment is <see cref="I1"/>, radians, in (-pi/2, pi/2].</summary>
    public double PrincipalAngle => 0.5 * Math.Atan2(-2 * Ixy, Ixx - Iyy);

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
        return new SectionProperties(a, new Point2(o.X + xc, o.Y + yc), ixx, iyy, ixy);
    }
}
