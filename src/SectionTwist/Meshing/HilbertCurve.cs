namespace SectionTwist.Meshing;

/// <summary>
/// Position along a Hilbert curve of order 16 over a box, for ordering points with locality (the classic
/// rotate-and-flip conversion, e.g. H. S. Warren, "Hacker's Delight", 2nd ed., section 16-2).
/// </summary>
internal static class HilbertCurve
{
    public static uint Key(double x, double y, double minX, double minY, double size)
    {
        const int n = 1 << 16;
        double s = size > 0 ? (n - 1) / size : 0;
        int xi = Math.Clamp((int)((x - minX) * s), 0, n - 1);
        int yi = Math.Clamp((int)((y - minY) * s), 0, n - 1);
        uint d = 0;
        for (int half = n / 2; half > 0; half /= 2)
        {
            int rx = (xi & half) > 0 ? 1 : 0;
            int ry = (yi & half) > 0 ? 1 : 0;
            d += (uint)half * (uint)half * (uint)((3 * rx) ^ ry);
            if (ry == 0)
            {
                if (rx == 1) { xi = n - 1 - xi; yi = n - 1 - yi; }
                (xi, yi) = (yi, xi);
            }
        }
        return d;
    }
}
