namespace SectionTwist.Profiles;

/// <summary>
/// Table rows of the open families added to the designations: parallel-flange channels UPE and unequal-leg angles.
/// Every row is from memory (there was no table at hand when they were written) and must be checked against the
/// mill's current table before use in design. A row is kept only when the exact area of its outline, with the
/// family's root and toe radii, rounds to the area remembered for it (tests/SectionTwist.Tests/Profiles).
/// </summary>
internal static class OpenSectionTable
{
    // UPE, parallel-flange channel: h, b, tw, tf (constant, no taper), root radius r, no toe radius; A (cm^2) and It
    // (cm^4) as printed in the European tables. Source: EN 10365:2017 (UPE rows; dimensions as in DIN 1026-2), section
    // properties from the ArcelorMittal sales programme, all from memory. The printed It comes from the tables' thin-wall
    // formula with a fillet term; our memory of it is firm only up to UPE 200 (NaN above: the test then compares the
    // exact value with the tables' thin-wall sum).
    private static SteelSectionTable.Row U(string s, double h, double b, double tw, double tf, double r, double a, double it) =>
        new("upe", s, h, b, tw, tf, r, 0, 0, a, it);

    // Unequal-leg angle L h x b x t: long leg h along y, short leg b along x, root radius r1, toe radius r2 = r1 / 2
    // (EN 10056-1). Area as printed in the European/British tables (EN 10056-1 rows), from memory; the torsion constant
    // is not in our memory of the table (NaN), so the test compares the exact value with the thin-wall sum instead.
    private static SteelSectionTable.Row L(string s, double h, double b, double t, double r1, double a) =>
        new("lun", s, h, b, t, t, r1, r1 / 2, 0, a, double.NaN);

    /// <summary>The rows, in family and size order.</summary>
    public static IReadOnlyList<SteelSectionTable.Row> Rows { get; } =
    [
        U("80", 80, 50, 4.0, 7.0, 10, 10.1, 1.47),
        U("100", 100, 55, 4.5, 7.5, 10, 12.5, 2.01),
        U("120", 120, 60, 5.0, 8.0, 12, 15.4, 2.90),
        U("140", 140, 65, 5.0, 9.0, 12, 18.4, 4.05),
        U("160", 160, 70, 5.5, 9.5, 12, 21.7, 5.20),
        U("180", 180, 75, 5.5, 10.5, 12, 25.1, 6.99),
        U("200", 200, 80, 6.0, 11.0, 13, 29.0, 8.89),
        U("220", 220, 85, 6.5, 12.0, 13, 33.9, double.NaN),
        U("240", 240, 90, 7.0, 12.5, 15, 38.5, double.NaN),
        U("270", 270, 95, 7.5, 13.5, 15, 44.8, double.NaN),
        U("300", 300, 100, 9.5, 15.0, 15, 56.6, double.NaN),
        U("330", 330, 105, 11.0, 16.0, 18, 67.8, double.NaN),
        U("360", 360, 110, 12.0, 17.0, 18, 77.9, double.NaN),
        U("400", 400, 115, 13.5, 18.0, 18, 91.9, double.NaN),
        L("60x40x5", 60, 40, 5, 6, 4.79),
        L("60x40x6", 60, 40, 6, 6, 5.68),
        L("65x50x5", 65, 50, 5, 6, 5.54),
        L("75x50x6", 75, 50, 6, 7, 7.19),
        L("75x50x8", 75, 50, 8, 7, 9.41),
        L("80x40x6", 80, 40, 6, 7, 6.89),
        L("80x40x8", 80, 40, 8, 7, 9.01),
        L("80x60x7", 80, 60, 7, 8, 9.38),
        L("100x50x6", 100, 50, 6, 8, 8.71),
        L("100x50x8", 100, 50, 8, 8, 11.4),
        L("100x65x8", 100, 65, 8, 10, 12.7),
        L("100x65x10", 100, 65, 10, 10, 15.6),
        L("100x75x8", 100, 75, 8, 10, 13.5),
        L("100x75x10", 100, 75, 10, 10, 16.6),
        L("100x75x12", 100, 75, 12, 10, 19.7),
        L("125x75x8", 125, 75, 8, 11, 15.5),
        L("125x75x10", 125, 75, 10, 11, 19.1),
        L("125x75x12", 125, 75, 12, 11, 22.7),
        L("150x90x10", 150, 90, 10, 12, 23.2),
        L("150x90x12", 150, 90, 12, 12, 27.5),
        L("150x90x15", 150, 90, 15, 12, 33.9),
        L("200x100x10", 200, 100, 10, 15, 29.2),
        L("200x100x12", 200, 100, 12, 15, 34.8),
        L("200x100x15", 200, 100, 15, 15, 43.0),
        L("200x150x12", 200, 150, 12, 15, 40.8),
        L("200x150x15", 200, 150, 15, 15, 50.5),
    ];
}
