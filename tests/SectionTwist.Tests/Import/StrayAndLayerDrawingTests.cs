using SectionTwist.Import.Dxf;

namespace SectionTwist.Tests.Import;

/// <summary>
/// Regression drawings for stray entities (far away, huge, loose inside the part) and outlines split over layers.
/// Areas: elementary geometry (rectangle b h, disc pi r^2, annulus pi (R^2 - r^2)).
/// </summary>
public class StrayAndLayerDrawingTests
{
    private const double Mm2 = 1e-6;

    [Fact]
    public void A_construction_line_far_away_is_named_and_left_out_and_does_not_set_the_snap_tolerance()
    {
        // 40 x 20 rectangle whose corners miss by 1e-5 (inside the default 1e-6 of its 44.7 diagonal)
        // plus a stray line at 1e16 units (it would make the snap tolerance 1e10)
        var r = new DxfText().Header(4).Entities()
            .Line(0, 0, 40, 0).Line(40, 1e-5, 40, 20).Line(40, 20, 0, 20).Line(0, 20, 0, 0)
            .Line(1e16, 0, 1e16 + 5, 0, "CONSTR").End().Read();
        Tol.Rel(800 * Mm2, r.Profile.Properties.Area, 1e-6, "rectangle 40 x 20");
        var left = Assert.Single(r.Report.LeftOut);
        Assert.Contains("LINE (line", left.Entities);
        Assert.Equal("CONSTR", left.Layer);
        Assert.Contains(r.Report.Warnings, w => w.Contains("far from the rest of the drawing", StringComparison.Ordinal) && w.Contains("LINE (line", StringComparison.Ordinal));
        Assert.True(r.Report.SnapTolerance < 1e-4, $"snap tolerance {r.Report.SnapTolerance} must follow the rectangle, not the stray line");
        Tol.Rel(Math.Sqrt(40 * 40 + 20 * 20), r.Report.Extent, 1e-12, "diagonal of the rectangle");
    }

    [Fact]
    public void A_huge_line_through_the_part_and_a_far_circle_are_left_out()
    {
        // the annulus drawn as quarter arcs (eight entities) beside the two strays
        var d = new DxfText().Header(4).Entities();
        for (int q = 0; q < 4; q++) d.Arc(0, 0, 10, 90 * q, 90 * q + 90).Arc(0, 0, 4, 90 * q, 90 * q + 90);
        var r = d.Line(-1e16, -1e16, 1e16, 1e16, "CONSTR").Circle(5e15, 0, 3, "CONSTR").End().Read();
        Tol.Rel(Math.PI * (100 - 16) * Mm2, r.Profile.Properties.Area, 1e-12, "annulus R 10, r 4");
        Assert.Equal(2, r.Report.LeftOut.Count);
        Assert.Single(r.Report.Parts);
    }

    [Fact]
    public void A_loose_construction_line_inside_the_part_is_left_out_with_a_note()
    {
        var r = new DxfText().Header(4).Entities().Rect(0, 0, 30, 10).Line(-5, 5, 35, 5, "CENTER").End().Read();
        Tol.Rel(300 * Mm2, r.Profile.Properties.Area, 1e-12, "rectangle 30 x 10");
        var left = Assert.Single(r.Report.LeftOut);
        Assert.Contains("straight line that closes nothing", left.Reason);
        Assert.Contains(r.Report.Warnings, w => w.StartsWith("left out LINE (line", StringComparison.Ordinal));
    }

    [Fact]
    public void Construction_lines_ending_at_a_corner_are_left_out_one_by_one()
    {
        var r = new DxfText().Header(4).Entities().Rect(0, 0, 10, 10).Line(10, 10, 20, 20).Line(10, 10, 20, 0).End().Read();
        Tol.Rel(100 * Mm2, r.Profile.Properties.Area, 1e-12, "square 10");
        Assert.Equal(2, r.Report.LeftOut.Count);
    }

