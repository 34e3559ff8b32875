using SectionTwist.Profiles;
using SectionTwist.Units;
using YamlDotNet.RepresentationModel;

namespace SectionTwist.Shaft;

/// <summary>The units block, materials and sections of the shaft file.</summary>
internal sealed partial class ShaftFileReader
{
    private static readonly (string Key, QuantityKind Kind)[] UnitKeys =
    [
        ("length", QuantityKind.Length), ("torque", QuantityKind.Torque), ("modulus", QuantityKind.Modulus),
        ("stress", QuantityKind.Stress), ("power", QuantityKind.Power), ("speed", QuantityKind.Speed),
    ];

    /// <summary>
    /// The units block: defaults for plain numbers, and the display units of the results (the standard system of the
    /// length unit, with the torque, stress, modulus, power and speed units the block names, spelled the one printed way).
    /// </summary>
    private UnitSystem ReadUnits(YamlNode? node)
    {
        var system = UnitSystem.SiMillimetre;
        if (node is null) return system;
        var m = new YamlMap(_file, node, "units", [.. UnitKeys.Select(u => u.Key)]);
        foreach (var (key, kind) in UnitKeys)
        {
            if (m.String(key) is not { } symbol) continue;
            double f = QuantityText.UnitFactor(symbol, kind)
                ?? throw _file.Error(m.Get(key)!, key, $"'{YamlGuard.Short(symbol)}' is not a {key} unit; use one of {QuantityText.Examples(kind)}");
            _file.SetDefault(kind, symbol, f);
        }
        // lengths first: they pick the system (in, ft: US; m: SI-m; else SI-mm), then the named units replace its own
        if (m.String("length") is { } len)
            system = UnitSystem.For(LengthUnit.TryParse(len, out var lu) ? lu : new LengthUnit(DisplayUnit.Spell(len), DisplayUnit.Spell(len), QuantityText.UnitFactor(len, QuantityKind.Length)!.Value));
        foreach (var (key, measure) in new[] { ("torque", Measure.Torque), ("stress", Measure.Stress), ("modulus", Measure.Modulus), ("power", Measure.Power), ("speed", Measure.Speed) })
        {
            if (m.String(key) is not { } symbol) continue;
            var kind = UnitKeys.First(u => u.Key == key).Kind;
            system = system.With(measure, new DisplayUnit(DisplayUnit.Spell(symbol), QuantityText.UnitFactor(symbol, kind)!.Value));
        }
        return system;
    }

