using SectionTwist.Geometry;

namespace SectionTwist.Import.Dxf;

/// <summary>Tables, blocks, objects, ellipses and polylines.</summary>
internal sealed partial class DxfWriter
{
    private void Ellipse(EllipticalArcSegment e, string layer)
    {
        double a = e.SemiMajor, b = e.SemiMinor, rot = e.Rotation, u0 = e.StartParameter;
        // DXF wants ratio <= 1: if the second axis is longer, make it the major axis (u -> u - pi/2, see Conics)
        if (b > a) { (a, b) = (b, a); rot += Math.PI / 2; u0 -= Math.PI / 2; }
        double sweep = e.Sweep;
        double start = sweep > 0 ? u0 : u0 + sweep;
        double len = Math.Abs(sweep);
        bool full = Math.Abs(len - 2 * Math.PI) < 1e-12;
        Common("ELLIPSE", layer, "AcDbEllipse");
        Xy(10, e.Center);
        Pair(11, a * Math.Cos(rot) * _k); Pair(21, a * Math.Sin(rot) * _k); Pair(31, 0.0);
        Pair(210, 0.0); Pair(220, 0.0); Pair(230, 1.0);
        Pair(40, b / a);
        double s = full ? 0 : ((start % (2 * Math.PI)) + 2 * Math.PI) % (2 * Math.PI);
        Pair(41, s);
        Pair(42, full ? 2 * Math.PI : s + len);
    }

    private void Polyline(string layer, IReadOnlyList<Point2> pts, bool closed)
    {
        if (pts.Count < 2) return;
        if (_r2000)
        {
            Common("LWPOLYLINE", layer, "AcDbPolyline");
            Pair(90, pts.Count); Pair(70, closed ? 1 : 0); Pair(43, 0.0);
            foreach (var p in pts) { Pair(10, p.X * _k); Pair(20, p.Y * _k); }
            return;
        }
        Pair(0, "POLYLINE"); Pair(8, layer); Pair(66, 1); Xy(10, default); Pair(70, closed ? 1 : 0);
        foreach (var p in pts) { Pair(0, "VERTEX"); Pair(8, layer); Xy(10, p); }
        Pair(0, "SEQEND"); Pair(8, layer);
    }

    private void Tables(List<string> layers)
    {
        Pair(0, "SECTION"); Pair(2, "TABLES");
        if (_r2000)
        {
            Table("VPORT", "8", []);
            Table("LTYPE", "5", ["ByBlock", "ByLayer", "Continuous"]);
        }
        else Table("LTYPE", "5", ["CONTINUOUS"]);
        Table("LAYER", "2", layers);
        if (_r2000)
        {
            Table("STYLE", "3", ["Standard"]);
            Table("VIEW", "6", []);
            Table("UCS", "7", []);
            Table("APPID", "9", ["ACAD"]);
            Table("DIMSTYLE", "A", ["Standard"]);
            Table("BLOCK_RECORD", "1", ["*Model_Space", "*Paper_Space"]);
        }
        Pair(0, "ENDSEC");
    }

    private void Table(string name, string handle, IReadOnlyList<string> entries)
    {
        Pair(0, "TABLE"); Pair(2, name);
        if (_r2000) { Pair(5, handle); Pair(330, "0"); Pair(100, "AcDbSymbolTable"); }
        Pair(70, entries.Count);
        if (_r2000 && name == "DIMSTYLE") Pair(100, "AcDbDimStyleTable");
        foreach (var e in entries)
        {
            string h = e == "*Model_Space" ? "1F" : e == "*Paper_Space" ? "1E" : NextHandle();
            Pair(0, name);
            if (_r2000)
            {
                Pair(name == "DIMSTYLE" ? 105 : 5, h); Pair(330, handle); Pair(100, "AcDbSymbolTableRecord");
                Pair(100, name switch
                {
                    "LTYPE" => "AcDbLinetypeTableRecord", "LAYER" => "AcDbLayerTableRecord", "STYLE" => "AcDbTextStyleTableRecord",
                    "APPID" => "AcDbRegAppTableRecord", "DIMSTYLE" => "AcDbDimStyleTableRecord", _ => "AcDbBlockTableRecord",
                });
            }
            Pair(2, e);
            if (name != "BLOCK_RECORD") Pair(70, 0);
            switch (name)
            {
                case "LTYPE": Pair(3, e.Equals("Continuous", StringComparison.OrdinalIgnoreCase) ? "Solid line" : ""); Pair(72, 65); Pair(73, 0); Pair(40, 0.0); break;
                case "LAYER": Pair(62, 7); Pair(6, _r2000 ? "Continuous" : "CONTINUOUS"); break;
                case "STYLE": Pair(40, 0.0); Pair(41, 1.0); Pair(50, 0.0); Pair(71, 0); Pair(42, 2.5); Pair(3, "txt"); Pair(4, ""); break;
            }
        }
        Pair(0, "ENDTAB");
    }

    private void Blocks()
    {
        Pair(0, "SECTION"); Pair(2, "BLOCKS");
        if (_r2000)
        {
            foreach (var (name, owner) in new[] { ("*Model_Space", "1F"), ("*Paper_Space", "1E") })
            {
                Pair(0, "BLOCK"); Pair(5, NextHandle()); Pair(330, owner); Pair(100, "AcDbEntity"); Pair(8, "0");
                Pair(100, "AcDbBlockBegin"); Pair(2, name); Pair(70, 0); Xy(10, default); Pair(3, name); Pair(1, "");
                Pair(0, "ENDBLK"); Pair(5, NextHandle()); Pair(330, owner); Pair(100, "AcDbEntity"); Pair(8, "0"); Pair(100, "AcDbBlockEnd");
            }
        }
        Pair(0, "ENDSEC");
    }

    private void Objects()
    {
        Pair(0, "SECTION"); Pair(2, "OBJECTS");
        Pair(0, "DICTIONARY"); Pair(5, "C"); Pair(330, "0"); Pair(100, "AcDbDictionary"); Pair(281, 1); Pair(3, "ACAD_GROUP"); Pair(350, "D");
        Pair(0, "DICTIONARY"); Pair(5, "D"); Pair(330, "C"); Pair(100, "AcDbDictionary"); Pair(281, 1);
        Pair(0, "ENDSEC");
    }
}
