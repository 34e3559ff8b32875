using FsCheck;
using FsCheck.Xunit;
using SectionTwist.Import;
using SectionTwist.Rendering.Drawing;
using SectionTwist.Rendering.Report;
using SectionTwist.Rendering.Section;
using SectionTwist.Rendering.Shaft;
using SectionTwist.Torsion;
using SkiaSharp;

namespace SectionTwist.Tests.Rendering;

/// <summary>
/// The picture defects of issue 11, one test each: colour-bar ticks at round numbers, the outline stroke complete on every
/// edge (the inch hollow-section sample lost part of its bottom edge under the scale bar), the title from the section,
/// labels clear of lines and panel titles, hinted text, and the report's method sentence. Layout rules are ours (common
/// practice, no source); round numbers are 1, 2 and 5 times a power of ten (Heckbert, Graphics Gems, 1990).
/// </summary>
public sealed class PictureDefectTests
{
    private static bool IsRound(double w)
    {
        double m = w / Math.Pow(10, Math.Floor(Math.Log10(w)));
        return new[] { 1.0, 2.0, 5.0, 10.0 }.Any(n => Math.Abs(m - n) < 1e-9);
    }

    [Theory]
    [InlineData(2.002, 10)]    // the inch SHS sample at 100 N*m: ticks were 0.2, 0.4, 0.601, 0.801, ...
    [InlineData(64.02, 10)]
    [InlineData(290.4, 10)]
    [InlineData(1.3e-4, 8)]
    [InlineData(7.3e6, 24)]
    public void Colour_bands_have_a_round_width_and_reach_the_top(double top, int requested)
    {
        var (bands, width) = SectionPicture.BandScale(top, requested);
        Assert.True(IsRound(width), $"band width {width}");
        Assert.True(bands * width >= top * (1 - 1e-12) && (bands - 1) * width < top, $"{bands} x {width} for {top}");
        Assert.InRange(bands, 1, 24);
    }

    [Property(MaxTest = 200)]
    public bool Colour_bands_are_round_for_any_peak(NormalFloat x, PositiveInt n)
    {
        double top = Math.Abs(x.Get) + 1e-9;
        int requested = 2 + n.Get % 23;
        var (bands, width) = SectionPicture.BandScale(top, requested);
        return IsRound(width) && bands >= 1 && bands <= 24 && bands * width >= top * (1 - 1e-12);
    }

    [Fact]
    public void Outline_stroke_is_complete_on_the_bottom_edge_of_the_inch_hollow_section()
    {
        // winch-frame-shs-inch.dxf: a 3 in square hollow section; its straight bottom edge runs from x = -1 to 1 in at y = -1.5 in
        var profile = ProfileSources.Load(Path.Combine(RepoPaths.SampleProfiles, "winch-frame-shs-inch.dxf"));
        var r = SectionAnalyzer.Analyze(profile, new AnalysisOptions { Accuracy = 1e-3 });
        var data = SectionPlotData.From(r);
        var o = new SectionPlotOptions { Torque = 100 };
        using var bmp = SKBitmap.Decode(SectionPicture.Render(data, ImageFormat.Png, o));
        Dump.Write("shs-inch.png", SectionPicture.Render(data, ImageFormat.Png, o));
        var L = SectionPicture.Layout(data, o);
        for (double x = -0.95; x <= 0.95; x += 0.01)
        {
            var p = L.ToPixel(x * 0.0254, -1.5 * 0.0254);
            int px = (int)Math.Round(p.X), py = (int)Math.Round(p.Y);
            bool dark = Enumerable.Range(-1, 3).Any(dy => bmp.GetPixel(px, py + dy) is var c && c.Red < 90 && c.Green < 90 && c.Blue < 90);
            Assert.True(dark, $"no outline stroke at x = {x:F2} in ({px}, {py})");
        }
    }

    [Fact]
    public void Title_comes_from_the_section_not_from_the_output_file()
    {
        var r = SectionAnalyzer.Analyze(ProfileSources.Load("circle:d=20"), new AnalysisOptions { Accuracy = 1e-3 });
        Assert.Equal("circle:d=20: shear stress magnitude", SectionPlotData.From(r).Title);
        Assert.Equal("circle:d=20", SectionTwist.Cli.SectionPlotHook.Title("circle:d=20", null));
        string dxf = Path.Combine(RepoPaths.SampleProfiles, "winch-drum-tube.dxf");
        Assert.Equal("winch-drum-tube.dxf, part 2", SectionTwist.Cli.SectionPlotHook.Title(dxf, 2));
    }

    [Property(MaxTest = 300)]
    public bool Sloped_torque_label_never_touches_its_line(NormalFloat y0, NormalFloat y1, PositiveInt width, PositiveInt text)
    {
        // a segment 20..400 px wide from (100, a) to (100 + w, b) over a zero line at 200 px
        float w = 20 + width.Get % 380;
        float a = 200 + (float)(y0.Get % 150), b = 200 + (float)(y1.Get % 150);
        if (Math.Abs(a - b) < 1) return true; // horizontal lines take the other placement
        var p = new SKPoint(100, a);
        var q = new SKPoint(100 + w, b);
        var box = ShaftDiagram.SlopedLabelBox(p, q, 200, 10 + text.Get % 60, 11);
        // the line does not enter the box: sample it densely
        for (int i = 0; i <= 400; i++)
        {
            float t = i / 400f;
            if (box.Contains(p.X + t * (q.X - p.X), p.Y + t * (q.Y - p.Y))) return false;
        }
        return true;
    }

    [Theory]
    [InlineData(450f, false)]  // -3874 lbf*in just above the bottom of a -4000..0 panel: was clamped onto the line
    [InlineData(310f, true)]   // a positive torque just under the top
    [InlineData(380f, false)]
    public void Flat_torque_label_stays_off_its_line(float y, bool positive)
    {
        var panel = new SKRect(90, 296, 960, 460);
        float baseline = ShaftDiagram.FlatLabelY(y, positive, panel);
        // the text box of an 11 px label spans baseline - 9 .. baseline + 3; the 2 px line must lie outside it
        Assert.True(y + 1 < baseline - 9 || y - 1 > baseline + 3, $"label at {baseline} on the line at {y}");
        Assert.InRange(baseline, panel.Top + 9, panel.Bottom - 1);
    }

    [Fact]
    public void Rotation_label_at_the_top_of_its_panel_goes_below_the_point_clear_of_the_title()
    {
        var panel = new SKRect(90, 500, 960, 660);
        Assert.Equal(515f, ShaftDiagram.RotationLabelY(500, panel));   // the "0°" at the top edge: below the point
        Assert.Equal(573f, ShaftDiagram.RotationLabelY(580, panel));   // elsewhere: above it
    }

    [Fact]
    public void Text_is_hinted_so_thin_bars_stay_one_pixel()
    {
        using var f = Fonts.Font(13);
        Assert.Equal(SKFontHinting.Slight, f.Hinting);
    }

    [Fact]
    public void Method_paragraph_reads_as_sentences()
    {
        string shaft = ReportText.DefaultMethod[^1];
        Assert.DoesNotContain("section follow", shaft, StringComparison.Ordinal);
        Assert.Contains("From the rotations follow the internal torque", shaft, StringComparison.Ordinal);
        Assert.EndsWith(".", shaft, StringComparison.Ordinal);
    }
}
