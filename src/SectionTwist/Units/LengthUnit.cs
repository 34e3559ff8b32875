using System.Globalization;

namespace SectionTwist.Units;

/// <summary>A unit of length with its size in metres. Profiles store coordinates in metres; the unit is kept for display.</summary>
/// <param name="Symbol">Short symbol, e.g. <c>mm</c>.</param>
/// <param name="Name">Full name, e.g. <c>millimetre</c>.</param>
/// <param name="Metres">Size of one unit in metres.</param>
public sealed record LengthUnit(string Symbol, string Name, double Metres)
{
    /// <summary>Metre.</summary>
    public static readonly LengthUnit Metre = new("m", "metre", 1.0);
    /// <summary>Millimetre.</summary>
    public static readonly LengthUnit Millimetre = new("mm", "millimetre", 1e-3);
    /// <summary>Centimetre.</summary>
    public static readonly LengthUnit Centimetre = new("cm", "centimetre", 1e-2);
    /// <summary>Micrometre.</summary>
    public static readonly LengthUnit Micrometre = new("um", "micrometre", 1e-6);
    /// <summary>International inch (25.4 mm exactly).</summary>
    public static readonly LengthUnit Inch = new("in", "inch", 0.0254);
    /// <summary>International foot (0.3048 m exactly).</summary>
    public static readonly LengthUnit Foot = new("ft", "foot", 0.3048);

    private static readonly Dictionary<string, LengthUnit> BySymbol = new(StringComparer.OrdinalIgnoreCase)
    {
        ["m"] = Metre, ["metre"] = Metre, ["meter"] = Metre, ["metres"] = Metre, ["meters"] = Metre,
        ["mm"] = Millimetre, ["millimetre"] = Millimetre, ["millimeter"] = Millimetre, ["millimetres"] = Millimetre, ["millimeters"] = Millimetre,
        ["cm"] = Centimetre, ["centimetre"] = Centimetre, ["centimeter"] = Centimetre,
        ["um"] = Micrometre, ["µm"] = Micrometre, ["micron"] = Micrometre, ["micrometre"] = Micrometre,
        ["in"] = Inch, ["inch"] = Inch, ["inches"] = Inch, ["\""] = Inch,
        ["ft"] = Foot, ["foot"] = Foot, ["feet"] = Foot, ["'"] = Foot,
    };

    /// <summary>All units the parser knows, one entry per unit.</summary>
    public static IReadOnlyList<LengthUnit> Known { get; } = [Millimetre, Centimetre, Metre, Micrometre, Inch, Foot];

    /// <summary>Finds a unit by symbol or name (case-insensitive).</summary>
    public static bool TryParse(string? text, out LengthUnit unit)
    {
        if (text is not null && BySymbol.TryGetValue(text.Trim(), out var u)) { unit = u; return true; }
        unit = Millimetre;
        return false;
    }

    /// <summary>Finds a unit by symbol or name; throws a <see cref="SectionTwistException"/> naming the known units otherwise.</summary>
    public static LengthUnit Parse(string text, string where = "--unit")
    {
        if (TryParse(text, out var u)) return u;
        throw new SectionTwistException("unknown-unit",
            $"{where}: unknown length unit '{(text.Length > 40 ? text[..40] + "..." : text)}'{Suggest.DidYouMean(text, BySymbol.Keys)}; use one of {string.Join(", ", Known.Select(k => k.Symbol))}");
    }

    /// <summary>Converts a value in this unit to metres.</summary>
    public double ToMetres(double value) => value * Metres;

    /// <summary>Converts a value in metres to this unit.</summary>
    public double FromMetres(double metres) => metres / Metres;

    /// <inheritdoc />
    public override string ToString() => Symbol;

    /// <summary>Formats a number with the invariant culture.</summary>
    internal static string Inv(double v, string format = "G6") => v.ToString(format, CultureInfo.InvariantCulture);
}
