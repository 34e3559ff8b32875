using System.Text;
using SectionTwist.Rendering.Adapters;
using SectionTwist.Rendering.Drawing;
using SectionTwist.Rendering.Section;
using SectionTwist.Rendering.Shaft;
using SectionTwist.Shaft;
using SectionTwist.Units;
using SectionTwist.Verification;

namespace SectionTwist.Rendering.Report;

/// <summary>
/// Assembles the report of a solved shaft file: inputs, the shaft chapter (tables, diagram), one chapter per analysed
/// section with its contour picture, warnings, the verification rows, method, assumptions and the caution note. Writes it
/// as one self-contained HTML file, alone (<see cref="Write"/>) or with the pictures beside it (<see cref="WriteBundle"/>).
/// </summary>
public static class ShaftReport
{
    /// <summary>Width and height of the shaft diagram, px.</summary>
    private const int DiagramWidth = 1000, DiagramHeight = 900;

    /// <summary>Builds the report model and the pictures it embeds.</summary>
    /// <param name="doc">The shaft file as read.</param>
    /// <param name="result">Its solution.</param>
    /// <param name="sections">The sections analysed while reading the file (for their chapters and pictures); may be null.</param>
    /// <param name="verification">Outcomes of <see cref="VerificationSuite.Run"/> on this build; may be empty.</param>
    /// <param name="options">Generator text and time stamp.</param>
    /// <param name="extras">Further shafts and the drivetrain dynamics, each shown in chapters of their own; null for none.</param>
    public static ShaftReportContent Build(ShaftDocument doc, ShaftResult result, ShaftSectionCatalog? sections,
        IReadOnlyList<VerificationOutcome> verification, ShaftReportOptions? options = null, ShaftReportExtras? extras = null)
    {
        ArgumentNullException.ThrowIfNull(doc);
        ArgumentNullException.ThrowIfNull(result);
        ArgumentNullException.ThrowIfNull(verification);
        options ??= new ShaftReportOptions();
        var data = ShaftDiagramAdapter.From(result, null, sections) with { Units = doc.Units };
        byte[] png = ShaftDiagram.Render(data, ImageFormat.Png, DiagramWidth, DiagramHeight);
        var diagram = new ReportFigure("The shaft to scale, internal torque, rotation of the stations and peak shear along the axis " +
                                       "(dashed: allowable)", ImageFormat.Png, png, "shaft.png");

        var chapters = new List<ReportChapter> { ShaftResultChapter.Build(doc, result, diagram) };
        var pictures = new List<ReportFigure>();
        // the result carries the section-analysis warnings (naming each section) and the unbounded peaks
        var warnings = result.Warnings.Select(w => w.Message).ToList();
        if (result.Bending is { } bending)
        {
            var unit = LengthUnit.TryParse(doc.Units.Length.Symbol, out var lu) ? lu : LengthUnit.Millimetre;
            chapters.Add(BendingChapter.Build(doc, result, unit));
            warnings.AddRange(bending.Warnings);
        }
        foreach (var s in DistinctUsed(sections))
        {
            double torque = MaxTorqueOn(result, s);
            string file = $"section-{Slug(s.Name)}.png";
            string caption = torque > 0
                ? $"Section '{s.Name}': shear stress magnitude in {doc.Units.Stress.Symbol} at the largest torque it carries, {doc.Units.Torque.Text(torque)}"
                : $"Section '{s.Name}': shear stress per unit torque";
            byte[] bytes = SectionPicture.Render(SectionPlotData.From(s.Result, $"{s.Name}: {s.Source.TemplateSpec ?? Path.GetFileName(s.Source.DxfPath)}"),
                ImageFormat.Png, new SectionPlotOptions { Width = 760, Height = 560, Torque = torque > 0 ? torque : null, Units = doc.Units });
            var figure = new ReportFigure(caption, ImageFormat.Png, bytes, file);
            pictures.Add(figure);
            // the section's own warnings are in the list above already (from the result); the chapter repeats them beside its picture
            chapters.Add(ReportAdapters.SectionChapter($"Section '{s.Name}' ({s.Source.TemplateSpec ?? Path.GetFileName(s.Source.DxfPath)})", s.Result, figure, doc.Units));
        }
        if (WarpingChapter.Build(doc, result) is { } warping) chapters.Insert(1, warping);
        int after = chapters.Count > 1 && chapters[1].Heading.Contains("warping", StringComparison.OrdinalIgnoreCase) ? 2 : 1;
        var keyFigures = ShaftResultChapter.KeyFigures(doc, result).ToList();
        var method = new List<string>([.. ReportText.DefaultMethod, SectionsMethod]);
        var assumptions = ReportText.ShaftAssumptions(result.Warping is not null, result.Bending is not null, extras?.Modes is not null && doc.Dynamics is not null);
        string caution = result.Bending is null ? ReportText.DefaultCaution : BendingChapter.Caution;
        var extraChapters = new List<ReportChapter>();
        if (extras?.Geared is { } geared)
        {
            extraChapters.Add(BranchChapter.Build(doc, geared));
            warnings.AddRange(geared.Warnings.Select(w => w.Message));
            foreach (var b in geared.Branches) warnings.AddRange(b.Result.Warnings.Select(w => $"shaft '{b.Shaft}': {w.Message}"));
        }
        if (result.Overload is { } overload)
        {
            extraChapters.Add(OverloadChapter.Build(doc, overload));
            warnings.AddRange(overload.Warnings.Select(w => w.Message));
            foreach (var seg in overload.Segments)
                foreach (var c in seg.Checks.Where(c => c.Margin < 0))
                    warnings.Add($"segment '{seg.Segment}': overload '{c.Case}' is over the plastic capacity T_p / factor");
            keyFigures.Add(new KeyFigure("overload checks (plastic capacity)", overload.AnyOverCapacity ? "some case over T_p / factor" : "all within T_p / factor", overload.AnyOverCapacity));
            caution += " Overload checks: " + OverloadChapter.Caution;
        }
        if (extras?.Modes is { } modes && doc.Dynamics is not null)
        {
            var parts = ModesChapters.Build(doc, modes, extras.Resonance, extras.Forced, "Dynamics: ");
            var first = parts.Chapters[0];
            extraChapters.Add(first with
            {
                Paragraphs = ["The drivetrain of the file's 'dynamics' block (the same analysis as 'sectiontwist modes'): torsional natural frequencies, mode shapes, " +
                              "the strain-energy share of every part, the interference check and the forced response.", .. first.Paragraphs],
                Tables = [.. parts.Inputs, .. first.Tables],
            });
            extraChapters.AddRange(parts.Chapters.Skip(1));
            keyFigures.AddRange(parts.KeyFigures.Select(k => k with { Label = "dynamics: " + k.Label }));
            warnings.AddRange(modes.Warnings.Select(w => "dynamics: " + w));
            method.AddRange(ModesReport.Method);
            assumptions.AddRange(ModesReport.Assumptions);
            caution += " Dynamics: " + ModesReport.Caution;
        }
        chapters.InsertRange(after, extraChapters);
        warnings.AddRange(result.WarpingWarnings);
        foreach (var seg in result.Segments.Where(x => x.ExceedsShearLimit || x.ExceedsTwistRateLimit))
            warnings.Add($"segment '{seg.Label}': {seg.Check}");

        var model = new ReportModel
        {
            Title = doc.Model.Title is { } t ? $"Shaft report: {t}" : "Shaft report",
            Subtitle = $"input: {doc.Path}",
            Generator = options.Generator,
            Generated = options.Generated,
            KeyFigures = keyFigures,
            Inputs = ShaftInputTables.Build(doc, result),
            Chapters = chapters,
            Verification = ReportAdapters.Verification(verification),
            Warnings = warnings,
            Method = method,
            Assumptions = assumptions,
            Caution = caution,
        };
        return new ShaftReportContent(model, data, png, pictures);
    }

