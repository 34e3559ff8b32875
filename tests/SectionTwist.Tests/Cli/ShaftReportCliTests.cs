using System.Globalization;
using SectionTwist.Cli;

namespace SectionTwist.Tests.Cli;

/// <summary><c>shaft --report</c>, output-path errors and the embedded demo file.</summary>
public sealed class ShaftReportCliTests : IDisposable
{
    private readonly string _dir = Path.Combine(Path.GetTempPath(), "st-shaft-report-" + Guid.NewGuid().ToString("N"));

    // Round and tube sections only (exact formulas, no section analysis), so the test stays fast.
    private const string Shaft = """
        title: report test shaft
        units: {length: mm, torque: N*m, stress: MPa, modulus: GPa}
        materials:
          steel: {library: steel-1045-cd}
        sections:
          solid: {round: 40}
          hollow: {tube: {outer: 50, inner: 30}}
        stations:
          - {name: A, at: 0}
          - {name: B, after: 200}
          - {name: C, after: 300}
        segments:
          - {from: A, to: B, section: solid, material: steel}
          - {from: B, to: C, section: hollow, material: steel}
        loads:
          - {at: C, torque: 800}
        supports: {fixed: [A]}
        """;

    public ShaftReportCliTests() => Directory.CreateDirectory(_dir);

    public void Dispose()
    {
        try { Directory.Delete(_dir, true); } catch (IOException) { } catch (UnauthorizedAccessException) { }
    }

    private string WriteShaft()
    {
        string p = Path.Combine(_dir, "shaft.yaml");
        File.WriteAllText(p, Shaft);
        return p;
    }

    [Fact]
    public void Shaft_report_writes_one_self_contained_html_file()
    {
        string report = Path.Combine(_dir, "out", "shaft.html");
        var (code, output, err) = CliRun.Run("shaft", WriteShaft(), "--report", report);
        Assert.True(code == 0, err);
        Assert.Contains("Governing segment (shear)", output, StringComparison.Ordinal); // the tables still print
        Assert.True(File.Exists(report));
        string html = File.ReadAllText(report);
        Assert.Contains("Shaft report: report test shaft", html, StringComparison.Ordinal);
        Assert.Contains("<img alt=", html, StringComparison.Ordinal);
        Assert.Contains("data:image/png;base64,", html, StringComparison.Ordinal);
        Assert.DoesNotContain("src=\"http", html, StringComparison.Ordinal);
        Assert.Contains("verification cases passed on this build", html, StringComparison.Ordinal);
        // solid 40 mm under 800 N*m: tau = 16 T / (pi d^3) = 63.66 MPa (Timoshenko and Goodier, ch. 10)
        string tau = (16 * 800 / (Math.PI * Math.Pow(0.040, 3)) / 1e6).ToString("G4", CultureInfo.InvariantCulture);
        Assert.Contains($">{tau}<", html, StringComparison.Ordinal);
        Assert.Contains("Governing segment (shear): A-B", html, StringComparison.Ordinal);
    }

    [Fact]
    public void Demo_with_a_file_as_out_folder_fails_with_one_line_and_exit_2()
    {
        string file = Path.Combine(_dir, "taken");
        File.WriteAllText(file, "x");
        var (code, output, err) = CliRun.Run("demo", "--out", file);
        Assert.Equal(2, code);
        Assert.Equal("", output);
        string[] lines = err.TrimEnd().Split('\n');
        Assert.Single(lines);
        Assert.StartsWith($"sectiontwist demo: error: --out {file}: a file of that name exists", lines[0], StringComparison.Ordinal);
    }

    [Fact]
    public void Demo_with_an_unwritable_out_folder_fails_with_one_line_and_exit_2()
    {
        // below a regular file no folder can be made, whoever runs the test (root included)
        string file = Path.Combine(_dir, "plain");
        File.WriteAllText(file, "x");
        string bad = Path.Combine(file, "sub");
        var (code, _, err) = CliRun.Run("demo", "--out", bad);
        Assert.Equal(2, code);
        Assert.Single(err.TrimEnd().Split('\n'));
        Assert.StartsWith($"sectiontwist demo: error: --out {bad}: cannot write there", err, StringComparison.Ordinal);
        Assert.Contains("give a writable folder", err, StringComparison.Ordinal);
    }

    [Fact]
    public void Shaft_report_to_a_folder_fails_before_solving()
    {
        var (code, _, err) = CliRun.Run("shaft", WriteShaft(), "--report", _dir);
        Assert.Equal(2, code);
        Assert.Single(err.TrimEnd().Split('\n'));
        Assert.Contains("that is a folder; give a file name", err, StringComparison.Ordinal);
    }

    [Fact]
    public void Embedded_demo_file_is_the_sample_file()
    {
        string onDisk = File.ReadAllText(Path.Combine(RepoPaths.SampleProfiles, "winch-shaft.yaml")).ReplaceLineEndings("\n");
        Assert.Equal(onDisk, DemoCommand.ReadDemoFile().ReplaceLineEndings("\n"));
    }
}
