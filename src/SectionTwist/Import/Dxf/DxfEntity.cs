using SectionTwist.Geometry;

namespace SectionTwist.Import.Dxf;

/// <summary>One DXF entity: its type, its pairs (in file order) and, for POLYLINE, its VERTEX entities.</summary>
internal sealed class DxfEntity(string type, int line, List<DxfPair> pairs, string file)
{
    public string Type { get; } = type;
    public int Line { get; } = line;
    public List<DxfPair> Pairs { get; } = pairs;
    public string File { get; } = file;
    public List<DxfEntity> Vertices { get; } = [];

    public string Layer => Str(8) ?? "0";
    public string? Handle => Str(5);
    public bool PaperSpace => Int(67, 0) == 1;

    /// <summary>"ARC (handle 2F, line 120)" for messages.</summary>
    public string Describe() => Handle is { } h ? $"{Type} (handle {h}, line {Line})" : $"{Type} (line {Line})";

    public string? Str(int code)
    {
        foreach (var p in Pairs) if (p.Code == code) return p.Value;
        return null;
    }

    public double Dbl(int code, double fallback)
    {
        foreach (var p in Pairs) if (p.Code == code) return p.AsDouble(File);
        return fallback;
    }

    public int Int(int code, int fallback)
    {
        foreach (var p in Pairs) if (p.Code == code) return p.AsInt(File);
        return fallback;
    }

    public Point2 Pt(int xCode, double fx = 0, double fy = 0) => new(Dbl(xCode, fx), Dbl(xCode + 10, fy));

    public double Z(int xCode) => Dbl(xCode + 20, 0);

    /// <summary>The extrusion direction 210/220/230 (default +Z).</summary>
    public (double X, double Y, double Z) Extrusion => (Dbl(210, 0), Dbl(220, 0), Dbl(230, 1));

    /// <summary>All values of one code, in order.</summary>
    public IEnumerable<double> All(int code)
    {
        foreach (var p in Pairs) if (p.Code == code) yield return p.AsDouble(File);
    }

    /// <summary>Points from repeated x codes paired with the next y code (e.g. spline control points 10/20).</summary>
    public List<Point2> Points(int xCode)
    {
        var list = new List<Point2>();
        for (int i = 0; i < Pairs.Count; i++)
        {
            if (Pairs[i].Code != xCode) continue;
            double x = Pairs[i].AsDouble(File), y = 0;
            for (int j = i + 1; j < Pairs.Count && j <= i + 3; j++)
                if (Pairs[j].Code == xCode + 10) { y = Pairs[j].AsDouble(File); break; }
            list.Add(new Point2(x, y));
        }
        return list;
    }
}

/// <summary>A block definition: name, base point and entities.</summary>
internal sealed class DxfBlock(string name, Point2 basePoint, int line)
{
    public string Name { get; } = name;
    public Point2 Base { get; } = basePoint;
    public int Line { get; } = line;
    public List<DxfEntity> Entities { get; } = [];
}
