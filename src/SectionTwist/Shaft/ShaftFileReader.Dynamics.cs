using System.Globalization;
using SectionTwist.Dynamics;
using YamlDotNet.RepresentationModel;

namespace SectionTwist.Shaft;

/// <summary>The <c>dynamics</c> block of the shaft file (docs/shaft-file.md, "Dynamics"): further shafts, stages, inertias, excitations.</summary>
internal sealed partial class ShaftFileReader
{
    private static readonly string[] DynamicsKeys =
        ["shaft", "fixed", "shafts", "stages", "inertias", "modes", "tolerance", "speeds", "orders", "bands", "damping", "harmonic"];

    /// <summary>Mass moment of inertia units, kg*m^2 per unit (lb = 0.45359237 kg, in = 0.0254 m, lbf = 4.4482216152605 N).</summary>
    private static readonly Dictionary<string, double> InertiaUnits = new(StringComparer.Ordinal)
    {
        ["kg*m^2"] = 1, ["kg*cm^2"] = 1e-4, ["kg*mm^2"] = 1e-6, ["g*cm^2"] = 1e-7, ["t*m^2"] = 1e3,
        ["lb*in^2"] = 0.45359237 * 0.0254 * 0.0254, ["lb*ft^2"] = 0.45359237 * 0.3048 * 0.3048,
        ["lbf*in*s^2"] = 4.4482216152605 * 0.0254, ["lbf*ft*s^2"] = 4.4482216152605 * 0.3048, ["slug*ft^2"] = 4.4482216152605 * 0.3048,
    };

    /// <summary>GD^2 units: J = GD^2 / 4 with the weight in kgf (or lbf, giving lb*ft^2); J = GD^2 / (4 g) with the weight in N.</summary>
    private static readonly Dictionary<string, double> Gd2Units = new(StringComparer.Ordinal)
    {
        ["kgf*m^2"] = 0.25, ["kg*m^2"] = 0.25, ["N*m^2"] = 0.25 / PointInertia.StandardGravity,
        ["lbf*ft^2"] = 0.25 * 0.45359237 * 0.3048 * 0.3048, ["lb*ft^2"] = 0.25 * 0.45359237 * 0.3048 * 0.3048,
    };

    private ShaftFileReader(ShaftFileContext file, string baseDirectory, Func<SectionSource, SectionStiffness>? resolver)
    {
        _file = file;
        _baseDirectory = baseDirectory;
        _resolver = resolver;
    }

