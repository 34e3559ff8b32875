using System.Globalization;
using YamlDotNet.Core;
using YamlDotNet.RepresentationModel;

namespace SectionTwist.Shaft;

/// <summary>
/// Reads the shaft file (docs/shaft-file.md) from the YAML representation model, keeping every node's position so that
/// each error names the file, line and key. Stations, segments, loads, supports and springs are read here; units,
/// materials and sections in <c>ShaftFileReader.Parts.cs</c>.
/// </summary>
internal sealed partial class ShaftFileReader
{
    private static readonly string[] TopKeys = ["title", "units", "materials", "sections", "stations", "segments", "loads", "supports", "springs", "reference", "twistLimit", "bending", "warping", "dynamics", "overload"];
    private readonly ShaftFileContext _file;
    private readonly string _baseDirectory;
    private readonly Func<SectionSource, SectionStiffness>? _resolver;
    private Dictionary<string, Material> _materials = new(StringComparer.Ordinal);
    /// <summary>The file entry of each material defined under 'materials:', for messages that point at it.</summary>
    private readonly Dictionary<Material, YamlNode> _materialNodes = new(ReferenceEqualityComparer.Instance);
    private readonly Dictionary<string, double> _stations = new(StringComparer.Ordinal);
    private readonly List<Station> _stationList = [];
    private readonly List<(string A, string B)> _segmentEnds = [];
    private readonly Dictionary<string, YamlNode> _stationNodes = new(StringComparer.Ordinal);

    public ShaftFileReader(string fileName, string baseDirectory, Func<SectionSource, SectionStiffness>? resolver)
    {
        _file = new ShaftFileContext(fileName);
        _baseDirectory = baseDirectory;
        _resolver = resolver;
    }

    /// <summary>Refuse a file without a 'dynamics' block before any section is analysed (the modes command needs one).</summary>
    public bool RequireDynamics { get; init; }

    /// <summary>The refusal of a shaft file that has no 'dynamics' block.</summary>
    internal static SectionTwistException NoDynamics(string fileName) => new("shaft-file",
        $"{fileName}: the file has no 'dynamics' block; add one with the inertias, e.g. 'dynamics: {{inertias: [{{at: A, inertia: 0.05 kg*m^2}}]}}' (docs/shaft-file.md)");

    public ShaftDocument Read(string path, string text)
    {
        YamlGuard.Check(text, _file.FileName);
        var stream = new YamlStream();
        try { stream.Load(new StringReader(text)); }
        catch (YamlException e)
        {
            // the scanner places a tab in the indentation at the start of the enclosing block (often 1:1): name the tab's own line
            if (TabIndentation(text) is { } tab)
                throw new SectionTwistException("shaft-file", $"{_file.FileName}:{tab.Line}:{tab.Column}: a tab in the indentation; YAML indents with spaces only: replace the tab with spaces");
            throw new SectionTwistException("shaft-file", $"{_file.FileName}:{e.Start.Line}:{e.Start.Column}: not valid YAML: {FirstLine(e.InnerException?.Message ?? e.Message)}; check the indentation and quoting there");
        }
        catch (InvalidOperationException)
        {
            // The YAML scanner gives up without a position on some malformed input (e.g. an unclosed '{'): report the last good spot.
            var (line, col) = LastGoodPosition(text);
            throw new SectionTwistException("shaft-file", $"{_file.FileName}:{line}:{col}: not valid YAML after this point; check for an unclosed '{{' or '[' or a stray quote");
        }
        catch (Exception e) when (e is ArgumentException or FormatException or NotSupportedException or UriFormatException)
        {
            var (line, col) = LastGoodPosition(text);
            throw new SectionTwistException("shaft-file", $"{_file.FileName}:{line}:{col}: not valid YAML after this point ({YamlGuard.Short(e.Message, 120)}); check the keys, tags and quoting there");
        }
        if (stream.Documents.Count == 0)
            throw new SectionTwistException("shaft-file", $"{_file.FileName}:1: the file is empty; see docs/shaft-file.md for an example");
        var root = new YamlMap(_file, stream.Documents[0].RootNode, "the shaft file", TopKeys);
        if (RequireDynamics && root.Get("dynamics") is null) throw NoDynamics(_file.FileName);

        var units = ReadUnits(root.Get("units"));
        var materials = ReadMaterials(root.Get("materials"));
        _materials = materials;
        var sections = ReadSections(root.Get("sections"));
        ReadStations(root.Require("stations", "list the stations, e.g. '- {name: A, at: 0}'"));
        var segments = ReadSegments(root.Require("segments", "list the segments, e.g. '- {from: A, to: B, section: s1, material: m1}'"), materials, sections);
        var loads = root.Get("loads") is { } ln ? ReadLoads(ln) : [];
        var fixedStations = root.Get("supports") is { } sn ? ReadSupports(sn) : [];
        var springs = root.Get("springs") is { } spn ? ReadSprings(spn) : [];
        CheckJoined(springs);
        string? reference = root.Get("reference") is { } rn ? StationName(rn, "reference") : null;
        double? limit = root.Quantity("twistLimit", QuantityKind.TwistRate);
        if (limit is <= 0) throw _file.Error(root.Get("twistLimit")!, "twistLimit", "the twist-rate limit must be positive, e.g. '0.25 deg/m'");

        var model = new ShaftModel
        {
            Title = root.String("title"),
            Stations = _stationList,
            Segments = segments,
            Loads = loads,
            FixedStations = fixedStations,
            Springs = springs,
            ReferenceStation = reference,
            TwistRateLimit = limit,
            Bending = root.Get("bending") is { } bn ? ReadBending(bn) : null,
            Warping = root.Get("warping") is { } wn ? ReadWarping(wn) : null,
            Overload = root.Get("overload") is { } on ? ReadOverload(on, segments) : null,
        };
        CheckWarpingModulus(model);
        return new ShaftDocument(path, model, units) { Dynamics = root.Get("dynamics") is { } dn ? ReadDynamics(dn, model, materials, sections) : null };
    }

