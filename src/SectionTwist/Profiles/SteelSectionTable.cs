namespace SectionTwist.Profiles;

/// <summary>
/// Rows of hot-rolled steel section tables by designation, dimensions in mm with the table's own area (cm^2) and
/// torsion constant It (cm^4) for checking. Every row is from memory of the European tables (IPE, HEA and HEB to
/// EN 10365 / Euronorm 53-62 and 19-57; UPN to EN 10365 / DIN 1026-1; equal angles to EN 10056-1; UPE and unequal
/// angles in <see cref="OpenSectionTable"/>; hot-finished hollow sections to EN 10210-2 in
/// <see cref="HollowSectionTable"/>) and must be checked against the mill's current table before use in design. The
/// tables' It comes from a thin-wall formula with a fillet term (hollow sections: Bredt's formula with corner radii),
/// not from an exact solution.
/// </summary>
internal static class SteelSectionTable
{
    /// <summary>One row: depth h, width b, web tw, flange tf (UPN: at b/2 from the back of the web), root radius r, toe radius r2, taper %, A, It (NaN: not in our table).</summary>
    internal readonly record struct Row(string Family, string Size, double H, double B, double Tw, double Tf, double R, double R2, double Taper, double Area, double It);

    private static Row I(string f, string s, double h, double b, double tw, double tf, double r, double a, double it) => new(f, s, h, b, tw, tf, r, 0, 0, a, it);

    private static readonly Row[] RolledRows =
    [
        I("ipe", "100", 100, 55, 4.1, 5.7, 7, 10.3, 1.20),
        I("ipe", "120", 120, 64, 4.4, 6.3, 7, 13.2, 1.74),
        I("ipe", "140", 140, 73, 4.7, 6.9, 7, 16.4, 2.45),
        I("ipe", "160", 160, 82, 5.0, 7.4, 9, 20.1, 3.60),
        I("ipe", "180", 180, 91, 5.3, 8.0, 9, 23.9, 4.79),
        I("ipe", "200", 200, 100, 5.6, 8.5, 12, 28.5, 6.98),
        I("ipe", "220", 220, 110, 5.9, 9.2, 12, 33.4, 9.07),
        I("ipe", "240", 240, 120, 6.2, 9.8, 15, 39.1, 12.88),
        I("ipe", "270", 270, 135, 6.6, 10.2, 15, 45.9, 15.94),
        I("ipe", "300", 300, 150, 7.1, 10.7, 15, 53.8, 20.12),
        I("hea", "100", 96, 100, 5.0, 8.0, 12, 21.2, 5.24),
        I("hea", "120", 114, 120, 5.0, 8.0, 12, 25.3, 5.99),
        I("hea", "140", 133, 140, 5.5, 8.5, 12, 31.4, 8.13),
        I("hea", "160", 152, 160, 6.0, 9.0, 15, 38.8, 12.19),
        I("hea", "200", 190, 200, 6.5, 10.0, 18, 53.8, 20.98),
        I("heb", "100", 100, 100, 6.0, 10.0, 12, 26.0, 9.25),
        I("heb", "120", 120, 120, 6.5, 11.0, 12, 34.0, 13.84),
        I("heb", "140", 140, 140, 7.0, 12.0, 12, 43.0, 20.06),
        I("heb", "160", 160, 160, 8.0, 13.0, 15, 54.3, 31.24),
        I("heb", "200", 200, 200, 9.0, 15.0, 18, 78.1, 59.28),
        new("upn", "80", 80, 45, 6.0, 8.0, 8.0, 4.0, 8, 11.0, double.NaN),
        new("upn", "100", 100, 50, 6.0, 8.5, 8.5, 4.5, 8, 13.5, double.NaN),
        new("upn", "120", 120, 55, 7.0, 9.0, 9.0, 4.5, 8, 17.0, double.NaN),
        new("upn", "140", 140, 60, 7.0, 10.0, 10.0, 5.0, 8, 20.4, double.NaN),
        new("upn", "160", 160, 65, 7.5, 10.5, 10.5, 5.5, 8, 24.0, double.NaN),
        new("upn", "200", 200, 75, 8.5, 11.5, 11.5, 6.0, 8, 32.2, double.NaN),
        new("leq", "50x5", 50, 50, 5, 5, 7, 3.5, 0, 4.80, double.NaN),
        new("leq", "60x6", 60, 60, 6, 6, 8, 4, 0, 6.91, double.NaN),
        new("leq", "80x8", 80, 80, 8, 8, 10, 5, 0, 12.3, double.NaN),
        new("leq", "100x10", 100, 100, 10, 10, 12, 6, 0, 19.2, double.NaN),
    ];

    /// <summary>Every row: the rolled I, H, UPN and equal-angle rows, then the open and hollow tables (declared after their parts, which initialise first).</summary>
    public static IReadOnlyList<Row> Rows { get; } = [.. RolledRows, .. OpenSectionTable.Rows, .. HollowSectionTable.Rows];

    /// <summary>
    /// The row of <paramref name="family"/> and <paramref name="size"/>, or null. Sizes match by their numbers, so
    /// <c>100x100x5.0</c> and <c>100 x 100 x 5</c> find the row <c>100x100x5</c>.
    /// </summary>
    public static Row? Find(string family, string size) =>
        Rows.Where(r => r.Family == family && SameSize(r.Size, size)).Select(r => (Row?)r).FirstOrDefault();

    private static bool SameSize(string a, string b)
    {
        if (string.Equals(a, b.Trim(), StringComparison.OrdinalIgnoreCase)) return true;
        var x = Numbers(a);
        var y = Numbers(b);
        return x is not null && y is not null && x.SequenceEqual(y);
    }

    private static double[]? Numbers(string size)
    {
        var parts = size.ToLowerInvariant().Replace('*', 'x').Split('x', StringSplitOptions.TrimEntries);
        var values = new double[parts.Length];
        for (int i = 0; i < parts.Length; i++)
            if (!double.TryParse(parts[i], System.Globalization.NumberStyles.Float, System.Globalization.CultureInfo.InvariantCulture, out values[i])) return null;
        return values;
    }

    /// <summary>The equivalent parametric spec, e.g. <c>ibeam:h=200,b=100,tw=5.6,tf=8.5,r=12</c>.</summary>
    public static string Spec(Row r) => FormattableString.Invariant(r.Family switch
    {
        // the table gives tf at b/2 from the back of the web; the channel template wants it at mid-outstand, tw/2 further out
        "upn" => $"channel:h={r.H},b={r.B},tw={r.Tw},tf={Math.Round(r.Tf - r.Taper / 100 * r.Tw / 2, 6)},r={r.R},r2={r.R2},taper={r.Taper}",
        "leq" or "lun" => $"angle:h={r.H},b={r.B},t={r.Tw},r={r.R},r2={r.R2}",
        "upe" => $"channel:h={r.H},b={r.B},tw={r.Tw},tf={r.Tf},r={r.R}",
        "hfshs" or "hfrhs" => $"rhs:H={r.H},B={r.B},t={r.Tw},ro={r.R},ri={r.R2}",
        "hfchs" => $"tube:D={r.H},t={r.Tw}",
        _ => $"ibeam:h={r.H},b={r.B},tw={r.Tw},tf={r.Tf},r={r.R}",
    });
}
