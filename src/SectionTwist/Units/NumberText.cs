using System.Globalization;

namespace SectionTwist.Units;

/// <summary>
/// The house number style for human-readable output (text tables, reports, pictures, bench): plain decimals from 0.001 to
/// under a million, otherwise one exponent style with at least two exponent digits (<c>1.2E+04</c>, <c>2.8E-10</c>, never
/// <c>E+006</c>); no <c>-0</c>; values that are zero to the accuracy of the computation print as <c>0</c>
/// (<see cref="Clean"/>). JSON and CSV keep full round-trip precision and do not use this class.
/// </summary>
public static class NumberText
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    /// <summary>Plain notation is used for magnitudes from this value ...</summary>
    private const double PlainLow = 1e-3;
    /// <summary>... up to (not including) this one.</summary>
    private const double PlainHigh = 1e6;

    /// <summary>
    /// <paramref name="value"/> to <paramref name="digits"/> significant digits: plain for 0.001 &lt;= |v| &lt; 1e6 (trailing
    /// zeros after the point dropped), else <c>d.dddE+XX</c>. Zero is <c>0</c>, infinities <c>∞</c> and <c>-∞</c>, NaN <c>n/a</c>.
    /// </summary>
    public static string Format(double value, int digits = 5)
    {
        digits = Math.Clamp(digits, 1, 15);
        if (double.IsNaN(value)) return "n/a";
        if (double.IsInfinity(value)) return value > 0 ? "∞" : "-∞";
        if (value == 0) return "0";
        // round first: 999999.7 to 5 digits is 1E+06, which is no longer plain
        double rounded = RoundSignificant(value, digits);
        double ar = Math.Abs(rounded);
        if (ar >= PlainLow && ar < PlainHigh)
        {
            int mag = (int)Math.Floor(Math.Log10(ar));
            int decimals = Math.Max(0, digits - 1 - mag);
            string s = rounded.ToString("F" + decimals.ToString(Inv), Inv);
            if (s.Contains('.', StringComparison.Ordinal)) s = s.TrimEnd('0').TrimEnd('.');
            return s == "-0" ? "0" : s;
        }
        return Exponent(value, digits);
    }

    /// <summary>
    /// Always the exponent form, <paramref name="digits"/> significant digits: <c>2.8E-10</c>, <c>1.2E+04</c>, <c>9.0E-04</c>,
    /// <c>1E-06</c> for one digit. For error estimates and tolerances.
    /// </summary>
    public static string Exponent(double value, int digits = 2)
    {
        digits = Math.Clamp(digits, 1, 15);
        if (double.IsNaN(value)) return "n/a";
        if (double.IsInfinity(value)) return value > 0 ? "∞" : "-∞";
        if (value == 0) return "0";
        string s = value.ToString("E" + (digits - 1).ToString(Inv), Inv); // e.g. 2.80E-010
        int e = s.IndexOf('E', StringComparison.Ordinal);
        string mantissa = s[..e];
        int exp = int.Parse(s[(e + 1)..], NumberStyles.AllowLeadingSign, Inv);
        return $"{mantissa}E{(exp < 0 ? '-' : '+')}{Math.Abs(exp).ToString("00", Inv)}";
    }

    /// <summary><paramref name="decimals"/> fixed decimals (<c>F4</c>), with <c>-0.0000</c> written as <c>0.0000</c>.</summary>
    public static string Fixed(double value, int decimals)
    {
        if (!double.IsFinite(value)) return Format(value);
        string s = value.ToString("F" + Math.Clamp(decimals, 0, 15).ToString(Inv), Inv);
        return s.StartsWith('-') && s.AsSpan(1).IndexOfAnyExcept('0', '.') < 0 ? s[1..] : s;
    }

    /// <summary>
    /// A .NET-style format applied in the house style: <c>Gn</c> = <see cref="Format"/> with n digits (<c>G</c> alone: 5),
    /// <c>Fn</c> = <see cref="Fixed"/>, <c>En</c> = <see cref="Exponent"/> with n + 1 digits; anything else is passed to
    /// <see cref="double.ToString(string, IFormatProvider)"/>.
    /// </summary>
    public static string Styled(double value, string format)
    {
        ArgumentNullException.ThrowIfNull(format);
        if (format.Length == 0) return Format(value);
        char kind = char.ToUpperInvariant(format[0]);
        bool hasN = int.TryParse(format.AsSpan(1), NumberStyles.None, Inv, out int n);
        if (format.Length > 1 && !hasN) return value.ToString(format, Inv);
        return kind switch
        {
            'G' => Format(value, hasN && n > 0 ? n : 5),
            'F' => Fixed(value, hasN ? n : 2),
            'E' => Exponent(value, (hasN ? n : 6) + 1),
            _ => value.ToString(format, Inv),
        };
    }

    /// <summary>
    /// Zero when |<paramref name="value"/>| is at most <paramref name="relative"/> times <paramref name="scale"/> (the size
    /// the value is computed from, e.g. the largest applied torque for a reaction, the part size for a centroid): the
    /// round-off of a quantity that is zero in exact arithmetic. Otherwise the value unchanged.
    /// </summary>
    public static double Clean(double value, double scale, double relative = 1e-12) =>
        Math.Abs(value) <= relative * Math.Abs(scale) ? 0 : value;

    private static double RoundSignificant(double v, int digits)
    {
        int mag = (int)Math.Floor(Math.Log10(Math.Abs(v)));
        int decimals = digits - 1 - mag;
        if (decimals is >= 0 and <= 15) return Math.Round(v, decimals, MidpointRounding.AwayFromZero);
        double p = Math.Pow(10, decimals);
        return double.IsFinite(p) && p > 0 ? Math.Round(v * p, MidpointRounding.AwayFromZero) / p : v;
    }
}
