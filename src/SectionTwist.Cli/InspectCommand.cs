using System.Globalization;
using SectionTwist.Import;
using SectionTwist.Import.Dxf;
using SectionTwist.Units;

namespace SectionTwist.Cli;

/// <summary><c>sectiontwist inspect drawing.dxf</c>: what a drawing holds and how it turns into a section.</summary>
internal sealed class InspectCommand : ICommand
{
    public string Name => "inspect";
    public string Summary => "list a DXF drawing's layers, entities, units, parts (candidate regions), left-out entities and facets";
    public string Usage => $$"""
        sectiontwist inspect DRAWING.dxf [--unit U] [drawing options]
          --unit      length unit of the drawing (overrides $INSUNITS; needed when the drawing is unitless)
        {{DrawingOptions.Usage}}
          Parts are numbered by area, largest first; each line gives a point inside it. Pass the number to
          'section --part N', the point to 'section --at X,Y', or a box around one view to 'section --window'.
          Exit code 0 when 'section' would accept the drawing with the same options (given its unit: a missing
          unit shows on the units line), 2 when it would refuse it (the problem is printed last).
        """;

    public int Run(Args args, CliContext ctx)
    {
        var unitText = args.Option("unit");
        var source = DrawingOptions.Read(args, new ProfileSourceOptions { Unit = unitText is null ? null : LengthUnit.Parse(unitText) });
        if (args.Positional.Count != 1) throw new UsageException("give one DXF drawing");
        args.EnsureAllUsed();
        var r = DxfProfiles.Inspect(args.Positional[0], DxfSource.ToDxf(source), ctx.Cancellation);
        Print(ctx.Out, r);
        if (r.Problem is null) return 0;
        ctx.Err.WriteLine($"sectiontwist inspect: error: {r.Problem}");
        return 2;
    }

    internal static void Print(TextWriter w, DxfImportReport r)
    {
        string G(double v) => NumberText.Format(v, 6);
        string u = r.Unit?.Symbol ?? "units";
        string Box(Geometry.Box2 b) => $"x {G(b.MinX)}..{G(b.MaxX)}, y {G(b.MinY)}..{G(b.MaxY)}";
        w.WriteLine($"drawing {r.Source}  ({r.Format} DXF, version {r.Version}{(r.CodePage is null ? "" : ", code page " + r.CodePage)})");
        string unitLine = r.Unit is null
            ? $"none ($INSUNITS {(r.InsUnits is null ? "missing" : r.InsUnits.Value.ToString(CultureInfo.InvariantCulture))}): pass --unit mm (or in, cm, m, ft)"
            : $"{r.Unit.Name} ({r.Unit.Symbol}) from {r.UnitSource}";
        w.WriteLine($"  units          {unitLine}");
        // one layer per line, count first: the name is the rest of the line, whatever characters it holds
        w.WriteLine($"  layers         {r.Layers.Count} (entities, name)");
        foreach (var l in r.Layers) w.WriteLine($"    {(r.LayerEntityCounts.TryGetValue(l, out int n) ? n : 0),8}  {l}");
        w.WriteLine($"  entities       {string.Join(", ", r.EntityCounts.Select(kv => $"{kv.Key} {kv.Value}"))}");
        if (r.PaperSpaceSkipped > 0) w.WriteLine($"  paper space    {r.PaperSpaceSkipped} entities ignored");
        if (r.SkippedTypes.Count > 0) w.WriteLine($"  skipped types  {string.Join(", ", r.SkippedTypes)}");
        if (r.Extent > 0) w.WriteLine($"  extent         {G(r.Extent)} {u} (diagonal, far strays left out)");
        w.WriteLine($"  loops          {r.Loops}");
        w.WriteLine(DxfSource.IsRoundOff(r)
            ? $"  gaps closed    none (end points meet to round-off; snap tolerance {G(r.SnapTolerance)} {u})"
            : $"  gaps closed    largest {G(r.LargestGapClosed)} {u} (snap tolerance {G(r.SnapTolerance)} {u})");
        if (r.DuplicatesDropped > 0) w.WriteLine($"  duplicates     {r.DuplicatesDropped} dropped");
        if (r.Parts.Count > 0)
        {
            w.WriteLine($"  parts          {r.Parts.Count} (largest first{(r.Selection is null ? "" : $"; used: {r.Selection}")})");
            foreach (var p in r.Parts)
                w.WriteLine($"    {p.Number,3}  area {G(p.Area)} {u}^2, {p.Holes} hole(s), {Box(p.Bounds)}, inside at {G(p.Inside.X)},{G(p.Inside.Y)}, " +
                            $"layers {string.Join(", ", p.Layers.Select(Quote))}, {p.Entity}");
        }
        foreach (var f in r.Frames) w.WriteLine($"  sheet frame    {f}");
        foreach (var j in r.Junctions.Take(10)) w.WriteLine($"  junction       {j.Ends} ends meet at ({G(j.Where.X)}, {G(j.Where.Y)}): {string.Join(", ", j.Entities)}");
        if (r.Junctions.Count > 10) w.WriteLine($"  junction       {r.Junctions.Count - 10} more");
        foreach (var l in r.LeftOut.Take(10)) w.WriteLine($"  left out       {l.Entities} on layer {Quote(l.Layer)}, {Box(l.Bounds)}: {l.Reason}");
        if (r.LeftOut.Count > 10) w.WriteLine($"  left out       {r.LeftOut.Count - 10} more");
        foreach (var f in r.Facets)
            w.WriteLine($"  facets         {f.Facets} facets ({f.Entities}) near ({G(f.Where.X)}, {G(f.Where.Y)}), {(f.Concave ? "concave" : "convex")}{(f.Arcs is { } a ? $", fitted by {a} arc(s)" : "")}");
        foreach (var warn in r.Warnings) w.WriteLine($"  note: {warn}");
        if (r.Problem is not null) w.WriteLine($"  problem: {r.Problem}");
    }

    private static string Quote(string name) => $"'{name}'";
}
