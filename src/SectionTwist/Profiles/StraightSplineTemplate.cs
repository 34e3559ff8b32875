using System.Globalization;
using SectionTwist.Geometry;
using static SectionTwist.Profiles.TemplateDefinition;

namespace SectionTwist.Profiles;

/// <summary>
/// Straight-sided (parallel-key) spline shaft N x d x D, tooth width B: a core of minor diameter d with N parallel-sided
/// teeth reaching the major diameter D, root fillet r between flank and core. ISO 14 light and medium rows by name
/// (<c>spline:series=light,N=8,d=32</c>) or as <c>iso14:8x32x36</c>. The root fillet defaults to
/// <see cref="Iso14Table.RootFillet"/> (from memory, with a warning); r=0 gives sharp roots (a singular peak shear).
/// </summary>
internal static class StraightSplineTemplate
{
    public static TemplateDefinition Definition { get; } = new(
        new TemplateInfo("spline", "straight-sided spline shaft N x d x D, tooth width B (ISO 14 rows by series or as iso14:NxdxD)",
            Params(new TemplateParameter("N", ParameterKind.Count, "number of teeth", "ISO 14 row"),
                new TemplateParameter("d", ParameterKind.Length, "minor (root) diameter"),
                new TemplateParameter("D", ParameterKind.Length, "major (tip) diameter", "ISO 14 row"),
                new TemplateParameter("B", ParameterKind.Length, "tooth width", "ISO 14 row"),
                new TemplateParameter("r", ParameterKind.Length, "root fillet radius, flank to core (0 = sharp)", "ISO 14 by D (memory)"),
                new TemplateParameter("series", ParameterKind.Choice, "ISO 14 series for the defaults", "any", ["light", "medium"])),
            "D = D (major diameter)", "spline:series=light,N=8,d=32", ["iso14"]),
        Build,
        (a, _) => Resolve(a).DMajor)
    {
        Positional = Positional,
    };

    /// <summary>"8x32x36" (N x d x D, millimetres unless units are written) to key/value items.</summary>
    private static IEnumerable<(string, string)> Positional(string spec, string item)
    {
        string[] p = item.Split(['x', 'X', '*'], StringSplitOptions.TrimEntries);
        if (p.Length is < 3 or > 4)
            throw new SectionTwistException("bad-spec", $"{spec}: '{item}' is not N x d x D (e.g. iso14:8x32x36 or 8x32x36x6 with the tooth width)");
        yield return ("N", p[0]);
        yield return ("d", p[1]);
        yield return ("D", p[2]);
        if (p.Length == 4) yield return ("B", p[3]);
    }

    private static (int N, double DMinor, double DMajor, double B) Resolve(TemplateArguments a)
    {
        double d = a.Length("d");
        string? series = a.Has("series") ? a.Choice("series", "light") : null;
        int? n = a.Has("N") ? a.Count("N") : null;
        double? dMajor = a.Has("D") ? a.Length("D") : null;
        bool need = n is null || dMajor is null || !a.Has("B");
        Iso14Table.Row? row = null;
        if (need)
        {
            var rows = Iso14Table.Find(series, n, Math.Round(d * 1000, 6), dMajor is { } dm ? Math.Round(dm * 1000, 6) : null).ToList();
            if (rows.Count == 0)
                throw a.Error(n is null ? "N" : dMajor is null ? "D" : "B",
                    $"no ISO 14 {series ?? "light or medium"} row with {(n is null ? "" : $"N={n}, ")}d={a.Show(d)}{(dMajor is null ? "" : $", D={a.Show(dMajor.Value)}")}; give N, D and B explicitly (rows: {string.Join(" ", Iso14Table.Rows.Where(r => series is null || r.Series == series).Select(r => string.Create(CultureInfo.InvariantCulture, $"{r.N}x{r.D1}x{r.D2}")))})");
            if (rows.Count > 1 && (n is null || dMajor is null))
                throw a.Error("series", $"d={a.Show(d)} is in both ISO 14 series ({string.Join(", ", rows.Select(r => string.Create(CultureInfo.InvariantCulture, $"{r.Series} {r.N}x{r.D1}x{r.D2}")))}); add series=light or series=medium, or give N and D");
            row = rows[0];
            if (row.Value.Memory)
                a.DefaultFromMemory(n is null ? "N" : dMajor is null ? "D" : "B",
                    string.Create(CultureInfo.InvariantCulture, $"ISO 14 {row.Value.Series} row {row.Value.N} x {row.Value.D1} x {row.Value.D2}, B = {row.Value.B} mm,"),
                    "give N, D and B explicitly");
        }
        return (n ?? row!.Value.N, d, dMajor ?? row!.Value.D2 * 1e-3, a.Length("B", (row?.B ?? 0) * 1e-3));
    }

    private static Region[] Build(TemplateArguments a)
    {
        var (n, dMinor, dMajor, b) = Resolve(a);
        if (n < 2) throw a.Error("N", $"{n} teeth: use at least 2");
        if (dMajor <= dMinor) throw a.Error("D", $"major diameter {a.Show(dMajor)} is not larger than the minor diameter {a.Show(dMinor)}; use D > d");
        if (b >= dMinor) throw a.Error("B", $"tooth width {a.Show(b)} is not less than the minor diameter {a.Show(dMinor)}");
        double rf = dMinor / 2, ra = dMajor / 2;
        double halfRoot = Math.Asin(b / 2 / rf);
        if (2 * halfRoot >= 2 * Math.PI / n)
            throw a.Error("B", $"{n} teeth of width {a.Show(b)} overlap on the {a.Show(dMinor)} core; use fewer teeth or a narrower B");
        double xr = Math.Sqrt(rf * rf - b * b / 4), xt = Math.Sqrt(ra * ra - b * b / 4);
        double gapChord = 2 * rf * Math.Sin(Math.PI / n - halfRoot);
        double r = a.Has("r") ? a.LengthOrZero("r", 0) : Iso14Table.RootFillet(dMajor * 1000) * 1e-3;
        if (r > 0 && (r >= xt - xr || 2 * r >= gapChord))
            throw a.Error("r", $"{(a.Has("r") ? "" : "the default ")}root fillet {a.Show(r)} does not fit a tooth of height {a.Show(xt - xr)} and a gap of {a.Show(gapChord)}; use a smaller r");
        if (!a.Has("r"))
            a.DefaultFromMemory("r", $"root fillet {a.Show(r)} (ISO 14 by the major diameter {a.Show(dMajor)}; a smaller real fillet raises the peak shear),");
        var o = new Outline(a.Spec);
        for (int k = 0; k < n; k++)
        {
            double rot = 2 * Math.PI * k / n;
            o.Arc(new Point2(xr, -b / 2).Rotated(rot), default, true, r)
             .Line(new Point2(xt, -b / 2).Rotated(rot))
             .Arc(new Point2(xt, b / 2).Rotated(rot), default, true)
             .Line(new Point2(xr, b / 2).Rotated(rot), r);
        }
        return [new Region(o.ToLoop())];
    }
}
