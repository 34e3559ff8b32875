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

    public DxfText LwPolyline(bool closed, params (double X, double Y, double Bulge)[] v)
    {
        P(0, "LWPOLYLINE").P(8, "0").P(90, v.Length).P(70, closed ? 1 : 0);
        foreach (var (x, y, b) in v) { P(10, x).P(20, y); if (b != 0) P(42, b); }
        return this;
    }

    /// <summary>A rectangle of LINEs with lower-left corner (x, y).</summary>
    public DxfText Rect(double x, double y, double w, double h, string layer = "0") =>
        Line(x, y, x + w, y, layer).Line(x + w, y, x + w, y + h, layer).Line(x + w, y + h, x, y + h, layer).Line(x, y + h, x, y, layer);

    public override string ToString() => _sb.ToString();

    public byte[] Bytes(Encoding? enc = null) => (enc ?? Encoding.UTF8).GetBytes(ToString());

    public DxfImport Read(DxfReadOptions? o = null, string name = "test.dxf") => DxfProfiles.Read(Bytes(), name, o);

    public static DxfReadOptions Mm => new() { Unit = LengthUnit.Millimetre };
}