    /// <summary>
    /// Restrained warping needs E for every segment of open section (E Iw); a material of this file without it is named
    /// at its own entry, where the remedy goes, before any solve.
    /// </summary>
    private void CheckWarpingModulus(ShaftModel model)
    {
        if (model.Warping is not { } w || !w.Values.Any(x => x.Kind != WarpingTorsion.WarpingEndKind.Free)) return;
        foreach (var s in model.Segments)
            if (s.Section is { WarpingConstant: > 0 } && s.Material.YoungsModulus is null && _materialNodes.TryGetValue(s.Material, out var node))
                throw _file.Error(node, "E", $"material '{YamlGuard.Short(s.Material.Name)}' has no Young's modulus, which the restrained warping of segment {s.Label} needs (E Iw); add e.g. 'E: 210 GPa' to it, or take a library material");
    }

    /// <summary>Line and column (1-based) of the first tab in a line's leading white space, or null.</summary>
    internal static (int Line, int Column)? TabIndentation(string text)
    {
        var lines = text.Split('\n');
        for (int i = 0; i < lines.Length; i++)
        {
            for (int j = 0; j < lines[i].Length && lines[i][j] is ' ' or '\t'; j++)
                if (lines[i][j] == '\t') return (i + 1, j + 1);
        }
        return null;
    }

    private static (long Line, long Column) LastGoodPosition(string text)
    {
        long line = 1, col = 1;
        try
        {
            var parser = new Parser(new StringReader(text));
            while (parser.MoveNext()) if (parser.Current is { } ev) { line = ev.Start.Line; col = ev.Start.Column; }
        }
        catch (YamlException e) { line = e.Start.Line; col = e.Start.Column; }
        catch (Exception) { }
        return (line, col);
    }

    private static string FirstLine(string s) => s.Split('\n')[0].Trim().TrimEnd('.');

    private IEnumerable<YamlNode> Sequence(YamlNode node, string key, string example)
    {
        if (node is YamlSequenceNode seq)
        {
            int max = key == "stations" ? Limits.InputLimits.MaxStations : Limits.InputLimits.MaxShaftItems;
            if (seq.Children.Count > max)
                throw _file.Error(node, key, $"{seq.Children.Count} entries, more than the {max} SectionTwist solves in one shaft; merge {(key == "stations" ? "stations (a prismatic stretch needs none between its ends)" : "entries")} or split the shaft");
            return seq.Children;
        }
        throw _file.Error(node, key, $"expected a list (lines starting with '- '), found {YamlMap.Describe(node)}; e.g. '{example}'");
    }

