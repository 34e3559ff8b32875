using System.Xml.Linq;
using SectionTwist.Rendering.Drawing;
using SectionTwist.Rendering.Shaft;
using SkiaSharp;

namespace SectionTwist.Tests.Rendering;

public class ShaftDiagramTests
{
    // Applied torques A +400, B -550, C +300, D -150 N*m (they balance). By the positive-internal-torque convention
    // (vector out of the cut face of the part nearer A), the internal torque is minus the sum of the applied torques
    // to the left of the cut: AB -400, BC +150, CD -150 N*m (statics; common practice, no source needed).
    internal static ShaftDiagramData Sample()
    {
        static DiagramSegment Seg(string label, double from, double to, double d, double t, double k, double? allow, double inner = 0) =>
            new() { Label = label, From = from, To = to, OuterStart = d, OuterEnd = d, Inner = inner, TorqueStart = t, TorqueEnd = t,
                    ShearStart = k * Math.Abs(t), ShearEnd = k * Math.Abs(t), Allowable = allow };
        return new ShaftDiagramData
        {
            Title = "test shaft",
            Stations =
            [
                new("A", 0.00, 0.0, 400, SupportKind.Bearing),
                new("B", 0.15, -0.21, -550),
                new("C", 0.45, -0.05, 300),
                new("D", 0.60, -0.16, -150, SupportKind.Bearing),
            ],
            Segments =
            [
                Seg("AB", 0.00, 0.15, 0.040, -400, 16 / (Math.PI * Math.Pow(0.040, 3)), 60e6),
                Seg("BC", 0.15, 0.45, 0.050, 150, 16 / (Math.PI * (Math.Pow(0.050, 4) - Math.Pow(0.030, 4)) / 0.050), 60e6, 0.030),
                Seg("CD", 0.45, 0.60, 0.024, -150, 16 / (Math.PI * Math.Pow(0.024, 3)), 40e6),
            ],
        };
    }

    [Fact]
    public void Torque_series_steps_at_the_stations_with_the_right_signs()
    {
        var pts = ShaftSeries.Torque(Sample());
        // a vertical step at B from -400 to +150 and at C from +150 to -150
        int b = Enumerable.Range(0, pts.Count - 1).Single(i => pts[i].X == 0.15 && pts[i + 1].X == 0.15);
        Assert.Equal(-400, pts[b].Y);
        Assert.Equal(150, pts[b + 1].Y);
        int c = Enumerable.Range(0, pts.Count - 1).Single(i => pts[i].X == 0.45 && pts[i + 1].X == 0.45);
        Assert.Equal(150, pts[c].Y);
        Assert.Equal(-150, pts[c + 1].Y);
        // the line starts and ends on the zero line at the shaft ends
        Assert.Equal((0.0, 0.0), (pts[0].X, pts[0].Y));
        Assert.Equal((0.60, 0.0), (pts[^1].X, pts[^1].Y));
    }

    [Fact]
    public void Torque_plot_pixels_are_filled_on_the_side_of_the_sign()
    {
        var d = Sample();
        const int w = 900, h = 820;
        var png = ShaftDiagram.Render(d, ImageFormat.Png, w, h);
        Dump.Write("shaft.png", png);
        using var bmp = SKBitmap.Decode(png);
        Assert.Equal((w, h), (bmp.Width, bmp.Height));
        var L = ShaftDiagram.Layout(d, w, h);
        var (tp, _, _) = ShaftDiagram.Panels(d, L);
        float zero = tp.ToPixelY(0);
        foreach (var (mid, sign) in new[] { (0.075, -1), (0.30, +1), (0.50, -1) })
        {
            int x = (int)L.ToPixelX(mid);
            var filled = bmp.GetPixel(x, (int)(zero - sign * 8));
            var empty = bmp.GetPixel(x, (int)(zero + sign * 8));
            Assert.True(filled.Blue > filled.Red + 15 && filled.Red < 225, $"x={mid}: expected the torque fill on the {(sign > 0 ? "upper" : "lower")} side, got {filled}");
            Assert.True(empty.Red > 230 && empty.Green > 230, $"x={mid}: expected background on the other side, got {empty}");
        }
    }

    [Fact]
    public void Exceeding_segment_is_shaded_red_in_the_shear_plot()
    {
        var d = Sample();
        Assert.True(d.Segments[2].Exceeds);
        Assert.False(d.Segments[0].Exceeds);
        const int w = 900, h = 820;
        using var bmp = SKBitmap.Decode(ShaftDiagram.Render(d, ImageFormat.Png, w, h));
        var L = ShaftDiagram.Layout(d, w, h);
        var (_, _, sp) = ShaftDiagram.Panels(d, L);
        var over = bmp.GetPixel((int)L.ToPixelX(0.52), (int)sp.ToPixelY(5));
        var fine = bmp.GetPixel((int)L.ToPixelX(0.07), (int)sp.ToPixelY(5));
        Assert.True(over.Red > over.Green + 60, $"CD should be shaded red, got {over}");
        Assert.True(fine.Green > fine.Red, $"AB should be shaded teal, got {fine}");
    }

    [Fact]
    public void Svg_is_well_formed_with_station_names_and_values()
    {
        string svg = System.Text.Encoding.UTF8.GetString(ShaftDiagram.Render(Sample(), ImageFormat.Svg, 800, 760));
        var doc = XDocument.Parse(svg);
        XNamespace ns = "http://www.w3.org/2000/svg";
        var texts = doc.Descendants(ns + "text").Select(t => t.Value.Trim()).ToList();
        foreach (string s in new[] { "A", "B", "C", "D", "+400 N·m", "-550 N·m", "over allowable" })
            Assert.Contains(s, texts);
    }
}