    private Dictionary<string, Material> ReadMaterials(YamlNode? node)
    {
        var result = new Dictionary<string, Material>(StringComparer.Ordinal);
        if (node is null) return result;
        if (node is not YamlMappingNode map)
            throw _file.Error(node, "materials", "expected named materials, e.g. 'shaft-steel: {library: steel-1045-cd}'");
        foreach (var (k, v) in map.Children)
        {
            string name = ((YamlScalarNode)k).Value ?? "";
            var m = new YamlMap(_file, v, $"material '{YamlGuard.Short(name)}'", "name", "library", "G", "E", "poisson", "density", "allowableShear", "shearYield", "yield", "ultimate", "source");
            Material? lib = null;
            if (m.Get("library") is { } ln)
            {
                string key = m.String("library")!;
                if (!ShaftMaterials.TryGet(key, out var found))
                {
                    string? near = Suggest.Nearest(key, ShaftMaterials.All.Keys);
                    throw _file.Error(ln, "library", $"unknown library material '{YamlGuard.Short(key)}'{(near is null ? "" : $"; did you mean '{near}'?")} (library: {YamlMap.Names(ShaftMaterials.All.Keys)})");
                }
                lib = found;
            }
            double? e = m.Has("E") ? PositiveStress(m, "E") : lib?.YoungsModulus;
            double g;
            if (m.Has("G"))
            {
                if (m.Has("poisson")) throw _file.Error(m.KeyNode("poisson"), "poisson", $"material '{YamlGuard.Short(name)}': give G, or E with poisson, not G and poisson");
                g = m.Quantity("G", QuantityKind.Modulus)!.Value;
            }
            else if (m.Has("poisson"))
            {
                if (!m.Has("E")) throw _file.Error(v, "E", $"material '{YamlGuard.Short(name)}': G = E / (2 (1 + poisson)) needs both 'E' and 'poisson'");
                double nu = m.Quantity("poisson", QuantityKind.Number)!.Value;
                if (!(nu > -1 && nu < 0.5)) throw _file.Error(m.Get("poisson")!, "poisson", "Poisson's ratio must lie between -1 and 0.5 (steel about 0.3)");
                g = Material.ShearModulusFrom(e!.Value, nu);
            }
            else if (m.Has("E") && lib is null)
                throw _file.Error(v, "poisson", $"material '{YamlGuard.Short(name)}': G = E / (2 (1 + poisson)) needs both 'E' and 'poisson' (or give G)");
            else g = lib?.ShearModulus ?? throw _file.Error(v, "G", $"material '{YamlGuard.Short(name)}' needs a shear modulus: 'G', or 'E' and 'poisson', or 'library'");
            if (!(g > 0)) throw _file.Error(m.Get("G") ?? v, "G", "the shear modulus must be positive");
            if (ShaftValueRange.Check(QuantityKind.Modulus, g) is { } odd) throw _file.Error(m.Get("G") ?? m.Get("E") ?? v, "G", $"material '{YamlGuard.Short(name)}': the shear modulus {odd}");

            double? allow = lib?.AllowableShear, ssy = lib?.ShearYield, sy = lib?.YieldStrength, su = lib?.UltimateStrength;
            bool strengthsGiven = m.Has("yield") || m.Has("ultimate") || m.Has("allowableShear") || m.Has("shearYield");
            if (m.Has("yield") || m.Has("ultimate"))
            {
                sy = m.Has("yield") ? PositiveStress(m, "yield") : null;
                su = m.Has("ultimate") ? PositiveStress(m, "ultimate") : null;
                var derived = ShaftMaterials.FromStrengths(name, g, sy, su, "");
                allow = derived.AllowableShear; ssy = derived.ShearYield;
            }
            if (m.Has("allowableShear")) allow = PositiveStress(m, "allowableShear");
            if (m.Has("shearYield")) ssy = PositiveStress(m, "shearYield");
            double? density = lib?.Density;
            if (m.Has("density"))
            {
                density = m.Quantity("density", QuantityKind.Density)!.Value;
                if (!(density > 0) || !double.IsFinite(density.Value)) throw _file.Error(m.Get("density")!, "density", "the density must be positive, e.g. '7850 kg/m^3'");
            }
            string source = m.String("source") ?? (lib is not null && !m.Has("G") && !m.Has("E") && !m.Has("density") && !strengthsGiven
                ? lib.Source : $"given in {_file.FileName}{(lib is null ? "" : $", based on library '{m.String("library")}'")}");
            result[name] = new Material(m.String("name") ?? name, g, allow, ssy, source)
            {
                YoungsModulus = e,
                Density = density,
                YieldStrength = sy,
                UltimateStrength = su,
                StrengthBasis = strengthsGiven || lib is null ? MaterialBasis.User : lib.StrengthBasis,
            };
            _materialNodes[result[name]] = v;
        }
        return result;
    }

    private double PositiveStress(YamlMap m, string key)
    {
        double v = m.Quantity(key, key == "E" ? QuantityKind.Modulus : QuantityKind.Stress)!.Value;
        if (!(v > 0)) throw _file.Error(m.Get(key)!, key, "must be positive");
        return v;
    }

