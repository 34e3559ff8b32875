using SectionTwist.Composite;
using SectionTwist.Geometry;
using SectionTwist.Shaft;

namespace SectionTwist.Tests.Composite;

/// <summary>Composite sections whose parts meet along part of their outlines, built for the tests (lengths in metres).</summary>
internal static class CompositeShapes
{
    /// <summary>The rectangle [x0, x1] x [y0, y1], counter-clockwise.</summary>
    public static Loop Rect(double x0, double y0, double x1, double y1) =>
        LoopBuilder.Polygon([new(x0, y0), new(x1, y0), new(x1, y1), new(x0, y1)]);

    /// <summary>A one-region profile of <paramref name="outer"/> with optional holes.</summary>
    public static Profile Shape(Loop outer, params Loop[] holes) => new([new Region(outer, holes)]);

    /// <summary>Layers of width <paramref name="b"/> stacked upwards from y = 0, the thicknesses and materials given bottom first.</summary>
    public static CompositeSection Layers(double b, params (double T, Material M)[] layers)
    {
        var parts = new List<CompositePart>();
        double y = 0;
        for (int i = 0; i < layers.Length; i++)
        {
            parts.Add(new CompositePart($"layer{i + 1}", Shape(Rect(0, y, b, y + layers[i].T)), layers[i].M));
            y += layers[i].T;
        }
        return new CompositeSection(parts, "layers");
    }

    /// <summary>A round bar of radius <paramref name="r"/> cut along the x axis into an upper and a lower half-disc.</summary>
    public static CompositeSection HalfDiscs(double r, Material upper, Material lower)
    {
        var top = new Loop([new ArcSegment(default, r, 0, Math.PI), new LineSegment(new(-r, 0), new(r, 0))]);
        var bottom = new Loop([new ArcSegment(default, r, Math.PI, Math.PI), new LineSegment(new(r, 0), new(-r, 0))]);
        return new CompositeSection([new CompositePart("upper", Shape(top), upper), new CompositePart("lower", Shape(bottom), lower)], "half-discs");
    }

    /// <summary>
    /// A square tube (outside 2a, bore 2c, both centred) cut along the y axis into a left and a right half: the bore is
    /// bounded by both parts and the two interfaces run from the outline to the bore.
    /// </summary>
    public static CompositeSection SplitTube(double a, double c, Material left, Material right)
    {
        Loop Half(double s) => LoopBuilder.Polygon(
            s < 0
                ? [new(0, -a), new(0, -c), new(-c, -c), new(-c, c), new(0, c), new(0, a), new(-a, a), new(-a, -a)]
                : [new(0, a), new(0, c), new(c, c), new(c, -c), new(0, -c), new(0, -a), new(a, -a), new(a, a)]);
        return new CompositeSection([new CompositePart("left", Shape(Half(-1)), left), new CompositePart("right", Shape(Half(1)), right)], "split tube");
    }

    /// <summary>
    /// A W x H bar (centred) with a w x h insert let into the middle of its top edge: the insert's top is part of the
    /// outline, its other three sides are interfaces ending on the outline.
    /// </summary>
    public static CompositeSection EdgeInsert(double W, double H, double w, double h, Material bar, Material insert)
    {
        var outline = LoopBuilder.Polygon([new(-W / 2, -H / 2), new(W / 2, -H / 2), new(W / 2, H / 2), new(w / 2, H / 2), new(w / 2, H / 2 - h),
            new(-w / 2, H / 2 - h), new(-w / 2, H / 2), new(-W / 2, H / 2)]);
        return new CompositeSection([new CompositePart("bar", Shape(outline), bar), new CompositePart("insert", Shape(Rect(-w / 2, H / 2 - h, w / 2, H / 2)), insert)], "edge insert");
    }
}
