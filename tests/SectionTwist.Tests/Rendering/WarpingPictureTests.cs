using SectionTwist.Profiles;
using SectionTwist.Rendering.Drawing;
using SectionTwist.Rendering.Section;
using SectionTwist.Rendering.Warping;
using SectionTwist.Tests.Cli;
using SectionTwist.Torsion;
using SkiaSharp;

namespace SectionTwist.Tests.Rendering;

/// <summary>
/// The picture of the normalized warping function (section --warping-plot): the sign pattern it shows against the
/// thin-walled sectorial coordinate (Vlasov, Thin-Walled Elastic Beams, ch. 1: for an I-section omega = x y about the
/// shear centre, zero along the web and the flange centres, antisymmetric about both axes; for a channel zero at the
/// web's mid-depth), the marks and the legend.
/// </summary>
public class WarpingPictureTests
{
    private static readonly AnalysisOptions Options = new() { Accuracy = 1e-3, Warping = true };

    private static SectionResult Solve(string spec) => SectionAnalyzer.Analyze(ProfileTemplates.Create(spec), Options);

    private static (SKBitmap Bitmap, SectionLayout Layout) Draw(SectionResult r, string name)
    {
        byte[] png = WarpingPicture.Render(r, ImageFormat.Png, name);
        Dump.Write(name + "-warping.png", png);
        var bmp = SKBitmap.Decode(png) ?? throw new InvalidOperationException("PNG did not decode");
        return (bmp, SectionLayout.Create(SectionPlotData.From(r), WarpingPicture.Width, WarpingPicture.Height));
    }

    private static SKColor At(SKBitmap b, SectionLayout l, double xMm, double yMm)
    {
        var p = l.ToPixel(xMm / 1000, yMm / 1000);
        return b.GetPixel((int)Math.Round(p.X), (int)Math.Round(p.Y));
    }

    private static int Sign(SKColor c) => c.Red - c.Blue > 60 ? 1 : c.Blue - c.Red > 60 ? -1 : 0;

    [Fact]
    public void I_section_warping_is_antisymmetric_about_the_web_and_the_flange_mid_plane()
    {
        var r = Solve("ipe:200");
        var (bmp, l) = Draw(r, "ipe200");
        using (bmp)
        {
            // the flange tips (x = +-45 mm, y = +-95.75 mm, the flanges' mid-thickness) carry |omega| near its largest value
            int topRight = Sign(At(bmp, l, 45, 95.75)), topLeft = Sign(At(bmp, l, -45, 95.75));
            int bottomRight = Sign(At(bmp, l, 45, -95.75)), bottomLeft = Sign(At(bmp, l, -45, -95.75));
            Assert.NotEqual(0, topRight);
            Assert.Equal(-topRight, topLeft);
            Assert.Equal(-topRight, bottomRight);
            Assert.Equal(topRight, bottomLeft);
            // the web (omega = 0 along its mid-line, Vlasov) is near-white, and the same colour mirrored about the web
            Assert.Equal(0, Sign(At(bmp, l, 0, 50)));
            Assert.Equal(At(bmp, l, 30, 95.75), Mirror(At(bmp, l, -30, 95.75)));
        }
    }

    // the band of -omega is the mirror of the band of omega: colour k of 2n <-> colour 2n - 1 - k
    private static SKColor Mirror(SKColor c)
    {
        for (int n = 1; n <= 24; n++)
            for (int k = 0; k < 2 * n; k++)
                if (WarpingPicture.BandColour(k, n) == c) return WarpingPicture.BandColour(2 * n - 1 - k, n);
        return c;
    }

    [Fact]
    public void Channel_shows_the_shear_centre_behind_the_web_and_zero_warping_at_mid_depth()
    {
        var r = Solve("upe:200");
        Assert.True(r.Warping!.ShearCentre.X < 0, "UPE shear centre lies behind the web (x < 0)");
        var (bmp, l) = Draw(r, "upe200");
        using (bmp)
        {
            Assert.Equal(0, Sign(At(bmp, l, 3, 0)));                      // web at mid-depth: omega = 0
            Assert.Equal(-Sign(At(bmp, l, 75, 94.5)), Sign(At(bmp, l, 75, -94.5))); // flange tips: opposite signs
            Assert.NotEqual(0, Sign(At(bmp, l, 75, 94.5)));
            var sc = l.ToPixel(r.Warping.ShearCentre);
            Assert.True(bmp.GetPixel((int)sc.X, (int)sc.Y).Red < 60, "the shear centre is marked (black square)");
        }
    }

    [Fact]
    public void The_legend_names_omega_in_length_squared_and_a_section_without_warping_is_refused()
    {
        string svg = System.Text.Encoding.UTF8.GetString(WarpingPicture.Render(Solve("channel:h=100,b=50,tw=6,tf=8"), ImageFormat.Svg, "channel test"));
        Assert.Contains("ω, mm²", svg, StringComparison.Ordinal);
        Assert.Contains("channel test", svg, StringComparison.Ordinal);
        Assert.Contains("shear centre", svg, StringComparison.Ordinal);
        var plain = SectionAnalyzer.Analyze(ProfileTemplates.Create("rect:b=20,h=10"), new AnalysisOptions { Accuracy = 1e-3 });
        var ex = Assert.Throws<SectionTwistException>(() => WarpingPicture.Render(plain, ImageFormat.Png, "x"));
        Assert.Contains("--warping", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Cli_writes_the_picture_with_warping_and_refuses_it_without()
    {
        string png = Path.Combine(CliRunner.TempDir(), "omega.png");
        var (exit, output, err) = CliRunner.Run("section", "lun:100x50x8", "--accuracy", "1e-3", "--warping", "--warping-plot", png);
        Assert.True(exit == 0, err);
        Assert.Contains("warping constant Iw", output, StringComparison.Ordinal);
        var bytes = File.ReadAllBytes(png);
        Assert.True(bytes.Length > 1000 && bytes[1] == (byte)'P' && bytes[2] == (byte)'N' && bytes[3] == (byte)'G', "a PNG was written");
        Assert.Equal([png], Directory.GetFiles(Path.GetDirectoryName(png)!)); // no temporary left behind

        var (e2, _, err2) = CliRunner.Run("section", "ipe:200", "--warping-plot", png);
        Assert.Equal(2, e2);
        Assert.Contains("--warping-plot needs --warping", err2, StringComparison.Ordinal);
        var (e3, _, err3) = CliRunner.Run("section", "ipe:200", "--warping", "--warping-plot", Path.Combine(CliRunner.TempDir(), "omega.gif"));
        Assert.Equal(2, e3);
        Assert.Contains("name the file *.png or *.svg", err3, StringComparison.Ordinal);
        Assert.DoesNotContain("   at ", err3, StringComparison.Ordinal);
    }
}
