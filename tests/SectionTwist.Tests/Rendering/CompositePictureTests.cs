using SectionTwist.Composite;
using SectionTwist.Rendering.Drawing;
using SectionTwist.Rendering.Section;
using SectionTwist.Tests.Composite;
using SectionTwist.Torsion;
using SkiaSharp;

namespace SectionTwist.Tests.Rendering;

/// <summary>The composite section picture: a colour per material, the legend names them, interfaces and peaks drawn.</summary>
public class CompositePictureTests
{
    private static CompositeResult Bimetal() => CompositeAnalyzer.Analyze(
        CompositeShapes.Layers(0.04, (0.003, CompositeExactTests.Steel), (0.002, CompositeExactTests.Brass)), CompositeExactTests.Steel,
        new AnalysisOptions { Accuracy = 1e-3 });

    [Fact]
    public void Each_material_is_drawn_in_its_own_hue()
    {
        var r = Bimetal();
        var o = new SectionPlotOptions();
        var png = CompositePicture.Render(r, ImageFormat.Png, "bimetal", o);
        Dump.Write("composite-bimetal.png", png);
        using var bmp = SKBitmap.Decode(png)!;
        var L = CompositePicture.Layout(r.Section.Envelope.Bounds, o.Width, o.Height);
        // near the short edge, away from the interface and the peak labels: the lower layer (steel) blue, the upper (brass) orange
        var steel = bmp.GetPixel((int)L.ToPixel(0.004, 0.0008).X, (int)L.ToPixel(0.004, 0.0008).Y);
        var brass = bmp.GetPixel((int)L.ToPixel(0.004, 0.0042).X, (int)L.ToPixel(0.004, 0.0042).Y);
        Assert.True(steel.Blue > steel.Red + 30, $"steel drawn as {steel}");
        Assert.True(brass.Red > brass.Blue + 30, $"brass drawn as {brass}");
    }

    [Fact]
    public void Svg_names_the_materials_and_keeps_the_caution()
    {
        var r = Bimetal();
        string svg = System.Text.Encoding.UTF8.GetString(CompositePicture.Render(r, ImageFormat.Svg, "bimetal"));
        var doc = System.Xml.Linq.XDocument.Parse(svg);
        System.Xml.Linq.XNamespace ns = "http://www.w3.org/2000/svg";
        string text = string.Concat(doc.Descendants(ns + "text").Select(t => t.Value));
        Assert.Contains("steel", text, StringComparison.Ordinal);
        Assert.Contains("brass", text, StringComparison.Ordinal);
        Assert.Contains("bonded interface", text, StringComparison.Ordinal);
        Assert.Contains("peak in brass", text, StringComparison.Ordinal);
        Assert.Contains("Perfect bonding assumed", text, StringComparison.Ordinal);
    }
}
