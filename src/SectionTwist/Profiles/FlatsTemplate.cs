using SectionTwist.Geometry;
using static SectionTwist.Profiles.TemplateDefinition;

namespace SectionTwist.Profiles;

/// <summary>
/// Round shaft with one flat (D shape), two opposite flats (double D) or four flats at 90 degrees, each flat cut to
/// depth h below the round surface (the flat lies at D/2 - h from the axis).
/// </summary>
internal static class FlatsTemplate
{
    public static TemplateDefinition Definition { get; } = new(
        new TemplateInfo("flats", "round shaft with 1 (D), 2 opposite (double D) or 4 flats of depth h",
            Params(new TemplateParameter("D", ParameterKind.Length, "shaft diameter"),
                new TemplateParameter("h", ParameterKind.Length, "depth of each flat below the round surface"),
                new TemplateParameter("n", ParameterKind.Count, "number of flats: 1, 2 or 4", "1"),
                new TemplateParameter("at", ParameterKind.Angle, "direction of the first flat's normal from +x", "90")),
            "D = D", "flats:D=20,h=2,n=2", ["dshaft", "flatted"]),
        Build,
        (a, _) => a.Length("D"));

    private static Region[] Build(TemplateArguments a)
    {
        double radius = a.Length("D") / 2, h = a.Length("h");
        int n = a.Count("n", 1);
        double at = a.Angle("at", Math.PI / 2);
        double limit = n switch
        {
            1 => 2 * radius,
            2 => radius,
            4 => radius * (1 - Math.Sqrt(0.5)),
            _ => throw a.Error("n", $"{n} flats: use 1 (D shape), 2 (double D) or 4"),
        };
        if (h >= limit)
            throw a.Error("h", n switch
            {
                1 => $"flat depth {a.Show(h)} cuts the whole shaft; use h < D = {a.Show(2 * radius)}",
                2 => $"flat depth {a.Show(h)} reaches the axis: two opposite flats would meet; use h < D/2 = {a.Show(radius)}",
                _ => $"flat depth {a.Show(h)}: four flats would meet at the corners; use h < D (1 - 1/sqrt 2)/2 = {a.Show(limit)} (or the square template)",
            });
        double y = radius - h, c = Math.Sqrt(radius * radius - y * y);
        var o = new Outline(a.Spec);
        for (int k = 0; k < n; k++)
        {
            double rot = at - Math.PI / 2 + 2 * Math.PI * k / n;
            o.Arc(new Point2(c, y).Rotated(rot), default, true).Line(new Point2(-c, y).Rotated(rot));
        }
        return [new Region(o.ToLoop())];
    }
}
