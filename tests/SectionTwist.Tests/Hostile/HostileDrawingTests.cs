using System.Diagnostics;
using System.Text;
using SectionTwist.Geometry;
using SectionTwist.Import;
using SectionTwist.Import.Dxf;
using SectionTwist.Limits;
using SectionTwist.Profiles;
using DxfText = SectionTwist.Tests.Import.DxfText;
using SectionTwist.Torsion;

namespace SectionTwist.Tests.Hostile;

/// <summary>
/// The drawing, point-list and analysis classes of the hostile-input table, each with a drawing of our own making:
/// budgets are checked before the work (INSERT arrays, nesting, pieces), geometry the mesher cannot resolve is refused,
/// a hole drawn outside its outline is not silently a second solid part, and cancellation is observed promptly.
/// </summary>
public class HostileDrawingTests
{
    /// <summary>A block of a 400-vertex polygon and an INSERT repeating it <paramref name="cols"/> x <paramref name="rows"/> times.</summary>
    private static byte[] ArrayDrawing(int cols, int rows, double spacing)
    {
        var d = new DxfText().Header().P(0, "SECTION").P(2, "BLOCKS").P(0, "BLOCK").P(8, "0").P(2, "RING").P(70, 0).P(10, 0.0).P(20, 0.0).P(30, 0.0);
        d.P(0, "LWPOLYLINE").P(8, "0").P(90, 400).P(70, 1);
        for (int i = 0; i < 400; i++) d.P(10, 5 * Math.Cos(2 * Math.PI * i / 400)).P(20, 5 * Math.Sin(2 * Math.PI * i / 400));
        d.P(0, "ENDBLK").P(0, "ENDSEC").Entities();
        d.P(0, "INSERT").P(8, "0").P(2, "RING").P(10, 0.0).P(20, 0.0).P(70, cols).P(71, rows).P(44, spacing).P(45, spacing);
        return d.End().Bytes();
    }

    [Fact]
    public void Hang_dxf_a_large_insert_array_of_a_many_vertex_block_is_refused_before_expansion()
    {
        var data = ArrayDrawing(200, 200, 12);
        var e = Hostile.Refused(() => DxfProfiles.Read(data, "array.dxf", DxfText.Mm), 2, "dxf-too-large");
        Assert.Contains("INSERT", e.Message);
        Assert.Contains("'RING'", e.Message);
    }

    [Fact]
    public void Hang_dxf_blocks_nesting_exponentially_are_refused_before_expansion()
    {
        // block B0 is a line; B(k) inserts B(k-1) as a 2 x 2 array: 4^20 lines at the top
        var d = new DxfText().Header().P(0, "SECTION").P(2, "BLOCKS");
        d.P(0, "BLOCK").P(8, "0").P(2, "B0").P(10, 0.0).P(20, 0.0).Line(0, 0, 1, 0).P(0, "ENDBLK");
        for (int k = 1; k <= 20; k++)
            d.P(0, "BLOCK").P(8, "0").P(2, $"B{k}").P(10, 0.0).P(20, 0.0).P(0, "INSERT").P(8, "0").P(2, $"B{k - 1}").P(10, 0.0).P(20, 0.0).P(70, 2).P(71, 2).P(44, 1.0).P(45, 1.0).P(0, "ENDBLK");
        d.P(0, "ENDSEC").Entities().P(0, "INSERT").P(8, "0").P(2, "B20").P(10, 0.0).P(20, 0.0);
        Hostile.Refused(() => DxfProfiles.Read(d.End().Bytes(), "nest.dxf", DxfText.Mm), 2, "dxf-too-large");
    }

    [Fact]
    public void Hang_dxf_many_crossing_copies_of_one_outline_end_in_a_clean_error_quickly()
    {
        // 20 x 20 copies of a 400-vertex ring of radius 5 at spacing 3: every copy crosses its neighbours
        var data = ArrayDrawing(20, 20, 3);
        Hostile.Refused(() => SectionAnalyzer.Analyze(DxfProfiles.Read(data, "crossing.dxf", DxfText.Mm).Profile), 30, "self-intersection");
    }

    [Fact]
    public void Hang_analysis_an_ellipse_with_an_enormous_axis_beside_the_outline_is_refused()
    {
        var d = new DxfText().Header().Entities().Circle(0, 0, 20)
            .P(0, "ELLIPSE").P(8, "0").P(10, 100.0).P(20, 0.0).P(30, 0.0).P(11, 1e15).P(21, 0.0).P(31, 0.0).P(40, 0.5);
        var clock = Stopwatch.StartNew();
        var e = Assert.Throws<SectionTwistException>(() => SectionAnalyzer.Analyze(DxfProfiles.Read(d.End().Bytes(), "far.dxf", DxfText.Mm).Profile));
        Assert.True(clock.Elapsed.TotalSeconds < 5, $"{clock.Elapsed.TotalSeconds:F1} s");
        Assert.Contains(e.Code, new[] { "bad-scale", "feature-too-small", "overlapping-regions", "self-intersection", "dxf-stray-hole" });
    }

