using SectionTwist.Composite;
using static SectionTwist.Tests.Composite.CompositeShapes;

namespace SectionTwist.Tests.Composite;

/// <summary>
/// Parts that do not fit together are refused with one line naming the parts and the remedy: overlaps, gaps, contact at
/// a point only, an edge drawn by three parts. Common practice, no source: a bonded composite needs an edge to carry the
/// shear from one part to the next.
/// </summary>
public class CompositeContactRefusalTests
{
    private static readonly SectionTwist.Shaft.Material Steel = CompositeExactTests.Steel;
    private static readonly SectionTwist.Shaft.Material Brass = CompositeExactTests.Brass;

    private static SectionTwistException Refused(string code, params (string Name, SectionTwist.Geometry.Loop Loop)[] parts)
    {
        var ex = Assert.Throws<SectionTwistException>(() => new CompositeSection(
            parts.Select((p, i) => new CompositePart(p.Name, Shape(p.Loop), i % 2 == 0 ? Steel : Brass)), "test section"));
        Assert.Equal(code, ex.Code);
        Assert.DoesNotContain('\n', ex.Message);
        Assert.StartsWith("test section: ", ex.Message, StringComparison.Ordinal);
        return ex;
    }

    [Fact]
    public void Crossing_parts_are_refused_as_an_overlap()
    {
        var ex = Refused("composite-parts", ("A", Rect(0, 0, 0.02, 0.01)), ("B", Rect(0.01, 0.005, 0.03, 0.015)));
        Assert.Contains("overlap", ex.Message, StringComparison.Ordinal);
        Assert.Contains("share their edges", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_part_inside_another_without_a_hole_is_refused_as_an_overlap()
    {
        var ex = Refused("composite-overlap", ("A", Rect(0, 0, 0.02, 0.01)), ("B", Rect(0.005, 0.002, 0.01, 0.004)));
        Assert.Contains("overlap", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_part_drawn_twice_is_refused_as_an_overlap()
    {
        var ex = Refused("composite-overlap", ("A", Rect(0, 0, 0.02, 0.01)), ("B", Rect(0, 0, 0.02, 0.01)));
        Assert.Contains("'A', 'B'", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Layers_with_a_gap_are_refused_naming_the_part()
    {
        // a 0.1 mm gap between two layers: nothing bonds them
        var ex = Refused("composite-gap", ("A", Rect(0, 0, 0.02, 0.01)), ("B", Rect(0, 0.0101, 0.02, 0.02)));
        Assert.Contains("part 'B' shares no edge", ex.Message, StringComparison.Ordinal);
        Assert.Contains("snap the drawing", ex.Message, StringComparison.Ordinal);
        // the width of the gap, so that a rounding gap of an export (1e-4 mm) is told from a real one
        Assert.Contains("nearest boundaries are 0.1 mm apart", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Corner_to_corner_contact_is_refused_as_a_point_contact()
    {
        var ex = Refused("composite-point-contact", ("A", Rect(0, 0, 0.01, 0.01)), ("B", Rect(0.01, 0.01, 0.02, 0.02)));
        Assert.Contains("parts 'A' and 'B' touch only at the point", ex.Message, StringComparison.Ordinal);
        Assert.Contains("share an edge", ex.Message, StringComparison.Ordinal);
        // the place in the parts' own unit (mm here), not in metres without a unit
        Assert.Contains("the point (10, 10) mm", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_corner_touching_an_edge_is_refused_as_a_point_contact()
    {
        var tri = SectionTwist.Geometry.LoopBuilder.Polygon([new(0.005, 0.01), new(0.015, 0.02), new(-0.005, 0.02)]);
        var ex = Refused("composite-point-contact", ("A", Rect(0, 0, 0.02, 0.01)), ("B", tri));
        Assert.Contains("touch only at the point", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void An_edge_shared_by_three_parts_is_refused()
    {
        var ex = Refused("composite-overlap", ("A", Rect(0, 0, 0.02, 0.01)), ("B", Rect(0, 0.01, 0.02, 0.02)), ("C", Rect(0, 0.01, 0.02, 0.03)));
        Assert.Contains("overlap", ex.Message, StringComparison.Ordinal);
    }
}
