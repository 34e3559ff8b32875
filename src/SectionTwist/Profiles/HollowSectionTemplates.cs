using SectionTwist.Geometry;
using static SectionTwist.Profiles.TemplateDefinition;

namespace SectionTwist.Profiles;

/// <summary>
/// Rectangular and square hollow sections, H (along y) by B (along x), wall t, outer and inner corner radii.
/// Default radii: hot-finished (EN 10210-2) ro = 1.5 t, ri = t (docs/references.md, from memory there);
/// cold-formed (EN 10219-2, from memory): t &lt;= 6 mm: ro = 2 t, ri = t; 6 &lt; t &lt;= 10 mm: ro = 2.5 t, ri = 1.5 t;
/// t &gt; 10 mm: ro = 3 t, ri = 2 t.
/// </summary>
internal static class HollowSectionTemplates
{
    private static TemplateParameter[] Common() =>
    [
        new("t", ParameterKind.Length, "wall thickness"),
        new("ro", ParameterKind.Length, "outer corner radius", "1.5 t hot, 2-3 t cold"),
        new("ri", ParameterKind.Length, "inner corner radius", "t hot, 1-2 t cold"),
        new("form", ParameterKind.Choice, "hot-finished (EN 10210) or cold-formed (EN 10219) default radii", "hot", ["hot", "cold"]),
    ];

    public static IEnumerable<TemplateDefinition> All()
    {
        yield return new TemplateDefinition(
            new TemplateInfo("rhs", "rectangular hollow section H x B x t with corner radii",
                Params([new("H", ParameterKind.Length, "outer height along y"), new("B", ParameterKind.Length, "outer width along x"), .. Common()]),
                "D = max(H, B)", "rhs:H=100,B=50,t=4", []),
            a => [Build(a, a.Length("H"), a.Length("B"))],
            (a, _) => Math.Max(a.Length("H"), a.Length("B")));
        yield return new TemplateDefinition(
            new TemplateInfo("shs", "square hollow section B x B x t with corner radii",
                Params([new("B", ParameterKind.Length, "outer width"), .. Common()]),
                "D = B", "shs:B=80,t=5", []),
            a => [Build(a, a.Length("B"), a.Length("B"))],
            (a, _) => a.Length("B"));
    }

    /// <summary>Default (outer, inner) corner radii for wall t, metres.</summary>
    internal static (double Outer, double Inner) DefaultRadii(double t, bool cold)
    {
        if (!cold) return (1.5 * t, t);
        double mm = t * 1000;
        return mm <= 6 + 1e-9 ? (2 * t, t) : mm <= 10 + 1e-9 ? (2.5 * t, 1.5 * t) : (3 * t, 2 * t);
    }

    private static Region Build(TemplateArguments a, double height, double width)
    {
        double t = a.Length("t");
        double small = Math.Min(height, width);
        if (2 * t >= small)
            throw a.Error("t", $"wall {a.Show(t)} is not less than half the width {a.Show(small)}: no hole is left; use t < {a.Show(small / 2)} (or rect for a solid bar)");
        bool cold = a.Choice("form", "hot") == "cold";
        var (ro0, ri0) = DefaultRadii(t, cold);
        double ro = a.LengthOrZero("ro", ro0), ri = a.LengthOrZero("ri", ri0);
        if (!a.Has("ro") || !a.Has("ri"))
        {
            string which = !a.Has("ro") && !a.Has("ri") ? $"corner radii ro = {a.Show(ro)}, ri = {a.Show(ri)}"
                : !a.Has("ro") ? $"outer corner radius ro = {a.Show(ro)}" : $"inner corner radius ri = {a.Show(ri)}";
            a.DefaultFromMemory(!a.Has("ro") ? "ro" : "ri", $"{which} ({(cold ? "cold-formed, EN 10219-2" : "hot-finished, EN 10210-2")}; they change J and the peak shear)",
                "give ro= and ri= from the mill's table or your drawing");
        }
        if (2 * ro > small)
            throw a.Error("ro", $"outer corner radius {a.Show(ro)} exceeds half the width {a.Show(small / 2)}; use a smaller ro");
        double innerSmall = small - 2 * t;
        if (2 * ri > innerSmall)
            throw a.Error("ri", $"inner corner radius {a.Show(ri)} exceeds half the inner width {a.Show(innerSmall / 2)}; use a smaller ri");
        // Wall measured along the corner diagonal: t sqrt2 + (ri - ro)(sqrt2 - 1) must stay positive.
        if (t * Math.Sqrt(2) + (ri - ro) * (Math.Sqrt(2) - 1) <= 0)
            throw a.Error("ro", $"outer radius {a.Show(ro)} with inner radius {a.Show(ri)} leaves no wall at the corners; use ro - ri < 3.41 t");
        var outer = PolygonTemplates.RoundedRectangle(width, height, ro, a.Spec);
        var inner = PolygonTemplates.RoundedRectangle(width - 2 * t, height - 2 * t, ri, a.Spec);
        return new Region(outer, [inner]);
    }
}
