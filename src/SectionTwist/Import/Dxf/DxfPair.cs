using System.Globalization;

namespace SectionTwist.Import.Dxf;

/// <summary>
/// One group-code/value pair of a DXF file. <see cref="Line"/> is the 1-based line of the group code in an ASCII file
/// (the byte offset in a binary file) for messages. Binary files carry numbers directly in <see cref="Number"/>.
/// </summary>
internal readonly record struct DxfPair(int Code, string Value, int Line, double Number = double.NaN, bool HasNumber = false)
{
    /// <summary>The value as a double; throws a located error when it is not a number.</summary>
    public double AsDouble(string file)
    {
        double v = HasNumber ? Number : double.NaN;
        if (HasNumber || double.TryParse(Value, NumberStyles.Float, CultureInfo.InvariantCulture, out v))
        {
            if (double.IsFinite(v) && Math.Abs(v) <= 1e20) return Math.Abs(v) < 1e-200 ? 0 : v; // denormal junk reads as zero
            throw new SectionTwistException("bad-dxf-number",
                $"{file}:{Line}: group code {Code} holds {Trunc(Value)}, outside the range of drawing coordinates (|x| <= 1e20); the file is damaged");
        }
        if (DecimalComma(Value))
            throw new SectionTwistException("bad-dxf-number",
                $"{file}:{Line}: group code {Code} holds '{Trunc(Value)}', a number with a decimal comma; DXF needs a decimal point: " +
                "export the drawing again with '.' as the decimal separator (the number format of the DXF export, or a system region that writes 1.5)");
        throw new SectionTwistException("bad-dxf-number",
            $"{file}:{Line}: group code {Code} needs a number but holds '{Trunc(Value)}'; the file is damaged or not DXF");
    }

    /// <summary>True for text like "12,5" or "-0,75": digits, one comma, digits.</summary>
    private static bool DecimalComma(string v)
    {
        v = v.Trim();
        int c = v.IndexOf(',', StringComparison.Ordinal);
        if (c <= 0 || c != v.LastIndexOf(',') || c == v.Length - 1) return false;
        string head = v[..c].TrimStart('-', '+');
        return head.Length > 0 && head.All(char.IsAsciiDigit) && v[(c + 1)..].All(char.IsAsciiDigit);
    }

    /// <summary>The value as an integer (a real number is truncated toward zero); throws a located error otherwise.</summary>
    public int AsInt(string file)
    {
        if (HasNumber) return Clamp(Number);
        if (int.TryParse(Value, NumberStyles.Integer, CultureInfo.InvariantCulture, out int i)) return i;
        if (long.TryParse(Value, NumberStyles.Integer, CultureInfo.InvariantCulture, out long l)) return l > 0 ? int.MaxValue : int.MinValue;
        if (double.TryParse(Value, NumberStyles.Float, CultureInfo.InvariantCulture, out double d) && !double.IsNaN(d)) return Clamp(d);
        throw new SectionTwistException("bad-dxf-number",
            $"{file}:{Line}: group code {Code} needs a whole number but holds '{Trunc(Value)}'; the file is damaged or not DXF");
    }

    private static int Clamp(double d) => d >= int.MaxValue ? int.MaxValue : d <= int.MinValue ? int.MinValue : (int)d;

    internal static string Trunc(string s) => s.Length <= 40 ? s : s[..40] + "...";

    /// <summary>True for group codes whose value is text (names, handles, comments).</summary>
    public static bool IsStringCode(int code) =>
        code is >= 0 and <= 9 or 100 or 101 or 102 or 105 or >= 300 and <= 309 or >= 320 and <= 369 or >= 390 and <= 399
            or >= 410 and <= 419 or >= 430 and <= 439 or >= 470 and <= 481 or 999 or >= 1000 and <= 1009;
}
