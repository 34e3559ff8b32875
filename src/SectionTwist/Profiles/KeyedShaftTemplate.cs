using SectionTwist.Geometry;
using static SectionTwist.Profiles.TemplateDefinition;

namespace SectionTwist.Profiles;

/// <summary>
/// Round shaft with n parallel-key keyseats: width b, depth t1 measured from the shaft surface on the keyseat's
/// centre line (so the keyseat floor lies at d/2 - t1 from the axis, the DIN 6885-1 convention "d - t1"), floor corner
/// radius r. Width and depth default to the DIN 6885-1 / ISO 773 row for the diameter; the floor radius to the smallest
/// the standard allows for the width (from memory, with a warning), so the common case is not singular. r=0 gives
/// sharp floor corners (a singular peak shear, which the analysis reports).
/// </summary>
internal static class KeyedShaftTemplate
{
    public static TemplateDefinition Definition { get; } = new(
        new TemplateInfo("keyed", "round shaft with n parallel-key keyseats (DIN 6885-1 / ISO 773 sizes by default)",
            Params(new TemplateParameter("d", ParameterKind.Length, "shaft diameter"),
                new TemplateParameter("n", ParameterKind.Count, "number of keyseats", "1"),
                new TemplateParameter("at", ParameterKind.AngleList, "angular positions of the keyseat centre lines from +x", "90 and evenly spaced"),
                new TemplateParameter("b", ParameterKind.Length, "keyseat width", "DIN 6885-1 by d"),
                new TemplateParameter("t1", ParameterKind.Length, "keyseat depth from the surface", "DIN 6885-1 by d"),
                new TemplateParameter("r", ParameterKind.Length, "keyseat floor corner radius (0 = sharp: singular peak shear)", "DIN 6885-1 min. by b (memory)")),
            "D = d", "keyed:d=40mm,n=2", ["keyway", "keyseat"]),
        Build,
        (a, _) => a.Length("d"));

    private static Region[] Build(TemplateArguments a)
    {
        double d = a.Length("d"), radius = d / 2;
        int n = a.Count("n", 1);
        if (n < 1 || n > 8) throw a.Error("n", $"{n} keyseats: use 1 to 8");
        double[] at = a.Angles("at", Enumerable.Range(0, n).Select(k => Math.PI / 2 + 2 * Math.PI * k / n).ToArray());
        if (a.Has("at") && a.Has("n") && at.Length != n)
            throw a.Error("at", $"{at.Length} angle(s) given for n={n} keyseats; give one angle per keyseat");
        n = at.Length;
        ParallelKeyTable.Row? row = ParallelKeyTable.For(d * 1000);
        if ((!a.Has("b") || !a.Has("t1")) && row is null)
            throw a.Error(a.Has("b") ? "t1" : "b", $"DIN 6885-1 lists shafts over 6 up to 110 mm, not d = {a.Show(d)}; give b= and t1= explicitly");
        double b = a.Length("b", (row?.B ?? 0) * 1e-3), t1 = a.Length("t1", (row?.T1 ?? 0) * 1e-3);
        double r = a.Has("r") ? a.LengthOrZero("r", 0) : DefaultRadius(a, b);
        if (b >= d) throw a.Error("b", $"keyseat width {a.Show(b)} is not less than the diameter {a.Show(d)}; use b < d");
        if (t1 >= radius) throw a.Error("t1", $"keyseat depth {a.Show(t1)} reaches the axis (radius {a.Show(radius)}); use t1 < d/2");
        double yEdge = Math.Sqrt(radius * radius - b * b / 4), yFloor = radius - t1;
        if (yFloor >= yEdge)
            throw a.Error("t1", $"keyseat depth {a.Show(t1)} is too shallow for width {a.Show(b)}: the floor does not cut the side walls; use t1 > {a.Show(radius - yEdge)}");
        if (r > 0 && (2 * r > b || r > yEdge - yFloor))
            throw a.Error("r", $"{(a.Has("r") ? "" : "the default ")}floor radius {a.Show(r)} does not fit a {a.Show(b)} x {a.Show(yEdge - yFloor)} keyseat wall; use r <= {a.Show(Math.Min(b / 2, yEdge - yFloor))}");
        // Keyseats in counter-clockwise order; neighbours must not overlap on the circle.
        Array.Sort(at = at.Select(ArcSegment.NormalizePositive).ToArray());
        double halfWidth = Math.Asin(b / (2 * radius)); // angular half-width at the surface
        for (int k = 0; k < n && n > 1; k++)
        {
            double gap = ArcSegment.NormalizePositive(at[(k + 1) % n] - at[k]);
            if (k == n - 1 && n > 1 && gap == 0) gap = 2 * Math.PI;
            double needed = 2 * Math.Atan2(b / 2, yFloor) ;
            if (gap <= Math.Max(2 * halfWidth, needed) + 1e-9)
                throw a.Error("at", $"keyseats at {at[k] * 180 / Math.PI:G4} and {at[(k + 1) % n] * 180 / Math.PI:G4} deg overlap; space them further apart or use a narrower b");
        }
        var o = new Outline(a.Spec);
        foreach (double theta in at)
        {
            // Local frame: keyseat centre line along +y; rotate by theta - 90 deg.
            double rot = theta - Math.PI / 2;
            o.Arc(new Point2(b / 2, yEdge).Rotated(rot), default, true)
             .Line(new Point2(b / 2, yFloor).Rotated(rot), r)
             .Line(new Point2(-b / 2, yFloor).Rotated(rot), r)
             .Line(new Point2(-b / 2, yEdge).Rotated(rot));
        }
        return [new Region(o.ToLoop())];
    }

    /// <summary>The smallest floor radius DIN 6885-1 / ISO 773 allow for the keyseat width (from memory, so it warns).</summary>
    private static double DefaultRadius(TemplateArguments a, double b)
    {
        double bMm = b * 1000;
        var row = ParallelKeyTable.FloorRadius(bMm)
            ?? throw a.Error("r", $"DIN 6885-1 gives keyseat floor radii for widths 2 to 50 mm, not b = {a.Show(b)}; give r= (r=0 for sharp corners)");
        double r = row.RMin * 1e-3;
        a.DefaultFromMemory("r", string.Create(System.Globalization.CultureInfo.InvariantCulture,
            $"keyseat floor radius {a.Show(r)}, the smallest of DIN 6885-1 / ISO 773 ({row.RMin:0.00#} to {row.RMax:0.00#} mm for a {bMm:G4} mm wide key),"));
        return r;
    }
}
