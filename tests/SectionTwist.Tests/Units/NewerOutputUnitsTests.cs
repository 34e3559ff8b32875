using System.Text.RegularExpressions;
using SectionTwist.Rendering.Adapters;
using SectionTwist.Rendering.Bending;
using SectionTwist.Rendering.Drawing;
using SectionTwist.Shaft;
using SectionTwist.Tests.Cli;
using SectionTwist.Units;

namespace SectionTwist.Tests.Units;

/// <summary>
/// Issue 11 item 8 for the newer outputs: bending, warping, modes and plastic text, CSV, report chapters and picture labels
/// go through the Units facility, so <c>--units US</c> shows US units everywhere and one spelling per quantity, and no
/// number is printed with a three-digit exponent or switches to exponents between 1e4 and 1e6 (the house number style,
/// DEVELOPERS.md). Conversion factors: NIST SP 811 (2008), appendix B (lbf = 4.4482216152605 N, lb = 0.45359237 kg,
/// in = 0.0254 m, exact or as defined there).
/// </summary>
public sealed class NewerOutputUnitsTests
{
    private static readonly string Conveyor = Path.Combine(RepoPaths.SampleProfiles, "conveyor-head-shaft.yaml");
    private static readonly string Beam = Path.Combine(RepoPaths.SampleProfiles, "conveyor-cross-beam.yaml");
    private static readonly string Winch = Path.Combine(RepoPaths.SampleProfiles, "winch-shaft.yaml");

    /// <summary>SI spellings that must not appear in US output (whole words, so "mm" in "summary" does not count).</summary>
    private static readonly Regex SiSpelling = new(@"(N·m|N\*m|\bMPa\b|\bGPa\b|\bkN\b|\[N\]|\bkg\b|kg·m²|\bmm\b|\bm/s\b|deg/m\b)", RegexOptions.Compiled);

    /// <summary>
    /// Lines that quote a published formula in its source's units (Shigley's Marin factors with S_ut in MPa and d in mm,
    /// the endurance cap of 700 MPa) are citations, not results; every other line is checked.
    /// </summary>
    private static IEnumerable<string> ResultLines(string text) =>
        text.Split('\n').Where(l => !l.Contains("Shigley", StringComparison.Ordinal) && !l.Contains("from memory", StringComparison.Ordinal));

    private static void AssertUsOnly(string text, string what)
    {
        foreach (var line in ResultLines(text))
            Assert.False(SiSpelling.IsMatch(line), $"{what}: an SI spelling in US output: {line.Trim()}");
        AssertHouseNumbers(text, what);
    }

    private static void AssertHouseNumbers(string text, string what)
    {
        Assert.DoesNotMatch(@"\dE[+-]\d{3}", text);                   // never E+006 / E-015
        var m = Regex.Match(text, @"\d\.?\d*E\+0[45]\b");              // 1.2E+04: G4 switching to exponents below 1e6
        Assert.False(m.Success, $"{what}: a number between 1e4 and 1e6 in exponent form: {m.Value}");
    }

    [Fact]
    public void Shaft_with_bending_in_US_units_prints_lbf_in_psi_and_lbf_everywhere()
    {
        var (code, output, err) = CliRunner.Run("shaft", Conveyor, "--units", "US");
        Assert.True(code == 0, err);
        Assert.Contains("max M [lbf·in]", output, StringComparison.Ordinal);
        Assert.Contains("Fy [lbf]", output, StringComparison.Ordinal);
        Assert.Contains("von Mises [psi]", output, StringComparison.Ordinal);
        AssertUsOnly(output, "shaft text");
    }

    [Fact]
    public void Bending_csv_follows_the_units_and_converts_exactly()
    {
        var doc = ShaftFile.Load(Conveyor, ShaftSections.CreateResolver());
        var r = ShaftSolver.Solve(doc.Model);
        string[] us = SectionTwist.Bending.BendingCsv.Samples(r.Bending!, UnitSystem.US).Split('\n');
        Assert.StartsWith("position_in,segment,shear_y_lbf,shear_z_lbf,moment_y_lbf_in,", us[0], StringComparison.Ordinal);
        Assert.Contains(",von_mises_psi,", us[0], StringComparison.Ordinal);
        string[] si = SectionTwist.Bending.BendingCsv.Samples(r.Bending!, UnitSystem.SiMetre).Split('\n');
        Assert.StartsWith("position_m,segment,shear_y_N,shear_z_N,moment_y_Nm,", si[0], StringComparison.Ordinal);
        // the same sample in both: moment in lbf*in = N*m / (4.4482216152605 * 0.0254) (NIST SP 811)
        var cu = us[^2].Split(','); var cs = si[^2].Split(',');
        double mUs = double.Parse(cu[6], System.Globalization.CultureInfo.InvariantCulture), mSi = double.Parse(cs[6], System.Globalization.CultureInfo.InvariantCulture);
        Tol.Rel(mSi / (4.4482216152605 * 0.0254), mUs, 1e-12, "lbf*in from N*m");
    }

