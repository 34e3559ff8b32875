namespace SectionTwist.Rendering.Report;

/// <summary>The dynamics part of a report (<see cref="ModesChapters.Build"/>).</summary>
/// <param name="KeyFigures">Lowest frequency, rigid-body modes, discretisation error, closest crossing.</param>
/// <param name="Inputs">The stations table and, with stages, the stages table.</param>
/// <param name="Chapters">Natural frequencies and mode shapes, interference check, forced response.</param>
public sealed record ModesReportParts(IReadOnlyList<KeyFigure> KeyFigures, IReadOnlyList<ReportTable> Inputs, IReadOnlyList<ReportChapter> Chapters);
