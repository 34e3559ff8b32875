using System.Text;
using SectionTwist.Geometry;
using SectionTwist.Import.Dxf;
using SectionTwist.Units;

namespace SectionTwist.Tests.Import;

/// <summary>The real-file pitfalls of DXF-NOTES.md, one small drawing each. Areas are elementary geometry.</summary>
public class DxfPitfallTests
{
    private const double Mm2 = 1e-6;

    [Fact]
    public void Tiny_gaps_are_closed_and_reported()
    {
        // 100 x 50 rectangle whose corners miss by 3e-5 mm (about 3e-7 of the diagonal, inside the 1e-6 default)
        double g = 3e-5;
        var r = new DxfText().Header(4).Entities()
            .Line(0, 0, 100, 0).Line(100 + g, 0, 100, 50).Line(100, 50 + g, 0, 50).Line(0, 50, 0, g).End().Read();
        Tol.Rel(5000 * Mm2, r.Profile.Properties.Area, 1e-6, "rectangle b h");
        Tol.Rel(g, r.Report.LargestGapClosed, 1e-6);
    }

    [Fact]
    public void Larger_gap_names_place_and_entities_and_a_wider_snap_closes_it()
    {
        var d = new DxfText().Header(4).Entities()
            .Line(0, 0, 100, 0).Line(100, 0, 100, 50).Line(100, 50, 0, 50).Line(0, 50, 0, 0.01).End();
        var e = Assert.Throws<SectionTwistException>(() => d.Read());
        Assert.Equal("open-loop", e.Code);
        Assert.Contains("gap of 0.01", e.Message);
        Assert.Contains("(0, 0.01)", e.Message);
        Assert.Contains("LINE (line", e.Message);
        Assert.Contains("join the ends with --snap 0.0002 (now 1e-6)", e.Message);
        var r = d.Read(new DxfReadOptions { SnapTolerance = 1e-3 });
        Tol.Rel(5000 * Mm2, r.Profile.Properties.Area, 1e-3);
        Tol.Rel(0.01, r.Report.LargestGapClosed, 1e-9);
    }

    [Fact]
    public void Exact_and_overlapping_duplicates_are_dropped()
    {
        var r = new DxfText().Header(4).Entities()
            .Rect(0, 0, 40, 20)
            .Line(40, 0, 0, 0)        // exact duplicate, reversed
            .Line(10, 20, 30, 20)     // contained in the top edge
            .Line(30, 0, 45, 0)       // no: would stick out - see below
            .End();
        // the last line sticks out beyond the corner: a stray end that must be reported, not silently kept
        var e = Assert.Throws<SectionTwistException>(() => r.Read());
        Assert.Contains("(45, 0)", e.Message);

        // 40 x 20 rectangle with a fillet r = 5 at the lower left; the bottom edge drawn as two overlapping lines,
        // the fillet drawn twice, the top edge drawn twice plus a piece lying on it
        var ok = new DxfText().Header(4).Entities()
            .Line(5, 0, 25, 0).Line(15, 0, 40, 0)
            .Line(40, 0, 40, 20).Line(40, 20, 0, 20).Line(0, 20, 0, 5)
            .Arc(5, 5, 5, 180, 270).Arc(5, 5, 5, 180, 270)
            .Line(0, 20, 40, 20).Line(10, 20, 30, 20).End();
        var read = ok.Read();
        Assert.Equal(4, read.Report.DuplicatesDropped);
        Tol.Rel((800 - 25 + Math.PI * 25 / 4) * Mm2, read.Profile.Properties.Area, 1e-12, "rectangle minus corner square plus quarter disc");
        Assert.Equal(4, read.Profile.Regions[0].Outer.Segments.Count(s => s is LineSegment));
    }

    [Fact]
    public void Mirrored_arc_with_negative_extrusion()
    {
        // OCS centre (-10, 0) with extrusion (0,0,-1) is world (10, 0); OCS angles 0..180 (upper half, CCW about -Z)
        // map to the world upper half circle about (10, 0), running clockwise. Closed by the diameter: half disc r = 5.
        var r = new DxfText().Header(4).Entities().Arc(-10, 0, 5, 0, 180, nz: -1).Line(5, 0, 15, 0).End().Read();
        Tol.Rel(Math.PI * 12.5 * Mm2, r.Profile.Properties.Area, 1e-12, "half disc");
        var arc = r.Profile.Regions[0].Outer.Segments.OfType<ArcSegment>().Single();
        Tol.Abs(0.010, arc.Center.X, 1e-15, "mirrored centre x");
        Assert.True(r.Profile.Bounds.MinY >= -1e-15, "the half disc lies above the x axis after mirroring");
    }

