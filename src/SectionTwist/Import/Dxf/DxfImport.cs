using SectionTwist.Geometry;
using SectionTwist.Units;

namespace SectionTwist.Import.Dxf;

/// <summary>A profile read from a DXF drawing, with the report of what was found.</summary>
/// <param name="Profile">The section (coordinates in metres, <see cref="Profile.Unit"/> = the drawing unit).</param>
/// <param name="Report">What the reader found, joined, dropped and skipped.</param>
public sealed record DxfImport(Profile Profile, DxfImportReport Report);

/// <summary>One candidate region of the drawing (a closed loop with the loops directly inside it as holes). Lengths in drawing units.</summary>
/// <param name="Number">1-based part number (largest net area first).</param>
/// <param name="Area">Net area in drawing units squared.</param>
/// <param name="Holes">Number of holes.</param>
/// <param name="Bounds">Bounding box in drawing units.</param>
/// <param name="Layers">Layers its loops came from.</param>
/// <param name="Entity">The entity its outer loop starts with, e.g. "LWPOLYLINE (handle 2A, line 40)".</param>
/// <param name="Inside">A point inside its material (for choosing it with a point).</param>
public sealed record DxfPartInfo(int Number, double Area, int Holes, Box2 Bounds, IReadOnlyList<string> Layers, string Entity, Point2 Inside);

/// <summary>Entities left out of the outline, with the reason (lengths in drawing units).</summary>
/// <param name="Entities">The entity, or the first entities of a group.</param>
/// <param name="Count">Number of entities (pieces) in the group.</param>
/// <param name="Layer">Their layer(s).</param>
/// <param name="Bounds">Bounding box.</param>
/// <param name="Reason">Why they were left out.</param>
public sealed record DxfLeftOut(string Entities, int Count, string Layer, Box2 Bounds, string Reason);

/// <summary>A place where three or more outline ends meet, so that no single outline runs through it (drawing units).</summary>
/// <param name="Where">The meeting point.</param>
/// <param name="Ends">Number of ends meeting there.</param>
/// <param name="Entities">Up to four of the entities meeting there.</param>
/// <param name="Bounds">Bounding box of the connected group.</param>
public sealed record DxfJunctionInfo(Point2 Where, int Ends, IReadOnlyList<string> Entities, Box2 Bounds);

/// <summary>A curve of the chosen outline drawn as facets (drawing units).</summary>
/// <param name="Entities">The entity (and facet range) it came from.</param>
/// <param name="Facets">Number of facets.</param>
/// <param name="Where">A point halfway along it.</param>
/// <param name="Concave">True when it bends into the material (its facet corners are re-entrant).</param>
/// <param name="Arcs">Arcs fitted in its place, or null when the facets were kept.</param>
public sealed record DxfFacetInfo(string Entities, int Facets, Point2 Where, bool Concave, int? Arcs);

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
    /// <summary>The candidate regions, largest first (all of them, also when one was picked).</summary>
    public required IReadOnlyList<DxfPartInfo> Parts { get; init; }
    /// <summary>The part used, or null when all parts form the section (or the part was chosen by a point outside the list).</summary>
    public int? SelectedPart { get; init; }
    /// <summary>How the section was chosen ("all parts", "part 2", "at (10, 20)", "window ..."), or null before a choice.</summary>
    public string? Selection { get; init; }
    /// <summary>The size relative tolerances refer to: the diagonal of the drawing with far stray entities left out.</summary>
    public double Extent { get; init; }
    /// <summary>Entities left out (far strays, lines that close nothing, open entities left out on request), with reasons.</summary>
    public IReadOnlyList<DxfLeftOut> LeftOut { get; init; } = [];
    /// <summary>Places where three or more outline ends meet (not usable as outlines).</summary>
    public IReadOnlyList<DxfJunctionInfo> Junctions { get; init; } = [];
    /// <summary>Loops read as a sheet frame or title-block cell (they enclose text, junctions or open curves and other loops).</summary>
    public IReadOnlyList<string> Frames { get; init; } = [];
    /// <summary>Curves of the chosen outline drawn as facets.</summary>
    public IReadOnlyList<DxfFacetInfo> Facets { get; init; } = [];
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
