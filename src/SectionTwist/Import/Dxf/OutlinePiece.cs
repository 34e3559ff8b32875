using SectionTwist.Geometry;

namespace SectionTwist.Import.Dxf;

/// <summary>One boundary piece during loop building, with the entity it came from and its end nodes after snapping.</summary>
internal sealed class OutlinePiece(Segment segment, string source, string layer)
{
    public Segment Segment { get; set; } = segment;
    public string Source { get; } = source;
    public string Layer { get; } = layer;
    public int A { get; set; } = -1;
    public int B { get; set; } = -1;
    public bool Dead { get; set; }

    /// <summary>Snapping prefers the ends of exact curves: ellipse arcs 3, circular arcs 2, lines 1.</summary>
    public int Priority => Segment switch { EllipticalArcSegment => 3, ArcSegment => 2, _ => 1 };

    /// <summary>True for a full circle or ellipse (a loop by itself).</summary>
    public bool IsClosedCurve => Segment switch
    {
        ArcSegment a => Math.Abs(Math.Abs(a.Sweep) - 2 * Math.PI) < 1e-9,
        EllipticalArcSegment e => Math.Abs(Math.Abs(e.Sweep) - 2 * Math.PI) < 1e-9,
        _ => false,
    };
}
