using System.Globalization;
using System.Text.RegularExpressions;
using SectionTwist.Import.Dxf;

namespace SectionTwist.Tests.Import;

/// <summary>
/// The exact outcome for drawings that used to give a wrong, silent or unfollowable answer: several parts, islands,
/// gaps (the snap value printed closes them), empty files, damaged numbers before the unit question, decimal commas,
/// junctions. Areas: rectangle b h, disc pi r^2.
/// </summary>
public class DrawingMessageTests
{
    private const double Mm2 = 1e-6;

    [Fact]
    public void Several_parts_are_analysed_together_with_a_note_naming_them_and_their_sizes()
    {
        var r = new DxfText().Header(4).Entities().Rect(0, 0, 30, 10).Rect(40, 0, 10, 10).Rect(60, 0, 5, 4).End().Read();
        Tol.Rel((300 + 100 + 20) * Mm2, r.Profile.Properties.Area, 1e-12, "three rectangles");
        var note = Assert.Single(r.Report.Warnings, w => w.Contains("separate parts", StringComparison.Ordinal));
        Assert.StartsWith("3 separate parts analysed together (their J add up): --part 1 (area 300, x 0..30, y 0..10), --part 2 (area 100, x 40..50, y 0..10), --part 3 (area 20, x 60..65, y 0..4)", note);
        Assert.Contains("pick one with --part 1 or a point with --at ", note);
    }

    [Fact]
    public void A_part_inside_a_hole_is_ambiguous_and_named()
    {
        // drum tube (R 30, r 20) with a loose shaft (r 10) drawn in its bore
        var d = new DxfText().Header(4).Entities().Circle(0, 0, 30).Circle(0, 0, 20).Circle(0, 0, 10).End();
        var e = Assert.Throws<SectionTwistException>(() => d.Read());
        Assert.Equal("dxf-island", e.Code);
        Assert.Contains("CIRCLE (line", e.Message);
        Assert.Contains("--part 1 (area 1570.8", e.Message);
        Tol.Rel(Math.PI * 100 * Mm2, d.Read(new DxfReadOptions { Part = 2 }).Profile.Properties.Area, 1e-12, "disc r 10");
    }

    [Fact]
    public void The_snap_value_in_a_gap_message_is_accepted_and_closes_the_gap()
    {
        foreach (double gap in new[] { 0.01, 0.003, 0.4 })
        {
            var d = new DxfText().Header(4).Entities().Line(0, 0, 100, 0).Line(100, 0, 100, 50).Line(100, 50, 0, 50).Line(0, 50, 0, gap).End();
            var e = Assert.Throws<SectionTwistException>(() => d.Read());
            Assert.Equal("open-loop", e.Code);
            Assert.Contains($"gap of {gap.ToString(CultureInfo.InvariantCulture)} drawing units", e.Message);
            var m = Regex.Match(e.Message, @"--snap (\S+) \(now 1e-6\)");
            Assert.True(m.Success, e.Message);
            double snap = double.Parse(m.Groups[1].Value, CultureInfo.InvariantCulture);
            Assert.InRange(snap, 1e-6, 1e-2);
            var r = d.Read(new DxfReadOptions { SnapTolerance = snap });
            Tol.Rel(5000 * Mm2, r.Profile.Properties.Area, 1e-2, "rectangle 100 x 50 with one corner moved by the gap");
        }
    }

    [Fact]
    public void A_wide_gap_offers_no_snap_but_names_the_loose_end()
    {
        var d = new DxfText().Header(4).Entities().Line(0, 0, 100, 0).Line(100, 0, 100, 50).Line(100, 50, 0, 50).Line(0, 50, 0, 20).End();
        var e = Assert.Throws<SectionTwistException>(() => d.Read());
        Assert.DoesNotContain("--snap", e.Message);
        Assert.Matches(@"ends at \(0, (0|20)\) with nothing joined to it", e.Message);
    }

    [Fact]
    public void Empty_and_entity_less_files_do_not_blame_the_unit()
    {
        var empty = Assert.Throws<SectionTwistException>(() => DxfProfiles.Read([], "empty.dxf"));
        Assert.Equal("empty.dxf: the file is empty; export the drawing again as DXF", empty.Message);
        var headerOnly = new DxfText().Header(null).P(0, "EOF").ToString();
        var e = Assert.Throws<SectionTwistException>(() => DxfProfiles.Read(System.Text.Encoding.ASCII.GetBytes(headerOnly), "header.dxf"));
        Assert.Equal("dxf-no-entities", e.Code);
        Assert.DoesNotContain("INSUNITS", e.Message);
    }

    [Fact]
    public void A_damaged_number_is_reported_before_the_unit_question()
    {
        var d = new DxfText().Header(null).Entities().Rect(0, 0, 5, 5).P(0, "LINE").P(8, "0").P(10, "1.5.2").P(20, 0.0).P(11, 3.0).P(21, 0.0).End();
        var e = Assert.Throws<SectionTwistException>(() => d.Read());
        Assert.Equal("bad-dxf-number", e.Code);
        Assert.Contains("'1.5.2'", e.Message);
    }

    [Fact]
    public void A_decimal_comma_is_refused_with_the_writer_setting_that_fixes_it()
    {
        var d = new DxfText().Header(4).Entities().P(0, "CIRCLE").P(8, "0").P(10, "12,5").P(20, "0,0").P(40, "7,5").End();
        var e = Assert.Throws<SectionTwistException>(() => d.Read());
        Assert.Equal("bad-dxf-number", e.Code);
        Assert.Contains("holds '7,5'", e.Message);
        Assert.Contains("decimal comma", e.Message);
        Assert.Contains("decimal point", e.Message);
    }

    [Fact]
    public void A_t_junction_on_a_clean_outline_is_placed_and_names_its_entities()
    {
        // a rectangle split by a line across it: three ends meet at (15, 0) and at (15, 10)
        var d = new DxfText().Header(4).Entities()
            .Line(0, 0, 15, 0).Line(15, 0, 30, 0).Line(30, 0, 30, 10).Line(30, 10, 15, 10).Line(15, 10, 0, 10).Line(0, 10, 0, 0)
            .Line(15, 0, 15, 10).End();
        var e = Assert.Throws<SectionTwistException>(() => d.Read());
        Assert.Equal("dxf-branch", e.Code);
        Assert.Matches(@"3 outline ends meet at \(15, (0|10)\)", e.Message);
        Assert.Contains("remove the stray or construction lines there", e.Message);
    }
}
