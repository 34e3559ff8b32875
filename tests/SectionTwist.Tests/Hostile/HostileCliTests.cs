using System.Diagnostics;
using System.Text.Json;
using SectionTwist.Tests.Cli;

namespace SectionTwist.Tests.Hostile;

/// <summary>
/// What a user sees at the command line when a limit is hit: one line, exit code 2, a remedy that exists on the command
/// (--timeout, --memory-budget, --part), never a stack trace or exit 70; JSON output never fails on a non-finite number.
/// </summary>
public class HostileCliTests
{
    private static string Write(string name, string text)
    {
        string path = Path.Combine(CliRunner.TempDir(), name);
        File.WriteAllText(path, text);
        return path;
    }

    [Theory]
    [InlineData("{at: B, torque: 1e308 N*m}")]
    [InlineData("{at: B, torque: 1.7976931348623157e308 N*m}")]
    [InlineData("{at: B, power: 1e12 W, speed: 1e-6 rad/s}")]
    public void Non_finite_overflowing_torques_exit_2_with_one_line_in_every_output_form(string load)
    {
        string path = Write("overflow.yaml", Hostile.Shaft(load: load));
        foreach (var extra in new[] { Array.Empty<string>(), ["--json"], ["--report", Path.Combine(CliRunner.TempDir(), "r.html")] })
        {
            var clock = Stopwatch.StartNew();
            var (code, output, err) = CliRunner.Run(["shaft", path, .. extra]);
            Assert.Equal(2, code);
            Assert.True(clock.Elapsed.TotalSeconds < 30, $"{clock.Elapsed.TotalSeconds:F0} s");
            Assert.Equal("", output);
            Assert.Single(err.Trim().Split('\n'));
            Assert.Contains("overflow.yaml:", err);
        }
    }

    [Fact]
    public void Json_of_a_solved_shaft_holds_only_finite_numbers_or_null()
    {
        string path = Write("ok.yaml", Hostile.Shaft(load: "{at: B, torque: 1e12 N*m}", section: "{J: 1e-36 m^4, shearFactor: 1e27 1/m^3}"));
        var (code, output, err) = CliRunner.Run("shaft", path, "--json");
        Assert.True(code == 0, err);
        using var doc = JsonDocument.Parse(output);
        Assert.DoesNotContain("Infinity", output);
        Assert.DoesNotContain("NaN", output);
        foreach (var st in doc.RootElement.GetProperty("stations").EnumerateArray())
            Assert.True(double.IsFinite(st.GetProperty("rotation").GetDouble()));
    }

    [Fact]
    public void Timeout_stops_a_command_with_a_message_naming_the_option()
    {
        var clock = Stopwatch.StartNew();
        // 1e-8 takes seconds: the timer behind --timeout runs on the thread pool, which the tests running beside this one
        // may hold for a while, so the analysis must outlast that delay
        var (code, _, err) = CliRunner.Run("section", "keyed:d=40", "--accuracy", "1e-8", "--timeout", "0.3");
        Assert.Equal(2, code);
        Assert.True(clock.Elapsed.TotalSeconds < 10, $"{clock.Elapsed.TotalSeconds:F1} s");
        Assert.Contains("time limit of 0.3 s", err);
        Assert.Contains("--timeout SECONDS", err);
    }

    [Fact]
    public void Timeout_and_memory_budget_values_are_checked()
    {
        Assert.Equal(2, CliRunner.Run("section", "circle:d=40", "--timeout", "-1").Code);
        var (code, _, err) = CliRunner.Run("section", "circle:d=40", "--memory-budget", "1");
        Assert.Equal(2, code);
        Assert.Contains("--memory-budget", err);
    }

    [Fact]
    public void Memory_budget_refusal_names_the_options_that_help()
    {
        var (code, output, err) = CliRunner.Run("section", "keyed:d=40,r=0.5", "--accuracy", "1e-6", "--memory-budget", "16");
        Assert.Equal(2, code);
        Assert.Equal("", output);
        Assert.Contains("memory budget (16 MB)", err);
        Assert.Contains("--accuracy", err);
        // the same section within a normal budget solves
        Assert.Equal(0, CliRunner.Run("section", "keyed:d=40,r=0.5", "--accuracy", "1e-3", "--memory-budget", "512").Code);
    }

    [Fact]
    public void Stray_hole_in_a_drawing_exits_2_and_part_1_solves()
    {
        var d = new Import.DxfText().Header().Entities().Rect(0, 0, 60, 40, "PLATE").Circle(20, 20, 5, "HOLES").Circle(100, 20, 5, "HOLES");
        string path = Path.Combine(CliRunner.TempDir(), "plate.dxf");
        File.WriteAllBytes(path, d.End().Bytes());
        var (code, _, err) = CliRunner.Run("section", path, "--accuracy", "1e-3");
        Assert.Equal(2, code);
        Assert.Contains("--part N", err);
        Assert.Equal(0, CliRunner.Run("section", path, "--part", "1", "--accuracy", "1e-3").Code);
    }

    [Fact]
    public void Help_lists_the_options_every_command_takes()
    {
        var (_, output, _) = CliRunner.Run("help");
        Assert.Contains("--timeout SECONDS", output);
        Assert.Contains("--memory-budget MB", output);
    }
}
