using System.Text.Json;
using SectionTwist.Profiles;

namespace SectionTwist.Cli;

/// <summary><c>sectiontwist templates [NAME] [--json]</c>: lists the parametric profiles with their parameters, defaults and units.</summary>
internal sealed class TemplatesCommand : ICommand
{
    public string Name => "templates";

    public string Summary => "list the parametric profiles (keyed, spline, shs, ...) with their parameters";

    public string Usage =>
        "sectiontwist templates [NAME] [--json]\n" +
        "  Lists every template (or one) with its keys, defaults and units. A spec is NAME:key=value,key=value;\n" +
        "  lengths take a unit (40mm, 1.5in, 0.04m) or the default unit (mm, or --unit where a command has it);\n" +
        "  angles are degrees unless written with rad; counts are whole numbers.";

    public int Run(Args args, CliContext context)
    {
        bool json = args.Flag("json");
        args.EnsureAllUsed();
        if (args.Positional.Count > 1) throw new UsageException("give at most one template name");
        IReadOnlyList<TemplateInfo> list = ProfileTemplates.All;
        if (args.Positional.Count == 1)
        {
            var one = ProfileTemplates.Find(args.Positional[0]) ?? throw new SectionTwistException("unknown-template",
                $"unknown template '{args.Positional[0]}'{Suggest.DidYouMean(args.Positional[0], ProfileTemplates.All.SelectMany(t => t.Aliases.Prepend(t.Name)))}; known templates: {string.Join(", ", ProfileTemplates.All.Select(t => t.Name))}");
            list = [one];
        }
        if (json) WriteJson(list, context.Out, context.Cancellation);
        else WriteText(list, context.Out, context.Cancellation);
        return 0;
    }

    /// <summary>Widest default text kept in its column; a longer one moves the description to the next line.</summary>
    private const int DefaultColumn = 26;

    private static void WriteText(IReadOnlyList<TemplateInfo> list, TextWriter w, CancellationToken ct)
    {
        foreach (var t in list)
        {
            ct.ThrowIfCancellationRequested();
            w.WriteLine($"{t.Name}{(t.Aliases.Count > 0 ? " (also " + string.Join(", ", t.Aliases) + ")" : "")}: {t.Summary}");
            w.WriteLine($"  example: {t.Example}");
            w.WriteLine($"  outer size for J/J_round: {t.OuterSize}");
            if (t.Parameters.Count == 0) { w.WriteLine(); continue; }
            // columns as wide as this template's entries, so no value runs into the description
            var rows = t.Parameters.Select(p => (p.Key, Kind: p.UnitHint, Default: p.IsRequired ? "required" : "default " + p.Default, p.Description)).ToList();
            int kw = Math.Max(3, rows.Max(r => r.Key.Length)), uw = Math.Max(4, rows.Max(r => r.Kind.Length));
            int dw = Math.Min(DefaultColumn, Math.Max(7, rows.Max(r => r.Default.Length)));
            string indent = new(' ', 2 + kw + 2 + uw + 2 + dw + 2);
            w.WriteLine($"  {"key".PadRight(kw)}  {"kind".PadRight(uw)}  {"default".PadRight(dw)}  meaning");
            foreach (var (key, kind, def, description) in rows)
            {
                if (def.Length <= dw) w.WriteLine($"  {key.PadRight(kw)}  {kind.PadRight(uw)}  {def.PadRight(dw)}  {description}");
                else
                {
                    w.WriteLine($"  {key.PadRight(kw)}  {kind.PadRight(uw)}  {def}");
                    w.WriteLine(indent + description);
                }
            }
            w.WriteLine();
        }
        w.WriteLine("Lengths: a bare number is in mm unless --unit says otherwise; write units per value: d=40mm, B=3in, t=0.25in.");
        w.WriteLine("Angles are degrees (30 or 30deg) unless written with rad (0.5rad). Kind 'deg/deg/...' is a list of angles, one per");
        w.WriteLine("feature, separated by '/': keyed:d=40,n=2,at=90/270 puts two keyseats at 90 and 270 deg from +x.");
        w.WriteLine("A kind 'a|b' takes one of the words listed (series=light). Counts are whole numbers (n=2).");
        if (list.Any(t => SteelSectionTemplates.IsDesignation(t.Name)))
        {
            w.WriteLine("Designations (ipe, hea, heb, upn, upe, leq, lun, hfshs, hfrhs, hfchs): the table rows are from memory, not from a");
            w.WriteLine("supplier's table; check every row used against the supplier's current table. Lateral-torsional and local buckling");
            w.WriteLine("and connection design are outside this tool; defer to the local steel design code.");
        }
    }

    private static void WriteJson(IReadOnlyList<TemplateInfo> list, TextWriter w, CancellationToken ct)
    {
        using var stream = new MemoryStream();
        using (var j = new Utf8JsonWriter(stream, new JsonWriterOptions { Indented = true }))
        {
            j.WriteStartArray();
            foreach (var t in list)
            {
                ct.ThrowIfCancellationRequested();
                j.WriteStartObject();
                j.WriteString("name", t.Name);
                j.WriteStartArray("aliases");
                foreach (var a in t.Aliases) j.WriteStringValue(a);
                j.WriteEndArray();
                j.WriteString("summary", t.Summary);
                j.WriteString("example", t.Example);
                j.WriteString("outerSize", t.OuterSize);
                j.WriteStartArray("parameters");
                foreach (var p in t.Parameters)
                {
                    j.WriteStartObject();
                    j.WriteString("key", p.Key);
                    j.WriteString("kind", p.Kind.ToString().ToLowerInvariant());
                    j.WriteString("description", p.Description);
                    if (p.Default is null) j.WriteNull("default"); else j.WriteString("default", p.Default);
                    if (p.Choices.Count > 0)
                    {
                        j.WriteStartArray("choices");
                        foreach (var c in p.Choices) j.WriteStringValue(c);
                        j.WriteEndArray();
                    }
                    j.WriteEndObject();
                }
                j.WriteEndArray();
                j.WriteEndObject();
            }
            j.WriteEndArray();
        }
        w.WriteLine(System.Text.Encoding.UTF8.GetString(stream.ToArray()));
    }
}
