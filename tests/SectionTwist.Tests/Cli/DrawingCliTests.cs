using System.Globalization;
using System.Text.Json;
using System.Text.RegularExpressions;
using SectionTwist.Tests.Import;
using static SectionTwist.Tests.Import.RegressionDrawings;

namespace SectionTwist.Tests.Cli;

/// <summary>
/// The drawing options on the command line: every remedy a drawing message gives is an option of the command that
/// printed it, with a value it accepts, and following it works. Areas: annulus pi (R^2 - r^2), rectangle b h.
/// </summary>
public class DrawingCliTests
{
    private static string Write(DxfText d, string name = "drawing.dxf")
    {
        string path = Path.Combine(CliRunner.TempDir(), name);
        File.WriteAllText(path, d.ToString());
        return path;
    }

    private static double Area(string output)
    {
        var m = Regex.Match(output, @"area A\s+(\S+) mm(?:\^2|²)");
        Assert.True(m.Success, output);
        return double.Parse(m.Groups[1].Value, CultureInfo.InvariantCulture);
    }

    [Fact]
    public void Inspect_on_a_drawing_with_one_loose_construction_line_shows_the_part_and_names_the_line()
    {
        string path = Write(new DxfText().Header(4).Entities().Rect(0, 0, 30, 10, "SHAFT").Line(-5, 20, 35, 20, "CONSTR").End());
        var (code, output, err) = CliRunner.Run("inspect", path);
        Assert.Equal(0, code);
        Assert.Equal("", err);
        Assert.Contains("  parts          1 (largest first", output);
        Assert.Contains("      1  area 300 mm^2, 0 hole(s), x 0..30, y 0..10", output);
        Assert.Matches(@"left out\s+LINE \(line \d+\) on layer 'CONSTR'", output);
    }

    [Fact]
    public void Every_remedy_of_a_refused_sheet_runs_on_the_same_command()
    {
        string path = Write(Sheet());
        var (code, _, err) = CliRunner.Run("section", path, "--accuracy", "1e-2");
        Assert.Equal(2, code);
        var m = Regex.Match(err, @"--part (\d+) \(area 1055\.58");
        Assert.True(m.Success, err);
        var (ok, output, _) = CliRunner.Run("section", path, "--part", m.Groups[1].Value, "--accuracy", "1e-2");
        Assert.Equal(0, ok);
        Tol.Rel(TubeArea, Area(output), 1e-5, "annulus R 20, r 8 (printed to 6 digits)");
        foreach (var args in new[] { new[] { "--at", "100,95" }, ["--window", "60,40,140,120"], ["--hatch"], ["--layer", "VIEW", "--part", "1"], ["--layer", "V*", "--at", "100,95"] })
        {
            var (c, o, e) = CliRunner.Run(["section", path, "--accuracy", "1e-2", .. args]);
            Assert.True(c == 0, $"{string.Join(' ', args)}: {e}");
            Tol.Rel(TubeArea, Area(o), 1e-5, $"annulus via {string.Join(' ', args)}");
        }
    }

    [Fact]
    public void Repeated_layer_options_read_outline_and_bore_together()
    {
        string path = Write(new DxfText().Header(4).Entities().Circle(0, 0, 25, "OUTSIDE").Circle(0, 0, 10, "BORES").End());
        var (c, o, e) = CliRunner.Run("section", path, "--layer", "OUTSIDE", "--layer", "BORES", "--accuracy", "1e-2");
        Assert.True(c == 0, e);
        Tol.Rel(Math.PI * 525, Area(o), 1e-5, "annulus R 25, r 10");
        var (c1, _, e1) = CliRunner.Run("section", path, "--layer", "OUTSIDE", "--accuracy", "1e-2");
        Assert.Equal(0, c1);
        Assert.Contains("if it is a hole or part of the outline, add its layer: --layer OUTSIDE,BORES", e1);
    }

    [Fact]
    public void The_snap_value_printed_by_section_is_accepted_by_section()
    {
        string path = Write(new DxfText().Header(4).Entities().Line(0, 0, 100, 0).Line(100, 0, 100, 50).Line(100, 50, 0, 50).Line(0, 50, 0, 0.02).End());
        var (code, _, err) = CliRunner.Run("section", path);
        Assert.Equal(2, code);
        var m = Regex.Match(err, @"--snap (\S+) ");
        Assert.True(m.Success, err);
        var (c, o, e) = CliRunner.Run("section", path, "--snap", m.Groups[1].Value, "--accuracy", "1e-2");
        Assert.True(c == 0, e);
        Tol.Rel(5000, Area(o), 1e-5, "rectangle 100 x 50");
        var (ci, _, ei) = CliRunner.Run("inspect", path, "--snap", m.Groups[1].Value);
        Assert.True(ci == 0, ei);
    }

    [Fact]
    public void Json_carries_the_drawing_notes_as_warnings()
    {
        string path = Write(new DxfText().Header(4).Entities().Rect(0, 0, 30, 10).Rect(40, 0, 10, 10).End());
        var (c, o, e) = CliRunner.Run("section", path, "--json", "--accuracy", "1e-2");
        Assert.True(c == 0, e);
        using var doc = JsonDocument.Parse(o);
        var warn = doc.RootElement.GetProperty("warnings").EnumerateArray().Single(w => w.GetProperty("code").GetString() == "drawing");
        Assert.StartsWith("2 separate parts analysed together", warn.GetProperty("message").GetString());
    }

    [Theory]
    [InlineData("--at", "10", "is not 2 numbers")]
    [InlineData("--window", "0,0,5", "is not 4 numbers")]
    [InlineData("--window", "0,0,0,5", "has no width")]
    [InlineData("--fit-arcs", "0.5", "must lie in (0, 0.01]")]
    [InlineData("--snap", "0.2", "must lie in [0, 0.1)")]
    public void Bad_drawing_options_exit_2_with_an_example(string option, string value, string fragment)
    {
        string path = Write(new DxfText().Header(4).Entities().Rect(0, 0, 30, 10).End());
        var (c, _, e) = CliRunner.Run("section", path, option, value);
        Assert.Equal(2, c);
        Assert.Contains(fragment, e);
    }
}
