using System.Globalization;
using System.Text;
using SectionTwist.Geometry;
using SectionTwist.Units;

namespace SectionTwist.Import.Dxf;

/// <summary>
/// Writes a profile as ASCII DXF. R12: LINE/ARC/CIRCLE per segment (elliptical arcs as POLYLINE chords). R2000:
/// each loop as one closed LWPOLYLINE with bulges (bulge = tan(sweep / 4)), or per-segment LINE/ARC/ELLIPSE when the
/// loop has elliptical arcs. Coordinates in the drawing unit with <c>$INSUNITS</c> set; numbers round-trip exactly.
/// </summary>
internal sealed partial class DxfWriter
{
    private readonly TextWriter _w;
    private readonly DxfWriteOptions _o;
    private readonly double _k; // metres -> drawing units
    private readonly bool _r2000;
    private int _handle = 0x100;

    private DxfWriter(TextWriter w, DxfWriteOptions o, LengthUnit unit)
    {
        _w = w; _o = o; _k = 1 / unit.Metres; _r2000 = o.Version == DxfVersion.R2000;
    }

    public static void Write(Profile profile, Stream stream, DxfWriteOptions o)
    {
        var unit = o.Unit ?? profile.Unit;
        if (string.IsNullOrWhiteSpace(o.ProfileLayer)) throw new SectionTwistException("bad-option", "the DXF profile layer name must not be empty");
        var enc = CodePagesEncodingProvider.Instance.GetEncoding(1252)!;
        using var w = new StreamWriter(stream, enc, 1 << 16, leaveOpen: true) { NewLine = "\r\n" };
        var writer = new DxfWriter(w, o, unit);
        writer.WriteAll(profile, unit);
        w.Flush();
    }

    private void Pair(int code, string value) { _w.WriteLine(code.ToString(CultureInfo.InvariantCulture).PadLeft(3)); _w.WriteLine(value); }
    private void Pair(int code, double value) => Pair(code, value.ToString("R", CultureInfo.InvariantCulture));
    private void Pair(int code, int value) => Pair(code, value.ToString(CultureInfo.InvariantCulture));
    private string NextHandle() => (_handle++).ToString("X", CultureInfo.InvariantCulture);

    private void Xy(int code, Point2 p) { Pair(code, p.X * _k); Pair(code + 10, p.Y * _k); Pair(code + 20, 0.0); }

    private void WriteAll(Profile profile, LengthUnit unit)
    {
        var layers = new List<string> { "0", _o.ProfileLayer };
        foreach (var pl in _o.Polylines)
            if (!layers.Contains(pl.Layer, StringComparer.OrdinalIgnoreCase)) layers.Add(pl.Layer);
        Header(profile.Bounds, unit);
        Tables(layers);
        Blocks();
        Pair(0, "SECTION"); Pair(2, "ENTITIES");
        double chord = _o.ChordTolerance * profile.Bounds.Diagonal;
        foreach (var loop in profile.Loops) Loop(loop, chord);
        foreach (var pl in _o.Polylines) Polyline(pl.Layer, pl.Points, pl.Closed);
        Pair(0, "ENDSEC");
        if (_r2000) Objects();
        Pair(0, "EOF");
    }

    private void Header(Box2 b, LengthUnit unit)
    {
        Pair(0, "SECTION"); Pair(2, "HEADER");
        Pair(9, "$ACADVER"); Pair(1, _r2000 ? "AC1015" : "AC1009");
        Pair(9, "$DWGCODEPAGE"); Pair(3, "ANSI_1252");
        Pair(9, "$INSUNITS"); Pair(70, DxfUnits.ToCode(unit));
        Pair(9, "$MEASUREMENT"); Pair(70, unit.Metres is 0.0254 or 0.3048 ? 0 : 1);
        Pair(9, "$EXTMIN"); Xy(10, new Point2(b.MinX, b.MinY));
        Pair(9, "$EXTMAX"); Xy(10, new Point2(b.MaxX, b.MaxY));
        if (_r2000) { Pair(9, "$HANDSEED"); Pair(5, "FFFFF"); }
        Pair(0, "ENDSEC");
    }

    private void Common(string type, string layer, string subclass)
    {
        Pair(0, type);
        if (_r2000) { Pair(5, NextHandle()); Pair(330, "1F"); Pair(100, "AcDbEntity"); }
        Pair(8, layer);
        if (_r2000) Pair(100, subclass);
    }

    private void Loop(Loop loop, double chord)
    {
        string layer = _o.ProfileLayer;
        if (_r2000 && loop.Segments.Count > 1 && loop.Segments.All(s => s is not EllipticalArcSegment))
        {
            var verts = new List<(Point2 P, double Bulge)>();
            foreach (var s in loop.Segments)
            {
                if (s is ArcSegment a)
                {
                    int pieces = Math.Abs(a.Sweep) > Math.PI * 1.5 ? 2 : 1; // a bulge above 1 is legal, but halves keep full circles well-defined
                    for (int k = 0; k < pieces; k++)
                        verts.Add((a.PointAt((double)k / pieces), Math.Tan(a.Sweep / pieces / 4)));
                }
                else verts.Add((s.Start, 0));
            }
            Common("LWPOLYLINE", layer, "AcDbPolyline");
            Pair(90, verts.Count); Pair(70, 1); Pair(43, 0.0);
            foreach (var (p, bulge) in verts)
            {
                Pair(10, p.X * _k); Pair(20, p.Y * _k);
                if (bulge != 0) Pair(42, bulge);
            }
            return;
        }
        foreach (var s in loop.Segments) Segment(s, layer, chord);
    }

    private void Segment(Segment s, string layer, double chord)
    {
        switch (s)
        {
            case LineSegment l:
                Common("LINE", layer, "AcDbLine");
                Xy(10, l.Start); Xy(11, l.End);
                break;
            case ArcSegment a when Math.Abs(Math.Abs(a.Sweep) - 2 * Math.PI) < 1e-12:
                Common("CIRCLE", layer, "AcDbCircle");
                Xy(10, a.Center); Pair(40, a.Radius * _k);
                break;
            case ArcSegment a:
            {
                double from = a.Sweep > 0 ? a.StartAngle : a.StartAngle + a.Sweep;
                double d0 = Deg(from), d1 = Deg(from + Math.Abs(a.Sweep));
                Common("ARC", layer, "AcDbCircle");
                Xy(10, a.Center); Pair(40, a.Radius * _k);
                if (_r2000) Pair(100, "AcDbArc");
                Pair(50, d0); Pair(51, d1);
                break;
            }
            case EllipticalArcSegment e when _r2000:
                Ellipse(e, layer);
                break;
            default:
                Polyline(layer, s.Flatten(Math.Max(chord, 1e-300)), false);
                break;
        }
    }

    private static double Deg(double rad)
    {
        double d = rad * (180.0 / Math.PI) % 360.0;
        return d < 0 ? d + 360.0 : d;
    }
}