    private DynamicsInput ReadDynamics(YamlNode node, ShaftModel main, Dictionary<string, Material> materials, Dictionary<string, (YamlNode Node, Func<SectionStiffness> Get)> sections)
    {
        var m = new YamlMap(_file, node, "dynamics", DynamicsKeys);
        string mainName = m.String("shaft") ?? "main";
        var shafts = new List<ShaftBranch> { new(mainName, main) };
        var stationShaft = new Dictionary<string, string>(StringComparer.Ordinal);
        foreach (var s in main.Stations) stationShaft[s.Name] = mainName;
        if (m.Get("shafts") is { } sn)
        {
            foreach (var item in Sequence(sn, "shafts", "- {name: motor shaft, stations: [...], segments: [...]}"))
            {
                var b = new YamlMap(_file, item, "a shaft", "name", "stations", "segments", "springs", "loads", "supports");
                string name = b.RequireString("name", "give the shaft a name, e.g. 'name: motor shaft'");
                if (shafts.Any(x => x.Name == name)) throw _file.Error(b.Get("name")!, "name", $"shaft '{name}' is defined twice; give each shaft a unique name");
                var child = new ShaftFileReader(_file, _baseDirectory, _resolver);
                child.ReadStations(b.Require("stations", "list its stations, e.g. '- {name: P, at: 0}'"));
                foreach (var st in child._stationList)
                {
                    if (stationShaft.TryGetValue(st.Name, out var other))
                        throw _file.Error(b.Get("stations")!, "stations", $"station '{st.Name}' of shaft '{name}' is also a station of shaft '{other}'; station names must be unique over all shafts");
                    stationShaft[st.Name] = name;
                }
                var segs = b.Get("segments") is { } segNode ? child.ReadSegments(segNode, materials, sections) : [];
                var springs = b.Get("springs") is { } springNode ? child.ReadSprings(springNode) : [];
                // loads and supports of a further shaft serve the static solve of the geared train (GearedShaftSolver), not the dynamics
                var loads = b.Get("loads") is { } loadNode ? child.ReadLoads(loadNode) : [];
                var supports = b.Get("supports") is { } supNode ? child.ReadSupports(supNode) : [];
                shafts.Add(new ShaftBranch(name, new ShaftModel { Stations = child._stationList, Segments = segs, Springs = springs, Loads = loads, FixedStations = supports, Title = name }));
            }
        }
        string At(YamlNode n, string key)
        {
            if (n is not YamlScalarNode s || string.IsNullOrEmpty(s.Value)) throw _file.Error(n, key, $"expected a station name, found {YamlMap.Describe(n)}");
            if (stationShaft.ContainsKey(s.Value)) return s.Value;
            string? near = Suggest.Nearest(s.Value, stationShaft.Keys);
            throw _file.Error(n, key, $"no station named '{s.Value}' in any shaft{(near is null ? "" : $"; did you mean '{near}'?")}; fix the name or add the station");
        }
        string ShaftRef(YamlNode n, string key)
        {
            string v = n is YamlScalarNode { Value: { } s } ? s : throw _file.Error(n, key, "expected a shaft name");
            if (shafts.Any(x => x.Name == v)) return v;
            string? near = Suggest.Nearest(v, shafts.Select(x => x.Name));
            throw _file.Error(n, key, $"no shaft named '{v}'{(near is null ? "" : $"; did you mean '{near}'?")} (shafts: {string.Join(", ", shafts.Select(x => x.Name))})");
        }

        var stages = new List<GearStage>();
        if (m.Get("stages") is { } gn)
        {
            foreach (var item in Sequence(gn, "stages", "- {name: stage 1, driving: P, driven: W, teeth: [17, 71]}"))
            {
                var g = new YamlMap(_file, item, "a stage", "name", "driving", "driven", "ratio", "teeth", "kind", "meshStiffness");
                string a = At(g.Require("driving", "name the station of the driving gear or pulley"), "driving");
                string bb = At(g.Require("driven", "name the station of the driven gear or pulley"), "driven");
                if (stationShaft[a] == stationShaft[bb]) throw _file.Error(g.Get("driven")!, "driven", $"'{a}' and '{bb}' are both on shaft '{stationShaft[a]}'; a stage joins two shafts");
                if (g.Has("ratio") == g.Has("teeth")) throw _file.Error(item, "ratio", "a stage needs exactly one of 'ratio' (speed of driving / speed of driven) or 'teeth: [driving, driven]'");
                double ratio;
                int? za = null, zb = null;
                if (g.Has("ratio"))
                {
                    ratio = g.Quantity("ratio", QuantityKind.Number)!.Value;
                    if (!(ratio > 0)) throw _file.Error(g.Get("ratio")!, "ratio", "the ratio must be positive (speed of driving / speed of driven)");
                }
                else
                {
                    var t = g.Get("teeth")!;
                    if (t is not YamlSequenceNode { Children.Count: 2 } pair || !TryTeeth(pair.Children[0], out int t1) || !TryTeeth(pair.Children[1], out int t2))
                        throw _file.Error(t, "teeth", "expected two whole tooth counts [driving, driven], e.g. 'teeth: [17, 71]'");
                    za = t1; zb = t2; ratio = (double)t2 / t1;
                }
                var kind = g.String("kind") switch
                {
                    null or "external" => StageKind.External,
                    "internal" => StageKind.Internal,
                    "belt" or "chain" => StageKind.Belt,
                    var other => throw _file.Error(g.Get("kind")!, "kind", $"unknown stage kind '{other}'; use external, internal, belt or chain"),
                };
                double? km = g.Quantity("meshStiffness", QuantityKind.RotationalStiffness);
                if (km is <= 0) throw _file.Error(g.Get("meshStiffness")!, "meshStiffness", "the mesh stiffness must be positive (leave it out for a rigid stage)");
                stages.Add(new GearStage(a, bb, ratio) { Name = g.String("name"), Kind = kind, MeshStiffness = km, DrivingTeeth = za, DrivenTeeth = zb });
            }
        }

        var inertias = new List<PointInertia>();
        if (m.Get("inertias") is { } inode)
            foreach (var item in Sequence(inode, "inertias", "- {at: M, inertia: 0.05 kg*m^2}"))
                inertias.Add(ReadInertia(item, At, materials));

        List<string> fixedStations;
        if (m.Get("fixed") is { } fn)
            fixedStations = fn is YamlScalarNode { Value: "free" } ? [] : fn is YamlScalarNode ? [At(fn, "fixed")] : [.. Sequence(fn, "fixed", "fixed: [A]").Select(x => At(x, "fixed"))];
        else fixedStations = [.. main.FixedStations];

        var options = new ModalOptions();
        if (m.Get("modes") is { } mn)
        {
            double c = _file.Quantity(mn, "modes", QuantityKind.Number);
            if (!(c >= 1 && c <= 100 && c == Math.Floor(c))) throw _file.Error(mn, "modes", "give a whole number of modes from 1 to 100");
            options = options with { ModeCount = (int)c };
        }
        if (m.Get("tolerance") is { } tn)
        {
            double t = Fraction(tn, "tolerance");
            if (!(t > 0 && t < 0.1)) throw _file.Error(tn, "tolerance", "give a tolerance between 0 and 10 %, e.g. '0.1 %'");
            options = options with { Tolerance = t };
        }

        ExcitationSpec? excitation = null;
        if (m.Get("speeds") is { } spn)
        {
            var sp = new YamlMap(_file, spn, "speeds", "shaft", "from", "to");
            string shaft = sp.Get("shaft") is { } shn ? ShaftRef(shn, "shaft") : mainName;
            double lo = sp.Quantity("from", QuantityKind.Speed) ?? throw _file.Error(spn, "from", "give the lowest operating speed, e.g. 'from: 1350 rpm'");
            double hi = sp.Quantity("to", QuantityKind.Speed) ?? throw _file.Error(spn, "to", "give the highest operating speed, e.g. 'to: 1500 rpm'");
            if (!(lo >= 0 && hi >= lo && hi > 0)) throw _file.Error(spn, "from", "the speed range needs 0 <= from <= to and to > 0");
            var orders = new List<ExcitationOrder>();
            if (m.Get("orders") is { } on)
            {
                foreach (var item in Sequence(on, "orders", "- {name: running speed, shaft: motor shaft, order: 1}"))
                {
                    var o = new YamlMap(_file, item, "an order", "name", "shaft", "order", "stage");
                    if (o.Has("stage"))
                    {
                        if (o.Has("order") || o.Has("shaft")) throw _file.Error(item, "stage", "an order is either 'stage: NAME' (gear mesh) or 'order' with 'shaft', not both");
                        string stName = o.String("stage")!;
                        var st = stages.FirstOrDefault(x => x.Name == stName) ?? throw _file.Error(o.Get("stage")!, "stage", $"no stage named '{stName}' (stages: {string.Join(", ", stages.Select(x => x.Label))})");
                        if (st.DrivingTeeth is not { } z) throw _file.Error(o.Get("stage")!, "stage", $"stage '{stName}' has no tooth counts; give it 'teeth: [driving, driven]' or write the order as a number");
                        orders.Add(new ExcitationOrder(o.String("name") ?? $"{stName} mesh", stationShaft[st.Driving], z));
                        continue;
                    }
                    double order = o.Quantity("order", QuantityKind.Number) ?? throw _file.Error(item, "order", "give 'order' (cycles per revolution, e.g. 1 or 2) or 'stage' for the gear mesh");
                    if (!(order > 0)) throw _file.Error(o.Get("order")!, "order", "the order must be positive");
                    string osh = o.Get("shaft") is { } osn ? ShaftRef(osn, "shaft") : shaft;
                    orders.Add(new ExcitationOrder(o.String("name") ?? $"{order.ToString("G4", CultureInfo.InvariantCulture)}x {osh}", osh, order));
                }
            }
            else orders.Add(new ExcitationOrder($"1x {shaft}", shaft, 1));
            excitation = new ExcitationSpec { Range = new SpeedRange(shaft, lo, hi), Orders = orders };
            if (m.Get("bands") is { } bn)
            {
                if (bn is not YamlSequenceNode { Children.Count: 2 } bp) throw _file.Error(bn, "bands", "expected two margins [inner, outer], e.g. 'bands: [10 %, 20 %]'");
                double b1 = Fraction(bp.Children[0], "bands"), b2 = Fraction(bp.Children[1], "bands");
                if (!(b1 >= 0 && b2 >= b1)) throw _file.Error(bn, "bands", "the bands need 0 <= inner <= outer");
                excitation = excitation with { InnerBand = b1, OuterBand = b2 };
            }
        }
        else if (m.Has("orders") || m.Has("bands")) throw _file.Error(m.KeyNode(m.Has("orders") ? "orders" : "bands"), m.Has("orders") ? "orders" : "bands", "the excitation check needs the operating range: add 'speeds: {shaft: S, from: 1350 rpm, to: 1500 rpm}'");

        HarmonicTorque? forcing = null;
        double damping = new DynamicsInput { Drivetrain = new DrivetrainModel { Shafts = [] } }.DampingRatio;
        if (m.Get("damping") is { } dn)
        {
            damping = Fraction(dn, "damping");
            if (!(damping > 0 && damping < 1)) throw _file.Error(dn, "damping", "the modal damping ratio lies between 0 and 100 %, e.g. '2 %'");
        }
        if (m.Get("harmonic") is { } hn)
        {
            var h = new YamlMap(_file, hn, "harmonic", "name", "at", "amplitude", "frequency", "order", "shaft", "speed");
            string at = At(h.Require("at", "name the station where the alternating torque acts"), "at");
            double amp = h.Quantity("amplitude", QuantityKind.Torque) ?? throw _file.Error(hn, "amplitude", "give the torque amplitude, e.g. 'amplitude: 50 N*m'");
            if (!(amp > 0)) throw _file.Error(h.Get("amplitude")!, "amplitude", "the amplitude must be positive");
            double w;
            if (h.Has("frequency"))
            {
                if (h.Has("order") || h.Has("speed")) throw _file.Error(hn, "frequency", "give 'frequency', or 'order' with 'speed', not both");
                w = Frequency(h.Get("frequency")!);
            }
            else
            {
                double order = h.Quantity("order", QuantityKind.Number) ?? throw _file.Error(hn, "frequency", "give 'frequency: 24 Hz', or 'order' and 'speed' (of 'shaft')");
                double speed = h.Quantity("speed", QuantityKind.Speed) ?? throw _file.Error(hn, "speed", "give the shaft speed for the order, e.g. 'speed: 1450 rpm'");
                if (h.Get("shaft") is { } hs) ShaftRef(hs, "shaft");
                w = order * speed;
            }
            if (!(w > 0)) throw _file.Error(hn, "frequency", "the frequency must be positive");
            forcing = new HarmonicTorque(at, amp, w) { Name = h.String("name") };
        }

        return new DynamicsInput
        {
            Drivetrain = new DrivetrainModel { Shafts = shafts, Stages = stages, Inertias = inertias, FixedStations = fixedStations, Title = main.Title },
            Options = options,
            Excitation = excitation,
            Forcing = forcing,
            DampingRatio = damping,
        };
    }

