using SectionTwist.Geometry;
using SectionTwist.Units;

namespace SectionTwist.Import;

/// <summary>Options passed to a profile source. The drawing selections (layer, part, point, window, hatch) are in drawing units.</summary>
public sealed record ProfileSourceOptions
{
    /// <summary>Length unit of the input (overrides the file's own unit; default unit for specs). Null: the source's default.</summary>
    public LengthUnit? Unit { get; init; }

    /// <summary>Take only the entities on these layers (drawings): a name, a comma list or patterns with * and ?.</summary>
    public string? Layer { get; init; }

    /// <summary>Take only part N (1-based) when the drawing holds several separate parts.</summary>
    public int? Part { get; init; }

    /// <summary>Take the part around this point (drawings, drawing units).</summary>
    public Point2? At { get; init; }

    /// <summary>Take only what lies inside this box (drawings, drawing units).</summary>
    public Box2? Window { get; init; }

    /// <summary>Take the outlines from hatch boundaries (drawings).</summary>
    public bool UseHatches { get; init; }

    /// <summary>Fit arcs through curves drawn as facets, within this fraction of the part size; null: warn only.</summary>
    public double? FitArcs { get; init; }

    /// <summary>Leave out entities that do not close instead of refusing (drawings).</summary>
    public bool SkipOpen { get; init; }

    /// <summary>Requested relative accuracy; sources that flatten curves tie their chord tolerance to it.</summary>
    public double Accuracy { get; init; } = 1e-4;

    /// <summary>Relative snap tolerance for joining segment ends (fraction of the part size). Null: the source's default.</summary>
    public double? SnapTolerance { get; init; }

    /// <summary>Receives non-fatal notes (skipped entities, gaps closed).</summary>
    public Action<string>? Notes { get; init; }

    /// <summary>Stops reading a large input; sources observe it in their long loops.</summary>
    public CancellationToken Cancellation { get; init; }

    /// <summary>Word remedies as shaft-file keys instead of command-line options.</summary>
    internal bool ShaftFileKeys { get; init; }

    /// <summary>
    /// The layers that are the other parts of a composite section read layer by layer: a loop on one of them is that
    /// part, not a forgotten hole, so the reader does not advise adding its layer.
    /// </summary>
    internal IReadOnlyCollection<string>? PartLayers { get; init; }
}