    private const string SectionsMethod =
        "Where the shaft file gives a section as a round or a tube, J and the peak shear per unit torque are the exact formulas " +
        "J = π(D⁴ − d⁴)/32, τ/T = 16D/(π(D⁴ − d⁴)) (Timoshenko and Goodier, ch. 10); where it gives J and the shear factor directly, " +
        "those values are used as given; template and drawing sections are analysed as described above, and each has its own chapter in this report (properties and contour picture). " +
        "A section with a sharp re-entrant corner has no finite peak shear; segments built from it are marked 'unbounded' and get no factor of safety.";

    /// <summary>Writes the report to <paramref name="path"/> (one self-contained HTML file).</summary>
    public static void Write(ShaftReportContent content, string path)
    {
        ArgumentNullException.ThrowIfNull(content);
        HtmlReportWriter.Save(content.Model, path);
    }

    /// <summary>
    /// Writes <c>report.html</c>, <c>shaft.png</c>, <c>shaft.svg</c> and <c>section-NAME.png</c> per analysed section into
    /// <paramref name="directory"/> (created when missing). Returns the files written, report first.
    /// </summary>
    public static IReadOnlyList<string> WriteBundle(ShaftReportContent content, string directory)
    {
        ArgumentNullException.ThrowIfNull(content);
        var written = new List<string>();
        void Put(string name, byte[] bytes)
        {
            string p = Path.Combine(directory, name);
            AtomicFile.Write(p, s => s.Write(bytes));
            written.Add(p);
        }
        string report = Path.Combine(directory, "report.html");
        HtmlReportWriter.Save(content.Model, report);
        written.Add(report);
        Put("shaft.png", content.DiagramPng);
        Put("shaft.svg", ShaftDiagram.Render(content.Diagram, ImageFormat.Svg, DiagramWidth, DiagramHeight));
        foreach (var f in content.SectionPictures) Put(f.FileName!, f.Data);
        return written;
    }