    [Fact]
    public void Hang_analysis_an_ellipse_with_a_tiny_axis_is_refused_by_the_mesher_check()
    {
        var d = new DxfText().Header().Entities().Circle(0, 0, 20)
            .P(0, "ELLIPSE").P(8, "0").P(10, 100.0).P(20, 0.0).P(30, 0.0).P(11, 1e-9).P(21, 0.0).P(31, 0.0).P(40, 0.5);
        // refused by the outline check (the sliver traces as crossing itself) or by the mesher's feature check
        var e = Hostile.Refused(() => SectionAnalyzer.Analyze(DxfProfiles.Read(d.End().Bytes(), "tiny.dxf", DxfText.Mm).Profile), 5);
        Assert.Contains(e.Code, new[] { "feature-too-small", "self-intersection" });
    }

    [Fact]
    public void Hang_analysis_an_ellipse_of_1e_minus_104_inside_the_outline_is_refused_in_seconds()
    {
        // campaign finding (dxf input 45405): a hole ELLIPSE with a 1e-104 axis traced to 111 191 stacked chords, all in one
        // cell of the crossing grid, and the check went quadratic for 7 s of CPU without observing the budget
        var d = new DxfText().Header().Entities().Circle(0, 0, 20)
            .P(0, "ELLIPSE").P(8, "0").P(10, 16.66).P(20, 0.0).P(30, 0.0).P(11, 1e-104).P(21, 0.0).P(31, 0.0).P(40, 0.006);
        var e = Hostile.Refused(() => SectionAnalyzer.Analyze(DxfProfiles.Read(d.End().Bytes(), "speck.dxf", DxfText.Mm).Profile), 30);
        Assert.Contains(e.Code, new[] { "feature-too-small", "self-intersection", "zero-area", "profile-too-complex" });
    }

    [Fact]
    public void Hang_analysis_a_curve_far_smaller_than_the_tolerance_flattens_to_its_quarter_chords()
    {
        // the chord bound a (1 - cos(du/2)) of the circle of radius a holds for the ellipse, its image under a contraction
        var speck = EllipticalArcSegment.Full(new Point2(16.66, 0), 1e-104, 6e-107);
        Assert.Equal(5, speck.Flatten(4e-6).Count);
        var thin = EllipticalArcSegment.Full(new Point2(0, 0), 1, 0.01);
        var pts = thin.Flatten(1e-7);
        Assert.InRange(pts.Count, 100, 20_000);
        // every chord midpoint (in parameter) of the curve lies within the tolerance of its chord
        for (int i = 0; i + 1 < pts.Count; i++)
        {
            double t = (i + 0.5) / (pts.Count - 1);
            var m = thin.PointAt(t);
            Point2 a = pts[i], b = pts[i + 1], ab = b - a;
            double dist = Math.Abs(Point2.Cross(ab, m - a)) / ab.Length;
            Assert.True(dist <= 1e-7 * (1 + 1e-9), $"chord {i}: {dist:E2}");
        }
    }

    [Theory]
    [InlineData(1e-300)]
    [InlineData(1e-12)]
    [InlineData(1e12)]
    public void Hang_analysis_a_profile_scaled_out_of_range_is_refused(double factor)
    {
        var profile = ProfileTemplates.Create("keyed:d=40,r=0.5");
        var e = Hostile.Refused(() => SectionAnalyzer.Analyze(profile.Transformed(Similarity2.Scaling(factor))), 5);
        Assert.Contains(e.Code, new[] { "bad-scale", "zero-area" });
    }

    [Fact]
    public void Hang_analysis_a_sliver_part_is_refused_by_the_mesher_feature_check()
    {
        // a 1e-8 mm thick rectangle beside a 40 mm disc: eight decades between the section and its thinnest part
        string text = "-20, 0\narc, 0, -20, 20, 0\narc, 0, 20, -20, 0\n\n30, 0\n40, 0\n40, 1e-8\n30, 1e-8\n";
        var profile = PointListSource.Parse(new StringReader(text), "sliver.csv");
        var e = Hostile.Refused(() => SectionAnalyzer.Analyze(profile), 5, "feature-too-small");
        Assert.Contains("--part N", e.Message);
    }

    [Fact]
    public void Memory_the_analysis_is_refused_before_meshing_when_the_budget_is_too_small()
    {
        var options = new AnalysisOptions { Accuracy = 1e-6, MemoryBudgetBytes = 32L << 20 };
        var e = Hostile.Refused(() => SectionAnalyzer.Analyze(ProfileTemplates.Create("keyed:d=40,r=0.5"), options), 5, "memory-budget");
        Assert.Contains("--memory-budget", e.Message);
    }

