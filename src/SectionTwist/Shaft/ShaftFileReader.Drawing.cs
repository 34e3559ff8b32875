using System.Globalization;
using SectionTwist.Geometry;
using SectionTwist.Units;
using YamlDotNet.RepresentationModel;

namespace SectionTwist.Shaft;

/// <summary>The keys of a DXF section: which layers, which part (by number, point or window), hatch, facets, snap, unit.</summary>
internal sealed partial class ShaftFileReader
{
    private static readonly string[] DrawingKeys = ["layer", "part", "at", "window", "hatch", "fitArcs", "snap", "skipOpen", "unit"];

    private SectionSource ReadDrawingKeys(YamlMap m, string name, string dxfPath)
    {
        string? layer = m.Get("layer") switch
        {
            null => null,
            YamlSequenceNode seq => string.Join(",", seq.Children.Select(c => c is YamlScalarNode s ? s.Value ?? ""
                : throw _file.Error(c, "layer", "expected layer names, e.g. 'layer: [OUTSIDE, BORES]'"))),
            _ => m.String("layer"),
        };
        if (m.Has("part") && m.Has("at")) throw _file.Error(m.KeyNode("at"), "at", "give either 'part' or 'at', not both");
        var at = m.Get("at") is { } an ? Numbers(an, "at", 2, "at: [20, 15]") : null;
        var window = m.Get("window") is { } wn ? Numbers(wn, "window", 4, "window: [0, 0, 120, 80]") : null;
        Box2? box = null;
        if (window is { } w)
        {
            box = new Box2(Math.Min(w[0], w[2]), Math.Min(w[1], w[3]), Math.Max(w[0], w[2]), Math.Max(w[1], w[3]));
            if (!(box.Value.Width > 0 && box.Value.Height > 0))
                throw _file.Error(m.Get("window")!, "window", "the window needs two opposite corners with x1 != x2 and y1 != y2, e.g. 'window: [0, 0, 120, 80]'");
        }
        return new SectionSource(name, null, dxfPath, layer, m.String("part"), _file.Where(m.Get("dxf")!))
        {
            At = at is null ? null : new Point2(at[0], at[1]),
            Window = box,
            UseHatches = Flag(m, "hatch"),
            SkipOpen = Flag(m, "skipOpen"),
            FitArcs = Number(m, "fitArcs", "fitArcs: 1e-4"),
            SnapTolerance = Number(m, "snap", "snap: 1e-5"),
            Unit = m.String("unit") is { } u ? LengthUnit.Parse(u, $"{_file.Where(m.Get("unit")!)}: unit") : null,
        };
    }

    private double[] Numbers(YamlNode n, string key, int count, string example)
    {
        var items = n switch
        {
            YamlSequenceNode seq => seq.Children.Select(c => (c as YamlScalarNode)?.Value ?? "").ToArray(),
            YamlScalarNode s => (s.Value ?? "").Split(',', StringSplitOptions.TrimEntries),
            _ => [],
        };
        var v = new double[items.Length];
        if (items.Length != count || !items.Select((t, i) => double.TryParse(t, NumberStyles.Float, CultureInfo.InvariantCulture, out v[i]) && double.IsFinite(v[i])).All(ok => ok))
            throw _file.Error(n, key, $"expected {count} numbers in drawing units, e.g. '{example}', found {YamlMap.Describe(n)}");
        return v;
    }

    private bool Flag(YamlMap m, string key) => m.String(key) switch
    {
        null => false,
        "true" or "yes" => true,
        "false" or "no" => false,
        var other => throw _file.Error(m.Get(key)!, key, $"expected true or false, found '{other}'"),
    };

    private double? Number(YamlMap m, string key, string example)
    {
        if (m.String(key) is not { } t) return null;
        if (!double.TryParse(t, NumberStyles.Float, CultureInfo.InvariantCulture, out double v) || !double.IsFinite(v))
            throw _file.Error(m.Get(key)!, key, $"expected a number (a fraction of the size), e.g. '{example}', found '{t}'");
        return v;
    }
}
