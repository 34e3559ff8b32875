using SectionTwist.Units;

namespace SectionTwist.Import.Dxf;

/// <summary>
/// The <c>$INSUNITS</c> codes of the DXF reference (0 unitless, 1 inch ... 24 US survey mile). Sizes: inch, foot,
/// yard and mile are the international 1959 values (0.0254 m exactly); US survey units use 1 ft = 1200/3937 m
/// (NIST Handbook 44, appendix C); astronomical unit 149 597 870 700 m (IAU 2012 resolution B2); light year = Julian
/// year times c; parsec = 648000/pi au (IAU 2015 resolution B2).
/// </summary>
internal static class DxfUnits
{
    private const double UsFoot = 1200.0 / 3937.0;
    private const double Au = 149_597_870_700.0;

    private static readonly LengthUnit?[] Table =
    [
        null,
        LengthUnit.Inch,
        LengthUnit.Foot,
        new("mi", "mile", 1609.344),
        LengthUnit.Millimetre,
        LengthUnit.Centimetre,
        LengthUnit.Metre,
        new("km", "kilometre", 1000.0),
        new("uin", "microinch", 2.54e-8),
        new("mil", "mil (thou)", 2.54e-5),
        new("yd", "yard", 0.9144),
        new("Å", "angstrom", 1e-10),
        new("nm", "nanometre", 1e-9),
        LengthUnit.Micrometre,
        new("dm", "decimetre", 0.1),
        new("dam", "decametre", 10.0),
        new("hm", "hectometre", 100.0),
        new("Gm", "gigametre", 1e9),
        new("au", "astronomical unit", Au),
        new("ly", "light year", 9_460_730_472_580_800.0),
        new("pc", "parsec", 648000.0 / Math.PI * Au),
        new("ft(US)", "US survey foot", UsFoot),
        new("in(US)", "US survey inch", UsFoot / 12.0),
        new("yd(US)", "US survey yard", 3.0 * UsFoot),
        new("mi(US)", "US survey mile", 5280.0 * UsFoot),
    ];

    /// <summary>Highest known code.</summary>
    public const int MaxCode = 24;

    /// <summary>The unit for a code, or null for 0 (unitless) and unknown codes.</summary>
    public static LengthUnit? FromCode(int code) => code >= 0 && code < Table.Length ? Table[code] : null;

    /// <summary>The code of a unit (matched by size), or 0 when no code fits.</summary>
    public static int ToCode(LengthUnit unit)
    {
        for (int i = 1; i < Table.Length; i++)
            if (Table[i] is { } u && Math.Abs(u.Metres - unit.Metres) <= 1e-12 * unit.Metres) return i;
        return 0;
    }
}
