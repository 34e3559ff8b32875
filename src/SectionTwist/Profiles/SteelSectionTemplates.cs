using SectionTwist.Geometry;
using static SectionTwist.Profiles.TemplateDefinition;

namespace SectionTwist.Profiles;

/// <summary>
/// Hot-rolled sections by designation: <c>ipe:200</c>, <c>hea:160</c>, <c>heb:120</c>, <c>upn:100</c>, <c>leq:60x6</c>.
/// Each builds the parametric ibeam, channel or angle template from a table row (<see cref="SteelSectionTable"/>, rows
/// from memory) with its root and toe radii and flange taper.
/// </summary>
internal static class SteelSectionTemplates
{
    private static readonly (string Name, string Summary, string Example)[] Families =
    [
        ("ipe", "European parallel-flange I-beam IPE by nominal depth (table row, from memory)", "ipe:200"),
        ("hea", "European wide-flange H-beam HEA by designation (table row, from memory)", "hea:160"),
        ("heb", "European wide-flange H-beam HEB by designation (table row, from memory)", "heb:120"),
        ("upn", "European tapered-flange channel UPN by depth, 8 % flange taper (table row, from memory)", "upn:100"),
        ("leq", "equal-leg angle L a x t (EN 10056-1 row, from memory), heel at the origin", "leq:60x6"),
    ];

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
                Positional = (_, item) => [("size", item)],
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