    /// <summary>The few key lines for a console: governing segment, peak shear against the limit, twist rate, total twist.</summary>
    public static IReadOnlyList<string> Summary(ShaftDocument doc, ShaftResult result)
    {
        ArgumentNullException.ThrowIfNull(doc);
        ArgumentNullException.ThrowIfNull(result);
        var lines = new List<string> { ShaftResultChapter.Governing(doc, result), ShaftResultChapter.TwistRate(doc, result), ShaftResultChapter.EndToEnd(result) };
        lines.AddRange(ShaftResultChapter.Alarms(result));
        lines.AddRange(result.Warnings.Select(w => "Warning: " + w.Message));
        return lines;
    }

    /// <summary>Analysed sections that some segment uses, one per distinct J and shear factor.</summary>
    private static IEnumerable<AnalysedSection> DistinctUsed(ShaftSectionCatalog? sections) =>
        sections is null ? [] : sections.Sections.DistinctBy(s => (s.Result.TorsionConstant, s.Result.MaxShearPerTorque));

    /// <summary>The largest |internal torque| in the segments built from <paramref name="s"/>, N*m.</summary>
    private static double MaxTorqueOn(ShaftResult r, AnalysedSection s) =>
        r.Segments.Where(x => ShaftDiagramAdapter.ModelSegment(r.Model, x).Section is { } sec
                              && sec.TorsionConstant == s.Result.TorsionConstant && sec.ShearPerTorque == s.Result.MaxShearPerTorque)
            .Select(x => Math.Max(Math.Abs(x.TorqueAtFrom), Math.Abs(x.TorqueAtTo))).DefaultIfEmpty(0).Max();

    /// <summary>A file-name-safe form of a section name.</summary>
    internal static string Slug(string name)
    {
        var b = new StringBuilder(name.Length);
        foreach (char c in name.ToLowerInvariant())
            b.Append(char.IsAsciiLetterOrDigit(c) ? c : '-');
        string s = b.ToString().Trim('-');
        return s.Length == 0 ? "section" : s;
    }
}

/// <summary>Options of a shaft report.</summary>
public sealed record ShaftReportOptions
{
    /// <summary>Program name and version shown under the title.</summary>
    public string? Generator { get; init; }
    /// <summary>Time stamp shown under the title (null: none, for reproducible files).</summary>
    public DateTimeOffset? Generated { get; init; }
}

/// <summary>A built shaft report: the model and the pictures it embeds (also written beside it by <see cref="ShaftReport.WriteBundle"/>).</summary>
/// <param name="Model">The report model.</param>
/// <param name="Diagram">What the shaft diagram shows.</param>
/// <param name="DiagramPng">The shaft diagram, PNG.</param>
/// <param name="SectionPictures">One contour picture per analysed section (PNG, with its file name).</param>
public sealed record ShaftReportContent(ReportModel Model, ShaftDiagramData Diagram, byte[] DiagramPng, IReadOnlyList<ReportFigure> SectionPictures);
