using System.Globalization;

namespace SectionTwist.Rendering.Drawing;

/// <summary>
/// Axis ticks at "nice" numbers (1, 2, 5 times a power of ten), after P. S. Heckbert, "Nice numbers for graph labels",
/// Graphics Gems (Academic Press, 1990), pp. 61-63.
/// </summary>
internal static class NiceScale
{
    /// <summary>The nice number near <paramref name="x"/> (rounded, or the next one up when <paramref name="round"/> is false).</summary>
    public static double NiceNumber(double x, bool round)
    {
        if (!(x > 0) || !double.IsFinite(x)) return 1;
        double exp = Math.Floor(Math.Log10(x));
        double f = x / Math.Pow(10, exp);
        double nf = round
            ? (f < 1.5 ? 1 : f < 3 ? 2 : f < 7 ? 5 : 10)
            : (f <= 1 ? 1 : f <= 2 ? 2 : f <= 5 ? 5 : 10);
        return nf * Math.Pow(10, exp);
    }

    /// <summary>Tick step and the ticks covering [lo, hi] with about <paramref name="count"/> ticks.</summary>
    public static (double Step, double[] Ticks) Ticks(double lo, double hi, int count = 6)
    {
        if (hi < lo) (lo, hi) = (hi, lo);
        // non-finite or overflowing ranges would step forever: fall back to a unit range
        if (!double.IsFinite(lo) || !double.IsFinite(hi) || !double.IsFinite(hi - lo)) { lo = -1; hi = 1; }
        if (hi - lo < 1e-300 * Math.Max(1, Math.Abs(lo))) { hi = lo + 1; lo -= 1; }
        double step = NiceNumber((hi - lo) / Math.Max(1, count - 1), true);
        double first = Math.Ceiling(lo / step - 1e-9) * step;
        var ticks = new List<double>();
        for (double t = first; t <= hi + 1e-9 * step && ticks.Count < 1000; t = first + ticks.Count * step)
            ticks.Add(Math.Abs(t) < 1e-12 * step ? 0 : t);
        return (step, ticks.ToArray());
    }

    /// <summary>A nice range [lo', hi'] containing [lo, hi], extended to whole tick steps.</summary>
    public static (double Lo, double Hi, double Step) Range(double lo, double hi, int count = 6)
    {
        if (hi < lo) (lo, hi) = (hi, lo);
        if (!double.IsFinite(lo) || !double.IsFinite(hi) || !double.IsFinite(hi - lo)) { lo = -1; hi = 1; }
        if (hi - lo < 1e-300 + 1e-12 * Math.Max(Math.Abs(lo), Math.Abs(hi)))
        {
            double pad = Math.Abs(lo) > 0 ? 0.1 * Math.Abs(lo) : 1;
            lo -= pad; hi += pad;
        }
        double range = NiceNumber(hi - lo, false);
        double step = NiceNumber(range / Math.Max(1, count - 1), true);
        return (Math.Floor(lo / step + 1e-9) * step, Math.Ceiling(hi / step - 1e-9) * step, step);
    }

    /// <summary>Formats a tick value with just enough decimals for the step.</summary>
    public static string Format(double v, double step)
    {
        int decimals = step >= 1 ? 0 : Math.Min(8, (int)Math.Ceiling(-Math.Log10(step) - 1e-9));
        if (Math.Abs(v) < 0.5 * Math.Pow(10, -decimals)) v = 0;
        return v.ToString("F" + decimals.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);
    }

    /// <summary>A value to <paramref name="digits"/> significant digits in the house style (<see cref="Units.NumberText.Format"/>).</summary>
    public static string Sig(double v, int digits = 3) => Units.NumberText.Format(v, digits);
}