    [Fact]
    public void Restrained_warping_in_US_units_prints_bimoments_in_lbf_in2()
    {
        var (code, output, err) = CliRunner.Run("shaft", Beam, "--units", "US");
        Assert.True(code == 0, err);
        Assert.Contains("bimoment reaction [lbf·in²]", output, StringComparison.Ordinal);
        Assert.Contains("rate of twist [deg/ft]", output, StringComparison.Ordinal);
        AssertUsOnly(output, "warping text");
    }

    [Fact]
    public void Modes_in_US_units_print_inertia_in_lb_in2_and_torque_in_lbf_in_in_text_and_report()
    {
        string report = Path.Combine(CliRunner.TempDir(), "modes.html");
        var (code, output, err) = CliRunner.Run("modes", Winch, "--units", "US", "--report", report);
        Assert.True(code == 0, err);
        Assert.Contains("inertia [lb·in²]", output, StringComparison.Ordinal);
        Assert.Contains("f [Hz]", output, StringComparison.Ordinal);
        Assert.Matches(@"forced response: [\d.]+ lbf·in at", output);
        AssertUsOnly(output, "modes text");
        string html = System.Net.WebUtility.HtmlDecode(File.ReadAllText(report));
        Assert.Contains("mesh stiffness [lbf·in/rad]", html, StringComparison.Ordinal);
        AssertUsOnly(Regex.Replace(html, "data:image/png;base64,[^\"]*", ""), "modes report");
    }

    [Fact]
    public void Modes_default_to_the_files_own_units_with_one_spelling()
    {
        var (code, output, err) = CliRunner.Run("modes", Winch);
        Assert.True(code == 0, err);
        Assert.Contains("inertia [kg·m²]", output, StringComparison.Ordinal); // not kg*m^2
        Assert.DoesNotContain("N*m", output, StringComparison.Ordinal);
        AssertHouseNumbers(output, "modes text");
    }

    [Fact]
    public void Plastic_table_of_an_inch_section_is_in_lbf_in_and_psi()
    {
        // solid round 1.5 in, tau_y = 20000 psi: T_p = 2 pi r^3 tau_y / 3 = 17671 lbf*in (Nadai sand heap, cone)
        var (code, output, err) = CliRunner.Run("section", "circle:d=1.5in", "--unit", "in", "--accuracy", "1e-3", "--plastic", "20000psi");
        Assert.True(code == 0, err);
        Assert.Matches(@"fully plastic torque T_p +1767\d lbf·in", output);
        Assert.Contains("tau_y = 20000 psi", output, StringComparison.Ordinal);
        AssertUsOnly(output, "plastic text");
    }

    [Fact]
    public void Picture_labels_follow_the_units()
    {
        var doc = ShaftFile.Load(Conveyor, ShaftSections.CreateResolver());
        var r = ShaftSolver.Solve(doc.Model);
        string svg = System.Text.Encoding.UTF8.GetString(BendingDiagram.Render(r.Bending!, 350e6, "t", LengthUnit.Millimetre, ImageFormat.Svg, units: UnitSystem.US));
        Assert.Contains("M, lbf·in", svg, StringComparison.Ordinal);
        Assert.Contains("σv, psi", svg, StringComparison.Ordinal);
        Assert.Contains("δ, in", svg, StringComparison.Ordinal);
        Assert.DoesNotContain("N·m", svg, StringComparison.Ordinal);
        Assert.DoesNotContain("MPa", svg, StringComparison.Ordinal);
    }

    [Fact]
    public void The_new_measures_convert_by_the_published_factors()
    {
        var us = UnitSystem.US;
        Tol.Rel(1, us.Force.FromSi(4.4482216152605), 1e-15, "1 lbf (NIST SP 811)");
        Tol.Rel(1, us.Bimoment.FromSi(4.4482216152605 * 0.0254 * 0.0254), 1e-15, "1 lbf*in^2");
        Tol.Rel(1, us.Inertia.FromSi(0.45359237 * 0.0254 * 0.0254), 1e-15, "1 lb*in^2");
        Tol.Rel(1, us.WarpingConstant.FromSi(Math.Pow(0.0254, 6)), 1e-12, "1 in^6");
        Assert.Equal("Hz", us.Frequency.Symbol);
        Assert.Equal("N·m²", UnitSystem.SiMillimetre.Bimoment.Symbol);
        Assert.Equal("kg*m^2", UnitSystem.SiMetre.Inertia.Ascii);
        Assert.Equal("lbf", us.Force.Symbol);
    }
}
