using System.Globalization;
using System.Text;
using SectionTwist.Import.Dxf;
using SectionTwist.Units;

namespace SectionTwist.Tests.Import;

/// <summary>Builds small DXF files in tests: pairs of group code and value, wrapped in sections.</summary>
internal sealed class DxfText
{
    private readonly StringBuilder _sb = new();
    public string NewLine { get; init; } = "\n";

    public DxfText P(int code, object value)
    {
        string v = value switch
        {
            double d => d.ToString("R", CultureInfo.InvariantCulture),
            int i => i.ToString(CultureInfo.InvariantCulture),
            _ => value.ToString()!,
        };
        _sb.Append(code.ToString(CultureInfo.InvariantCulture)).Append(NewLine).Append(v).Append(NewLine);
        return this;
    }

    public DxfText Header(int? insUnits = 4, string acadVer = "AC1009", string? codePage = null)
    {
        P(0, "SECTION").P(2, "HEADER").P(9, "$ACADVER").P(1, acadVer);
        if (codePage is not null) P(9, "$DWGCODEPAGE").P(3, codePage);
        if (insUnits is { } u) P(9, "$INSUNITS").P(70, u);
        return P(0, "ENDSEC");
    }

    public DxfText Entities() => P(0, "SECTION").P(2, "ENTITIES");
    public DxfText End() => P(0, "ENDSEC").P(0, "EOF");

    public DxfText Line(double x0, double y0, double x1, double y1, string layer = "0") =>
        P(0, "LINE").P(8, layer).P(10, x0).P(20, y0).P(30, 0.0).P(11, x1).P(21, y1).P(31, 0.0);

    public DxfText Arc(double cx, double cy, double r, double a0, double a1, string layer = "0", double nz = 1) =>
        P(0, "ARC").P(8, layer).P(10, cx).P(20, cy).P(30, 0.0).P(40, r).P(50, a0).P(51, a1).P(210, 0.0).P(220, 0.0).P(230, nz);

    public DxfText Circle(double cx, double cy, double r, string layer = "0", double nz = 1) =>
        P(0, "CIRCLE").P(8, layer).P(10, cx).P(20, cy).P(30, 0.0).P(40, r).P(210, 0.0).P(220, 0.0).P(230, nz);

    public DxfText LwPolyline(bool closed, params (double X, double Y, double Bulge)[] v) => LwPolylineOn("0", closed, v);

    public DxfText LwPolylineOn(string layer, bool closed, params (double X, double Y, double Bulge)[] v)
    {
        P(0, "LWPOLYLINE").P(8, layer).P(90, v.Length).P(70, closed ? 1 : 0);
        foreach (var (x, y, b) in v) { P(10, x).P(20, y); if (b != 0) P(42, b); }
        return this;
    }

    /// <summary>A closed LWPOLYLINE through the points (no bulges).</summary>
    public DxfText Polygon(string layer, params (double X, double Y)[] pts) => Polygon(layer, pts.AsEnumerable());

    /// <summary>A closed LWPOLYLINE through the points (no bulges).</summary>
    public DxfText Polygon(string layer, IEnumerable<(double X, double Y)> pts) =>
        LwPolylineOn(layer, true, pts.Select(p => (p.X, p.Y, 0.0)).ToArray());

    public DxfText Text(double x, double y, string text, string layer = "0") =>
        P(0, "TEXT").P(8, layer).P(10, x).P(20, y).P(30, 0.0).P(40, 2.5).P(1, text);

    /// <summary>A DIMENSION entity (skipped by the reader; its block is not expanded).</summary>
    public DxfText Dimension(double x0, double y0, double x1, double y1, string layer = "DIM") =>
        P(0, "DIMENSION").P(8, layer).P(2, "*D1").P(10, x1).P(20, y0 - 5).P(30, 0.0).P(13, x0).P(23, y0).P(14, x1).P(24, y1).P(70, 32);

    /// <summary>A HATCH whose boundary paths are closed polylines (with bulges); the first path is the outer one.</summary>
    public DxfText HatchPolylines(string layer, params (double X, double Y, double Bulge)[][] paths)
    {
        HatchHead(layer, paths.Length);
        for (int k = 0; k < paths.Length; k++)
        {
            P(92, k == 0 ? 3 : 2).P(72, 1).P(73, 1).P(93, paths[k].Length);
            foreach (var (x, y, b) in paths[k]) P(10, x).P(20, y).P(42, b);
            P(97, 0);
        }
        return HatchTail();
    }

    /// <summary>The start of a HATCH: elevation point, extrusion, pattern, solid fill flag, associativity, path count.</summary>
    public DxfText HatchHead(string layer, int paths) =>
        P(0, "HATCH").P(8, layer).P(10, 0.0).P(20, 0.0).P(30, 0.0).P(210, 0.0).P(220, 0.0).P(230, 1.0).P(2, "ANSI31").P(70, 0).P(71, 1).P(91, paths);

    /// <summary>The end of a HATCH: style, pattern type, angle, scale, one pattern line, no seed points.</summary>
    public DxfText HatchTail() =>
        P(75, 1).P(76, 1).P(52, 0.0).P(41, 1.0).P(77, 0).P(78, 1).P(53, 45.0).P(43, 0.0).P(44, 0.0).P(45, -2.2).P(46, 2.2).P(79, 0).P(98, 1).P(10, 1.0).P(20, 1.0);

    /// <summary>A rectangle of LINEs with lower-left corner (x, y).</summary>
    public DxfText Rect(double x, double y, double w, double h, string layer = "0") =>
        Line(x, y, x + w, y, layer).Line(x + w, y, x + w, y + h, layer).Line(x + w, y + h, x, y + h, layer).Line(x, y + h, x, y, layer);

    public override string ToString() => _sb.ToString();

    public byte[] Bytes(Encoding? enc = null) => (enc ?? Encoding.UTF8).GetBytes(ToString());

    public DxfImport Read(DxfReadOptions? o = null, string name = "test.dxf") => DxfProfiles.Read(Bytes(), name, o);

    public static DxfReadOptions Mm => new() { Unit = LengthUnit.Millimetre };
}
