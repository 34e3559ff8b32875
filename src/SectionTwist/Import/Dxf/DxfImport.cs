using SectionTwist.Geometry;
using SectionTwist.Units;

namespace SectionTwist.Import.Dxf;

/// <summary>A profile read from a DXF drawing, with the report of what was found.</summary>
/// <param name="Profile">The section (coordinates in metres, <see cref="Profile.Unit"/> = the drawing unit).</param>
/// <param name="Report">What the reader found, joined, dropped and skipped.</param>
public sealed record DxfImport(Profile Profile, DxfImportReport Report);

/// <summary>One separate part of the drawing (an outer loop with its holes). Lengths in drawing units.</summary>
/// <param name="Number">1-based part number (largest net area first).</param>
/// <param name="Area">Net area in drawing units squared.</param>
/// <param name="Holes">Number of holes.</param>
/// <param name="Bounds">Bounding box in drawing units.</param>
/// <param name="Layers">Layers its loops came from.</param>
public sealed record DxfPartInfo(int Number, double Area, int Holes, Box2 Bounds, IReadOnlyList<string> Layers);

/// <summary>The import report. Lengths are in drawing units.</summary>
public sealed record DxfImportReport
{
    /// <summary>File name used in messages.</summary>
    public required string Source { get; init; }
    /// <summary>"ASCII" or "binary".</summary>
    public required string Format { get; init; }
    /// <summary><c>$ACADVER</c> (e.g. AC1009 for R12, AC1015 for R2000), or "unknown".</summary>
    public required string Version { get; init; }
    /// <summary><c>$DWGCODEPAGE</c>, or null when absent.</summary>
    public string? CodePage { get; init; }
    /// <summary><c>$INSUNITS</c>, or null when absent.</summary>
    public int? InsUnits { get; init; }
    /// <summary>The drawing unit used, or null when the drawing is unitless and no unit was given.</summary>
    public LengthUnit? Unit { get; init; }
    /// <summary>Where <see cref="Unit"/> came from: <c>$INSUNITS</c>, <c>option</c>, or <c>none</c>.</summary>
    public required string UnitSource { get; init; }
    /// <summary>Layers of the LAYER table plus layers used by entities.</summary>
    public required IReadOnlyList<string> Layers { get; init; }
    /// <summary>Model-space entity counts by type (top level).</summary>
    public required IReadOnlyDictionary<string, int> EntityCounts { get; init; }
    /// <summary>Model-space entity counts by layer (top level).</summary>
    public required IReadOnlyDictionary<string, int> LayerEntityCounts { get; init; }
    /// <summary>Entity types not used for the outline (annotation and unknown types), once each.</summary>
    public required IReadOnlyList<string> SkippedTypes { get; init; }
    /// <summary>Paper-space entities ignored.</summary>
    public int PaperSpaceSkipped { get; init; }
    /// <summary>Closed loops found.</summary>
    public int Loops { get; init; }
    /// <summary>The separate parts, largest first (all of them, also when one was picked).</summary>
    public required IReadOnlyList<DxfPartInfo> Parts { get; init; }
    /// <summary>The part used, or null when all parts form the section.</summary>
    public int? SelectedPart { get; init; }
    /// <summary>Largest distance an end point was moved to join a neighbour.</summary>
    public double LargestGapClosed { get; init; }
    /// <summary>Absolute snap tolerance used.</summary>
    public double SnapTolerance { get; init; }
    /// <summary>Duplicate or overlapping pieces dropped.</summary>
    public int DuplicatesDropped { get; init; }
    /// <summary>Non-fatal notes (skipped types, ignored degenerate entities, missing blocks).</summary>
    public required IReadOnlyList<string> Warnings { get; init; }
    /// <summary>The error that stopped loop building (only from <see cref="DxfProfiles.Inspect(string, DxfReadOptions?, CancellationToken)"/>), else null.</summary>
    public string? Problem { get; init; }
}