    [Fact]
    public void A_bent_loose_polyline_is_refused_unless_left_out_on_request()
    {
        var d = new DxfText().Header(4).Entities().Rect(0, 0, 30, 10).LwPolylineOn("SKETCH", false, (40, 0, 0), (45, 8, 0), (50, 0, 0)).End();
        var e = Assert.Throws<SectionTwistException>(() => d.Read());
        Assert.Equal("open-loop", e.Code);
        Assert.Contains("LWPOLYLINE (line", e.Message);
        Assert.Contains("--skip-open", e.Message);
        var r = d.Read(new DxfReadOptions { SkipOpen = true });
        Tol.Rel(300 * Mm2, r.Profile.Properties.Area, 1e-12, "rectangle 30 x 10");
        Assert.Contains("left out on request", Assert.Single(r.Report.LeftOut).Reason);
    }

    [Fact]
    public void An_outline_with_a_gap_around_a_bore_is_never_left_out()
    {
        // outer square drawn with a 2-unit gap (too wide to snap); the bore alone must not become a solid part
        var d = new DxfText().Header(4).Entities()
            .Line(0, 0, 40, 0).Line(40, 0, 40, 40).Line(40, 40, 0, 40).Line(0, 40, 0, 2).Circle(20, 20, 5).End();
        var e = Assert.Throws<SectionTwistException>(() => d.Read(new DxfReadOptions { SkipOpen = true }));
        Assert.Equal("open-loop", e.Code);
        Assert.Contains("cannot be left out", e.Message);
        Assert.Matches(@"ends at \(0, (0|2)\)", e.Message);
    }

    [Fact]
    public void Outline_and_bores_on_two_layers_warn_when_one_is_chosen_and_read_together_by_list_or_pattern()
    {
        var d = new DxfText().Header(4).Entities().Circle(0, 0, 25, "OUTSIDE").Circle(0, 0, 10, "BORES").Line(-30, 0, 30, 0, "CENTER").End();
        var one = d.Read(new DxfReadOptions { Layer = "OUTSIDE" });
        Tol.Rel(Math.PI * 625 * Mm2, one.Profile.Properties.Area, 1e-12, "disc r 25 (bore left out)");
        var warn = Assert.Single(one.Report.Warnings, w => w.Contains("lies inside the chosen section", StringComparison.Ordinal));
        Assert.Contains("layer 'BORES'", warn);
        Assert.Contains("--layer OUTSIDE,BORES", warn);
        double tube = Math.PI * (625 - 100) * Mm2;
        Tol.Rel(tube, d.Read(new DxfReadOptions { Layer = "OUTSIDE,BORES" }).Profile.Properties.Area, 1e-12, "annulus R 25, r 10");
        Tol.Rel(tube, d.Read(new DxfReadOptions { Layer = "out*, b?res" }).Profile.Properties.Area, 1e-12, "annulus by patterns");
        Assert.DoesNotContain(d.Read(new DxfReadOptions { Layer = "OUTSIDE,BORES" }).Report.Warnings, w => w.Contains("not chosen", StringComparison.Ordinal));
    }

    [Fact]
    public void A_layer_whose_name_holds_a_comma_or_parentheses_is_taken_exactly()
    {
        var d = new DxfText().Header(4).Entities().Rect(0, 0, 10, 10, "A,B").Rect(20, 0, 5, 5, "A").Rect(40, 0, 2, 2, "P (old)").End();
        Tol.Rel(100 * Mm2, d.Read(new DxfReadOptions { Layer = "A,B" }).Profile.Properties.Area, 1e-12, "square 10 on layer 'A,B'");
        Tol.Rel(4 * Mm2, d.Read(new DxfReadOptions { Layer = "p (OLD)" }).Profile.Properties.Area, 1e-12, "square 2 on layer 'P (old)'");
    }

    [Fact]
    public void A_layer_that_matches_nothing_is_named_with_the_drawing_layers()
    {
        var d = new DxfText().Header(4).Entities().Rect(0, 0, 10, 10, "SHAFT").End();
        var e = Assert.Throws<SectionTwistException>(() => d.Read(new DxfReadOptions { Layer = "SHAFT,BORE" }));
        Assert.Equal("dxf-no-outline", e.Code);
        Assert.Contains("layer 'BORE' matches no layer of the drawing; its layers are 'SHAFT'", e.Message);
    }
}