    private Material MaterialRef(YamlNode node, Dictionary<string, Material> materials)
    {
        string key = node is YamlScalarNode s ? s.Value ?? "" : throw _file.Error(node, "material", "expected a material name");
        if (materials.TryGetValue(key, out var m)) return m;
        if (ShaftMaterials.TryGet(key, out var lib)) return lib;
        var all = materials.Keys.Concat(ShaftMaterials.All.Keys).ToArray();
        string? near = Suggest.Nearest(key, all);
        throw _file.Error(node, "material", $"unknown material '{YamlGuard.Short(key)}'{(near is null ? "" : $"; did you mean '{near}'?")} (file: {(materials.Count == 0 ? "none" : YamlMap.Names(materials.Keys))}; library: {YamlMap.Names(ShaftMaterials.All.Keys)}); define it under 'materials:'");
    }

    private Dictionary<string, (YamlNode Node, Func<SectionStiffness> Get)> ReadSections(YamlNode? node)
    {
        var result = new Dictionary<string, (YamlNode, Func<SectionStiffness>)>(StringComparer.Ordinal);
        if (node is null) return result;
        if (node is not YamlMappingNode map)
            throw _file.Error(node, "sections", "expected named sections, e.g. 'input: {round: 40 mm}'");
        foreach (var (k, v) in map.Children)
        {
            string name = ((YamlScalarNode)k).Value ?? "";
            result[name] = (v, ReadSection(v, name));
        }
        return result;
    }

    /// <summary>Checks a section definition now and returns a cached getter (template and DXF sections are analysed once, on first use).</summary>
    private Func<SectionStiffness> ReadSection(YamlNode node, string name)
    {
        var m = new YamlMap(_file, node, $"section '{YamlGuard.Short(name)}'", "round", "tube", "J", "shearFactor", "torsionalModulus", "polarMoment", "description", "outerDiameter", "template", "dxf",
            "layer", "part", "at", "window", "hatch", "fitArcs", "snap", "skipOpen", "unit", "materials");
        string[] kinds = [.. new[] { "round", "tube", "J", "template", "dxf" }.Where(m.Has)];
        if (kinds.Length != 1)
            throw _file.Error(node, kinds.Length == 0 ? "round" : kinds[1],
                $"section '{YamlGuard.Short(name)}' needs exactly one of 'round', 'tube', 'J' (with 'shearFactor'), 'template' or 'dxf'{(kinds.Length > 1 ? $", found {string.Join(" and ", kinds)}" : "")}");
        string? description = m.String("description");
        double? od = m.Has("outerDiameter") ? Diameter(m.Get("outerDiameter")!, "outerDiameter") : null;
        if (m.Has("materials") && kinds[0] is not ("template" or "dxf"))
            throw _file.Error(m.KeyNode("materials"), "materials", $"section '{YamlGuard.Short(name)}': 'materials' makes a composite section from a 'template' or 'dxf'; remove it here");
        switch (kinds[0])
        {
            case "round":
                {
                    var s = SectionStiffness.Round(Diameter(m.Get("round")!, "round"));
                    s = s with { Description = description ?? $"round {m.String("round")}" };
                    return () => s;
                }
            case "tube":
                {
                    var t = new YamlMap(_file, m.Get("tube")!, $"tube of section '{YamlGuard.Short(name)}'", "outer", "inner");
                    double outer = Diameter(t.Require("outer", "give the outer diameter"), "outer");
                    double inner = t.Quantity("inner", QuantityKind.Length) ?? throw _file.Error(m.Get("tube")!, "inner", "give the inner diameter (0 for solid: use 'round' instead)");
                    if (!(inner >= 0 && inner < outer)) throw _file.Error(t.Get("inner")!, "inner", "the inner diameter must be at least 0 and smaller than the outer diameter");
                    var s = SectionStiffness.Tube(outer, inner) with { Description = description ?? $"tube {t.String("outer")} / {t.String("inner")}" };
                    return () => s;
                }
            case "J":
                {
                    double j = m.Quantity("J", QuantityKind.AreaMoment)!.Value;
                    if (!(j > 0)) throw _file.Error(m.Get("J")!, "J", "the torsion constant must be positive");
                    double factor;
                    if (m.Has("shearFactor") == m.Has("torsionalModulus"))
                        throw _file.Error(node, "shearFactor", $"section '{YamlGuard.Short(name)}' with 'J' needs exactly one of 'shearFactor' (peak shear per unit torque, e.g. '1.2e-4 1/mm^3') or 'torsionalModulus' (T / tau_max, e.g. '12 cm^3')");
                    if (m.Has("shearFactor")) factor = m.Quantity("shearFactor", QuantityKind.ShearPerTorque)!.Value;
                    else
                    {
                        double z = m.Quantity("torsionalModulus", QuantityKind.Volume)!.Value;
                        if (!(z > 0)) throw _file.Error(m.Get("torsionalModulus")!, "torsionalModulus", "must be positive");
                        factor = 1 / z;
                    }
                    if (!(factor > 0)) throw _file.Error(m.Get("shearFactor")!, "shearFactor", "must be positive");
                    double? ip = m.Quantity("polarMoment", QuantityKind.AreaMoment);
                    if (ip is { } ipv && !(ipv > 0)) throw _file.Error(m.Get("polarMoment")!, "polarMoment", "the polar second moment of area must be positive");
                    var s = new SectionStiffness(j, factor, description ?? name, od) { PolarMoment = ip };
                    return () => s;
                }
            default:
                {
                    bool template = kinds[0] == "template";
                    if (template && DrawingKeys.FirstOrDefault(m.Has) is { } drawingKey)
                        throw _file.Error(m.KeyNode(drawingKey), drawingKey, $"'{drawingKey}' belongs to DXF sections ({string.Join(", ", DrawingKeys)}); remove it from a template section");
                    string value = m.String(kinds[0])!;
                    string? dxfPath = template ? null : Path.GetFullPath(Path.Combine(_baseDirectory, value));
                    var src = template
                        ? new SectionSource(name, value, null, null, null, _file.Where(m.Get(kinds[0])!))
                        : ReadDrawingKeys(m, name, dxfPath!);
                    var at = m.Get(kinds[0])!;
                    if (m.Get("materials") is { } mn) src = src with { Materials = CompositeMaterials(mn, name) };
                    else if (template && ProfileTemplates.IsComposite(value))
                        throw _file.Error(at, "template", $"'{YamlGuard.Short(value)}' is a composite template: give each part a material, e.g. 'materials: {{core: steel-1045-cd, sleeve: brass}}'");
                    SectionStiffness? cached = null;
                    return () => cached ??= Resolve(src, at, kinds[0], description, od);
                }
        }
    }

