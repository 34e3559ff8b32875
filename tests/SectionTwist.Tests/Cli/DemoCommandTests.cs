using System.Globalization;
using System.Text.RegularExpressions;
using System.Xml.Linq;
using SectionTwist.Cli;
using SectionTwist.Tests.Rendering;
using SkiaSharp;

namespace SectionTwist.Tests.Cli;

/// <summary>Runs <c>sectiontwist demo --out TMP</c> once for the tests of this class and removes the folder afterwards.</summary>
public sealed class DemoRun : IDisposable
{
    public DemoRun()
    {
        Folder = Path.Combine(Path.GetTempPath(), "st-demo-" + Guid.NewGuid().ToString("N"));
        (Code, Out, Err) = CliRun.Run("demo", "--out", Folder);
    }

    public string Folder { get; }
    public int Code { get; }
    public string Out { get; }
    public string Err { get; }

    public void Dispose()
    {
        try { Directory.Delete(Folder, true); } catch (IOException) { } catch (UnauthorizedAccessException) { }
    }
}

/// <summary>Runs the command line in-process against string writers.</summary>
internal static class CliRun
{
    public static (int Code, string Out, string Err) Run(params string[] argv) => CliRunner.Run(argv);
}

/// <summary>The demo command: exit code, files, summary lines, and the report in a browser.</summary>
public class DemoCommandTests(DemoRun demo) : IClassFixture<DemoRun>
{
    [Fact]
    public void Demo_exits_0_and_writes_the_report_and_pictures()
    {
        Assert.True(demo.Code == 0, demo.Err);
        string[] expected = ["report.html", "shaft.png", "shaft.svg", "section-input-keyed.png", "section-spline-output.png", "modes.html"];
        Assert.Equal(expected.Order(), Directory.GetFiles(demo.Folder).Select(Path.GetFileName).Order());
        using (var shaft = SKBitmap.Decode(Path.Combine(demo.Folder, "shaft.png"))) Assert.Equal((1000, 900), (shaft.Width, shaft.Height));
        foreach (string s in expected.Where(f => f.StartsWith("section-", StringComparison.Ordinal)))
        {
            using var bmp = SKBitmap.Decode(Path.Combine(demo.Folder, s));
            Assert.Equal((760, 560), (bmp.Width, bmp.Height));
        }
        Assert.Equal("svg", XDocument.Load(Path.Combine(demo.Folder, "shaft.svg")).Root!.Name.LocalName);
        Assert.Contains($"report: {Path.Combine(demo.Folder, "report.html")}", demo.Out, StringComparison.Ordinal);
        Assert.Contains("Governing segment (shear): input (A – B)", demo.Out, StringComparison.Ordinal);
        Assert.Contains("Total twist", demo.Out, StringComparison.Ordinal);
        Assert.Contains("Verification: all", demo.Out, StringComparison.Ordinal);
    }

    [Fact]
    public void Demo_numbers_match_hand_checks()
    {
        // 5.5 kW at 120 rpm: T = P / omega = 437.68 N*m through every section up to the spline (statics of a free shaft).
        // Hollow middle 60/40 mm: tau = 16 T D / (pi (D^4 - d^4)) = 12.86 MPa (Timoshenko and Goodier, ch. 10).
        string html = File.ReadAllText(Path.Combine(demo.Folder, "report.html"));
        double t = 5500 / (120 * 2 * Math.PI / 60);
        double tau = 16 * t * 0.060 / (Math.PI * (Math.Pow(0.060, 4) - Math.Pow(0.040, 4)));
        Assert.Contains($">{(tau / 1e6).ToString("G4", CultureInfo.InvariantCulture)}<", html, StringComparison.Ordinal);
        Assert.Contains($">-{t.ToString("G5", CultureInfo.InvariantCulture)}<", html, StringComparison.Ordinal);
        // The keyed journal governs: its printed peak (4 digits) is T times the peak shear per unit torque of its section,
        // keyed:d=45,r=0.5, solved independently here at 1e-5, within the two analyses' stated estimates and the rounding.
        var (atDefault, fine) = SectionTwist.Tests.Shaft.DemoSectionReferences.For(SectionTwist.Tests.Shaft.DemoSectionReferences.Keyed);
        Tol.Rel(t * fine.MaxShearPerTorque / 1e6, PrintedPeakMpa(),
            atDefault.EstimatedRelativeError.MaxShear + fine.EstimatedRelativeError.MaxShear + 5e-4, "keyed:d=45,r=0.5 solved at 1e-5");
    }