    private void ReadStations(YamlNode node)
    {
        double? previous = null;
        foreach (var item in Sequence(node, "stations", "- {name: A, at: 0}"))
        {
            var m = new YamlMap(_file, item, "a station", "name", "at", "after");
            string name = m.RequireString("name", "give the station a name, e.g. 'name: A'");
            if (name.Length == 0) throw _file.Error(m.Get("name")!, "name", "the station name is empty; give it a name");
            if (_stations.ContainsKey(name)) throw _file.Error(m.Get("name")!, "name", $"station '{YamlGuard.Short(name)}' is defined twice; give each station a unique name");
            double x;
            if (m.Has("at") == m.Has("after"))
                throw _file.Error(item, "at", $"station '{YamlGuard.Short(name)}' needs exactly one of 'at' (position along the axis) or 'after' (distance from the previous station)");
            if (m.Has("at")) x = m.Quantity("at", QuantityKind.Length)!.Value;
            else
            {
                double after = m.Quantity("after", QuantityKind.Length)!.Value;
                if (previous is null) throw _file.Error(m.KeyNode("after"), "after", $"the first station '{YamlGuard.Short(name)}' has no previous station; give it 'at: 0'");
                if (!(after > 0))
                    throw _file.Error(m.Get("after")!, "after", $"negative or zero length {Si(after)} m from the previous station; stations are listed along the axis, so 'after' must be positive (use 'at' for an absolute position)");
                x = previous.Value + after;
                if (ShaftValueRange.Check(QuantityKind.Length, x) is { } far)
                    throw _file.Error(m.Get("after")!, "after", $"station '{YamlGuard.Short(name)}' ends up at {Si(x)} m, which {far}");
            }
            if (previous is { } before && x < before)
            {
                var last = _stationList[^1];
                throw _file.Error(m.KeyNode(m.Has("at") ? "at" : "after"), m.Has("at") ? "at" : "after",
                    $"station '{YamlGuard.Short(name)}' at {Len(x)} comes before the previous station '{last.Name}' at {Len(before)} " +
                    $"(line {_stationNodes[last.Name].Start.Line}); list the stations in order along the axis, or correct the position");
            }
            _stations[name] = x;
            _stationNodes[name] = item;
            _stationList.Add(new Station(name, x));
            previous = x;
        }
        if (_stationList.Count < 2) throw _file.Error(node, "stations", "a shaft needs at least two stations");
    }

    /// <summary>Reads a station reference and checks it exists.</summary>
    private string StationName(YamlNode node, string key)
    {
        if (node is not YamlScalarNode s || string.IsNullOrEmpty(s.Value))
            throw _file.Error(node, key, $"expected a station name, found {YamlMap.Describe(node)}");
        if (_stations.ContainsKey(s.Value)) return s.Value;
        string? near = Suggest.Nearest(s.Value, _stations.Keys);
        throw _file.Error(node, key, $"no station named '{YamlGuard.Short(s.Value)}'{(near is null ? "" : $"; did you mean '{near}'?")} (stations: {YamlMap.Names(_stations.Keys)}); add it under 'stations:' or fix the name");
    }

    private List<ShaftSegment> ReadSegments(YamlNode node, Dictionary<string, Material> materials, Dictionary<string, (YamlNode Node, Func<SectionStiffness> Get)> sections)
    {
        var list = new List<ShaftSegment>();
        foreach (var item in Sequence(node, "segments", "- {from: A, to: B, section: s1, material: m1}"))
        {
            var m = new YamlMap(_file, item, "a segment", "name", "from", "to", "section", "taper", "material");
            string from = StationName(m.Require("from", "name the station at one end"), "from");
            string to = StationName(m.Require("to", "name the station at the other end"), "to");
            if (from == to) throw _file.Error(m.Get("to")!, "to", $"the segment starts and ends at station '{from}'; a segment joins two different stations");
            if (_stations[from] == _stations[to])
                throw _file.Error(m.Get("to")!, "to", $"stations '{from}' and '{to}' are at the same position, so the segment has zero length; move a station or join them with a spring instead");
            var material = MaterialRef(m.Require("material", "name a material from 'materials:' or the library"), materials);
            string? name = m.String("name");
            ShaftSegment seg;
            if (m.Has("section") == m.Has("taper"))
                throw _file.Error(item, "section", "a segment needs exactly one of 'section' (a named or inline section) or 'taper' (two round diameters)");
            if (m.Get("section") is { } sn)
            {
                SectionStiffness section;
                if (sn is YamlScalarNode ss)
                {
                    string key = ss.Value ?? "";
                    if (!sections.TryGetValue(key, out var entry))
                    {
                        string? near = Suggest.Nearest(key, sections.Keys);
                        throw _file.Error(sn, "section", $"no section named '{YamlGuard.Short(key)}'{(near is null ? "" : $"; did you mean '{near}'?")} (sections: {(sections.Count == 0 ? "none" : YamlMap.Names(sections.Keys))}); define it under 'sections:' or write it inline, e.g. 'section: {{round: 40 mm}}'");
                    }
                    section = entry.Get();
                }
                else section = ReadSection(sn, $"{from}-{to}")();
                // a composite section: J referred to this segment's material, so that G J is the effective rigidity
                if (section.TorsionalRigidity is { } gj) section = section with { TorsionConstant = gj / material.ShearModulus };
                seg = new ShaftSegment(from, to, section, material) { Name = name };
            }
            else
            {
                var tn = m.Get("taper")!;
                (double a, double b) = ReadTaper(tn);
                seg = new ShaftSegment(from, to, new RoundTaper(a, b), material) { Name = name };
            }
            _segmentEnds.Add((from, to));
            _segmentNodes.Add(item);
            list.Add(seg);
        }
        CheckOverlaps(list);
        return list;
    }

