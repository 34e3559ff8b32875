namespace SectionTwist.Profiles;

/// <summary>
/// Table rows of hot-finished structural hollow sections (EN 10210-2): square (SHS), rectangular (RHS) and circular
/// (CHS). Every row is from memory of the European/British tables and must be checked against the supplier's current
/// table before use in design. Square and rectangular rows use the standard's calculation radii, outer 1.5 t and
/// inner 1.0 t; a row is kept only when the exact area of that outline rounds to the area remembered for it.
/// </summary>
internal static class HollowSectionTable
{
    // SHS / RHS: H (along y) x B (along x) x t, corner radii 1.5 t outside and t inside (EN 10210-2 calculation
    // values). A (cm^2) as printed, from memory. The printed It of these tables is the EN 10210-2 formula (Bredt's
    // thin-wall formula on the mid-line with corner radii, plus t^3 h / 3); our memory of its digits is firm only for
    // the three rows quoted in docs/references.md, the others carry NaN and the test computes the formula itself.
    private static SteelSectionTable.Row R(string family, double h, double b, double t, double a, double it = double.NaN) =>
        new(family, FormattableString.Invariant($"{h}x{b}x{t}"), h, b, t, t, 1.5 * t, t, 0, a, it);

    // CHS: D x t, A (cm^2) as printed and It = 2 I (cm^4) with I as printed, from memory (the tables print the exact
    // annulus values, so the exact solution must reproduce them to the printed digits).
    private static SteelSectionTable.Row C(double d, double t, double a, double it) =>
        new("hfchs", FormattableString.Invariant($"{d}x{t}"), d, d, t, t, 0, 0, 0, a, it);

    /// <summary>The rows, in family and size order.</summary>
    public static IReadOnlyList<SteelSectionTable.Row> Rows { get; } =
    [
        R("hfshs", 40, 40, 3, 4.34),
        R("hfshs", 40, 40, 4, 5.59),
        R("hfshs", 50, 50, 3, 5.54),
        R("hfshs", 50, 50, 4, 7.19),
        R("hfshs", 50, 50, 5, 8.73, 47.6),
        R("hfshs", 60, 60, 4, 8.79, 72.5),
        R("hfshs", 60, 60, 5, 10.7),
        R("hfshs", 80, 80, 5, 14.7, 217),
        R("hfshs", 80, 80, 6.3, 18.1),
        R("hfshs", 90, 90, 5, 16.7),
        R("hfshs", 100, 100, 5, 18.7),
        R("hfshs", 100, 100, 6.3, 23.2),
        R("hfshs", 100, 100, 8, 28.8),
        R("hfshs", 100, 100, 10, 34.9),
        R("hfshs", 120, 120, 6.3, 28.2),
        R("hfshs", 120, 120, 8, 35.2),
        R("hfshs", 150, 150, 8, 44.8),
        // several RHS rows have the perimeter and wall of an SHS row above and so its area (60x40x4 and 50x50x4, 80x40x4
        // and 60x60x4, 100x60x5 and 80x80x5, 120x80x5 and 100x100x5, 200x100x8 and 150x150x8): a cross-check of memory
        R("hfrhs", 50, 30, 3.2, 4.60),
        R("hfrhs", 60, 40, 4, 7.19),
        R("hfrhs", 80, 40, 4, 8.79),
        R("hfrhs", 100, 50, 4, 11.2),
        R("hfrhs", 100, 50, 5, 13.7),
        R("hfrhs", 100, 60, 5, 14.7),
        R("hfrhs", 120, 60, 5, 16.7),
        R("hfrhs", 120, 80, 5, 18.7),
        R("hfrhs", 150, 100, 5, 23.7),
        R("hfrhs", 150, 100, 8, 36.8),
        R("hfrhs", 160, 80, 5, 22.7),
        R("hfrhs", 200, 100, 5, 28.7),
        R("hfrhs", 200, 100, 6.3, 35.8),
        R("hfrhs", 200, 100, 8, 44.8),
        R("hfrhs", 250, 150, 8, 60.8),
        C(21.3, 2.6, 1.53, 1.36),
        C(26.9, 3.2, 2.38, 3.41),
        C(33.7, 3.2, 3.07, 7.21),
        C(42.4, 3.2, 3.94, 15.2),
        C(48.3, 3.2, 4.53, 23.2),
        C(60.3, 3.2, 5.74, 47.0),
        C(76.1, 3.2, 7.33, 97.6),
        C(88.9, 3.2, 8.62, 158),
        C(114.3, 3.6, 12.5, 384),
        C(139.7, 5, 21.2, 961),
        C(168.3, 5, 25.7, 1712),
        C(219.1, 6.3, 42.1, 4772),
        C(273, 6.3, 52.8, 9392),
        C(323.9, 6.3, 62.9, 15858),
    ];
}