    [Fact]
    public void Demo_report_holds_the_dynamics_overload_and_motor_shaft_chapters()
    {
        Assert.True(demo.Code == 0, demo.Err);
        string html = File.ReadAllText(Path.Combine(demo.Folder, "report.html"));
        foreach (string heading in new[] { "Further shafts beyond the gear stages", "Overload: plastic capacity", "Dynamics: Natural frequencies and mode shapes", "Dynamics: Interference check", "Dynamics: Forced response" })
            Assert.Contains($">{heading}<", html, StringComparison.Ordinal);
        Assert.Contains("Interference diagram", html, StringComparison.Ordinal);
        Assert.Contains("Strain-energy share", html, StringComparison.Ordinal);
        Assert.Contains("no strain hardening", html, StringComparison.Ordinal);
        // the gear stage passes 437.68 N*m x 13 / 157 = 36.24 N*m to the motor shaft (power balance of a lossless stage, common practice)
        double t = 5500 / (120 * 2 * Math.PI / 60) * 13 / 157;
        Assert.Contains($">{t.ToString("G4", CultureInfo.InvariantCulture)}<", html, StringComparison.Ordinal);
        // hollow middle 60/40 mm of steel-1045-cd: T_p = 2 pi tau_y (ro^3 - ri^3) / 3 with tau_y = 0.577 S_y (Nadai sand heap; Shigley ch. 5)
        var steel = SectionTwist.Shaft.ShaftMaterials.All["steel-1045-cd"];
        double tp = 2 * Math.PI * 0.577 * steel.YieldStrength!.Value * (Math.Pow(0.030, 3) - Math.Pow(0.020, 3)) / 3;
        Assert.Contains($">{SectionTwist.Units.NumberText.Format(tp, 4)}<", html, StringComparison.Ordinal);
    }

    [SkippableFact]
    public void Demo_report_opens_in_headless_chromium_with_the_key_figures()
    {
        Assert.True(demo.Code == 0, demo.Err);
        string? chromium = Chromium.Find();
        Skip.If(chromium is null, "chromium is not installed here (.ci/run installs the Debian package)");
        var (dom, console) = Chromium.DumpDom(chromium!, Path.Combine(demo.Folder, "report.html"), demo.Folder);
        Assert.True(console.Count == 0, string.Join('\n', console));
        string text = Regex.Replace(dom, "<[^>]+>", " ");
        string peak = PrintedPeakMpa().ToString("G4", CultureInfo.InvariantCulture) + " MPa";
        Assert.Contains(peak, text, StringComparison.Ordinal);
        Assert.Contains("Shaft report: winch drive shaft (demo)", text, StringComparison.Ordinal);
        Assert.Contains("verification cases passed on this build", text, StringComparison.Ordinal);
        Assert.Contains("licensed engineering practice", text, StringComparison.Ordinal);
        Assert.Contains("Section 'input-keyed'", text, StringComparison.Ordinal);
        // the diagram and one contour picture per analysed section, all embedded
        var imgs = Regex.Matches(dom, "<img [^>]*src=\"([^\"]{0,30})").Select(m => m.Groups[1].Value).ToList();
        Assert.Equal(5, imgs.Count);   // shaft diagram, two section pictures, the dynamics chapter's mode shapes and interference diagram
        Assert.All(imgs, s => Assert.StartsWith("data:image/png;base64,", s, StringComparison.Ordinal));
    }

    /// <summary>The governing segment's peak shear as the command printed it, MPa.</summary>
    private double PrintedPeakMpa()
    {
        var m = Regex.Match(demo.Out, @"Governing segment \(shear\): [^\n]*?peak shear ([0-9.]+) MPa");
        Assert.True(m.Success, demo.Out);
        return double.Parse(m.Groups[1].Value, CultureInfo.InvariantCulture);
    }
}
