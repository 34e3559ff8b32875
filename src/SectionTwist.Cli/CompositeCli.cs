using System.Text;
using System.Text.Json;
using SectionTwist.Composite;
using SectionTwist.Shaft;
using SectionTwist.Units;

namespace SectionTwist.Cli;

/// <summary>The <c>section --material PART=MATERIAL,...</c> option: composite sections, their text table and JSON.</summary>
internal static class CompositeCli
{
    /// <summary>Parses <c>core=steel-1045-cd,sleeve=brass</c> (repeatable option values joined) into part-material pairs.</summary>
    public static IReadOnlyList<KeyValuePair<string, Material>> ParseMaterials(IEnumerable<string> values)
    {
        var list = new List<KeyValuePair<string, Material>>();
        foreach (var item in values.SelectMany(v => v.Split(',', StringSplitOptions.TrimEntries | StringSplitOptions.RemoveEmptyEntries)))
        {
            int eq = item.IndexOf('=', StringComparison.Ordinal);
            if (eq <= 0 || eq == item.Length - 1)
                throw new UsageException($"--material: '{item}' is not PART=MATERIAL; write e.g. --material core=steel-1045-cd,sleeve=brass (a drawing: LAYER=MATERIAL)");
            string part = item[..eq].Trim(), key = item[(eq + 1)..].Trim();
            if (list.Any(kv => string.Equals(kv.Key, part, StringComparison.OrdinalIgnoreCase)))
                throw new UsageException($"--material: part '{part}' is given twice; keep one");
            if (!ShaftMaterials.TryGet(key, out var m))
                throw new UsageException($"--material: unknown material '{key}' for part '{part}'{Suggest.DidYouMean(key, ShaftMaterials.All.Keys)}; library materials: {string.Join(", ", ShaftMaterials.All.Keys)}");
            list.Add(new(part, m));
        }
        return list;
    }

    /// <summary>The reference material of <c>--reference</c>: a part's name or a material key among the section's materials.</summary>
    public static Material Reference(string? text, CompositeSection s)
    {
        if (text is null) return s.Materials[0];
        var byPart = s.Parts.FirstOrDefault(p => string.Equals(p.Name, text, StringComparison.OrdinalIgnoreCase));
        if (byPart is not null) return byPart.Material;
        if (ShaftMaterials.TryGet(text, out var m)) return m;
        throw new UsageException($"--reference: '{text}' is neither a part ({string.Join(", ", s.Parts.Select(p => p.Name))}) nor a library material{Suggest.DidYouMean(text, s.Parts.Select(p => p.Name).Concat(ShaftMaterials.All.Keys))}");
    }

    public static void WriteText(TextWriter w, CompositeResult r, string source, UnitSystem? units)
    {
        var u = units ?? UnitSystem.For(r.Section.Envelope.Unit);
        var p = r.Section.Envelope.Properties;
        string L(double m) => u.Length.Format(m, 6);
        w.WriteLine($"composite section {source}  (units {u.Name})");
        w.WriteLine($"  area A                    {u.Area.Format(p.Area, 6),14} {u.Area.Symbol}");
        w.WriteLine($"  centroid (x, y)           ({L(p.Centroid.X)}, {L(p.Centroid.Y)}) {u.Length.Symbol}");
        w.WriteLine($"  torsional rigidity GJ     {u.TorsionalRigidity.Format(r.TorsionalRigidity, 6),14} {u.TorsionalRigidity.Symbol}   est. rel. error {NumberText.Exponent(r.EstimatedRelativeError, 2)}");
        w.WriteLine($"  equivalent J              {u.SecondMoment.Format(r.EquivalentTorsionConstant, 6),14} {u.SecondMoment.Symbol}   of {r.Reference.Name} (G = {u.Modulus.Text(r.Reference.ShearModulus, 4)})");
        foreach (var m in r.Materials)
        {
            w.WriteLine($"  {m.Material.Name} (parts {string.Join(", ", m.Parts)}): G = {u.Modulus.Text(m.Material.ShearModulus, 4)}, area {u.Area.Text(m.Area, 6)}");
            w.WriteLine($"    torque share            {NumberText.Fixed(100 * m.TorqueShare, 2),14} %");
            w.WriteLine($"    peak shear per torque   {u.ShearPerTorque.Format(m.MaxShearPerTorque, 6),14} {u.ShearPerTorque.Symbol}   est. rel. error {NumberText.Exponent(m.EstimatedRelativeError, 2)}");
            w.WriteLine($"    peak shear at           ({L(m.MaxShearLocation.X)}, {L(m.MaxShearLocation.Y)}) {u.Length.Symbol}");
            if (m.MaxShearUnbounded)
                w.WriteLine("    the peak does not converge (a sharp corner of the outline or of an interface): the value above is the mesh's, no bound, and no torque to reach the allowable is given; round the corner");
            else if (m.Material.LimitShear is { } lim)
                w.WriteLine($"    torque to reach its {m.Material.LimitBasis} shear ({u.Stress.Text(lim, 4)}): {u.Torque.Text(lim / m.MaxShearPerTorque, 4)}");
            else
                w.WriteLine("    no allowable or shear yield known for this material: check its peak shear against the supplier's strength (a shaft file material may give 'yield' or 'allowableShear')");
        }
        w.WriteLine($"  mesh                      {r.Mesh.Nodes} nodes, {r.Mesh.Elements} quadratic triangles, min angle {NumberText.Fixed(r.Mesh.MinAngleDeg, 1)} deg");
        foreach (var warn in r.Warnings) w.WriteLine($"  warning [{warn.Code}]: {warn.Message}");
        w.WriteLine($"  caution: {CompositeResult.Caution}");
    }