    [Fact]
    public void Negative_scale_insert_mirrors_the_block()
    {
        // block: quarter disc r = 10 in the first quadrant (two lines and an arc); X scale -1 puts it in the second quadrant
        var d = new DxfText().Header(4)
            .P(0, "SECTION").P(2, "BLOCKS").P(0, "BLOCK").P(2, "Q").P(10, 0.0).P(20, 0.0)
            .Line(0, 0, 10, 0).Arc(0, 0, 10, 0, 90).Line(0, 10, 0, 0).P(0, "ENDBLK").P(0, "ENDSEC")
            .Entities().P(0, "INSERT").P(2, "Q").P(10, 0.0).P(20, 0.0).P(41, -1.0).P(42, 1.0).End();
        var r = d.Read();
        Tol.Rel(Math.PI * 25 * Mm2, r.Profile.Properties.Area, 1e-12, "quarter disc");
        Tol.Abs(-0.010, r.Profile.Bounds.MinX, 1e-15);
        Tol.Abs(0, r.Profile.Bounds.MaxX, 1e-15);
        Assert.IsType<ArcSegment>(r.Profile.Regions[0].Outer.Segments.Single(s => s is not LineSegment));
    }

    [Fact]
    public void Non_uniform_insert_scale_turns_a_circle_into_an_exact_ellipse()
    {
        var d = new DxfText().Header(4)
            .P(0, "SECTION").P(2, "BLOCKS").P(0, "BLOCK").P(2, "C").P(10, 0.0).P(20, 0.0).Circle(0, 0, 10).P(0, "ENDBLK").P(0, "ENDSEC")
            .Entities().P(0, "INSERT").P(2, "C").P(10, 0.0).P(20, 0.0).P(41, 3.0).P(42, 1.0).P(50, 30.0).End();
        var r = d.Read();
        Assert.IsType<EllipticalArcSegment>(Assert.Single(r.Profile.Regions[0].Outer.Segments));
        Tol.Rel(Math.PI * 30 * 10 * Mm2, r.Profile.Properties.Area, 1e-9, "ellipse pi a b, a = 30, b = 10");
    }

    [Fact]
    public void Fit_point_spline_is_interpolated_through_its_points()
    {
        // fit points on a circle r = 10 (upper half, 13 points), closed by the diameter: the interpolating cubic
        // passes through every fit point and stays close to the half disc (area within 1e-3).
        var d = new DxfText().Header(4).Entities().P(0, "SPLINE").P(8, "0").P(70, 8).P(71, 3).P(72, 0).P(73, 0).P(74, 13);
        for (int i = 0; i <= 12; i++)
        {
            double a = Math.PI * i / 12;
            d.P(11, 10 * Math.Cos(a)).P(21, 10 * Math.Sin(a)).P(31, 0.0);
        }
        var r = d.Line(-10, 0, 10, 0).End().Read(new DxfReadOptions { SplineTolerance = 1e-7 });
        Tol.Rel(Math.PI * 50 * Mm2, r.Profile.Properties.Area, 1e-3, "half disc (fit points on the circle)");
        var pts = r.Profile.Regions[0].Outer.Flatten(1e-9);
        // a cubic through 13 points with free ends stays within a few 1e-4 of the radius (interpolation error, common practice, no source)
        double worst = pts.Max(p => Math.Abs(p.Length - 0.010) * (p.Y > 1e-6 ? 1 : 0));
        Assert.True(worst < 5e-4 * 0.010, $"the spline strays {worst:E2} m from the circle");
        var near = pts.Min(p => Point2.Distance(p, new Point2(0.010 * Math.Cos(Math.PI / 12), 0.010 * Math.Sin(Math.PI / 12))));
        Assert.True(near < 1e-9, "interpolation passes through the fit point");
    }

    [Fact]
    public void Open_polyline_closed_by_repeating_the_first_vertex()
    {
        var r = new DxfText().Header(4).Entities()
            .LwPolyline(false, (0, 0, 0), (30, 0, 0), (30, 10, 0), (0, 10, 0), (0, 0, 0)).End().Read();
        Tol.Rel(300 * Mm2, r.Profile.Properties.Area, 1e-12);
        Assert.Equal(4, r.Profile.Regions[0].Outer.Segments.Count);
    }

    [Theory]
    [InlineData("\n")]
    [InlineData("\r\n")]
    [InlineData("\r")]
    public void Any_line_end_style_reads(string nl)
    {
        var r = new DxfText { NewLine = nl }.Header(4).Entities().Rect(0, 0, 7, 3).End().Read();
        Tol.Rel(21 * Mm2, r.Profile.Properties.Area, 1e-12);
    }