    [Fact]
    public void Memory_the_tools_own_dxf_output_read_back_whole_is_refused_or_bounded()
    {
        // the outline plus closed stress-function contours on a second layer (as 'section --dxf' writes them)
        var profile = ProfileTemplates.Create("circle:d=40");
        var lines = new List<DxfPolyline>();
        for (int k = 1; k <= 9; k++)
            for (int i = 0; i < 200; i++)
            {
                double r = 0.02 * k / 10, a0 = 2 * Math.PI * i / 200, a1 = 2 * Math.PI * (i + 1) / 200;
                lines.Add(new DxfPolyline("PHI", [new Point2(r * Math.Cos(a0), r * Math.Sin(a0)), new Point2(r * Math.Cos(a1), r * Math.Sin(a1))], false));
            }
        using var ms = new MemoryStream();
        DxfProfiles.Write(profile, ms, new DxfWriteOptions { Version = DxfVersion.R2000, Polylines = lines });
        var options = new AnalysisOptions { MemoryBudgetBytes = 256L << 20 };
        var clock = Stopwatch.StartNew();
        try
        {
            // the reader may refuse the nest of contour parts itself (asking for --part); else the analysis is held to the budget
            var r = SectionAnalyzer.Analyze(DxfProfiles.Read(ms.ToArray(), "own.dxf").Profile, options);
            Assert.True(r.Mesh.Elements * 8000L <= options.MemoryBudgetBytes, $"{r.Mesh.Elements} elements exceed the budget");
        }
        catch (SectionTwistException e) { Assert.DoesNotContain('\n', e.Message); }
        Assert.True(clock.Elapsed.TotalSeconds < 60);
        // the outline's own layer reads and solves normally
        var alone = DxfProfiles.Read(ms.ToArray(), "own.dxf", new DxfReadOptions { Layer = "PROFILE" });
        Assert.Single(alone.Profile.Regions);
    }

    [Fact]
    public void Silent_part_a_hole_drawn_outside_its_outline_is_refused_with_the_remedy()
    {
        var d = new DxfText().Header().Entities().Rect(0, 0, 60, 40, "PLATE").Circle(20, 20, 5, "HOLES").Circle(100, 20, 5, "HOLES");
        var e = Hostile.Refused(() => DxfProfiles.Read(d.End().Bytes(), "plate.dxf"), 2, "dxf-stray-hole");
        Assert.Contains("'HOLES'", e.Message);
        Assert.Contains("--part N", e.Message);
        // picking the part is the remedy the message gives
        var one = DxfProfiles.Read(d.End().Bytes(), "plate.dxf", new DxfReadOptions { Part = 1 });
        Assert.Single(one.Profile.Regions[0].Holes);
    }

    [Fact]
    public void Silent_part_a_lone_circle_on_a_layer_named_for_holes_is_refused()
    {
        var d = new DxfText().Header().Entities().Rect(0, 0, 60, 40, "PLATE").Circle(100, 20, 5, "BORES");
        Hostile.Refused(() => DxfProfiles.Read(d.End().Bytes(), "bores.dxf"), 2, "dxf-stray-hole");
    }

    [Fact]
    public void Two_parts_on_one_layer_remain_allowed()
    {
        var d = new DxfText().Header().Entities().Rect(0, 0, 60, 40, "PLATE").Rect(100, 0, 20, 20, "PLATE");
        Assert.Equal(2, DxfProfiles.Read(d.End().Bytes(), "two.dxf").Profile.Regions.Count);
    }

    [SkippableFact]
    public void Crash_size_a_drawing_path_that_links_to_an_endless_device_is_refused_at_once()
    {
        Skip.IfNot(File.Exists("/dev/zero"), "needs /dev/zero (Unix)");
        string link = Path.Combine(Cli.CliRunner.TempDir(), "endless.dxf");
        File.CreateSymbolicLink(link, "/dev/zero");
        Hostile.Refused(() => ProfileSources.Load(link), 2, "not-a-file");
        string pts = Path.Combine(Cli.CliRunner.TempDir(), "endless.csv");
        File.CreateSymbolicLink(pts, "/dev/zero");
        Hostile.Refused(() => ProfileSources.Load(pts), 2, "not-a-file");
    }

    [Fact]
    public void Point_list_many_stacked_loops_are_refused_before_tracing()
    {
        var b = new StringBuilder();
        for (int i = 0; i <= InputLimits.MaxLoops; i++) b.Append("0, 0\n10, 0\narc, 15, 5, 10, 10\n0, 10\n\n");
        Hostile.Refused(() => PointListSource.Parse(new StringReader(b.ToString()), "stack.csv"), 5, "bad-point-list");
    }

    [Fact]
    public void Point_list_one_loop_of_stacked_arcs_is_refused_before_memory_runs_out()
    {
        var b = new StringBuilder("-10, 0\n");
        for (int i = 0; i < 20_000; i++) b.Append("arc, 0, -10, 10, 0\narc, 0, 10, -10, 0\n");
        var e = Hostile.Refused(() => PointListSource.Parse(new StringReader(b.ToString()), "arcs.csv"), 10);
        Assert.Contains(e.Code, new[] { "profile-too-complex", "self-intersection" });
    }
}
