using System.Globalization;
using System.Text;

namespace SectionTwist.Benchmarks;

/// <summary>Writes entities of a benchmark sheet as ASCII DXF pairs (R2000 header, $INSUNITS = 4, millimetres).</summary>
internal sealed class SheetWriter
{
    private readonly StringBuilder _sb = new();
    private int _handle = 0x100;

    public SheetWriter()
    {
        P(0, "SECTION").P(2, "HEADER").P(9, "$ACADVER").P(1, "AC1015").P(9, "$INSUNITS").P(70, "4").P(0, "ENDSEC");
        P(0, "SECTION").P(2, "ENTITIES");
    }

    public int Count { get; private set; }

    private SheetWriter P(int code, string v)
    {
        _sb.Append(code.ToString(CultureInfo.InvariantCulture)).Append('\n').Append(v).Append('\n');
        return this;
    }

    private SheetWriter P(int code, double v) => P(code, v.ToString("R", CultureInfo.InvariantCulture));

    private SheetWriter Head(string type, string layer)
    {
        Count++;
        return P(0, type).P(5, (_handle++).ToString("X", CultureInfo.InvariantCulture)).P(8, layer);
    }

    public void Line(double x0, double y0, double x1, double y1, string layer) =>
        Head("LINE", layer).P(10, x0).P(20, y0).P(30, 0.0).P(11, x1).P(21, y1).P(31, 0.0);

    public void Rect(double x, double y, double w, double h, string layer)
    {
        Line(x, y, x + w, y, layer); Line(x + w, y, x + w, y + h, layer); Line(x + w, y + h, x, y + h, layer); Line(x, y + h, x, y, layer);
    }

    public void Circle(double x, double y, double r, string layer) => Head("CIRCLE", layer).P(10, x).P(20, y).P(30, 0.0).P(40, r);

    public void Arc(double x, double y, double r, double a0, double a1, string layer) =>
        Head("ARC", layer).P(10, x).P(20, y).P(30, 0.0).P(40, r).P(50, a0).P(51, a1);

    public void Text(double x, double y, string text, string layer) => Head("TEXT", layer).P(10, x).P(20, y).P(30, 0.0).P(40, 2.5).P(1, text);

    public void Dimension(double x, double y, string layer) =>
        Head("DIMENSION", layer).P(2, "*D1").P(10, x + 8).P(20, y - 3).P(30, 0.0).P(13, x).P(23, y).P(14, x + 8).P(24, y).P(70, "32");

    public override string ToString() => new StringBuilder(_sb.ToString()).Append("0\nENDSEC\n0\nEOF\n").ToString();
}
