using System.Globalization;
using SectionTwist.Geometry;

namespace SectionTwist.Import.Dxf;

/// <summary>
/// Remedies in messages name what the user can type where they are: a command-line option (<c>--snap 2e-4</c>) for
/// <c>section</c> and <c>inspect</c>, or a key of the shaft file's section (<c>snap: 2e-4</c>) for <c>shaft</c>.
/// </summary>
internal sealed class DxfRemedy(bool shaftFileKeys)
{
    public bool ShaftFileKeys => shaftFileKeys;

    public string Snap(double v) => shaftFileKeys ? $"'snap: {Num(v)}'" : $"--snap {Num(v)}";
    public string Layer(string v) => shaftFileKeys ? $"'layer: {v}'" : $"--layer {Quote(v)}";
    public string Materials(IEnumerable<string> layers) => shaftFileKeys
        ? $"'materials: {{{string.Join(", ", layers.Select(l => l + ": MATERIAL"))}}}'" : $"--material {Quote(string.Join(",", layers.Select(l => l + "=MATERIAL")))} on 'section' ('inspect' lists one layer's parts with --layer NAME)";
    public string Part(int n) => shaftFileKeys ? $"'part: {n}'" : $"--part {n}";
    public string At(Point2 p) => shaftFileKeys ? $"'at: [{Num(p.X)}, {Num(p.Y)}]'" : $"--at {Num(p.X)},{Num(p.Y)}";
    public string Window(Box2 b) => shaftFileKeys
        ? $"'window: [{Num(b.MinX)}, {Num(b.MinY)}, {Num(b.MaxX)}, {Num(b.MaxY)}]'"
        : $"--window {Num(b.MinX)},{Num(b.MinY)},{Num(b.MaxX)},{Num(b.MaxY)}";
    public string WindowWord => shaftFileKeys ? "'window: [x1, y1, x2, y2]'" : "--window x1,y1,x2,y2";
    public string Hatch => shaftFileKeys ? "'hatch: true'" : "--hatch";
    public string FitArcs(double v) => shaftFileKeys ? $"'fitArcs: {Num(v)}'" : $"--fit-arcs {Num(v)}";
    public string SkipOpen => shaftFileKeys ? "'skipOpen: true'" : "--skip-open";
    public string Unit => shaftFileKeys ? "'unit: mm' (or in, cm, m, ft) to the section" : "--unit mm (or in, cm, m, ft)";

    /// <summary>"sectiontwist inspect FILE" (lists the regions).</summary>
    public static string Inspect(string file) => $"'sectiontwist inspect {file}'";

    /// <summary>A number as typed: up to 6 significant digits, invariant culture.</summary>
    public static string Num(double v)
    {
        string s = (Math.Abs(v) < 1e-300 ? 0 : v).ToString("G6", CultureInfo.InvariantCulture);
        int e = s.IndexOf('E', StringComparison.Ordinal);
        return e < 0 ? s : $"{s[..e]}e{int.Parse(s[(e + 1)..], CultureInfo.InvariantCulture)}";
    }

    /// <summary>A relative tolerance rounded up to one significant digit (2.3e-4 -> 3e-4).</summary>
    public static double RoundUp1(double v)
    {
        if (!(v > 0)) return v;
        double e = Math.Pow(10, Math.Floor(Math.Log10(v)));
        double m = Math.Ceiling(v / e * (1 - 1e-12));
        return m * e;
    }

    private static string Quote(string v) => v.IndexOfAny([' ', '(', ')', '*', '?', ';', '&', '|', '\'', '"']) >= 0 ? $"\"{v}\"" : v;
}
