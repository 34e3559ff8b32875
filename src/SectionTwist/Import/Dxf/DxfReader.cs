using System.Globalization;
using SectionTwist.Geometry;
using SectionTwist.Units;

namespace SectionTwist.Import.Dxf;

/// <summary>
/// The read pipeline: bytes -> pairs -> document -> curves -> (window, far strays, loops, regions, choice) -> profile in
/// metres. Every number of the chosen layers is read before the unit is asked for, so a damaged file is named first.
/// </summary>
internal static class DxfReader
{
    public static (DxfImportReport Report, Profile? Profile) Read(ReadOnlySpan<byte> data, string file, DxfReadOptions o, bool inspect, CancellationToken ct = default)
    {
        var fix = new DxfRemedy(o.ShaftFileKeys);
        CheckOptions(o, fix);
        var pairs = DxfTokenizer.Tokenize(data, file, out string format, out bool bom, ct);
        ct.ThrowIfCancellationRequested();
        if (pairs.Count == 0)
            throw new SectionTwistException("dxf-empty", $"{file}: the file is empty; export the drawing again as DXF");
        string? acadVer = FindHeader(pairs, "$ACADVER"), codePage = FindHeader(pairs, "$DWGCODEPAGE");
        var enc = DxfText.EncodingFor(acadVer, codePage, bom);
        for (int i = 0; i < pairs.Count; i++)
            if (DxfPair.IsStringCode(pairs[i].Code)) pairs[i] = pairs[i] with { Value = DxfText.Decode(pairs[i].Value, enc) };
        var doc = DxfParser.Parse(pairs, file, format);
        DxfBudget.Check(doc, ct);
        if (doc.Entities.Count == 0)
            throw new SectionTwistException("dxf-no-entities",
                $"{file}: the drawing holds no entities in its ENTITIES section; export the drawing with its geometry (model space)");

        var known = doc.Layers.Concat(doc.Entities.Select(e => e.Layer)).Concat(doc.Blocks.Values.SelectMany(b => b.Entities).Select(e => e.Layer))
            .Distinct(StringComparer.OrdinalIgnoreCase).ToList();
        var filter = LayerFilter.Create(o.Layer, known);
        var builder = new DxfGeometryBuilder(doc, filter is null ? null : filter.Matches, o.UseHatches, ct);
        builder.Run();
        var warnings = new List<string>(doc.Warnings);
        warnings.AddRange(builder.Warnings);
        var layers = doc.Layers.Concat(builder.LayerCounts.Keys).Distinct(StringComparer.OrdinalIgnoreCase).ToList();

        int? ins = doc.HeaderInt("$INSUNITS");
        LengthUnit? unit = o.Unit;
        string unitSource = "option";
        if (unit is null)
        {
            unit = ins is { } c ? DxfUnits.FromCode(c) : null;
            unitSource = unit is null ? "none" : "$INSUNITS";
            if (ins is { } bad && (bad < 0 || bad > DxfUnits.MaxCode)) warnings.Add($"unknown $INSUNITS code {bad}; treated as unitless");
        }

        var sel = new DxfSelection(file, o, builder, filter, layers.Concat(known).Distinct(StringComparer.OrdinalIgnoreCase).ToList(), unit ?? LengthUnit.Millimetre, ct);
        string? problem = null;
        try { sel.Run(); }
        catch (SectionTwistException e) when (inspect) { problem = e.Message; }
        warnings.AddRange(sel.Warnings);
        if (unit is null && !inspect)
            throw new SectionTwistException("dxf-unitless",
                $"{file}: the drawing has no length unit ($INSUNITS {(ins is null ? "is missing" : $"= {ins}")}); give it with {fix.Unit} to say what one drawing unit is");

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
            Loops = sel.Loops,
            Parts = sel.Parts,
            SelectedPart = sel.SelectedPart,
            Selection = sel.Selection,
            Extent = sel.Extent,
            LargestGapClosed = sel.LargestGap,
            SnapTolerance = sel.SnapTolerance,
            DuplicatesDropped = sel.DuplicatesDropped,
            LeftOut = sel.LeftOut,
            Junctions = sel.Junctions,
            Frames = sel.Frames,
            Facets = sel.Facets,
            Warnings = warnings,
            Problem = problem,
        };
        if (inspect || unit is null || sel.Chosen is null) return (report, null);
        string name = file + (o.Layer is null ? "" : $" layer {o.Layer}") + (sel.Selection is null or "all parts" ? "" : $" {sel.Selection}");
        // validate in drawing units so that messages quote drawing coordinates, then scale to metres
        var drawn = new Profile(sel.Chosen, unit, name) { CurveTolerance = sel.CurveTolerance };
        return (report, drawn.Transformed(Similarity2.Scaling(unit.Metres)));
    }

    private static void CheckOptions(DxfReadOptions o, DxfRemedy fix)
    {
        string snap = fix.ShaftFileKeys ? "snap" : "--snap", fit = fix.ShaftFileKeys ? "fitArcs" : "--fit-arcs";
        if (!(o.SnapTolerance >= 0 && o.SnapTolerance < 0.1))
            throw new SectionTwistException("bad-option", $"{snap} {o.SnapTolerance.ToString(CultureInfo.InvariantCulture)} must lie in [0, 0.1) (a fraction of the drawing's size, e.g. 1e-6)");
        if (!(o.SplineTolerance > 0 && o.SplineTolerance < 0.1))
            throw new SectionTwistException("bad-option", $"spline tolerance {o.SplineTolerance.ToString(CultureInfo.InvariantCulture)} must lie in (0, 0.1) (a fraction of the curve's size, e.g. 1e-7)");
        if (o.FitArcs is { } f && !(f > 0 && f <= 0.01))
            throw new SectionTwistException("bad-option", $"{fit} {f.ToString(CultureInfo.InvariantCulture)} must lie in (0, 0.01] (a fraction of the part size, e.g. 1e-4)");
        if (o.Part is < 1) throw new SectionTwistException("bad-option", $"{(fix.ShaftFileKeys ? "part" : "--part")} {o.Part}: parts are numbered from 1 (largest first)");
        if (o.Part is not null && o.At is not null)
            throw new SectionTwistException("bad-option", fix.ShaftFileKeys ? "give either 'part' or 'at', not both" : "give either --part or --at, not both");
        if (o.At is { } p && !(double.IsFinite(p.X) && double.IsFinite(p.Y)))
            throw new SectionTwistException("bad-option", "the point must have finite coordinates");
        if (o.Window is { } w && !(double.IsFinite(w.MinX + w.MinY + w.MaxX + w.MaxY) && w.MaxX > w.MinX && w.MaxY > w.MinY))
            throw new SectionTwistException("bad-option", "the window needs x1 < x2 and y1 < y2 (finite numbers, drawing units)");
    }

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
