using SectionTwist.Geometry;
using SectionTwist.Meshing;

namespace SectionTwist.Tests.Meshing;

/// <summary>
/// Uniform 1-to-4 refinement of 6-node meshes (red refinement; e.g. Bank, Sherman, Weiser 1983): four times the
/// elements, the area kept (exactly for straight sides; for curved sides the new boundary nodes sit on the curve,
/// so the area moves toward the exact one), boundary mid-side nodes on the curve.
/// </summary>
public class MeshRefinementTests
{
    [Fact]
    public void Straight_profile_refines_into_four_times_the_elements_with_the_same_area()
    {
        var p = new Profile([new Region(LoopBuilder.Polygon([new(0, 0), new(2, 0), new(2, 1), new(1, 1), new(1, 2), new(0, 2)]))]);
        var m = Mesher.Generate(p, new MeshOptions { MaxEdgeLength = 0.5 });
        var f = MeshRefinement.Uniform(m);
        Assert.Equal(4 * m.ElementCount, f.ElementCount);
        Assert.Equal(2 * m.BoundaryEdges.Length, f.BoundaryEdges.Length);
        MeshAssert.Valid(f, p);
        Tol.Rel(3.0, MeshQuality.Area(f), 1e-12, "area of the L");
        // children of a straight element are similar to it: the smallest angle does not change
        Tol.Abs(MeshQuality.MinAngleDegrees(m), MeshQuality.MinAngleDegrees(f), 1e-9);
    }

    // Circle: refined boundary mid-side nodes on the circle, area still within 1e-7 of pi r^2 and closer to it.
    [Fact]
    public void Circle_refinement_keeps_boundary_nodes_on_the_circle()
    {
        double r = 0.02;
        var p = new Profile([new Region(LoopBuilder.Circle(default, r), [LoopBuilder.Circle(new Point2(0.005, 0), 0.006)])]);
        var m = Mesher.Generate(p, new MeshOptions { MaxEdgeLength = 0.005 });
        var f = MeshRefinement.Uniform(m);
        Assert.Equal(4 * m.ElementCount, f.ElementCount);
        MeshAssert.Valid(f, p);
        double exact = Math.PI * (r * r - 0.006 * 0.006);
        double e0 = Tol.RelErr(exact, MeshQuality.Area(m)), e1 = Tol.RelErr(exact, MeshQuality.Area(f));
        Assert.True(e1 <= 1e-7 && e1 <= e0, $"coarse {e0:E2}, refined {e1:E2}");
        foreach (var be in f.BoundaryEdges.Where(b => b.Loop == 0))
            Tol.Rel(r, f.Node(be.Mid).Length, 1e-12, "refined mid-side node on the outer circle");
    }

    // Refining twice gives 16 times the elements and stays conforming (mid-side nodes shared between neighbours).
    [Fact]
    public void Refining_twice_stays_conforming()
    {
        var p = new Profile([new Region(LoopBuilder.Circle(default, 1))]);
        var m = Mesher.Generate(p, new MeshOptions { MaxEdgeLength = 0.5 });
        var f = MeshRefinement.Uniform(MeshRefinement.Uniform(m));
        Assert.Equal(16 * m.ElementCount, f.ElementCount);
        MeshAssert.Valid(f, p);
        Tol.Rel(Math.PI, MeshQuality.Area(f), 1e-8, "pi r^2");
    }
}
