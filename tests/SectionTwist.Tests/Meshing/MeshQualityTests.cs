using SectionTwist.Geometry;
using SectionTwist.Meshing;

namespace SectionTwist.Tests.Meshing;

/// <summary>Quality measures and the curved-element validity repair.</summary>
public class MeshQualityTests
{
    private static readonly int[] Nodes = [0, 1, 2, 3, 4, 5];

    // Bernstein test of det J (Johnen, Remacle, Geuzaine 2013): a straight triangle is valid; moving the mid-side
    // node of edge 01 past the opposite corner folds the element (det J changes sign), which the test must catch.
    [Fact]
    public void Bernstein_jacobian_test_accepts_straight_and_rejects_folded_elements()
    {
        double[] x = [0, 1, 0, 0.5, 0.5, 0], y = [0, 0, 1, 0, 0.5, 0.5];
        Assert.True(MeshQuality.JacobianCertainlyPositive(x, y, Nodes));
        Tol.Rel(1.0, MeshQuality.DetJ(x, y, Nodes, 0.2, 0.3), 1e-14, "affine map of the unit right triangle: det J = 2A = 1");
        y[3] = 1.2; // mid-side node of edge 01 pushed above the opposite corner
        Assert.False(MeshQuality.JacobianCertainlyPositive(x, y, Nodes));
        Assert.True(MeshQuality.DetJ(x, y, Nodes, 0.5, 0) < 0);
    }

    // A gentle bulge (mid-side node 0.1 off the chord) keeps det J positive everywhere.
    [Fact]
    public void Mildly_curved_element_is_valid()
    {
        double[] x = [0, 1, 0, 0.5, 0.5, 0], y = [0, 0, 1, -0.1, 0.5, 0.5];
        Assert.True(MeshQuality.JacobianCertainlyPositive(x, y, Nodes));
    }

    // With a huge chord tolerance (quarter-circle chords) and no grading, a big circular hole leaves curved
    // boundary elements whose mid-side nodes bulge far into them; the mesher must refine those boundary edges
    // until every element passes the Bernstein test.
    [Fact]
    public void Coarse_curved_boundaries_are_refined_until_no_element_folds()
    {
        var p = new Profile([new Region(LoopBuilder.Polygon([new(-2, -2), new(2, -2), new(2, 2), new(-2, 2)]), [LoopBuilder.Circle(new Point2(0.7, 0), 1.2)])]);
        var m = Mesher.Generate(p, new MeshOptions { MaxEdgeLength = 3, ChordTolerance = 1, Grade = false }, out var stats);
        MeshAssert.Valid(m, p);
        Assert.Equal(0, stats.FoldedLeft);
        Assert.Equal(0, MeshQuality.FoldedElements(m));
    }

    // D-shapes (part of an ellipse closed by a line) meet the line at small angles (about 12 degrees here): the
    // concentric shells must be Euclidean on the curve and the corner found at the correct end, or refinement runs
    // down to the length floor (Shewchuk 2002, section 4).
    [Theory]
    [InlineData(478)]
    [InlineData(1313)]
    [InlineData(53)]
    public void Elliptical_d_shapes_with_small_corner_angles_terminate_cleanly(int seed)
    {
        var rng = new Random(seed);
        double a = 0.5 + rng.NextDouble(), b = 0.1 + rng.NextDouble(), off = 1000 * rng.NextDouble();
        var e = new EllipticalArcSegment(new Point2(off, off), a, b, rng.NextDouble(), 0, Math.PI * (0.3 + 1.5 * rng.NextDouble()));
        var p = new Profile([new Region(new LoopBuilder(e.Start).Add(e).Close())]);
        var m = Mesher.Generate(p, new MeshOptions { MaxEdgeLength = p.Bounds.Diagonal / 20 }, out var stats);
        MeshAssert.Valid(m, p);
        Assert.Equal(0, stats.OffCurveVertices);
        Tol.Rel(p.Properties.Area, MeshQuality.Area(m), 1e-6, "exact area (Green's theorem on the ellipse arc)");
        // no element collapses toward the length floor near the sharp corner
        double minEdge = Enumerable.Range(0, m.ElementCount).Min(k => MeshAssert.ShortestEdge(m, k));
        Assert.True(minEdge > 1e-4 * p.Bounds.Diagonal, $"shortest edge {minEdge:E2}");
        MeshAssert.MinAngle(m, 25, MeshAssert.SharpCorners(p), 0.25 * p.Bounds.Diagonal);
    }
}
