using SectionTwist.Geometry;
using static SectionTwist.Profiles.TemplateDefinition;

namespace SectionTwist.Profiles;

/// <summary>
/// I-beam, channel, angle and tee with root fillets r (web to flange), toe radii r2 and tapered flanges. A taper is
/// the slope of the flange's inner face in percent (e.g. 14 for narrow I-beams, 8 for channels); the flange
/// thickness tf is then measured halfway along the outstand (common practice for tapered-flange sections).
/// </summary>
internal static class RolledSectionTemplates
{
    private static TemplateParameter[] Flanged(string hText) =>
    [
        new("h", ParameterKind.Length, hText),
        new("b", ParameterKind.Length, "flange width"),
        new("tw", ParameterKind.Length, "web thickness"),
        new("tf", ParameterKind.Length, "flange thickness (at mid-outstand when tapered)"),
        new("r", ParameterKind.Length, "root fillet radius, web to flange", "0"),
        new("r2", ParameterKind.Length, "flange toe radius", "0"),
        new("taper", ParameterKind.Number, "flange inner-face slope, percent", "0"),
    ];

    public static IEnumerable<TemplateDefinition> All()
    {
        yield return new TemplateDefinition(
            new TemplateInfo("ibeam", "I-section, web along y, symmetric flanges", Flanged("overall depth"),
                "D = max(h, b)", "ibeam:h=200,b=100,tw=5.6,tf=8.5,r=12", ["beam"]),
            a => [IBeam(a)], (a, _) => Math.Max(a.Length("h"), a.Length("b")));
        yield return new TemplateDefinition(
            new TemplateInfo("channel", "channel (C/U) section, web along y at x = 0, flanges toward +x", Flanged("overall depth"),
                "D = max(h, b)", "channel:h=100,b=50,tw=6,tf=8.5,r=8.5,taper=8", []),
            a => [Channel(a)], (a, _) => Math.Max(a.Length("h"), a.Length("b")));
        yield return new TemplateDefinition(
            new TemplateInfo("tee", "T-section, flange on top, web down", Flanged("overall height, flange included"),
                "D = max(h, b)", "tee:h=50,b=50,tw=6,tf=6,r=6", []),
            a => [Tee(a)], (a, _) => Math.Max(a.Length("h"), a.Length("b")));
        yield return new TemplateDefinition(
            new TemplateInfo("angle", "angle (L) section, heel at the origin, legs along +x and +y",
                Params(new TemplateParameter("h", ParameterKind.Length, "leg along y"),
                    new TemplateParameter("b", ParameterKind.Length, "leg along x", "h"),
                    new TemplateParameter("t", ParameterKind.Length, "leg thickness"),
                    new TemplateParameter("r", ParameterKind.Length, "root fillet radius", "0"),
                    new TemplateParameter("r2", ParameterKind.Length, "toe radius", "0")),
                "D = max(h, b)", "angle:h=60,t=6,r=8,r2=4", []),
            a => [Angle(a)], (a, _) => Math.Max(a.Length("h"), a.Length("b", a.Length("h"))));
    }

    /// <summary>Flange thickness at the web face and at the tip for a tapered flange of given outstand.</summary>
    private static (double Root, double Tip) Flange(TemplateArguments a, double outstand)
    {
        double tf = a.Length("tf"), slope = a.Number("taper", 0) / 100;
        if (slope < 0 || slope > 1) throw a.Error("taper", $"slope {slope * 100:G4} %: use 0 to 100 %");
        double root = tf + slope * outstand / 2, tip = tf - slope * outstand / 2;
        if (!(tip > 0)) throw a.Error("taper", $"a {slope * 100:G4} % taper over a {a.Show(outstand)} outstand thins the flange tip to nothing; use a smaller taper or a thicker tf");
        return (root, tip);
    }

    private static (double H, double B, double Tw, double R, double R2) Common(TemplateArguments a, double webFlanges)
    {
        double h = a.Length("h"), b = a.Length("b"), tw = a.Length("tw");
        if (tw >= b) throw a.Error("tw", $"web {a.Show(tw)} is not thinner than the flange width {a.Show(b)}; use tw < b");
        if (webFlanges * a.Length("tf") >= h)
            throw a.Error("tf", $"flange thickness {a.Show(a.Length("tf"))} leaves no web in depth {a.Show(h)}; use tf < {a.Show(h / webFlanges)}");
        return (h, b, tw, a.LengthOrZero("r", 0), a.LengthOrZero("r2", 0));
    }

    private static Region IBeam(TemplateArguments a)
    {
        var (h, b, tw, r, r2) = Common(a, 2);
        var (root, tip) = Flange(a, (b - tw) / 2);
        double x = b / 2, w = tw / 2, y = h / 2;
        if (y - root <= 0) throw a.Error("taper", "the tapered flanges meet at the web; reduce taper or tf");
        var o = new Outline(a.Spec)
            .Line(x, -y).Line(x, -y + tip, r2).Line(w, -y + root, r).Line(w, y - root, r).Line(x, y - tip, r2).Line(x, y)
            .Line(-x, y).Line(-x, y - tip, r2).Line(-w, y - root, r).Line(-w, -y + root, r).Line(-x, -y + tip, r2).Line(-x, -y);
        return new Region(o.ToLoop());
    }

    private static Region Channel(TemplateArguments a)
    {
        var (h, b, tw, r, r2) = Common(a, 2);
        var (root, tip) = Flange(a, b - tw);
        double y = h / 2;
        if (y - root <= 0) throw a.Error("taper", "the tapered flanges meet at the web; reduce taper or tf");
        var o = new Outline(a.Spec)
            .Line(0, -y).Line(b, -y).Line(b, -y + tip, r2).Line(tw, -y + root, r).Line(tw, y - root, r).Line(b, y - tip, r2).Line(b, y).Line(0, y);
        return new Region(o.ToLoop());
    }

    private static Region Tee(TemplateArguments a)
    {
        var (h, b, tw, r, r2) = Common(a, 1);
        var (root, tip) = Flange(a, (b - tw) / 2);
        if (root >= h) throw a.Error("taper", "the tapered flange reaches the web's foot; reduce taper or tf");
        double x = b / 2, w = tw / 2;
        var o = new Outline(a.Spec)
            .Line(-w, -h).Line(w, -h).Line(w, -root, r).Line(x, -tip, r2).Line(x, 0).Line(-x, 0).Line(-x, -tip, r2).Line(-w, -root, r);
        return new Region(o.ToLoop());
    }

    private static Region Angle(TemplateArguments a)
    {
        double h = a.Length("h"), b = a.Length("b", h), t = a.Length("t");
        if (t >= Math.Min(h, b)) throw a.Error("t", $"thickness {a.Show(t)} is not less than the shorter leg {a.Show(Math.Min(h, b))}; use t < {a.Show(Math.Min(h, b))}");
        double r = a.LengthOrZero("r", 0), r2 = a.LengthOrZero("r2", 0);
        if (r2 > t) throw a.Error("r2", $"toe radius {a.Show(r2)} exceeds the thickness {a.Show(t)}; use r2 <= t");
        var o = new Outline(a.Spec).Line(0, 0).Line(b, 0).Line(b, t, r2).Line(t, t, r).Line(t, h, r2).Line(0, h);
        return new Region(o.ToLoop());
    }
}
