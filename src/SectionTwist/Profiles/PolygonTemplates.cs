using SectionTwist.Geometry;
using static SectionTwist.Profiles.TemplateDefinition;

namespace SectionTwist.Profiles;

/// <summary>
/// Straight-sided solid bars: rectangle, thin flat bar, equilateral triangle, square and hexagon bar (across flats,
/// optional corner rounding) and a free polygon. All centred on their centroid except the free polygon.
/// </summary>
internal static class PolygonTemplates
{
    public static IEnumerable<TemplateDefinition> All()
    {
        yield return new TemplateDefinition(
            new TemplateInfo("rect", "solid rectangle b (along x) by h (along y), optional corner radius r",
                Params(new TemplateParameter("b", ParameterKind.Length, "width along x"),
                    new TemplateParameter("h", ParameterKind.Length, "height along y"),
                    new TemplateParameter("r", ParameterKind.Length, "corner radius", "0")),
                "D = max(b, h) (longer side)", "rect:b=60,h=20", ["rectangle"]),
            a => [Rectangle(a, a.Length("b"), a.Length("h"), a.LengthOrZero("r", 0), "r")],
            (a, _) => Math.Max(a.Length("b"), a.Length("h")));

        yield return new TemplateDefinition(
            new TemplateInfo("flat", "thin flat bar, width b by thickness t (b >= t), sharp corners",
                Params(new TemplateParameter("b", ParameterKind.Length, "width"),
                    new TemplateParameter("t", ParameterKind.Length, "thickness")),
                "D = b (width)", "flat:b=50,t=5", ["flatbar"]),
            Flat,
            (a, _) => a.Length("b"));

        yield return new TemplateDefinition(
            new TemplateInfo("triangle", "equilateral triangle of side a, base along x",
                Params(new TemplateParameter("a", ParameterKind.Length, "side length")),
                "D = 2 a / sqrt(3) (circumscribed circle)", "triangle:a=50", []),
            a => [Regular(a, 3, a.Length("a") / Math.Sqrt(3), Math.PI / 2, 0, "")],
            (a, _) => 2 * a.Length("a") / Math.Sqrt(3));

        yield return new TemplateDefinition(
            new TemplateInfo("square", "square bar of side s (across flats), optional corner radius r",
                Params(new TemplateParameter("s", ParameterKind.Length, "side (across flats)"),
                    new TemplateParameter("r", ParameterKind.Length, "corner radius", "0")),
                "D = s (across flats)", "square:s=30,r=2", []),
            a => [Regular(a, 4, a.Length("s") / Math.Sqrt(2), -3 * Math.PI / 4, a.LengthOrZero("r", 0), "r")],
            (a, _) => a.Length("s"));

        yield return new TemplateDefinition(
            new TemplateInfo("hex", "hexagon bar, across flats s (flats top and bottom), optional corner radius r",
                Params(new TemplateParameter("s", ParameterKind.Length, "across flats"),
                    new TemplateParameter("r", ParameterKind.Length, "corner radius", "0")),
                "D = s (across flats)", "hex:s=24", ["hexagon"]),
            a => [Regular(a, 6, a.Length("s") / Math.Sqrt(3), 0, a.LengthOrZero("r", 0), "r")],
            (a, _) => a.Length("s"));

        yield return new TemplateDefinition(
            new TemplateInfo("polygon", "free polygon: x1 y1 x2 y2 ... (space or comma separated, optional unit on each number)",
                [], "D = twice the largest distance of a vertex from the centroid", "polygon:0 0 40 0 40 10 0 10", []),
            _ => throw new InvalidOperationException("polygon is built from its body"),
            (_, regions) => 2 * regions[0].Outer.Segments.Max(s => Point2.Distance(s.Start, new Profile(regions).Properties.Centroid)))
        {
            RawBody = Polygon,
        };
    }

    /// <summary>A b x h rectangle centred at the origin with corner radius r.</summary>
    internal static Region Rectangle(TemplateArguments a, double b, double h, double r, string rKey)
    {
        if (2 * r > Math.Min(b, h) * (1 + 1e-12))
            throw a.Error(rKey, $"corner radius {a.Show(r)} is more than half the smaller side {a.Show(Math.Min(b, h))}; use r <= {a.Show(Math.Min(b, h) / 2)}");
        return new Region(RoundedRectangle(b, h, r, a.Spec));
    }

    /// <summary>A counter-clockwise b x h rectangle loop centred at the origin with corner radius r.</summary>
    internal static Loop RoundedRectangle(double b, double h, double r, string what)
    {
        double x = b / 2, y = h / 2;
        if (r >= Math.Min(x, y) * (1 - 1e-12) && r > 0)
        {
            // Fully rounded ends: corners meet; build the stadium/circle directly.
            r = Math.Min(x, y);
            var lb = new LoopBuilder(x, -y + r);
            if (y > r) lb.LineTo(x, y - r);
            lb.ArcTo(new Point2(x - r, y), new Point2(x - r, y - r), true);
            if (x > r) lb.LineTo(-x + r, y);
            lb.ArcTo(new Point2(-x, y - r), new Point2(-x + r, y - r), true);
            if (y > r) lb.LineTo(-x, -y + r);
            lb.ArcTo(new Point2(-x + r, -y), new Point2(-x + r, -y + r), true);
            if (x > r) lb.LineTo(x - r, -y);
            lb.ArcTo(new Point2(x, -y + r), new Point2(x - r, -y + r), true);
            return lb.Close();
        }
        return new Outline(what).Line(x, -y, r).Line(x, y, r).Line(-x, y, r).Line(-x, -y, r).ToLoop();
    }

    private static Region[] Flat(TemplateArguments a)
    {
        double b = a.Length("b"), t = a.Length("t");
        if (t > b) throw a.Error("t", $"thickness {a.Show(t)} exceeds the width {a.Show(b)}; a flat bar has t <= b (use rect for other shapes)");
        return [new Region(RoundedRectangle(b, t, 0, a.Spec))];
    }

    /// <summary>A regular n-gon with circumradius rc, first vertex at angle a0, corner radius r, centred at the origin.</summary>
    private static Region Regular(TemplateArguments a, int n, double rc, double a0, double r, string rKey)
    {
        double inradius = rc * Math.Cos(Math.PI / n);
        if (r > 0 && r >= inradius)
            throw a.Error(rKey, $"corner radius {a.Show(r)} is not less than half the across-flats size {a.Show(inradius)}; use a smaller r (or the circle template)");
        var o = new Outline(a.Spec);
        for (int k = 0; k < n; k++)
        {
            double t = a0 + 2 * Math.PI * k / n;
            o.Line(new Point2(rc * Math.Cos(t), rc * Math.Sin(t)), r);
        }
        return new Region(o.ToLoop());
    }

    private static Region[] Polygon(TemplateArguments a, string body)
    {
        string[] tokens = body.Split([' ', ',', ';', '\t'], StringSplitOptions.RemoveEmptyEntries);
        if (tokens.Length < 6 || tokens.Length % 2 != 0)
            throw new SectionTwistException("bad-template-parameter",
                $"{a.Spec}: a polygon needs at least three x y pairs (an even count of numbers), got {tokens.Length} number(s); write polygon:0 0 40 0 40 10");
        var pts = new Point2[tokens.Length / 2];
        for (int i = 0; i < pts.Length; i++)
            pts[i] = new Point2(a.ParseLengthText($"x{i + 1}", tokens[2 * i]), a.ParseLengthText($"y{i + 1}", tokens[2 * i + 1]));
        return [new Region(LoopBuilder.Polygon(pts))];
    }
}