    private readonly List<YamlNode> _segmentNodes = [];

    /// <summary>Two segments over the same stretch of the axis: named with both lines (the model would only say "overlap").</summary>
    private void CheckOverlaps(List<ShaftSegment> segments)
    {
        var spans = segments.Select((s, i) => (Lo: Math.Min(_stations[s.From], _stations[s.To]), Hi: Math.Max(_stations[s.From], _stations[s.To]), Index: i))
            .OrderBy(x => x.Lo).ThenBy(x => x.Index).ToList();
        for (int k = 1; k < spans.Count; k++)
        {
            var (prev, cur) = (spans[k - 1], spans[k]);
            if (cur.Lo >= prev.Hi - 1e-12 * Math.Max(1, Math.Abs(prev.Hi))) continue;
            var (a, b) = cur.Index > prev.Index ? (prev, cur) : (cur, prev);
            throw _file.Error(_segmentNodes[b.Index], "segments",
                $"segment {segments[b.Index].Label} overlaps segment {segments[a.Index].Label} (line {_segmentNodes[a.Index].Start.Line}) between " +
                $"{Len(Math.Max(a.Lo, b.Lo))} and {Len(Math.Min(a.Hi, b.Hi))}; each length of shaft belongs to one segment: join consecutive stations");
        }
    }

    /// <summary>A station that no segment or spring touches has no rotation to compute: named with its line.</summary>
    private void CheckJoined(List<TorsionalSpring> springs)
    {
        var joined = new HashSet<string>(StringComparer.Ordinal);
        foreach (var (a, b) in _segmentEnds) { joined.Add(a); joined.Add(b); }
        foreach (var sp in springs) { joined.Add(sp.StationA); joined.Add(sp.StationB); }
        foreach (var st in _stationList)
            if (!joined.Contains(st.Name))
                throw _file.Error(_stationNodes[st.Name], "stations",
                    $"station '{st.Name}' is joined to no segment or spring, so its rotation is undetermined; connect it with a segment or spring, or remove it");
    }

    private (double, double) ReadTaper(YamlNode node)
    {
        YamlNode a, b;
        if (node is YamlSequenceNode seq && seq.Children.Count == 2) { a = seq.Children[0]; b = seq.Children[1]; }
        else
        {
            var m = new YamlMap(_file, node, "a taper", "from", "to");
            a = m.Require("from", "give the diameter at the 'from' station"); b = m.Require("to", "give the diameter at the 'to' station");
        }
        return (Diameter(a, "taper"), Diameter(b, "taper"));
    }

    private double Diameter(YamlNode node, string key)
    {
        double d = _file.Quantity(node, key, QuantityKind.Length);
        if (!(d > 0)) throw _file.Error(node, key, $"negative or zero length {Si(d)} m for a diameter; a diameter must be positive");
        return d;
    }

