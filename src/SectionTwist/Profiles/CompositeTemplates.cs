using SectionTwist.Geometry;
using static SectionTwist.Profiles.TemplateDefinition;

namespace SectionTwist.Profiles;

/// <summary>
/// Composite round templates: a bar in a bonded sleeve and a tube with a bonded filled core. Their outline (the regions
/// a plain spec builds) is the whole section; <see cref="TemplateDefinition.Parts"/> gives the parts, each of which needs
/// a material (<c>--material core=...,sleeve=...</c>).
/// </summary>
internal static class CompositeTemplates
{
    public static IEnumerable<TemplateDefinition> All()
    {
        yield return new TemplateDefinition(
            new TemplateInfo("sleeved", "composite: round bar (part 'core', diameter d, optional bore b) in a bonded sleeve (part 'sleeve', wall t)",
                Params(new TemplateParameter("d", ParameterKind.Length, "core diameter (the interface)"),
                    new TemplateParameter("t", ParameterKind.Length, "sleeve wall thickness"),
                    new TemplateParameter("b", ParameterKind.Length, "bore diameter of the core", "0 (solid)")),
                "D = d + 2 t", "sleeved:d=40,t=5", []),
            a => Envelope(Sleeved(a)),
            (a, _) => a.Length("d") + 2 * a.Length("t"))
        { Parts = Sleeved };

        yield return new TemplateDefinition(
            new TemplateInfo("filled", "composite: round tube (part 'tube', outer diameter D, wall t) with its bore filled by a bonded core (part 'core')",
                Params(new TemplateParameter("D", ParameterKind.Length, "outer diameter"),
                    new TemplateParameter("t", ParameterKind.Length, "tube wall thickness")),
                "D = outer diameter", "filled:D=50,t=4", []),
            a => Envelope(Filled(a)),
            (a, _) => a.Length("D"))
        { Parts = Filled };
    }

    private static IReadOnlyList<Region> Envelope(IReadOnlyList<(string Name, IReadOnlyList<Region> Regions)> parts)
    {
        // the outer loop of the outermost part with the innermost part's holes
        var outer = parts.Select(p => p.Regions[0]).MaxBy(r => Math.Abs(r.Outer.SignedArea))!;
        var holes = parts.SelectMany(p => p.Regions).SelectMany(r => r.Holes).Where(h => !parts.Any(q => q.Regions.Any(r => SameCircle(r.Outer, h)))).ToList();
        return [new Region(outer.Outer, holes)];
    }

    private static bool SameCircle(Loop a, Loop b) => Math.Abs(Math.Abs(a.SignedArea) - Math.Abs(b.SignedArea)) <= 1e-12 * Math.Abs(a.SignedArea);

    private static IReadOnlyList<(string, IReadOnlyList<Region>)> Sleeved(TemplateArguments a)
    {
        double d = a.Length("d"), t = a.Length("t"), b = a.LengthOrZero("b", 0);
        if (b >= d) throw a.Error("b", $"bore {a.Show(b)} is not less than the core diameter d = {a.Show(d)}; use b < d");
        Region core = b > 0
            ? new Region(LoopBuilder.Circle(default, d / 2), [LoopBuilder.Circle(default, b / 2)])
            : new Region(LoopBuilder.Circle(default, d / 2));
        return [("core", [core]), ("sleeve", [new Region(LoopBuilder.Circle(default, d / 2 + t), [LoopBuilder.Circle(default, d / 2)])])];
    }

    private static IReadOnlyList<(string, IReadOnlyList<Region>)> Filled(TemplateArguments a)
    {
        double outer = a.Length("D"), t = a.Length("t");
        double inner = outer - 2 * t;
        if (!(inner > 0)) throw a.Error("t", $"wall {a.Show(t)} is not less than half of D = {a.Show(outer)}; use t < D/2");
        return [("core", [new Region(LoopBuilder.Circle(default, inner / 2))]),
            ("tube", [new Region(LoopBuilder.Circle(default, outer / 2), [LoopBuilder.Circle(default, inner / 2)])])];
    }
}
