namespace SectionTwist.Rendering.Section;

/// <summary>
/// Iso-bands and iso-lines of a field that is linear on each triangle (the linear sub-triangles of the 6-node mesh).
/// A band lo &lt;= v &lt;= hi of a linear function on a triangle is a convex polygon with at most five corners; it is
/// found by clipping the triangle against the two half-planes v &gt;= lo and v &lt;= hi (Sutherland and Hodgman,
/// "Reentrant polygon clipping", Comm. ACM 17(1), 1974), interpolating linearly along the cut edges.
/// </summary>
internal static class ContourGeometry
{
    /// <summary>
    /// Clips the triangle (x, y, v) to lo &lt;= v &lt;= hi. Writes up to 5 corners (x, y) to <paramref name="outX"/>,
    /// <paramref name="outY"/> and returns their count (0 when the band misses the triangle).
    /// </summary>
    public static int ClipBand(ReadOnlySpan<double> x, ReadOnlySpan<double> y, ReadOnlySpan<double> v, double lo, double hi,
        Span<double> outX, Span<double> outY)
    {
        Span<double> ax = stackalloc double[6], ay = stackalloc double[6], av = stackalloc double[6];
        Span<double> bx = stackalloc double[6], by = stackalloc double[6], bv = stackalloc double[6];
        x.CopyTo(ax); y.CopyTo(ay); v.CopyTo(av);
        int n = ClipHalf(ax, ay, av, x.Length, lo, keepAbove: true, bx, by, bv);
        n = ClipHalf(bx, by, bv, n, hi, keepAbove: false, ax, ay, av);
        for (int i = 0; i < n; i++) { outX[i] = ax[i]; outY[i] = ay[i]; }
        return n;
    }

    private static int ClipHalf(Span<double> x, Span<double> y, Span<double> v, int n, double level, bool keepAbove,
        Span<double> ox, Span<double> oy, Span<double> ov)
    {
        int m = 0;
        for (int i = 0; i < n; i++)
        {
            int j = (i + 1) % n;
            bool inI = keepAbove ? v[i] >= level : v[i] <= level;
            bool inJ = keepAbove ? v[j] >= level : v[j] <= level;
            if (inI) { ox[m] = x[i]; oy[m] = y[i]; ov[m] = v[i]; m++; }
            if (inI != inJ)
            {
                double t = (level - v[i]) / (v[j] - v[i]);
                ox[m] = x[i] + t * (x[j] - x[i]); oy[m] = y[i] + t * (y[j] - y[i]); ov[m] = level; m++;
            }
        }
        return m;
    }

    /// <summary>
    /// The segment where the linear function on triangle (x, y, v) equals <paramref name="level"/>; false when the level
    /// does not cross the triangle's interior.
    /// </summary>
    public static bool IsoSegment(ReadOnlySpan<double> x, ReadOnlySpan<double> y, ReadOnlySpan<double> v, double level,
        out double x0, out double y0, out double x1, out double y1)
    {
        x0 = y0 = x1 = y1 = 0;
        int found = 0;
        for (int i = 0; i < 3 && found < 2; i++)
        {
            int j = (i + 1) % 3;
            double a = v[i] - level, b = v[j] - level;
            // half-open rule: a vertex exactly on the level counts for one of its two edges only
            if ((a < 0 && b >= 0) || (a >= 0 && b < 0))
            {
                double t = a / (a - b);
                double px = x[i] + t * (x[j] - x[i]), py = y[i] + t * (y[j] - y[i]);
                if (found == 0) { x0 = px; y0 = py; } else { x1 = px; y1 = py; }
                found++;
            }
        }
        return found == 2;
    }
}
