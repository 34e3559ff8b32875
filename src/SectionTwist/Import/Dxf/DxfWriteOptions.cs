using SectionTwist.Geometry;
using SectionTwist.Units;

namespace SectionTwist.Import.Dxf;

/// <summary>The DXF flavour the writer produces.</summary>
public enum DxfVersion
{
    /// <summary>AC1009 (R12): LINE, ARC and CIRCLE entities; elliptical arcs as POLYLINE chords. Read by nearly every CAD program.</summary>
    R12,

    /// <summary>AC1015 (R2000): closed LWPOLYLINE outlines with bulges, ELLIPSE entities, handles and subclass markers.</summary>
    R2000,
}

/// <summary>An open or closed polyline to write on its own layer (mesh edges, stress contours). Points in metres.</summary>
/// <param name="Layer">Layer name, e.g. <c>MESH</c> or <c>CONTOUR_12MPa</c>.</param>
/// <param name="Points">Vertices in metres (the writer converts them to the drawing unit).</param>
/// <param name="Closed">True to join the last point back to the first.</param>
public sealed record DxfPolyline(string Layer, IReadOnlyList<Point2> Points, bool Closed);

/// <summary>Options for writing a profile to DXF.</summary>
public sealed record DxfWriteOptions
{
    /// <summary>The DXF flavour (default R12).</summary>
    public DxfVersion Version { get; init; } = DxfVersion.R12;

    /// <summary>Drawing unit; coordinates are written in it and <c>$INSUNITS</c> is set to match. Default: the profile's unit.</summary>
    public LengthUnit? Unit { get; init; }

    /// <summary>Layer for the outline (default <c>PROFILE</c>). Read the file back with this layer when extra polylines are present.</summary>
    public string ProfileLayer { get; init; } = "PROFILE";

    /// <summary>Extra polylines (mesh edges, contour lines), each on its own layer.</summary>
    public IReadOnlyList<DxfPolyline> Polylines { get; init; } = [];

    /// <summary>R12 only: chord tolerance for elliptical arcs as a fraction of the profile size (default 1e-5).</summary>
    public double ChordTolerance { get; init; } = 1e-5;
}
