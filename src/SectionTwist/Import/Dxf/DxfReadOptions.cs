using SectionTwist.Geometry;
using SectionTwist.Units;

namespace SectionTwist.Import.Dxf;

/// <summary>Options for reading a profile from a DXF drawing. Lengths and points are in drawing units.</summary>
public sealed record DxfReadOptions
{
    /// <summary>Length unit of the drawing; overrides <c>$INSUNITS</c>. Required when the drawing is unitless.</summary>
    public LengthUnit? Unit { get; init; }

    /// <summary>
    /// Use only entities on these layers (case-insensitive): one name, names separated by commas, or patterns with
    /// <c>*</c> (any characters) and <c>?</c> (one character). A text equal to a layer name of the drawing is that layer.
    /// Entities on layer 0 inside a block take the INSERT's layer.
    /// </summary>
    public string? Layer { get; init; }

    /// <summary>
    /// Use only part N (1-based). Parts are the candidate regions (a closed loop with the loops directly inside it as
    /// holes, sheet frames left out), numbered by net area, largest first; ties by the lower-left corner (x, then y).
    /// </summary>
    public int? Part { get; init; }

    /// <summary>Use the region of the innermost closed loop around this point (its material; the loops directly inside are holes).</summary>
    public Point2? At { get; init; }

    /// <summary>Use only entities lying wholly inside this box (a view on a drawing sheet).</summary>
    public Box2? Window { get; init; }

    /// <summary>Take the outlines from the boundary paths of HATCH entities (the hatched cut material of a section view) instead of the drawn entities.</summary>
    public bool UseHatches { get; init; }

    /// <summary>
    /// Replace curves drawn as facets (runs of short lines turning by small angles) by circular arcs through their
    /// vertices, within this fraction of the part size; null: keep the facets and warn.
    /// </summary>
    public double? FitArcs { get; init; }

    /// <summary>Leave out entities that do not form closed loops (they are listed in the warnings) instead of refusing the drawing.</summary>
    public bool SkipOpen { get; init; }

    /// <summary>End points closer than this fraction of the drawing's extent (far stray entities left out) are joined (default 1e-6).</summary>
    public double SnapTolerance { get; init; } = 1e-6;

    /// <summary>
    /// Splines (and elliptical arcs that must be bent to meet a neighbour) are replaced by circular arcs deviating at
    /// most this fraction of the curve's size (default 1e-7: its effect on J lies far below the requested accuracy).
    /// </summary>
    public double SplineTolerance { get; init; } = 1e-7;

    /// <summary>Word remedies as shaft-file keys (<c>snap: 2e-4</c>) instead of command-line options (<c>--snap 2e-4</c>).</summary>
    internal bool ShaftFileKeys { get; init; }

    /// <summary>The other part layers of a composite section read layer by layer (see <see cref="ProfileSourceOptions.PartLayers"/>).</summary>
    internal IReadOnlyCollection<string>? PartLayers { get; init; }
}