    /// <summary>The <c>materials</c> map of a composite section: part (template part or drawing layer) to a file or library material.</summary>
    private List<KeyValuePair<string, Material>> CompositeMaterials(YamlNode node, string name)
    {
        if (node is not YamlMappingNode map || map.Children.Count == 0)
            throw _file.Error(node, "materials", $"section '{YamlGuard.Short(name)}': expected each part with its material, e.g. 'materials: {{core: steel-1045-cd, sleeve: brass}}'");
        var list = new List<KeyValuePair<string, Material>>();
        foreach (var (k, v) in map.Children) list.Add(new(((YamlScalarNode)k).Value ?? "", MaterialRef(v, _materials)));
        return list;
    }

    private SectionStiffness Resolve(SectionSource src, YamlNode at, string key, string? description, double? od)
    {
        if (_resolver is null)
            throw _file.Error(at, key, $"section '{src.Name}' needs the section analysis of a {(key == "template" ? "template" : "DXF outline")}, which is not available here; give 'J' and 'shearFactor' directly, or 'round'/'tube'");
        SectionStiffness s;
        try { s = _resolver(src); }
        catch (SectionTwistException e) { throw new SectionTwistException(e.Code, $"{_file.Where(at)}: {key}: section '{src.Name}': {e.Message}", e); }
        s.Validate($"{_file.Where(at)}: section '{src.Name}'");
        return s with { Description = description ?? s.Description ?? (src.TemplateSpec ?? Path.GetFileName(src.DxfPath)), OuterDiameter = od ?? s.OuterDiameter };
    }
}
