using SectionTwist.Geometry;
using SectionTwist.Import.Dxf;

namespace SectionTwist.Tests.Import;

/// <summary>
/// One small hand-written drawing per entity type. Expected areas are elementary geometry (rectangle b h, circle
/// pi r^2, circular segment r^2 (theta - sin theta) / 2), exact up to rounding.
/// </summary>
public class DxfEntityTests
{
    private const double Mm2 = 1e-6; // mm^2 in m^2

    [Fact]
    public void Lines_make_a_rectangle_in_millimetres()
    {
        var r = new DxfText().Header(4).Entities().Rect(0, 0, 60, 20).End().Read();
        Tol.Rel(1200 * Mm2, r.Profile.Properties.Area, 1e-12, "rectangle b h");
        Assert.Equal("mm", r.Profile.Unit.Symbol);
        Assert.Equal(1, r.Report.Loops);
        Assert.Equal(4, r.Report.EntityCounts["LINE"]);
    }

    [Fact]
    public void Circle_is_one_exact_arc()
    {
        var r = new DxfText().Header(4).Entities().Circle(5, 5, 20).End().Read();
        var seg = Assert.Single(r.Profile.Regions[0].Outer.Segments);
        var arc = Assert.IsType<ArcSegment>(seg);
        Tol.Rel(0.020, arc.Radius, 1e-15, "radius 20 mm");
        Tol.Rel(Math.PI * 400 * Mm2, r.Profile.Properties.Area, 1e-12, "circle pi r^2");
    }

    [Fact]
    public void Arc_and_line_make_a_half_disc()
    {
        // semicircle above the x axis: ARC 0..180 deg, closed by a LINE along the diameter
        var r = new DxfText().Header(4).Entities().Arc(0, 0, 10, 0, 180).Line(-10, 0, 10, 0).End().Read();
        Tol.Rel(Math.PI * 50 * Mm2, r.Profile.Properties.Area, 1e-12, "half disc pi r^2 / 2");
        Assert.Contains(r.Profile.Regions[0].Outer.Segments, s => s is ArcSegment);
    }

    [Fact]
    public void Lwpolyline_with_bulges_and_closed_flag()
    {
        // slot 40 x 10 with semicircular ends: straight part 30 x 10 plus two half discs of r = 5
        var r = new DxfText().Header(4).Entities()
            .LwPolyline(true, (-15, -5, 0), (15, -5, 1), (15, 5, 0), (-15, 5, 1)).End().Read();
        Tol.Rel((300 + Math.PI * 25) * Mm2, r.Profile.Properties.Area, 1e-12, "slot: rectangle plus circle");
        Assert.Equal(2, r.Profile.Regions[0].Outer.Segments.Count(s => s is ArcSegment));
    }

    [Fact]
    public void Lwpolyline_negative_bulge_cuts_a_circular_notch()
    {
        // square 20 x 20 whose top edge is replaced by a clockwise half circle dipping into it (bulge -1 going right to left... )
        // top edge runs (20,20) -> (0,20); bulge +1 would bulge to the left of travel (upwards); -1 bulges downward into the square
        var r = new DxfText().Header(4).Entities()
            .LwPolyline(true, (0, 0, 0), (20, 0, 0), (20, 20, -1), (0, 20, 0)).End().Read();
        Tol.Rel((400 - Math.PI * 50) * Mm2, r.Profile.Properties.Area, 1e-12, "square minus half disc r = 10");
    }

    [Fact]
    public void Polyline_vertex_seqend_with_bulge_and_frame_points_skipped()
    {
        var d = new DxfText().Header(4).Entities()
            .P(0, "POLYLINE").P(8, "0").P(66, 1).P(10, 0.0).P(20, 0.0).P(30, 0.0).P(70, 1)
            .P(0, "VERTEX").P(8, "0").P(10, 0.0).P(20, 0.0).P(30, 0.0)
            .P(0, "VERTEX").P(8, "0").P(10, 999.0).P(20, 999.0).P(30, 0.0).P(70, 16) // spline frame point: skip
            .P(0, "VERTEX").P(8, "0").P(10, 10.0).P(20, 0.0).P(30, 0.0).P(42, 1.0)
            .P(0, "VERTEX").P(8, "0").P(10, 10.0).P(20, 10.0).P(30, 0.0)
            .P(0, "VERTEX").P(8, "0").P(10, 0.0).P(20, 10.0).P(30, 0.0)
            .P(0, "SEQEND").P(8, "0").End();
        var r = d.Read();
        // square 10 x 10 plus a half disc r = 5 bulging out of its right side (bulge +1 on the edge (10,0) -> (10,10))
        Tol.Rel((100 + Math.PI * 12.5) * Mm2, r.Profile.Properties.Area, 1e-12, "square plus half disc");
    }

