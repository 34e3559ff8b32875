using SectionTwist.Geometry;
using SectionTwist.Import.Dxf;
using static SectionTwist.Tests.Import.RegressionDrawings;

namespace SectionTwist.Tests.Import;

/// <summary>
/// A drawing sheet (frame, title block, text, dimension, several views, hatch) and the ways into it: the list of
/// candidate regions, --part, --at, --window and --hatch. Areas: annulus pi (R^2 - r^2), hexagon (sqrt 3 / 2) s^2.
/// </summary>
public class SheetDrawingTests
{
    private const double Mm2 = 1e-6;

    [Fact]
    public void The_whole_sheet_is_refused_with_the_way_in()
    {
        var e = Assert.Throws<SectionTwistException>(() => Sheet().Read());
        Assert.Equal("dxf-branch", e.Code);
        Assert.Contains("3 outline ends meet at (100, 155)", e.Message);
        Assert.Contains("choose a closed part: --part 1 (area 1055.58, x 80..120, y 60..100)", e.Message);
        Assert.Contains("--part 2 (area 779.423", e.Message);
    }

    [Fact]
    public void Inspect_lists_the_regions_with_frames_left_out()
    {
        var r = DxfProfiles.Inspect(Write(Sheet()), new DxfReadOptions());
        Assert.NotNull(r.Problem);
        Assert.Equal(2, r.Parts.Count);
        Tol.Rel(TubeArea, r.Parts[0].Area, 1e-12, "annulus R 20, r 8");
        Assert.Equal(1, r.Parts[0].Holes);
        Assert.Equal(["VIEW"], r.Parts[0].Layers);
        Tol.Rel(HexArea, r.Parts[1].Area, 1e-12, "hexagon across flats 30");
        Assert.Equal(2, r.Frames.Count);
        Assert.Contains(r.Frames, f => f.StartsWith("LWPOLYLINE (line", StringComparison.Ordinal));
        Assert.Equal((100, 155), (Assert.Single(r.Junctions).Where.X, r.Junctions[0].Where.Y));
        Assert.Contains("HATCH", r.SkippedTypes);
    }

    [Fact]
    public void Part_number_point_window_and_hatch_each_pick_the_section()
    {
        var sheet = Sheet();
        Tol.Rel(TubeArea * Mm2, sheet.Read(new DxfReadOptions { Part = 1 }).Profile.Properties.Area, 1e-12, "annulus R 20, r 8");
        Tol.Rel(HexArea * Mm2, sheet.Read(new DxfReadOptions { Part = 2 }).Profile.Properties.Area, 1e-12, "hexagon across flats 30");
        var at = sheet.Read(new DxfReadOptions { At = new Point2(TubeX, TubeY + 15) });
        Tol.Rel(TubeArea * Mm2, at.Profile.Properties.Area, 1e-12, "annulus by a point in its material");
        Assert.Equal(1, at.Report.SelectedPart);
        var win = sheet.Read(new DxfReadOptions { Window = new Box2(60, 40, 140, 120) });
        Tol.Rel(TubeArea * Mm2, win.Profile.Properties.Area, 1e-12, "annulus inside the window (centre lines straight, left out)");
        var hatch = sheet.Read(new DxfReadOptions { UseHatches = true });
        Tol.Rel(TubeArea * Mm2, hatch.Profile.Properties.Area, 1e-12, "annulus from the hatch boundary");
        Assert.All(hatch.Profile.Regions[0].Loops.SelectMany(l => l.Segments), s => Assert.IsType<ArcSegment>(s));
    }

    [Fact]
    public void A_point_in_a_hole_or_outside_every_outline_is_answered_with_a_point_that_works()
    {
        var sheet = Sheet();
        var hole = Assert.Throws<SectionTwistException>(() => sheet.Read(new DxfReadOptions { At = new Point2(TubeX, TubeY) }));
        Assert.Contains("(100, 80) lies in the hole CIRCLE (line", hole.Message);
        Assert.Contains("give a point in its material, e.g. --at ", hole.Message);
        var outside = Assert.Throws<SectionTwistException>(() => sheet.Read(new DxfReadOptions { At = new Point2(500, 500) }));
        Assert.Contains("no closed outline lies around (500, 500)", outside.Message);
        // the point offered in the message picks the part
        string suggested = hole.Message[(hole.Message.IndexOf("--at ", StringComparison.Ordinal) + 5)..].Split(' ', ';')[0];
        var xy = suggested.Split(',').Select(v => double.Parse(v, System.Globalization.CultureInfo.InvariantCulture)).ToArray();
        Tol.Rel(TubeArea * Mm2, sheet.Read(new DxfReadOptions { At = new Point2(xy[0], xy[1]) }).Profile.Properties.Area, 1e-12, "annulus by the suggested point");
    }

    [Fact]
    public void A_frame_around_one_clean_view_with_a_title_is_read_as_a_sheet()
    {
        var d = new DxfText().Header(4).Entities().Rect(0, 0, 200, 150, "BORDER").Text(150, 10, "CONVEYOR IDLER PIN", "TITLE")
            .Circle(60, 70, 12.5, "VIEW").End();
        var e = Assert.Throws<SectionTwistException>(() => d.Read());
        Assert.Equal("dxf-sheet", e.Code);
        Assert.Contains("TEXT (line", e.Message);
        Assert.Contains("--part 1 (area 490.874", e.Message);
        Tol.Rel(Math.PI * 156.25 * Mm2, d.Read(new DxfReadOptions { Part = 1 }).Profile.Properties.Area, 1e-12, "disc d 25");
    }

    [Fact]
    public void A_hatch_edge_path_with_clockwise_arcs_reads_either_angle_convention()
    {
        // plate 40 x 20 with a quarter-round notch r 5 at the corner (40, 20): area 800 - pi 25 / 4. The notch is a
        // clockwise arc about (40, 20) from 270 to 180 degrees; writers store it as (90, 180) (angles measured
        // clockwise) or as (270, 180).
        foreach (var (a0, a1) in new[] { (90.0, 180.0), (270.0, 180.0) })
        {
            var d = new DxfText().Header(4).Entities().HatchHead("HATCH", 1)
                .P(92, 1).P(93, 5)
                .P(72, 1).P(10, 0.0).P(20, 0.0).P(11, 40.0).P(21, 0.0)
                .P(72, 1).P(10, 40.0).P(20, 0.0).P(11, 40.0).P(21, 15.0)
                .P(72, 2).P(10, 40.0).P(20, 20.0).P(40, 5.0).P(50, a0).P(51, a1).P(73, 0)
                .P(72, 1).P(10, 35.0).P(20, 20.0).P(11, 0.0).P(21, 20.0)
                .P(72, 1).P(10, 0.0).P(20, 20.0).P(11, 0.0).P(21, 0.0)
                .P(97, 0).HatchTail().End();
            var r = d.Read(new DxfReadOptions { UseHatches = true });
            Tol.Rel((800 - Math.PI * 25 / 4) * Mm2, r.Profile.Properties.Area, 1e-12, "rectangle minus quarter disc r 5");
        }
    }

    [Fact]
    public void Hatch_option_on_a_drawing_without_hatch_says_so()
    {
        var e = Assert.Throws<SectionTwistException>(() => new DxfText().Header(4).Entities().Rect(0, 0, 5, 5).End().Read(new DxfReadOptions { UseHatches = true }));
        Assert.Contains("holds no HATCH", e.Message);
    }

    internal static string Write(DxfText d)
    {
        string path = Path.Combine(Cli.CliRunner.TempDir(), "sheet.dxf");
        File.WriteAllText(path, d.ToString());
        return path;
    }
}
