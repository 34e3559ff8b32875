using SectionTwist.Rendering.Drawing;

namespace SectionTwist.Rendering.Report;

/// <summary>
/// Everything one HTML report shows. Plain data, so any part of the program (section, shaft, demo) can fill it in.
/// Method, assumptions and the caution note have defaults for Saint-Venant torsion and the segmented shaft model.
/// </summary>
public sealed record ReportModel
{
    /// <summary>Page title and first heading.</summary>
    public required string Title { get; init; }
    /// <summary>A line under the title (e.g. the input file).</summary>
    public string? Subtitle { get; init; }
    /// <summary>Program name and version that made the report.</summary>
    public string? Generator { get; init; }
    /// <summary>When the report was made (omit for reproducible output).</summary>
    public DateTimeOffset? Generated { get; init; }
    /// <summary>The headline numbers, shown in a box at the top.</summary>
    public IReadOnlyList<KeyFigure> KeyFigures { get; init; } = [];
    /// <summary>Input tables (material, stations, loads, sections...).</summary>
    public IReadOnlyList<ReportTable> Inputs { get; init; } = [];
    /// <summary>Result chapters (one per section, one for the shaft...).</summary>
    public IReadOnlyList<ReportChapter> Chapters { get; init; } = [];
    /// <summary>Outcomes of the verification cases run on this build.</summary>
    public IReadOnlyList<VerificationRow> Verification { get; init; } = [];
    /// <summary>Warnings about inputs and results.</summary>
    public IReadOnlyList<string> Warnings { get; init; } = [];
    /// <summary>How the numbers were obtained.</summary>
    public IReadOnlyList<string> Method { get; init; } = ReportText.DefaultMethod;
    /// <summary>What the model assumes.</summary>
    public IReadOnlyList<string> Assumptions { get; init; } = ReportText.DefaultAssumptions;
    /// <summary>The caution note at the end.</summary>
    public string Caution { get; init; } = ReportText.DefaultCaution;
}

/// <summary>A headline number.</summary>
/// <param name="Label">What it is, e.g. "torsion constant J".</param>
/// <param name="Value">Formatted value with unit.</param>
/// <param name="Alert">True to highlight (e.g. an exceeded limit).</param>
public sealed record KeyFigure(string Label, string Value, bool Alert = false);

/// <summary>A table of text cells.</summary>
/// <param name="Caption">Caption above the table.</param>
/// <param name="Headers">Column headings.</param>
/// <param name="Rows">Rows of cells, as many as headings.</param>
public sealed record ReportTable(string Caption, IReadOnlyList<string> Headers, IReadOnlyList<IReadOnlyList<string>> Rows)
{
    /// <summary>Rows to highlight (indices into <see cref="Rows"/>), e.g. segments over their allowable.</summary>
    public IReadOnlyList<int> AlertRows { get; init; } = [];
}

/// <summary>A picture embedded in the report as a data: URI.</summary>
/// <param name="Caption">Caption under the picture.</param>
/// <param name="Format">PNG or SVG.</param>
/// <param name="Data">The encoded file bytes.</param>
/// <param name="FileName">Name of the same picture written beside the report, if any (mentioned in the caption).</param>
public sealed record ReportFigure(string Caption, ImageFormat Format, byte[] Data, string? FileName = null);

/// <summary>A chapter of results: paragraphs, tables and pictures.</summary>
/// <param name="Heading">Chapter heading.</param>
public sealed record ReportChapter(string Heading)
{
    /// <summary>Text paragraphs before the tables.</summary>
    public IReadOnlyList<string> Paragraphs { get; init; } = [];
    /// <summary>Tables.</summary>
    public IReadOnlyList<ReportTable> Tables { get; init; } = [];
    /// <summary>Pictures.</summary>
    public IReadOnlyList<ReportFigure> Figures { get; init; } = [];
}

/// <summary>The outcome of one verification case.</summary>
/// <param name="Name">Case name.</param>
/// <param name="Computed">Value computed by this build.</param>
/// <param name="Reference">Published or exact reference value.</param>
/// <param name="Unit">Unit of both values.</param>
/// <param name="RelativeError">(computed - reference) / reference.</param>
/// <param name="Tolerance">Allowed |relative error|.</param>
/// <param name="Source">Where the reference comes from.</param>
/// <param name="Pass">True when within tolerance.</param>
public sealed record VerificationRow(string Name, double Computed, double Reference, string Unit, double RelativeError,
    double Tolerance, string Source, bool Pass);