    private List<ShaftLoad> ReadLoads(YamlNode node)
    {
        var list = new List<ShaftLoad>();
        foreach (var item in Sequence(node, "loads", "- {at: A, torque: 250 N*m}"))
        {
            var m = new YamlMap(_file, item, "a load", "name", "at", "from", "to", "torque", "power", "speed", "torquePerLength");
            string? name = m.String("name");
            int kinds = (m.Has("torque") ? 1 : 0) + (m.Has("power") ? 1 : 0) + (m.Has("torquePerLength") ? 1 : 0);
            if (kinds != 1)
                throw _file.Error(item, "torque", "a load needs exactly one of 'torque', 'power' (with 'speed') or 'torquePerLength'");
            if (m.Has("power") != m.Has("speed"))
                throw _file.Error(item, m.Has("power") ? "speed" : "power", "'power' and 'speed' go together: T = P / omega; give both, e.g. 'power: 7.5 kW, speed: 1450 rpm'");
            double total = 0;
            string? auto = null;
            if (m.Has("torque")) total = m.Quantity("torque", QuantityKind.Torque)!.Value;
            else if (m.Has("power"))
            {
                double p = m.Quantity("power", QuantityKind.Power)!.Value, w = m.Quantity("speed", QuantityKind.Speed)!.Value;
                if (w == 0) throw _file.Error(m.Get("speed")!, "speed", "speed must not be zero to turn power into torque");
                total = ShaftPower.Torque(p, w);
                if (ShaftValueRange.Check(QuantityKind.Torque, total) is { } big)
                    throw _file.Error(m.Get("power")!, "power", $"power / speed gives a torque of {Si(total)} N*m, which {big}");
                auto = $"{m.String("power")} at {m.String("speed")}";
            }
            if (m.Has("at"))
            {
                if (m.Has("from") || m.Has("to")) throw _file.Error(item, "at", "a load is either at one station ('at') or spread over a segment ('from' and 'to'), not both");
                if (m.Has("torquePerLength")) throw _file.Error(m.KeyNode("torquePerLength"), "torquePerLength", "a torque per length needs a segment: give 'from' and 'to' instead of 'at'");
                list.Add(new PointTorque(StationName(m.Get("at")!, "at"), total) { Description = name ?? auto });
                continue;
            }
            string from = StationName(m.Require("from", "give 'at: STATION' for a point torque, or 'from' and 'to' for a segment"), "from");
            string to = StationName(m.Require("to", "give the other end of the segment"), "to");
            if (!_segmentEnds.Contains((from, to)) && !_segmentEnds.Contains((to, from)))
                throw _file.Error(m.Get("to")!, "to", $"no segment joins '{from}' and '{to}'; a distributed torque acts on one segment (split it into one load per segment)");
            double length = Math.Abs(_stations[to] - _stations[from]);
            double perLength = m.Has("torquePerLength") ? m.Quantity("torquePerLength", QuantityKind.TorquePerLength)!.Value : total / length;
            if (ShaftValueRange.Check(QuantityKind.TorquePerLength, perLength) is { } dense)
                throw _file.Error(m.Get("to")!, "to", $"the load spread over {from}-{to} is {Si(perLength)} N*m/m, which {dense}");
            list.Add(new DistributedTorque(from, to, perLength) { Description = name ?? auto });
        }
        return list;
    }

    private List<string> ReadSupports(YamlNode node)
    {
        if (node is YamlScalarNode { Value: "free" }) return [];
        var m = new YamlMap(_file, node, "supports", "fixed");
        var f = m.Require("fixed", "list the stations held against rotation, e.g. 'fixed: [A, E]', or write 'supports: free'");
        if (f is YamlScalarNode) return [StationName(f, "fixed")];
        return [.. Sequence(f, "fixed", "fixed: [A, E]").Select(n => StationName(n, "fixed"))];
    }

    private List<TorsionalSpring> ReadSprings(YamlNode node)
    {
        var list = new List<TorsionalSpring>();
        foreach (var item in Sequence(node, "springs", "- {between: [A, B], stiffness: 5 kN*m/rad}"))
        {
            var m = new YamlMap(_file, item, "a spring", "name", "between", "stiffness");
            var between = m.Require("between", "name the two stations, e.g. 'between: [A, B]'");
            if (between is not YamlSequenceNode { Children.Count: 2 } pair)
                throw _file.Error(between, "between", "expected two station names, e.g. 'between: [A, B]'");
            string a = StationName(pair.Children[0], "between"), b = StationName(pair.Children[1], "between");
            if (a == b) throw _file.Error(between, "between", "a spring joins two different stations");
            double k = m.Quantity("stiffness", QuantityKind.RotationalStiffness) ?? throw _file.Error(item, "stiffness", "a spring needs 'stiffness', e.g. '5 kN*m/rad'");
            if (!(k > 0)) throw _file.Error(m.Get("stiffness")!, "stiffness", "the stiffness must be positive");
            list.Add(new TorsionalSpring(a, b, k) { Name = m.String("name") });
        }
        return list;
    }

    private static string Si(double v) => v.ToString("G6", CultureInfo.InvariantCulture);

    /// <summary>A length (m) in the file's length unit for messages, e.g. <c>120 mm</c> (mm when the file names none).</summary>
    private string Len(double metres)
    {
        var (symbol, factor) = _file.Default(QuantityKind.Length) ?? ("mm", 1e-3);
        return $"{Units.NumberText.Format(metres / factor, 6)} {Units.DisplayUnit.Spell(symbol)}";
    }
}
