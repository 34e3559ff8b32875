using SectionTwist.Geometry;

namespace SectionTwist.Tests.Geometry;

public class SectionPropertiesTests
{
    // Closed forms (common practice; any strength-of-materials text): circle A = pi r^2, I = pi r^4 / 4.
    [Fact]
    public void Circle_area_and_second_moments_match_closed_form()
    {
        double r = 0.02;
        var p = new Profile([new Region(LoopBuilder.Circle(new Point2(0.1, -0.05), r))]);
        Tol.Rel(Math.PI * r * r, p.Properties.Area, 1e-13);
        Tol.Rel(Math.PI * Math.Pow(r, 4) / 4, p.Properties.Ixx, 1e-12);
        Tol.Rel(Math.PI * Math.Pow(r, 4) / 4, p.Properties.Iyy, 1e-12);
        Assert.True(Math.Abs(p.Properties.Ixy) < 1e-12 * Math.Pow(r, 4));
        Tol.Abs(0.1, p.Properties.Centroid.X, 1e-14);
        Tol.Abs(-0.05, p.Properties.Centroid.Y, 1e-14);
    }

    // Rectangle b x h: Ixx = b h^3 / 12, Iyy = h b^3 / 12 (common practice, no source needed).
    [Fact]
    public void Rectangle_with_round_hole_matches_closed_form()
    {
        double b = 0.06, h = 0.02, r = 0.004;
        var outer = LoopBuilder.Polygon([new(0, 0), new(b, 0), new(b, h), new(0, h)]);
        var hole = LoopBuilder.Circle(new Point2(b / 2, h / 2), r);
        var p = new Profile([new Region(outer, [hole])]);
        Tol.Rel(b * h - Math.PI * r * r, p.Properties.Area, 1e-13);
        Tol.Rel(b * h * h * h / 12 - Math.PI * Math.Pow(r, 4) / 4, p.Properties.Ixx, 1e-12);
        Tol.Rel(h * b * b * b / 12 - Math.PI * Math.Pow(r, 4) / 4, p.Properties.Iyy, 1e-12);
    }

    [Fact]
    public void Bulge_arc_semicircle_has_exact_area()
    {
        // D-shape: diameter on the x axis closed by a bulge-1 semicircle above it.
        var loop = new LoopBuilder(0.01, 0).BulgeTo(new Point2(-0.01, 0), 1.0).Close();
        var p = new Profile([new Region(loop)]);
        Tol.Rel(Math.PI * 1e-4 / 2, p.Properties.Area, 1e-13);
        Tol.Rel(4 * 0.01 / (3 * Math.PI), p.Properties.Centroid.Y, 1e-12);
    }

    [Fact]
    public void FromLoops_nests_holes_and_islands()
    {
        var big = LoopBuilder.Circle(default, 0.05);
        var hole = LoopBuilder.Circle(default, 0.03);
        var island = LoopBuilder.Circle(default, 0.01);
        var p = Profile.FromLoops([island, big, hole]);
        Assert.Equal(2, p.Regions.Count);
        Tol.Rel(Math.PI * (0.05 * 0.05 - 0.03 * 0.03 + 0.01 * 0.01), p.Properties.Area, 1e-12);
    }

    [Fact]
    public void Crossing_loops_are_rejected_with_location()
    {
        var a = LoopBuilder.Polygon([new(0, 0), new(1, 0), new(1, 1), new(0, 1)]);
        var bowtie = LoopBuilder.Polygon([new(2, 0), new(3, 1), new(3, 0), new(2, 1)]);
        var e = Assert.Throws<SectionTwistException>(() => new Profile([new Region(a), new Region(bowtie)]));
        Assert.Equal("self-intersection", e.Code);
        Assert.Contains("(2.5, 0.5)", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Open_loop_reports_gap()
    {
        var e = Assert.Throws<SectionTwistException>(() => new Loop([new LineSegment(new(0, 0), new(1, 0)), new LineSegment(new(1, 0), new(1, 1)), new LineSegment(new(1, 1), new(0, 0.1))]));
        Assert.Equal("open-loop", e.Code);
        Assert.Contains("gap", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Hole_outside_region_is_rejected()
    {
        var outer = LoopBuilder.Polygon([new(0, 0), new(1, 0), new(1, 1), new(0, 1)]);
        var hole = LoopBuilder.Circle(new Point2(3, 3), 0.2);
        var e = Assert.Throws<SectionTwistException>(() => new Profile([new Region(outer, [hole])]));
        Assert.Equal("hole-outside", e.Code);
    }
}

public class SegmentSubdivisionTests
{
    // Found by fuzzing DXF input: a zero sagitta or an extreme ellipse must not overflow the piece count.
    [Fact]
    public void Zero_sagitta_and_thin_ellipse_give_bounded_subdivisions()
    {
        var arc = ArcSegment.Circle(default, 1);
        var ts = arc.Subdivide(0);
        Assert.InRange(ts.Length, 4, 1_000_001);
        var thin = EllipticalArcSegment.Full(default, 1, 1e-9);
        var te = thin.Subdivide(0);
        Assert.InRange(te.Length, 3, 1_000_001);
        Assert.Equal(1.0, te[^1]);
    }
}