    private PointInertia ReadInertia(YamlNode item, Func<YamlNode, string, string> at, Dictionary<string, Material> materials)
    {
        var m = new YamlMap(_file, item, "an inertia", "name", "at", "inertia", "GD2", "body");
        string station = at(m.Require("at", "name the station it sits at"), "at");
        string? name = m.String("name");
        string[] kinds = [.. new[] { "inertia", "GD2", "body" }.Where(m.Has)];
        if (kinds.Length != 1) throw _file.Error(item, "inertia", "an inertia needs exactly one of 'inertia' (e.g. 0.05 kg*m^2), 'GD2' (e.g. 0.2 kgf*m^2) or 'body' (a disc or drum)");
        switch (kinds[0])
        {
            case "inertia":
                return new PointInertia(station, Table(m.Get("inertia")!, "inertia", InertiaUnits, "kg*m^2, kg*cm^2, lb*in^2, lb*ft^2, lbf*in*s^2")) { Name = name };
            case "GD2":
                return new PointInertia(station, Table(m.Get("GD2")!, "GD2", Gd2Units, "kgf*m^2, N*m^2, lbf*ft^2")) { Name = name };
            default:
                {
                    var b = new YamlMap(_file, m.Get("body")!, "a body", "outer", "inner", "length", "density", "material");
                    double outer = Diameter(b.Require("outer", "give the outer diameter"), "outer");
                    double inner = b.Quantity("inner", QuantityKind.Length) ?? 0;
                    if (!(inner >= 0 && inner < outer)) throw _file.Error(b.Get("inner")!, "inner", "the inner diameter must be at least 0 and smaller than the outer diameter");
                    double length = b.Quantity("length", QuantityKind.Length) ?? throw _file.Error(b.Node, "length", "give the axial length (disc width), e.g. 'length: 40 mm'");
                    if (!(length > 0)) throw _file.Error(b.Get("length")!, "length", "the length must be positive");
                    if (b.Has("density") == b.Has("material")) throw _file.Error(b.Node, "density", "a body needs exactly one of 'density' (e.g. 7850 kg/m^3) or 'material'");
                    double rho;
                    if (b.Has("density")) rho = b.Quantity("density", QuantityKind.Density)!.Value;
                    else
                    {
                        var mat = MaterialRef(b.Get("material")!, materials);
                        rho = mat.Density ?? throw _file.Error(b.Get("material")!, "material", $"material '{mat.Name}' has no density; give the body 'density' or the material 'density'");
                    }
                    if (!(rho > 0)) throw _file.Error(b.Get("density")!, "density", "the density must be positive");
                    return PointInertia.Cylinder(station, outer, inner, length, rho) with { Name = name };
                }
        }
    }