    public static string WriteJson(CompositeResult r, string source)
    {
        using var ms = new MemoryStream();
        using (var w = new Utf8JsonWriter(ms, new JsonWriterOptions { Indented = true }))
        {
            var p = r.Section.Envelope.Properties;
            w.WriteStartObject();
            w.WriteString("source", source);
            w.WriteString("lengthUnit", r.Section.Envelope.Unit.Symbol);
            SectionJson.Num(w, "area", p.Area);
            Pt(w, "centroid", p.Centroid);
            w.WriteString("referenceMaterial", r.Reference.Name);
            SectionJson.Num(w, "referenceShearModulus", r.Reference.ShearModulus);
            SectionJson.Num(w, "torsionalRigidity", r.TorsionalRigidity);
            SectionJson.Num(w, "equivalentTorsionConstant", r.EquivalentTorsionConstant);
            SectionJson.Num(w, "estimatedRelativeError", r.EstimatedRelativeError);
            w.WriteStartArray("materials");
            foreach (var m in r.Materials)
            {
                w.WriteStartObject();
                w.WriteString("name", m.Material.Name);
                w.WriteStartArray("parts");
                foreach (var part in m.Parts) w.WriteStringValue(part);
                w.WriteEndArray();
                SectionJson.Num(w, "shearModulus", m.Material.ShearModulus);
                if (m.Material.LimitShear is { } lim) SectionJson.Num(w, "limitShear", lim); else w.WriteNull("limitShear");
                w.WriteString("limitBasis", m.Material.LimitBasis);
                SectionJson.Num(w, "area", m.Area);
                SectionJson.Num(w, "torqueShare", m.TorqueShare);
                SectionJson.Num(w, "maxShearPerTorque", m.MaxShearPerTorque);
                Pt(w, "maxShearLocation", m.MaxShearLocation);
                SectionJson.Num(w, "estimatedRelativeError", m.EstimatedRelativeError);
                w.WriteBoolean("maxShearUnbounded", m.MaxShearUnbounded);
                w.WriteEndObject();
            }
            w.WriteEndArray();
            w.WriteStartObject("mesh");
            w.WriteNumber("nodes", r.Mesh.Nodes);
            w.WriteNumber("elements", r.Mesh.Elements);
            SectionJson.Num(w, "minAngleDeg", r.Mesh.MinAngleDeg);
            w.WriteEndObject();
            w.WriteString("caution", CompositeResult.Caution);
            SectionJson.Warnings(w, r.Warnings);
            w.WriteEndObject();
        }
        return Encoding.UTF8.GetString(ms.ToArray());
    }

    private static void Pt(Utf8JsonWriter w, string name, Geometry.Point2 p)
    {
        w.WriteStartObject(name);
        SectionJson.Num(w, "x", p.X);
        SectionJson.Num(w, "y", p.Y);
        w.WriteEndObject();
    }
}
