namespace SectionTwist.Profiles;

/// <summary>
/// Parallel keys and shaft keyseats by shaft diameter, DIN 6885-1 / ISO 773 (as listed in docs/references.md):
/// for shaft diameters over <see cref="Row.Over"/> up to <see cref="Row.UpTo"/> mm, key width b, key height h and
/// shaft keyseat depth t1, all mm.
/// </summary>
internal static class ParallelKeyTable
{
    /// <summary>One table row, millimetres.</summary>
    internal readonly record struct Row(double Over, double UpTo, double B, double H, double T1);

    internal static readonly Row[] Rows =
    [
        new(6, 8, 2, 2, 1.2), new(8, 10, 3, 3, 1.8), new(10, 12, 4, 4, 2.5), new(12, 17, 5, 5, 3.0),
        new(17, 22, 6, 6, 3.5), new(22, 30, 8, 7, 4.0), new(30, 38, 10, 8, 5.0), new(38, 44, 12, 8, 5.0),
        new(44, 50, 14, 9, 5.5), new(50, 58, 16, 10, 6.0), new(58, 65, 18, 11, 7.0), new(65, 75, 20, 12, 7.5),
        new(75, 85, 22, 14, 9.0), new(85, 95, 25, 14, 9.0), new(95, 110, 28, 16, 10),
    ];

    /// <summary>The row for a shaft diameter in mm (over..up to), or null outside 6..110 mm.</summary>
    public static Row? For(double diameterMm)
    {
        foreach (var r in Rows)
            if (diameterMm > r.Over && diameterMm <= r.UpTo * (1 + 1e-12)) return r;
        return null;
    }
}
