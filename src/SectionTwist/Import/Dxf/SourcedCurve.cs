using SectionTwist.Geometry;

namespace SectionTwist.Import.Dxf;

/// <summary>A piece of outline from the drawing (world coordinates, drawing units): an exact segment or a spline still to flatten.</summary>
internal sealed record SourcedCurve(Segment? Segment, NurbsCurve? Spline, string Source, string Layer)
{
    public Box2 Bounds => Segment?.Bounds ?? Spline!.ControlBounds;
}
