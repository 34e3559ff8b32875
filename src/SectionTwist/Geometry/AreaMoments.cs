namespace SectionTwist.Geometry;

/// <summary>
/// Running boundary integrals (Green's theorem) for area and moments about a chosen origin:
/// A = int x dy, Sx = int y dA = -1/2 int y^2 dx, Sy = int x dA = 1/2 int x^2 dy,
/// Ixx = int y^2 dA = -1/3 int y^3 dx, Iyy = int x^2 dA = 1/3 int x^3 dy, Ixy = int x y dA = 1/2 int x^2 y dy.
/// </summary>
internal struct AreaMoments
{
    public double A, Sx, Sy, Ixx, Iyy, Ixy;

    /// <summary>Adds the integrand at (x, y) with weighted differentials dx, dy.</summary>
    public void Add(double x, double y, double dx, double dy)
    {
        A += 0.5 * (x * dy - y * dx);
        Sy += 0.5 * x * x * dy;
        Sx -= 0.5 * y * y * dx;
        Iyy += x * x * x * dy / 3.0;
        Ixx -= y * y * y * dx / 3.0;
        Ixy += 0.5 * x * x * y * dy;
    }

    public void AddScaled(in AreaMoments o, double s)
    {
        A += s * o.A; Sx += s * o.Sx; Sy += s * o.Sy; Ixx += s * o.Ixx; Iyy += s * o.Iyy; Ixy += s * o.Ixy;
    }
}
