namespace SectionTwist.Tests.Profiles;

/// <summary>
/// Exact integrals for the closed-form checks of template geometry (calculus, common practice):
/// circle strips, circular segments, fillet spandrels.
/// </summary>
internal static class ClosedForms
{
    /// <summary>Integral of sqrt(R^2 - u^2) du from 0 to u.</summary>
    public static double F1(double r, double u) => 0.5 * (u * Math.Sqrt(r * r - u * u) + r * r * Math.Asin(u / r));

    /// <summary>Integral of u^2 sqrt(R^2 - u^2) du from 0 to u.</summary>
    public static double G2(double r, double u) => u * (2 * u * u - r * r) * Math.Sqrt(r * r - u * u) / 8 + Math.Pow(r, 4) / 8 * Math.Asin(u / r);

    /// <summary>Integral of (R^2 - u^2)^(3/2) du from 0 to u.</summary>
    public static double G3(double r, double u) => u * (5 * r * r - 2 * u * u) * Math.Sqrt(r * r - u * u) / 8 + 3 * Math.Pow(r, 4) / 8 * Math.Asin(u / r);

    /// <summary>
    /// Circular segment of a circle of radius R beyond the chord at distance c from the centre (toward +y):
    /// area, integral of y, integral of y^2 and integral of x^2 (about the circle centre).
    /// </summary>
    public static (double A, double Sy, double Iy2, double Ix2) Segment(double r, double c) =>
        (2 * (F1(r, r) - F1(r, c)), 2.0 / 3 * Math.Pow(r * r - c * c, 1.5), 2 * (G2(r, r) - G2(r, c)), 2.0 / 3 * (G3(r, r) - G3(r, c)));

    /// <summary>
    /// Keyseat cut {|x| &lt; b/2, yF &lt; y &lt; sqrt(R^2 - x^2)}: area, integral of y, of y^2, of x^2 (about the circle centre).
    /// </summary>
    public static (double A, double Sy, double Iy2, double Ix2) Keyseat(double r, double b, double yF)
    {
        double u = b / 2;
        return (2 * F1(r, u) - b * yF, (r * r - yF * yF) * u - u * u * u / 3,
            2.0 / 3 * (G3(r, u) - yF * yF * yF * u), 2 * (G2(r, u) - yF * u * u * u / 3));
    }

    /// <summary>
    /// Material a fillet of radius r adds between a straight flank y = c and a convex core circle of radius R (the root of a
    /// straight-sided spline tooth): corner K = (sqrt(R^2 - c^2), c); fillet centre C at distance r from the line and
    /// R + r from the core centre; tangent points T1 = (C.x, c) and T2 = C R / (R + r). The area is the quadrilateral
    /// K T1 C T2 minus the fillet sector at C and minus the circular segment of the core cut off by the chord K T2
    /// (plane geometry, common practice).
    /// </summary>
    public static double LineCircleFilletArea(double coreRadius, double c, double r)
    {
        double kx = Math.Sqrt(coreRadius * coreRadius - c * c);
        double cy = c + r, cx = Math.Sqrt((coreRadius + r) * (coreRadius + r) - cy * cy);
        double t2x = cx * coreRadius / (coreRadius + r), t2y = cy * coreRadius / (coreRadius + r);
        (double X, double Y)[] quad = [(kx, c), (cx, c), (cx, cy), (t2x, t2y)];
        double shoelace = 0;
        for (int i = 0; i < 4; i++) shoelace += quad[i].X * quad[(i + 1) % 4].Y - quad[(i + 1) % 4].X * quad[i].Y;
        double sector = 0.5 * r * r * Math.Acos(((0) * (t2x - cx) + (-r) * (t2y - cy)) / (r * r));
        double phi = Math.Atan2(t2y, t2x) - Math.Atan2(c, kx);
        double segment = 0.5 * coreRadius * coreRadius * (phi - Math.Sin(phi));
        return Math.Abs(shoelace) / 2 - sector - segment;
    }

    /// <summary>Area of a fillet spandrel (square r x r minus a quarter disc).</summary>
    public static double SpandrelArea(double r) => (1 - Math.PI / 4) * r * r;

    /// <summary>
    /// First and second moments along one coordinate of a spandrel occupying [c, c + r] in that coordinate, whose
    /// quarter disc is centred at coordinate c and opens toward +. Use <c>Spandrel(-c2, r)</c>
    /// for a spandrel on [c2 - r, c2] opening toward - (first moment then changes sign).
    /// </summary>
    public static (double S1, double S2) Spandrel(double c, double r)
    {
        double q = Math.PI * r * r / 4;
        double s1 = r * ((c + r) * (c + r) - c * c) / 2 - (q * c + r * r * r / 3);
        double s2 = r * (Math.Pow(c + r, 3) - c * c * c) / 3 - (q * c * c + 2 * c * r * r * r / 3 + Math.PI * Math.Pow(r, 4) / 16);
        return (s1, s2);
    }

    /// <summary>Centroidal Ixx of a W x H rectangle with all four corners rounded to r.</summary>
    public static double RoundedRectIxx(double w, double h, double r) => w * h * h * h / 12 - 4 * Spandrel(h / 2 - r, r).S2;

    /// <summary>Area of a W x H rectangle with all four corners rounded to r.</summary>
    public static double RoundedRectArea(double w, double h, double r) => w * h - 4 * SpandrelArea(r);
}
