using System.Globalization;
using SectionTwist.Import.Dxf;
using SectionTwist.Units;

namespace SectionTwist.Cli;

/// <summary><c>sectiontwist inspect drawing.dxf</c>: what a drawing holds and how it turns into a section.</summary>
internal sealed class InspectCommand : ICommand
{
    public string Name => "inspect";
    public string Summary => "list a DXF drawing's layers, entities, units, loops, parts and gaps closed";
    public string Usage => """
        sectiontwist inspect DRAWING.dxf [--unit U] [--layer NAME] [--snap REL]
          --unit      length unit of the drawing (overrides $INSUNITS; needed when the drawing is unitless)
          --layer     use only this layer (entities on layer 0 inside blocks take the insert's layer)
          --snap      join end points closer than REL x the part size (default 1e-6)
          Parts are numbered by area, largest first; pass the number to 'section --part N'.
        """;

    public int Run(Args args, CliContext ctx)
    {
        var unitText = args.Option("unit");
        double snap = args.Double("snap") ?? 1e-6;
        var options = new DxfReadOptions
        {
            Unit = unitText is null ? null : LengthUnit.Parse(unitText),
            Layer = args.Option("layer"),
            SnapTolerance = snap,
        };
        if (args.Positional.Count != 1) throw new UsageException("give one DXF drawing");
        args.EnsureAllUsed();
        var r = DxfProfiles.Inspect(args.Positional[0], options, ctx.Cancellation);
        Print(ctx.Out, r);
        return r.Problem is null ? 0 : 1;
    }

    internal static void Print(TextWriter w, DxfImportReport r)
    {
        string G(double v) => NumberText.Format(v, 6);
        string u = r.Unit?.Symbol ?? "units";
        w.WriteLine($"drawing {r.Source}  ({r.Format} DXF, version {r.Version}{(r.CodePage is null ? "" : ", code page " + r.CodePage)})");
        string unitLine = r.Unit is null
            ? $"none ($INSUNITS {(r.InsUnits is null ? "missing" : r.InsUnits.Value.ToString(CultureInfo.InvariantCulture))}): pass --unit mm (or in, cm, m, ft)"
            : $"{r.Unit.Name} ({r.Unit.Symbol}) from {r.UnitSource}";
        w.WriteLine($"  units          {unitLine}");
        w.WriteLine($"  layers         {string.Join(", ", r.Layers.Select(l => r.LayerEntityCounts.TryGetValue(l, out int n) ? $"{l} ({n})" : $"{l} (0)"))}");
        w.WriteLine($"  entities       {string.Join(", ", r.EntityCounts.Select(kv => $"{kv.Key} {kv.Value}"))}");
        if (r.PaperSpaceSkipped > 0) w.WriteLine($"  paper space    {r.PaperSpaceSkipped} entities ignored");
        if (r.SkippedTypes.Count > 0) w.WriteLine($"  skipped types  {string.Join(", ", r.SkippedTypes)}");
        w.WriteLine($"  loops          {r.Loops}");
        w.WriteLine(DxfSource.IsRoundOff(r)
            ? $"  gaps closed    none (end points meet to round-off; snap tolerance {G(r.SnapTolerance)} {u})"
            : $"  gaps closed    largest {G(r.LargestGapClosed)} {u} (snap tolerance {G(r.SnapTolerance)} {u})");
        if (r.DuplicatesDropped > 0) w.WriteLine($"  duplicates     {r.DuplicatesDropped} dropped");
        if (r.Parts.Count > 0)
        {
            w.WriteLine($"  parts          {r.Parts.Count} (largest first)");
            foreach (var p in r.Parts)
                w.WriteLine($"    {p.Number,3}  area {G(p.Area)} {u}^2, {p.Holes} hole(s), x {G(p.Bounds.MinX)}..{G(p.Bounds.MaxX)}, y {G(p.Bounds.MinY)}..{G(p.Bounds.MaxY)}, layers {string.Join(", ", p.Layers)}");
        }
        foreach (var warn in r.Warnings) w.WriteLine($"  note: {warn}");
        if (r.Problem is not null) w.WriteLine($"  problem: {r.Problem}");
    }
}
