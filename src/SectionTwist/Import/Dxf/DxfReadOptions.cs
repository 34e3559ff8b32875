using SectionTwist.Units;

namespace SectionTwist.Import.Dxf;

/// <summary>Options for reading a profile from a DXF drawing.</summary>
public sealed record DxfReadOptions
{
    /// <summary>Length unit of the drawing; overrides <c>$INSUNITS</c>. Required when the drawing is unitless.</summary>
    public LengthUnit? Unit { get; init; }

    /// <summary>Use only entities on this layer (case-insensitive). Entities on layer 0 inside a block take the INSERT's layer.</summary>
    public string? Layer { get; init; }

    /// <summary>
    /// Use only separate part N (1-based). Parts are the disjoint regions (an outer loop with its holes), numbered by
    /// net area, largest first; ties by the lower-left corner of the bounding box (x, then y).
    /// </summary>
    public int? Part { get; init; }

    /// <summary>End points closer than this fraction of the bounding-box diagonal are joined (default 1e-6).</summary>
    public double SnapTolerance { get; init; } = 1e-6;

    /// <summary>Splines (and elliptical arcs that must be bent to meet a neighbour) are replaced by chords deviating at most this fraction of the bounding-box diagonal (default 1e-5).</summary>
    public double SplineTolerance { get; init; } = 1e-5;
}