    [Fact]
    public void Ellipse_full_is_exact()
    {
        // a = 30, b = 10 rotated 30 degrees: area pi a b
        double c = Math.Cos(Math.PI / 6), s = Math.Sin(Math.PI / 6);
        var r = new DxfText().Header(4).Entities()
            .P(0, "ELLIPSE").P(8, "0").P(10, 3.0).P(20, 4.0).P(30, 0.0).P(11, 30 * c).P(21, 30 * s).P(31, 0.0)
            .P(210, 0.0).P(220, 0.0).P(230, 1.0).P(40, 1.0 / 3).P(41, 0.0).P(42, 2 * Math.PI).End().Read();
        Assert.IsType<EllipticalArcSegment>(Assert.Single(r.Profile.Regions[0].Outer.Segments));
        Tol.Rel(Math.PI * 300 * Mm2, r.Profile.Properties.Area, 1e-9, "ellipse pi a b");
    }

    [Fact]
    public void Ellipse_partial_closed_by_a_line()
    {
        // upper half of an ellipse a = 20, b = 8 (parameters 0..pi) closed by its major axis: area pi a b / 2
        var r = new DxfText().Header(4).Entities()
            .P(0, "ELLIPSE").P(8, "0").P(10, 0.0).P(20, 0.0).P(30, 0.0).P(11, 20.0).P(21, 0.0).P(31, 0.0)
            .P(40, 0.4).P(41, 0.0).P(42, Math.PI).Line(-20, 0, 20, 0).End().Read();
        Tol.Rel(Math.PI * 80 * Mm2, r.Profile.Properties.Area, 1e-9, "half ellipse pi a b / 2");
    }

    [Fact]
    public void Spline_with_control_points_is_evaluated_by_de_boor()
    {
        // quadratic rational B-spline quarter circle (weights 1, sqrt2/2, 1) closed by two radii: area pi r^2 / 4
        // (The NURBS Book, section 7.2: a quarter circle as a degree-2 NURBS)
        double w = Math.Sqrt(0.5);
        var r = new DxfText().Header(4).Entities()
            .P(0, "SPLINE").P(8, "0").P(70, 8 | 4).P(71, 2).P(72, 6).P(73, 3).P(74, 0)
            .P(40, 0.0).P(40, 0.0).P(40, 0.0).P(40, 1.0).P(40, 1.0).P(40, 1.0)
            .P(41, 1.0).P(41, w).P(41, 1.0)
            .P(10, 10.0).P(20, 0.0).P(30, 0.0).P(10, 10.0).P(20, 10.0).P(30, 0.0).P(10, 0.0).P(20, 10.0).P(30, 0.0)
            .Line(0, 10, 0, 0).Line(0, 0, 10, 0).End().Read(new DxfReadOptions { SplineTolerance = 1e-7 });
        // chords inside the arc lose at most (2/3) sagitta per unit length: tolerance 1e-7 of the size -> ~1e-6 relative
        Tol.Rel(Math.PI * 25 * Mm2, r.Profile.Properties.Area, 2e-6, "quarter disc pi r^2 / 4");
    }

