using System.Xml;
using System.Xml.Linq;
using SectionTwist.Geometry;
using SectionTwist.Rendering.Drawing;
using SectionTwist.Rendering.Report;
using SectionTwist.Rendering.Section;
using SectionTwist.Rendering.Shaft;
using SectionTwist.Units;

namespace SectionTwist.Tests.Rendering;

public class HtmlReportTests
{
    internal static ReportModel Sample()
    {
        var (field, j, peak) = RectangleField.Build(0.030, 0.015, 24, 12);
        var section = new SectionPlotData(field, new Point2(0, -0.015), peak, LengthUnit.Millimetre, "rectangle 60 x 30");
        return new ReportModel
        {
            Title = "Report test shaft",
            Subtitle = "input: test-shaft.yaml",
            Generator = "sectiontwist test",
            KeyFigures =
            [
                new("torsion constant J", $"{NiceScale.Sig(j * 1e12, 5)} mm⁴"),
                new("largest shear", "55.3 MPa (CD)", Alert: true),
            ],
            Inputs = [new ReportTable("Material", ["name", "G, GPa"], [["steel 42CrMo4 <QT>", "80.8"]])],
            Chapters =
            [
                new ReportChapter("Section: rectangle")
                {
                    Paragraphs = ["Rectangle 60 mm x 30 mm."],
                    Figures = [new ReportFigure("shear stress per unit torque", ImageFormat.Png,
                        SectionPicture.Render(section, ImageFormat.Png, new SectionPlotOptions { Width = 480, Height = 320 }), "rectangle.png")],
                },
                new ReportChapter("Shaft")
                {
                    Tables = [new ReportTable("Segments", ["segment", "T, N·m", "τ, MPa", "allowable, MPa"],
                        [["AB", "-400", "31.8", "60"], ["CD", "-150", "55.3", "40"]]) { AlertRows = [1] }],
                    Figures = [new ReportFigure("torque, rotation and shear along the shaft", ImageFormat.Svg,
                        ShaftDiagram.Render(ShaftDiagramTests.Sample(), ImageFormat.Svg, 700, 640))],
                },
            ],
            Verification =
            [
                new("square torsion constant", 0.140577, 0.1406, "a^4", -1.6e-4, 1e-3, "Timoshenko & Goodier 1970, s. 109", true),
                new("made-up failing case", 2.0, 1.0, "-", 1.0, 1e-3, "test", false),
            ],
            Warnings = ["sharp re-entrant corner at keyseat (x = 5 mm): the peak there is singular; add a fillet radius"],
        };
    }

    private static XDocument ParseXhtml(string html)
    {
        using var reader = XmlReader.Create(new StringReader(html), new XmlReaderSettings { DtdProcessing = DtdProcessing.Ignore });
        return XDocument.Load(reader);
    }

    [Fact]
    public void Report_is_well_formed_self_contained_and_has_the_key_figures()
    {
        var model = Sample();
        string html = HtmlReportWriter.Render(model);
        Dump.Write("report.html", System.Text.Encoding.UTF8.GetBytes(html));
        var doc = ParseXhtml(html);
        Assert.DoesNotContain("http:", html, StringComparison.OrdinalIgnoreCase);
        Assert.DoesNotContain("https:", html, StringComparison.OrdinalIgnoreCase);
        Assert.DoesNotContain("<script", html, StringComparison.OrdinalIgnoreCase);
        Assert.DoesNotContain("<link", html, StringComparison.OrdinalIgnoreCase);
        var imgs = doc.Descendants("img").ToList();
        Assert.Equal(2, imgs.Count);
        Assert.All(imgs, i => Assert.StartsWith("data:image/", (string?)i.Attribute("src"), StringComparison.Ordinal));
        string text = doc.Root!.Value;
        Assert.Contains(model.KeyFigures[0].Value, text, StringComparison.Ordinal);
        Assert.Contains("steel 42CrMo4 <QT>", text, StringComparison.Ordinal); // escaped in the file, intact in the text
        Assert.Contains("1 of 2 verification cases FAILED", text, StringComparison.Ordinal);
        Assert.Contains("sharp re-entrant corner", text, StringComparison.Ordinal);
        Assert.Contains("licensed engineering practice", text, StringComparison.Ordinal);
        Assert.Contains("Timoshenko & Goodier 1970", text, StringComparison.Ordinal);
    }

    [Fact]
    public void Embedded_pictures_decode()
    {
        string html = HtmlReportWriter.Render(Sample());
        var doc = ParseXhtml(html);
        foreach (var img in doc.Descendants("img"))
        {
            string src = (string)img.Attribute("src")!;
            byte[] bytes = Convert.FromBase64String(src[(src.IndexOf(',', StringComparison.Ordinal) + 1)..]);
            if (src.StartsWith("data:image/png", StringComparison.Ordinal))
            {
                using var bmp = SkiaSharp.SKBitmap.Decode(bytes);
                Assert.Equal((480, 320), (bmp.Width, bmp.Height));
            }
            else Assert.Equal("svg", XDocument.Parse(System.Text.Encoding.UTF8.GetString(bytes)).Root!.Name.LocalName);
        }
    }

    [SkippableFact]
    public void Report_opens_in_headless_chromium_without_console_errors()
    {
        string? chromium = Chromium.Find();
        Skip.If(chromium is null, "chromium is not installed here (.ci/run installs the Debian package)");
        string dir = Path.Combine(Path.GetTempPath(), "st-report-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(dir);
        try
        {
            var model = Sample();
            string path = Path.Combine(dir, "report.html");
            HtmlReportWriter.Save(model, path);
            var (dom, consoleErrors) = Chromium.DumpDom(chromium!, path, dir);
            Assert.Contains(model.KeyFigures[0].Value, dom, StringComparison.Ordinal);
            Assert.Contains("1 of 2 verification cases FAILED", dom, StringComparison.Ordinal);
            Assert.Contains("licensed engineering practice", dom, StringComparison.Ordinal);
            // the report has no script, so any console message is a fault
            Assert.True(consoleErrors.Count == 0, string.Join('\n', consoleErrors));
        }
        finally
        {
            try { Directory.Delete(dir, true); } catch (IOException) { } catch (UnauthorizedAccessException) { }
        }
    }
}
