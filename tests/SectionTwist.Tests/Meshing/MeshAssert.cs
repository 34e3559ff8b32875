using SectionTwist.Geometry;
using SectionTwist.Meshing;

namespace SectionTwist.Tests.Meshing;

/// <summary>Shared mesh invariants (the contract documented on <see cref="Mesh"/>).</summary>
internal static class MeshAssert
{
    /// <summary>
    /// Conformity, positive Jacobians (Bernstein test), boundary edges oriented along their loops with the element on
    /// their left, boundary mid-side nodes on the curve at the parameter midpoint, loops numbered region by region.
    /// </summary>
    public static void Valid(Mesh m, Profile p)
    {
        Assert.Null(MeshQuality.CheckConformity(m));
        Assert.Equal(0, MeshQuality.FoldedElements(m));
        double scale = p.Bounds.Diagonal;
        // loops: region by region, outer then holes
        int l = 0;
        for (int r = 0; r < p.Regions.Count; r++)
        {
            Assert.Equal(r, m.Loops[l].Region); Assert.False(m.Loops[l].IsHole); l++;
            for (int h = 0; h < p.Regions[r].Holes.Count; h++) { Assert.Equal(r, m.Loops[l].Region); Assert.Equal(h, m.Loops[l].Hole); l++; }
        }
        Assert.Equal(l, m.Loops.Length);
        // element on the left of each boundary edge A -> B: A, B consecutive counter-clockwise corners of an element
        var leftOf = new HashSet<(int, int)>();
        for (int e = 0; e < m.ElementCount; e++)
            for (int i = 0; i < 3; i++) leftOf.Add((m.Elements[6 * e + i], m.Elements[6 * e + (i + 1) % 3]));
        var perLoop = new double[m.Loops.Length];
        foreach (var be in m.BoundaryEdges)
        {
            Assert.Contains((be.A, be.B), leftOf);
            Assert.True(be.T0 < be.T1);
            Assert.True(Point2.Distance(m.Node(be.A), be.Curve.PointAt(be.T0)) <= 2e-9 * scale, "A on the curve at T0");
            Assert.True(Point2.Distance(m.Node(be.B), be.Curve.PointAt(be.T1)) <= 2e-9 * scale, "B on the curve at T1");
            Assert.True(Point2.Distance(m.Node(be.Mid), be.Curve.PointAt(0.5 * (be.T0 + be.T1))) <= 1e-12 * scale, "mid on the curve");
            Assert.Contains(be.Curve, m.Loops[be.Loop].Geometry.Segments);
            perLoop[be.Loop] += Point2.Cross(m.Node(be.A), m.Node(be.B));
        }
        // orientation: outer loops counter-clockwise, holes clockwise (shoelace over the chords)
        for (int k = 0; k < m.Loops.Length; k++) Assert.True(m.Loops[k].IsHole ? perLoop[k] < 0 : perLoop[k] > 0);
    }

    /// <summary>
    /// Every corner triangle has its smallest angle at least <paramref name="degrees"/> except those with a vertex
    /// within <paramref name="radius"/> of one of the <paramref name="exempt"/> points (small input angles).
    /// </summary>
    public static void MinAngle(Mesh m, double degrees, IReadOnlyList<Point2>? exempt = null, double radius = 0)
    {
        for (int e = 0; e < m.ElementCount; e++)
        {
            double a = MeshQuality.MinAngleDegrees(m, e);
            if (a >= degrees - 1e-9) continue;
            bool near = exempt != null && Enumerable.Range(0, 3).Any(i => exempt.Any(q => Point2.Distance(m.Node(m.Elements[6 * e + i]), q) <= radius));
            Assert.True(near, $"element {e} has a {a:F2} degree angle away from any small input angle (at {m.Node(m.Elements[6 * e])})");
        }
    }

    /// <summary>Corners of the profile whose interior angle is below 60 degrees.</summary>
    public static List<Point2> SharpCorners(Profile p)
    {
        var list = new List<Point2>();
        foreach (var loop in p.Loops)
        {
            var s = loop.Segments;
            for (int i = 0; i < s.Count; i++)
            {
                Point2 din = s[(i + s.Count - 1) % s.Count].DerivativeAt(1), dout = s[i].DerivativeAt(0);
                double inner = Math.PI - Math.Atan2(Point2.Cross(din, dout), Point2.Dot(din, dout));
                if (inner < Math.PI / 3) list.Add(s[i].Start);
            }
        }
        return list;
    }

    public static Point2 Centroid(Mesh m, int e) =>
        new((m.X[m.Elements[6 * e]] + m.X[m.Elements[6 * e + 1]] + m.X[m.Elements[6 * e + 2]]) / 3,
            (m.Y[m.Elements[6 * e]] + m.Y[m.Elements[6 * e + 1]] + m.Y[m.Elements[6 * e + 2]]) / 3);

    public static double ShortestEdge(Mesh m, int e)
    {
        double min = double.PositiveInfinity;
        for (int i = 0; i < 3; i++) min = Math.Min(min, Point2.Distance(m.Node(m.Elements[6 * e + i]), m.Node(m.Elements[6 * e + (i + 1) % 3])));
        return min;
    }

    public static double LongestEdge(Mesh m, int e)
    {
        double max = 0;
        for (int i = 0; i < 3; i++) max = Math.Max(max, Point2.Distance(m.Node(m.Elements[6 * e + i]), m.Node(m.Elements[6 * e + (i + 1) % 3])));
        return max;
    }
}