    private double Table(YamlNode node, string key, Dictionary<string, double> units, string examples)
    {
        if (node is not YamlScalarNode { Value: { } text } || !QuantityText.TrySplit(text, out double v, out string unit))
            throw _file.Error(node, key, $"expected a number with a unit, e.g. '0.05 {examples.Split(',')[0]}'");
        string u = unit.Replace(" ", "", StringComparison.Ordinal).Replace("·", "*", StringComparison.Ordinal).Replace("²", "^2", StringComparison.Ordinal);
        if (!units.TryGetValue(u, out double f))
            throw _file.Error(node, key, unit.Length == 0 ? $"'{text}' needs a unit: {examples}" : $"'{unit}' is not a unit here; use one of {examples}");
        double si = v * f;
        if (!(si > 0) || !double.IsFinite(si)) throw _file.Error(node, key, "must be positive");
        return si;
    }

    /// <summary>A ratio written as '10 %' or as a plain fraction '0.1'.</summary>
    private double Fraction(YamlNode node, string key)
    {
        if (node is not YamlScalarNode { Value: { } text } || !QuantityText.TrySplit(text, out double v, out string unit))
            throw _file.Error(node, key, "expected a percentage such as '10 %' or a fraction such as 0.1");
        if (unit == "%") return v / 100;
        if (unit.Length == 0) return v;
        throw _file.Error(node, key, $"'{unit}' is not a unit here; write a percentage such as '10 %' or a fraction such as 0.1");
    }

    /// <summary>A frequency in Hz, or a speed-like value in rpm or rad/s, as rad/s.</summary>
    private double Frequency(YamlNode node)
    {
        if (node is YamlScalarNode { Value: { } text } && QuantityText.TrySplit(text, out double v, out string unit) && unit is "Hz" or "hz")
            return 2 * Math.PI * v;
        return _file.Quantity(node, "frequency", QuantityKind.Speed);
    }

    private static bool TryTeeth(YamlNode n, out int z)
    {
        z = 0;
        return n is YamlScalarNode { Value: { } s } && int.TryParse(s, NumberStyles.Integer, CultureInfo.InvariantCulture, out z) && z > 0;
    }
}
