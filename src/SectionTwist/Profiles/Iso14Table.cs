namespace SectionTwist.Profiles;

/// <summary>
/// Straight-sided splines, ISO 14: N x d x D with tooth width B, mm, light and medium series. Nine rows are checked
/// against a copy of the standard's table; the others are from memory of the standard (marked <c>Memory</c>, and a
/// template that takes a default from such a row warns). The root fillet defaults (<see cref="RootFillet"/>) are from
/// memory as well.
/// </summary>
internal static class Iso14Table
{
    /// <summary>One row: series, number of splines N, minor d, major D, tooth width B (mm).</summary>
    internal readonly record struct Row(string Series, int N, double D1, double D2, double B, bool Memory);

    internal static readonly Row[] Rows =
    [
        new("light", 6, 23, 26, 6, false), new("light", 6, 26, 30, 6, true), new("light", 6, 28, 32, 7, false),
        new("light", 8, 32, 36, 6, false), new("light", 8, 36, 40, 7, true), new("light", 8, 42, 46, 8, false),
        new("light", 8, 46, 50, 9, true), new("light", 8, 52, 58, 10, true), new("light", 8, 56, 62, 10, true),
        new("light", 8, 62, 68, 12, true), new("light", 10, 72, 78, 12, false), new("light", 10, 82, 88, 12, true),
        new("light", 10, 92, 98, 14, true), new("light", 10, 102, 108, 16, true), new("light", 10, 112, 120, 18, true),
        new("medium", 6, 11, 14, 3, false), new("medium", 6, 13, 16, 3.5, true), new("medium", 6, 16, 20, 4, false),
        new("medium", 6, 18, 22, 5, true), new("medium", 6, 21, 25, 5, true), new("medium", 6, 23, 28, 6, true),
        new("medium", 6, 26, 32, 6, true), new("medium", 6, 28, 34, 7, true), new("medium", 8, 32, 38, 6, true),
        new("medium", 8, 36, 42, 7, false), new("medium", 8, 42, 48, 8, true), new("medium", 8, 46, 54, 9, true),
        new("medium", 8, 52, 60, 10, true), new("medium", 8, 56, 65, 10, true), new("medium", 8, 62, 72, 12, true),
        new("medium", 10, 72, 82, 12, true), new("medium", 10, 82, 92, 12, false), new("medium", 10, 92, 102, 14, true),
        new("medium", 10, 102, 112, 16, true), new("medium", 10, 112, 125, 18, true),
    ];

    /// <summary>
    /// Default root fillet radius (mm) of a straight-sided spline shaft by major diameter D (mm), from memory of the
    /// r column of the ISO 14 tables: 0.2 up to D = 26, 0.3 up to 46, 0.4 up to 72, 0.5 above. A smaller real fillet
    /// gives a higher peak shear, hence the warning that goes with it.
    /// </summary>
    public static double RootFillet(double dMajorMm) => dMajorMm <= 26 + 1e-9 ? 0.2 : dMajorMm <= 46 + 1e-9 ? 0.3 : dMajorMm <= 72 + 1e-9 ? 0.4 : 0.5;

    /// <summary>Rows matching the given values (null = any), sizes in mm.</summary>
    public static IEnumerable<Row> Find(string? series, int? n, double? d, double? dMajor) =>
        Rows.Where(r => (series is null || r.Series == series) && (n is null || r.N == n)
            && (d is null || Math.Abs(r.D1 - d.Value) < 1e-6) && (dMajor is null || Math.Abs(r.D2 - dMajor.Value) < 1e-6));
}
