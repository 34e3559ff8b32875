using System.Xml.Linq;
using SectionTwist.Geometry;
using SectionTwist.Rendering.Drawing;
using SectionTwist.Rendering.Section;
using SectionTwist.Units;
using SkiaSharp;

namespace SectionTwist.Tests.Rendering;

public class SectionPictureTests
{
    // 60 mm x 30 mm rectangle; peak shear at the middle of a long side (exact series, see RectangleField).
    private const double HalfLong = 0.030, HalfShort = 0.015;

    private static (SectionPlotData Data, double Peak) Rectangle(Point2? peakAt = null)
    {
        var (field, _, peak) = RectangleField.Build(HalfLong, HalfShort, 96, 48);
        var data = new SectionPlotData(field, peakAt ?? new Point2(0, -HalfShort), peak, LengthUnit.Millimetre, "rectangle 60 x 30 mm");
        return (data, peak);
    }

    private static SKBitmap Decode(byte[] png, string name = "section")
    {
        Dump.Write(name + ".png", png);
        return SKBitmap.Decode(png) ?? throw new InvalidOperationException("PNG did not decode");
    }

    private static double ColourDistance(SKColor a, SKColor b) =>
        Math.Sqrt(Math.Pow(a.Red - b.Red, 2) + Math.Pow(a.Green - b.Green, 2) + Math.Pow(a.Blue - b.Blue, 2));

    [Fact]
    public void Png_has_the_requested_size()
    {
        var (data, _) = Rectangle();
        using var bmp = Decode(SectionPicture.Render(data, ImageFormat.Png, new SectionPlotOptions { Width = 731, Height = 457 }));
        Assert.Equal(731, bmp.Width);
        Assert.Equal(457, bmp.Height);
    }

    [Fact]
    public void Long_side_middle_has_the_top_colour_and_corners_the_bottom_colour()
    {
        var (data, _) = Rectangle();
        // the zero-stress corner's lowest band is a few tenths of a mm wide: a large picture and 8 bands resolve it
        var o = new SectionPlotOptions { Width = 1400, Height = 860, Bands = 8 };
        using var bmp = Decode(SectionPicture.Render(data, ImageFormat.Png, o), "rectangle");
        var L = SectionPicture.Layout(data, o);
        var top = SectionPicture.BandColour(o.Bands - 1, o.Bands);
        var bottom = SectionPicture.BandColour(0, o.Bands);
        // the colour bar itself shows these colours at its ends
        Assert.True(ColourDistance(bmp.GetPixel((int)L.ColourBar.MidX, (int)L.ColourBar.Top + 3), top) < 6);
        Assert.True(ColourDistance(bmp.GetPixel((int)L.ColourBar.MidX, (int)L.ColourBar.Bottom - 3), bottom) < 6);
        // middle of the upper long side (the marker is on the lower one), 3 px inside
        var m = L.ToPixel(0, HalfShort);
        Assert.True(ColourDistance(bmp.GetPixel((int)m.X, (int)m.Y + 3), top) < 10, $"got {bmp.GetPixel((int)m.X, (int)m.Y + 3)}, want {top}");
        // the four corners, 2 px inside along the diagonal (the exact stress there is about 5 % of the peak)
        foreach (var (cx, cy) in new[] { (-1, -1), (1, -1), (1, 1), (-1, 1) })
        {
            var p = L.ToPixel(cx * HalfLong, cy * HalfShort);
            var got = bmp.GetPixel((int)Math.Floor(p.X - cx * 2.0), (int)Math.Floor(p.Y + cy * 2.0));
            Assert.True(ColourDistance(got, bottom) < 10, $"corner ({cx},{cy}) {p}: got {got}, want {bottom}");
        }
    }

    [Fact]
    public void Peak_marker_is_drawn_where_the_result_puts_the_peak()
    {
        // two renders with the peak on opposite long sides: the arrow follows the given location and stops beside the hot
        // spot, which stays visible (issue 11: the marker used to cover it)
        foreach (double side in new[] { -1.0, 1.0 })
        {
            var (data, _) = Rectangle(new Point2(0, side * HalfShort));
            var o = new SectionPlotOptions { Width = 800, Height = 520 };
            using var bmp = Decode(SectionPicture.Render(data, ImageFormat.Png, o));
            var L = SectionPicture.Layout(data, o);
            var at = L.ToPixel(0, side * HalfShort);
            var other = L.ToPixel(0, -side * HalfShort);
            Assert.True(ColourDistance(bmp.GetPixel((int)Math.Round(at.X), (int)Math.Round(at.Y)), Ink.Alert) > 100, "the hot spot is covered");
            Assert.True(AlertWithin(bmp, at, 20), "no arrow tip within 20 px of the peak");
            Assert.False(AlertWithin(bmp, other, 12), "a marker at the other side");
        }
    }

    private static bool AlertWithin(SKBitmap bmp, SKPoint p, int radius)
    {
        for (int dx = -radius; dx <= radius; dx++)
            for (int dy = -radius; dy <= radius; dy++)
            {
                int x = (int)Math.Round(p.X) + dx, y = (int)Math.Round(p.Y) + dy;
                if (dx * dx + dy * dy <= radius * radius && x >= 0 && y >= 0 && x < bmp.Width && y < bmp.Height && ColourDistance(bmp.GetPixel(x, y), Ink.Alert) < 40)
                    return true;
            }
        return false;
    }

    [Fact]
    public void Svg_is_well_formed_and_has_the_expected_elements()
    {
        var (data, peak) = Rectangle();
        var o = new SectionPlotOptions { Width = 640, Height = 420, Torque = 250, ShowMesh = true };
        string svg = System.Text.Encoding.UTF8.GetString(SectionPicture.Render(data, ImageFormat.Svg, o));
        Dump.Write("rectangle.svg", System.Text.Encoding.UTF8.GetBytes(svg));
        var doc = XDocument.Parse(svg);
        XNamespace ns = "http://www.w3.org/2000/svg";
        Assert.Equal(ns + "svg", doc.Root!.Name);
        Assert.Equal("640", (string?)doc.Root.Attribute("width"));
        Assert.Equal("420", (string?)doc.Root.Attribute("height"));
        Assert.True(doc.Descendants(ns + "path").Count() >= o.Bands, "one filled path per colour band at least");
        string text = string.Concat(doc.Descendants(ns + "text").Select(t => t.Value));
        // peak for T = 250 N*m in MPa, printed with 4 significant digits
        Assert.Contains(NiceScale.Sig(peak * 250 * 1e-6, 4), text, StringComparison.Ordinal);
        Assert.Contains("x, mm", text, StringComparison.Ordinal);
    }

    [Fact]
    public void Band_clipping_conserves_area()
    {
        // a band partition of a triangle covers it exactly: the areas of all bands add up to the triangle's
        double[] x = [0, 4, 1], y = [0, 0, 3], v = [0, 10, 4];
        Span<double> px = stackalloc double[6], py = stackalloc double[6];
        double total = 0;
        for (int k = 0; k < 5; k++)
        {
            int n = ContourGeometry.ClipBand(x, y, v, k == 0 ? double.NegativeInfinity : 2 * k, k == 4 ? double.PositiveInfinity : 2 * (k + 1), px, py);
            double a = 0;
            for (int i = 0; i < n; i++) { int j = (i + 1) % n; a += px[i] * py[j] - px[j] * py[i]; }
            total += 0.5 * a;
        }
        Assert.Equal(6.0, total, 12);
    }
}
