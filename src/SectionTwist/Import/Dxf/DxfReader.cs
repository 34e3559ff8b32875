using System.Globalization;
using SectionTwist.Geometry;
using SectionTwist.Units;

namespace SectionTwist.Import.Dxf;

/// <summary>The read pipeline: bytes -> pairs -> document -> curves -> loops -> parts -> profile in metres.</summary>
internal static class DxfReader
{
    public static (DxfImportReport Report, Profile? Profile) Read(ReadOnlySpan<byte> data, string file, DxfReadOptions o, bool inspect, CancellationToken ct = default)
    {
        if (!(o.SnapTolerance >= 0 && o.SnapTolerance < 0.1))
            throw new SectionTwistException("bad-option", $"snap tolerance {o.SnapTolerance} must lie in [0, 0.1) (a fraction of the part size, e.g. 1e-6)");
        if (!(o.SplineTolerance > 0 && o.SplineTolerance < 0.1))
            throw new SectionTwistException("bad-option", $"spline tolerance {o.SplineTolerance} must lie in (0, 0.1) (a fraction of the part size, e.g. 1e-5)");
        if (o.Part is < 1) throw new SectionTwistException("bad-option", $"--part {o.Part}: parts are numbered from 1 (largest first)");

        var pairs = DxfTokenizer.Tokenize(data, file, out string format, out bool bom, ct);
        ct.ThrowIfCancellationRequested();
        string? acadVer = FindHeader(pairs, "$ACADVER"), codePage = FindHeader(pairs, "$DWGCODEPAGE");
        var enc = DxfText.EncodingFor(acadVer, codePage, bom);
        for (int i = 0; i < pairs.Count; i++)
            if (DxfPair.IsStringCode(pairs[i].Code)) pairs[i] = pairs[i] with { Value = DxfText.Decode(pairs[i].Value, enc) };
        var doc = DxfParser.Parse(pairs, file, format);
        DxfBudget.Check(doc, ct);

        int? ins = doc.HeaderInt("$INSUNITS");
        LengthUnit? unit = o.Unit;
        string unitSource = "option";
        var warnings = new List<string>(doc.Warnings);
        if (unit is null)
        {
            unit = ins is { } c ? DxfUnits.FromCode(c) : null;
            unitSource = unit is null ? "none" : "$INSUNITS";
            if (ins is { } bad && (bad < 0 || bad > DxfUnits.MaxCode)) warnings.Add($"unknown $INSUNITS code {bad}; treated as unitless");
        }
        if (unit is null && !inspect)
            throw new SectionTwistException("dxf-unitless",
                $"{file}: the drawing has no length unit ($INSUNITS {(ins is null ? "is missing" : $"= {ins}")}); pass --unit mm (or in, cm, m, ft) to say what one drawing unit is");

        var builder = new DxfGeometryBuilder(doc, o.Layer, ct);
        builder.Run();
        warnings.AddRange(builder.Warnings);
        var layers = doc.Layers.Concat(builder.LayerCounts.Keys).Distinct(StringComparer.OrdinalIgnoreCase).ToList();

        var box = Box2.Empty;
        foreach (var c in builder.Curves) box = box.Union(c.Bounds);
        double diag = box.Diagonal;
        string? problem = null;
        var parts = new List<DxfPartInfo>();
        List<Region> regions = [];
        OutlineAssembler? asm = null;
        try
        {
            if (builder.Curves.Count == 0 || !(diag > 0))
                throw new SectionTwistException("dxf-no-outline",
                    $"{file}: no outline entities{(o.Layer is null ? "" : $" on layer '{o.Layer}'")} in model space; layers: {string.Join(", ", layers.DefaultIfEmpty("(none)"))}");
            asm = new OutlineAssembler(file, o.SnapTolerance * diag, o.SplineTolerance * diag, diag, ct);
            asm.Run(builder.Curves);
            if (asm.Loops.Count == 0) throw new SectionTwistException("dxf-no-outline", $"{file}: no closed outline found");
            // nest in drawing units so validation messages quote drawing coordinates
            var drawn = Profile.FromLoops(asm.Loops, unit ?? LengthUnit.Millimetre, file);
            regions = drawn.Regions.OrderByDescending(r => r.Area).ThenBy(r => r.Outer.Bounds.MinX).ThenBy(r => r.Outer.Bounds.MinY).ToList();
            for (int k = 0; k < regions.Count; k++)
            {
                var loopSet = regions[k].Loops.ToList();
                var lay = new SortedSet<string>(StringComparer.OrdinalIgnoreCase);
                for (int li = 0; li < asm.Loops.Count; li++)
                    if (loopSet.Any(l => SameLoop(l, asm.Loops[li]))) foreach (var s in asm.LoopLayers[li]) lay.Add(s);
                parts.Add(new DxfPartInfo(k + 1, regions[k].Area, regions[k].Holes.Count, regions[k].Outer.Bounds, lay.ToArray()));
            }
            if (o.Part is null) StrayHoleCheck.Check(file, regions, asm.Loops, asm.LoopLayers, unit ?? LengthUnit.Millimetre);
            if (o.Part is { } pn && pn > regions.Count)
                throw new SectionTwistException("dxf-no-part",
                    $"{file}: --part {pn} does not exist: the drawing holds {regions.Count} part(s) with areas {string.Join(", ", parts.Select(p => p.Area.ToString("G4", CultureInfo.InvariantCulture)))} (largest first)");
        }
        catch (SectionTwistException e) when (inspect)
        {
            problem = e.Message;
        }

        var report = new DxfImportReport
        {
            Source = file,
            Format = format,
            Version = acadVer ?? "unknown",
            CodePage = codePage,
            InsUnits = ins,
            Unit = unit,
            UnitSource = unitSource,
            Layers = layers,
            EntityCounts = builder.EntityCounts,
            LayerEntityCounts = builder.LayerCounts,
            SkippedTypes = builder.Skipped.ToArray(),
            PaperSpaceSkipped = builder.PaperSpaceSkipped,
            Loops = asm?.Loops.Count ?? 0,
            Parts = parts,
            SelectedPart = o.Part,
            LargestGapClosed = asm?.LargestGap ?? 0,
            SnapTolerance = o.SnapTolerance * diag,
            DuplicatesDropped = asm?.DuplicatesDropped ?? 0,
            Warnings = warnings,
            Problem = problem,
        };
        if (inspect || unit is null) return (report, null);
        var chosen = o.Part is { } n ? [regions[n - 1]] : regions;
        string name = file + (o.Layer is null ? "" : $" layer {o.Layer}") + (o.Part is null ? "" : $" part {o.Part}");
        var scale = Similarity2.Scaling(unit.Metres);
        return (report, new Profile(chosen.Select(r => r.Transformed(scale)), unit, name));
    }

    private static bool SameLoop(Loop a, Loop b) =>
        a.Segments.Count == b.Segments.Count && a.Bounds == b.Bounds;

    private static string? FindHeader(List<DxfPair> pairs, string name)
    {
        for (int i = 0; i + 1 < pairs.Count && i < 20000; i++)
        {
            if (pairs[i].Code == 0 && pairs[i].Value == "ENDSEC") break;
            if (pairs[i].Code == 9 && string.Equals(pairs[i].Value.Trim(), name, StringComparison.OrdinalIgnoreCase)) return pairs[i + 1].Value.Trim();
        }
        return null;
    }
}
