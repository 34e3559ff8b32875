namespace SectionTwist.Profiles;

/// <summary>
/// Parallel keys and shaft keyseats, DIN 6885-1 / ISO 773: by shaft diameter (over <see cref="Row.Over"/> up to
/// <see cref="Row.UpTo"/> mm) the key width b, key height h and shaft keyseat depth t1, all mm (checked against a copy of
/// the standard's table); and by key width the range of the keyseat floor radius (quoted from memory of the standard,
/// see <see cref="FloorRadius"/>).
/// </summary>
internal static class ParallelKeyTable
{
    /// <summary>One table row, millimetres.</summary>
    internal readonly record struct Row(double Over, double UpTo, double B, double H, double T1);

    /// <summary>Keyseat floor radius range for key widths from <see cref="BFrom"/> to <see cref="BTo"/> mm.</summary>
    internal readonly record struct RadiusRow(double BFrom, double BTo, double RMin, double RMax);

    internal static readonly Row[] Rows =
    [
        new(6, 8, 2, 2, 1.2), new(8, 10, 3, 3, 1.8), new(10, 12, 4, 4, 2.5), new(12, 17, 5, 5, 3.0),
        new(17, 22, 6, 6, 3.5), new(22, 30, 8, 7, 4.0), new(30, 38, 10, 8, 5.0), new(38, 44, 12, 8, 5.0),
        new(44, 50, 14, 9, 5.5), new(50, 58, 16, 10, 6.0), new(58, 65, 18, 11, 7.0), new(65, 75, 20, 12, 7.5),
        new(75, 85, 22, 14, 9.0), new(85, 95, 25, 14, 9.0), new(95, 110, 28, 16, 10),
    ];

    /// <summary>
    /// Keyseat floor radius r (min, max) by key width, ISO 773 / DIN 6885-1, from memory: 0.08-0.16 mm for keys 2 to 4
    /// wide, 0.16-0.25 for 5 to 8, 0.25-0.40 for 10 to 18, 0.40-0.60 for 20 to 32, 0.70-1.00 for 36 to 50.
    /// </summary>
    internal static readonly RadiusRow[] RadiusRows =
    [
        new(2, 4, 0.08, 0.16), new(5, 8, 0.16, 0.25), new(10, 18, 0.25, 0.40), new(20, 32, 0.40, 0.60), new(36, 50, 0.70, 1.00),
    ];

    /// <summary>The row for a shaft diameter in mm (over..up to), or null outside 6..110 mm.</summary>
    public static Row? For(double diameterMm)
    {
        foreach (var r in Rows)
            if (diameterMm > r.Over && diameterMm <= r.UpTo * (1 + 1e-12)) return r;
        return null;
    }

    /// <summary>
    /// The floor radius range for a key width in mm: the row whose width span holds it (a width between two spans takes
    /// the span below, the smaller radii), or null outside 2..50 mm.
    /// </summary>
    public static RadiusRow? FloorRadius(double widthMm)
    {
        if (!(widthMm >= 2 * (1 - 1e-12) && widthMm <= 50 * (1 + 1e-12))) return null;
        RadiusRow? found = null;
        foreach (var r in RadiusRows)
            if (widthMm >= r.BFrom * (1 - 1e-12)) found = r;
        return found;
    }
}