    [Fact]
    public void Insert_places_a_block_with_base_point_rotation_and_array()
    {
        // block: 10 x 4 rectangle with base point at its centre (5, 2); 2 columns x 1 row, 30 apart, rotated 90 deg
        var d = new DxfText().Header(4)
            .P(0, "SECTION").P(2, "BLOCKS").P(0, "BLOCK").P(8, "0").P(2, "BAR").P(70, 0).P(10, 5.0).P(20, 2.0).P(30, 0.0)
            .Rect(0, 0, 10, 4).P(0, "ENDBLK").P(8, "0").P(0, "ENDSEC")
            .Entities().P(0, "INSERT").P(8, "0").P(2, "BAR").P(10, 100.0).P(20, 50.0).P(30, 0.0).P(50, 90.0).P(70, 2).P(44, 30.0).End();
        var r = d.Read();
        Assert.Equal(2, r.Profile.Regions.Count);
        Tol.Rel(80 * Mm2, r.Profile.Properties.Area, 1e-12, "two 10 x 4 rectangles");
        // rotated 90 deg about (100, 50): the first copy spans x 98..102, y 45..55; the second is 30 along the rotated x axis (up)
        var b = r.Profile.Bounds;
        Tol.Abs(0.098, b.MinX, 1e-12); Tol.Abs(0.102, b.MaxX, 1e-12);
        Tol.Abs(0.045, b.MinY, 1e-12); Tol.Abs(0.085, b.MaxY, 1e-12);
    }

    [Fact]
    public void Nested_blocks_and_layer_zero_inherits_insert_layer()
    {
        var d = new DxfText().Header(4)
            .P(0, "SECTION").P(2, "BLOCKS")
            .P(0, "BLOCK").P(8, "0").P(2, "INNER").P(10, 0.0).P(20, 0.0).Circle(0, 0, 5).P(0, "ENDBLK")
            .P(0, "BLOCK").P(8, "0").P(2, "OUTER").P(10, 0.0).P(20, 0.0)
            .P(0, "INSERT").P(8, "0").P(2, "INNER").P(10, 10.0).P(20, 0.0).P(41, 2.0).P(42, 2.0).P(0, "ENDBLK").P(0, "ENDSEC")
            .Entities().P(0, "INSERT").P(8, "SHAFT").P(2, "OUTER").P(10, 1.0).P(20, 1.0)
            .Circle(500, 500, 1, "DIM").End();
        var r = d.Read(new DxfReadOptions { Layer = "shaft" });
        var arc = Assert.IsType<ArcSegment>(Assert.Single(r.Profile.Regions[0].Outer.Segments));
        Tol.Rel(0.010, arc.Radius, 1e-14, "radius 5 scaled 2");
        Tol.Abs(0.011, arc.Center.X, 1e-15); Tol.Abs(0.001, arc.Center.Y, 1e-15);
    }

    [Fact]
    public void Block_cycle_is_reported()
    {
        var d = new DxfText().Header(4)
            .P(0, "SECTION").P(2, "BLOCKS")
            .P(0, "BLOCK").P(2, "A").P(10, 0.0).P(20, 0.0).P(0, "INSERT").P(2, "B").P(10, 0.0).P(20, 0.0).P(0, "ENDBLK")
            .P(0, "BLOCK").P(2, "B").P(10, 0.0).P(20, 0.0).P(0, "INSERT").P(2, "A").P(10, 0.0).P(20, 0.0).P(0, "ENDBLK").P(0, "ENDSEC")
            .Entities().P(0, "INSERT").P(2, "A").P(10, 0.0).P(20, 0.0).End();
        var e = Assert.Throws<SectionTwistException>(() => d.Read());
        Assert.Equal("dxf-block-cycle", e.Code);
        Assert.Contains("A -> B -> A", e.Message);
    }

    [Fact]
    public void Paper_space_text_dimensions_hatches_are_ignored_and_unknown_types_listed_once()
    {
        var r = new DxfText().Header(4).Entities().Rect(0, 0, 10, 10)
            .P(0, "LINE").P(67, 1).P(10, 0.0).P(20, 0.0).P(11, 99.0).P(21, 99.0) // paper space
            .P(0, "TEXT").P(8, "0").P(10, 0.0).P(20, 0.0).P(1, "A-A")
            .P(0, "DIMENSION").P(8, "0").P(0, "HATCH").P(8, "0")
            .P(0, "WIDGET").P(8, "0").P(0, "WIDGET").P(8, "0").End().Read();
        Tol.Rel(100 * Mm2, r.Profile.Properties.Area, 1e-12);
        Assert.Equal(1, r.Report.PaperSpaceSkipped);
        Assert.Contains("WIDGET", r.Report.SkippedTypes);
        Assert.Contains("TEXT", r.Report.SkippedTypes);
        Assert.Single(r.Report.Warnings, w => w.Contains("WIDGET", StringComparison.Ordinal));
    }
}
