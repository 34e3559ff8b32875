using SectionTwist.Geometry;
using SectionTwist.Meshing;

namespace SectionTwist.Tests.Meshing;

/// <summary>
/// Interface curves joined into chains for the mesher, and meshes that keep open interface chains as element edges.
/// Derived in the test (the expected chains follow from the drawn pieces); no source.
/// </summary>
public class InterfaceChainTests
{
    private static Profile Square(double a) => new([new Region(LoopBuilder.Polygon([new(0, 0), new(a, 0), new(a, a), new(0, a)]))]);

    [Fact]
    public void Pieces_between_outline_vertices_form_one_open_chain_turned_one_way()
    {
        // a square split by a line x = 0.5 drawn as two pieces, the upper one reversed
        var outline = new Profile([new Region(LoopBuilder.Polygon([new(0, 0), new(0.5, 0), new(1, 0), new(1, 1), new(0.5, 1), new(0, 1)]))]);
        (Segment, int)[] pieces = [(new LineSegment(new(0.5, 0), new(0.5, 0.5)), 0), (new LineSegment(new(0.5, 1), new(0.5, 0.5)), 0)];
        var chains = InterfaceChains.Build(outline, pieces, 1e-9);
        var chain = Assert.Single(chains);
        Assert.True(chain.Open);
        Assert.Equal(2, chain.Curves.Count);
        Assert.Equal(chain.Curves[0].End, chain.Curves[1].Start);
    }

    [Fact]
    public void A_closed_square_of_pieces_is_a_closed_chain_and_a_junction_splits_chains()
    {
        var closed = InterfaceChains.Build(Square(4), [(new LineSegment(new(1, 1), new(3, 1)), 0), (new LineSegment(new(3, 1), new(3, 3)), 0),
            (new LineSegment(new(1, 3), new(3, 3)), 0), (new LineSegment(new(1, 1), new(1, 3)), 0)], 1e-9);
        var c = Assert.Single(closed);
        Assert.False(c.Open);
        Assert.Equal(4, c.Curves.Count);
        // three pieces meeting at the centre (a junction of three parts): three open chains
        var star = InterfaceChains.Build(Square(2), [(new LineSegment(new(1, 1), new(0, 1)), 0), (new LineSegment(new(1, 1), new(2, 1)), 0),
            (new LineSegment(new(1, 1), new(1, 2)), 0)], 1e-9);
        Assert.Equal(3, star.Count);
        Assert.All(star, s => Assert.True(s.Open));
    }

    [Fact]
    public void An_open_interface_ending_on_the_outline_is_kept_as_element_edges_and_splits_the_zones()
    {
        var outline = new Profile([new Region(LoopBuilder.Polygon([new(0, 0), new(0.02, 0), new(0.04, 0), new(0.04, 0.01), new(0.02, 0.01), new(0, 0.01)]))]);
        var mesh = Mesher.Generate(outline, [(new LineSegment(new(0.02, 0), new(0.02, 0.01)), 0)], new MeshOptions { MaxEdgeLength = 0.003 }, out _);
        Assert.Equal(2, mesh.ZoneSample.Length);
        Assert.True(mesh.InterfaceEdges.Length >= 3);
        // every interface node lies on x = 0.02 and is free (not a boundary node) unless it is an end on the outline
        foreach (var e in mesh.InterfaceEdges)
            foreach (int n in (int[])[e.A, e.Mid, e.B])
            {
                Assert.Equal(0.02, mesh.X[n], 12);
                bool end = mesh.Y[n] is 0 or 0.01;
                Assert.Equal(end, mesh.NodeLoop[n] >= 0);
            }
        Tol.Rel(0.04 * 0.01, Enumerable.Range(0, mesh.ElementCount).Sum(e => ElementArea(mesh, e)), 1e-12, "area of the rectangle");
    }

    private static double ElementArea(Mesh m, int e)
    {
        var a = m.Node(m.Elements[6 * e]); var b = m.Node(m.Elements[6 * e + 1]); var c = m.Node(m.Elements[6 * e + 2]);
        return 0.5 * Point2.Cross(b - a, c - a);
    }
}
