using SectionTwist.Geometry;
using static SectionTwist.Profiles.TemplateDefinition;

namespace SectionTwist.Profiles;

/// <summary>
/// Hot-rolled sections by designation: <c>ipe:200</c>, <c>hea:160</c>, <c>heb:120</c>, <c>upn:100</c>, <c>upe:200</c>,
/// <c>leq:60x6</c>, <c>lun:100x50x8</c>, and hot-finished hollow sections <c>hfshs:100x100x5</c>,
/// <c>hfrhs:200x100x8</c>, <c>hfchs:48.3x3.2</c>. Each builds the parametric ibeam, channel, angle, rhs or tube template
/// from a table row (<see cref="SteelSectionTable"/>, rows from memory) with its root and toe radii, flange taper or
/// corner radii.
/// </summary>
internal static class SteelSectionTemplates
{
    private static readonly (string Name, string Summary, string Example)[] Families =
    [
        ("ipe", "European parallel-flange I-beam IPE by nominal depth (table row, from memory)", "ipe:200"),
        ("hea", "European wide-flange H-beam HEA by designation (table row, from memory)", "hea:160"),
        ("heb", "European wide-flange H-beam HEB by designation (table row, from memory)", "heb:120"),
        ("upn", "European tapered-flange channel UPN by depth, 8 % flange taper (table row, from memory)", "upn:100"),
        ("upe", "European parallel-flange channel UPE by depth (EN 10365 row, from memory)", "upe:200"),
        ("leq", "equal-leg angle L a x t (EN 10056-1 row, from memory), heel at the origin", "leq:60x6"),
        ("lun", "unequal-leg angle L h x b x t, long leg h along y (EN 10056-1 row, from memory), heel at the origin", "lun:100x50x8"),
        ("hfshs", "hot-finished square hollow section B x B x t, radii 1.5 t / t (EN 10210-2 row, from memory)", "hfshs:100x100x5"),
        ("hfrhs", "hot-finished rectangular hollow section H x B x t, radii 1.5 t / t (EN 10210-2 row, from memory)", "hfrhs:200x100x8"),
        ("hfchs", "hot-finished circular hollow section D x t (EN 10210-2 row, from memory)", "hfchs:48.3x3.2"),
    ];

    /// <summary>True when <paramref name="name"/> is one of the designation families (a table, not a parametric template).</summary>
    public static bool IsDesignation(string name) => Families.Any(f => string.Equals(f.Name, name, StringComparison.OrdinalIgnoreCase));

    public static IEnumerable<TemplateDefinition> All()
    {
        foreach (var (name, summary, example) in Families)
        {
            string sizes = string.Join(", ", SteelSectionTable.Rows.Where(r => r.Family == name).Select(r => r.Size));
            yield return new TemplateDefinition(
                new TemplateInfo(name, summary,
                    Params(new TemplateParameter("size", ParameterKind.Choice, $"designation: {sizes}", null,
                        SteelSectionTable.Rows.Where(r => r.Family == name).Select(r => r.Size).ToArray())),
                    "D = max(h, b)", example, []),
                a => Build(name, a), (a, _) => Math.Max(Row(name, a).H, Row(name, a).B) * 1e-3)
            {
                // a size written with other digits (100x100x5.0) takes the row's own spelling
                Positional = (_, item) => [("size", SteelSectionTable.Find(name, item)?.Size ?? item)],
            };
        }
    }

    private static SteelSectionTable.Row Row(string family, TemplateArguments a)
    {
        string sizes = string.Join(", ", SteelSectionTable.Rows.Where(r => r.Family == family).Select(r => r.Size));
        if (!a.Has("size")) throw a.Error("size", $"give the designation, e.g. {family}:{SteelSectionTable.Rows.First(r => r.Family == family).Size} (sizes: {sizes}), or use the parametric template with your own dimensions");
        return SteelSectionTable.Find(family, a.Choice("size", "")) ?? throw a.Error("size", $"not in the table; sizes: {sizes}");
    }

    private static IReadOnlyList<Region> Build(string family, TemplateArguments a) =>
        ProfileTemplates.Create(SteelSectionTable.Spec(Row(family, a))).Regions;
}
