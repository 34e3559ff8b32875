using SectionTwist.Geometry;
using static SectionTwist.Profiles.TemplateDefinition;

namespace SectionTwist.Profiles;

/// <summary>Round bar, round tube and ellipse: exact circular and elliptical boundaries, centred at the origin.</summary>
internal static class RoundTemplates
{
    public static IEnumerable<TemplateDefinition> All()
    {
        yield return new TemplateDefinition(
            new TemplateInfo("circle", "solid round bar of diameter d",
                Params(new TemplateParameter("d", ParameterKind.Length, "diameter")),
                "D = d", "circle:d=40", ["round"]),
            a => [new Region(LoopBuilder.Circle(default, a.Length("d") / 2))],
            (a, _) => a.Length("d"));

        yield return new TemplateDefinition(
            new TemplateInfo("tube", "round tube, outer diameter D, inner diameter d (or wall t)",
                Params(new TemplateParameter("D", ParameterKind.Length, "outer diameter"),
                    new TemplateParameter("d", ParameterKind.Length, "inner diameter", "D - 2 t"),
                    new TemplateParameter("t", ParameterKind.Length, "wall thickness (instead of d)", "(D - d) / 2")),
                "D = outer diameter", "tube:D=50,d=40", ["pipe"]),
            Tube,
            (a, _) => a.Length("D"));

        yield return new TemplateDefinition(
            new TemplateInfo("ellipse", "solid ellipse with semi-axes a (along x) and b (along y)",
                Params(new TemplateParameter("a", ParameterKind.Length, "semi-axis along x"),
                    new TemplateParameter("b", ParameterKind.Length, "semi-axis along y")),
                "D = 2 max(a, b) (major axis)", "ellipse:a=30,b=15", []),
            a => [new Region(new Loop([EllipticalArcSegment.Full(default, a.Length("a"), a.Length("b"))]))],
            (a, _) => 2 * Math.Max(a.Length("a"), a.Length("b")));
    }

    private static Region[] Tube(TemplateArguments a)
    {
        double outer = a.Length("D");
        if (a.Has("d") && a.Has("t")) throw a.Error("t", "give either the inner diameter d or the wall t, not both");
        double inner = a.Has("t") ? outer - 2 * a.Length("t") : a.Length("d");
        if (a.Has("t") && !(inner > 0)) throw a.Error("t", $"wall {a.Show(a.Length("t"))} is not less than half of D = {a.Show(outer)}; use t < D/2 (or the circle template for a solid bar)");
        if (!a.Has("t") && !a.Has("d")) throw a.Error("d", "give the inner diameter d or the wall thickness t");
        if (inner >= outer) throw a.Error("d", $"inner diameter {a.Show(inner)} is not less than the outer diameter {a.Show(outer)}; use d < D");
        return [new Region(LoopBuilder.Circle(default, outer / 2), [LoopBuilder.Circle(default, inner / 2)])];
    }
}