    [Fact]
    public void Code_page_and_unicode_escapes_decode_layer_names()
    {
        // R2000 file in ANSI_1252: byte 0xD8 is the letter O with stroke; a \U+00C5 escape is the letter A with ring
        var d = new DxfText().Header(4, "AC1015", "ANSI_1252").Entities().Rect(0, 0, 5, 5, "R\u00d8R").Rect(20, 0, 5, 5, "\\U+00C5S").End();
        var bytes = d.Bytes(CodePagesEncodingProvider.Instance.GetEncoding(1252));
        var r = DxfProfiles.Read(bytes, "cp.dxf", new DxfReadOptions { Layer = "r\u00f8r" });
        Tol.Rel(25 * Mm2, r.Profile.Properties.Area, 1e-12);
        Assert.Contains("\u00c5S", r.Report.Layers);
        // AC1021 and later are UTF-8
        var u = new DxfText().Header(4, "AC1024").Entities().Rect(0, 0, 5, 5, "\u00e5s").End();
        var ru = DxfProfiles.Read(u.Bytes(Encoding.UTF8), "u.dxf", new DxfReadOptions { Layer = "\u00c5S" });
        Assert.Contains("\u00e5s", ru.Report.Layers);
    }

    [Fact]
    public void Binary_dxf_is_read()
    {
        var bin = BinaryDxf.FromAscii(new DxfText().Header(4, "AC1015").Entities().Rect(0, 0, 12, 5).Circle(6, 2.5, 1).End().ToString());
        var r = DxfProfiles.Read(bin, "bin.dxf");
        Assert.Equal("binary", r.Report.Format);
        Tol.Rel((60 - Math.PI) * Mm2, r.Profile.Properties.Area, 1e-12, "rectangle minus circle");
    }

    [Fact]
    public void A_dwg_or_other_binary_file_is_refused_by_name()
    {
        var junk = Encoding.ASCII.GetBytes("AC1032\0\0\0\0binary drawing");
        var e = Assert.Throws<SectionTwistException>(() => DxfProfiles.Read(junk, "x.dwg"));
        Assert.Contains("not a DXF file", e.Message);
        Assert.Contains("DWG", e.Message);
    }

    [Fact]
    public void Unitless_drawing_needs_the_unit_option_and_override_wins()
    {
        var d = new DxfText().Header(0).Entities().Rect(0, 0, 2, 1).End();
        var e = Assert.Throws<SectionTwistException>(() => d.Read());
        Assert.Equal("dxf-unitless", e.Code);
        Assert.Contains("--unit", e.Message);
        var noHeader = new DxfText().Entities().Rect(0, 0, 2, 1).End();
        Assert.Contains("--unit", Assert.Throws<SectionTwistException>(() => noHeader.Read()).Message);
        var r = d.Read(new DxfReadOptions { Unit = LengthUnit.Inch });
        Tol.Rel(2 * 0.0254 * 0.0254, r.Profile.Properties.Area, 1e-12, "2 in^2, 1 in = 25.4 mm exactly");
        var over = new DxfText().Header(4).Entities().Rect(0, 0, 2, 1).End().Read(new DxfReadOptions { Unit = LengthUnit.Centimetre });
        Tol.Rel(2e-4, over.Profile.Properties.Area, 1e-12, "override: cm");
    }

    [Fact]
    public void Several_parts_all_together_or_one_by_number_or_layer()
    {
        var d = new DxfText().Header(4).Entities().Rect(0, 0, 10, 10, "A").Rect(20, 0, 30, 10, "B").Circle(25, 5, 2, "B").End();
        var all = d.Read();
        Assert.Equal(2, all.Profile.Regions.Count);
        Assert.Equal(2, all.Report.Parts.Count);
        Tol.Rel(300 - Math.PI * 4, all.Report.Parts[0].Area, 1e-12, "part 1 is the larger: 30 x 10 minus circle r 2");
        Assert.Equal(1, all.Report.Parts[0].Holes);
        var p2 = d.Read(new DxfReadOptions { Part = 2 });
        Tol.Rel(100 * Mm2, p2.Profile.Properties.Area, 1e-12);
        var la = d.Read(new DxfReadOptions { Layer = "B" });
        Tol.Rel((300 - Math.PI * 4) * Mm2, la.Profile.Properties.Area, 1e-12);
        var e = Assert.Throws<SectionTwistException>(() => d.Read(new DxfReadOptions { Part = 3 }));
        Assert.Contains("2 part(s)", e.Message);
    }

    [Fact]
    public void Self_intersection_is_reported_with_its_place()
    {
        var d = new DxfText().Header(4).Entities().LwPolyline(true, (0, 0, 0), (10, 10, 0), (10, 0, 0), (0, 10, 0)).End();
        var e = Assert.Throws<SectionTwistException>(() => d.Read());
        Assert.Equal("self-intersection", e.Code);
        Assert.Contains("(5, 5)", e.Message);
    }

    [Fact]
    public void Stray_lines_at_a_corner_are_named_and_left_out()
    {
        var r = new DxfText().Header(4).Entities().Rect(0, 0, 10, 10).Line(10, 10, 20, 20).Line(10, 10, 20, 0).End().Read();
        Tol.Rel(100 * Mm2, r.Profile.Properties.Area, 1e-12, "square 10");
        Assert.Equal(2, r.Report.LeftOut.Count);
        Assert.Contains(r.Report.Warnings, w => w.StartsWith("left out 2 straight lines (LINE (line", StringComparison.Ordinal));
    }
}
