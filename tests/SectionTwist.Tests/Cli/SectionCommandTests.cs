using SectionTwist.Geometry;
using System.Text.Json;

namespace SectionTwist.Tests.Cli;

public class SectionCommandTests
{
    private static string PointList(string text)
    {
        string path = Path.Combine(CliRunner.TempDir(), "outline.csv");
        File.WriteAllText(path, text);
        return path;
    }

    // Each validation error of the profile model: one line naming the place and the remedy, exit code 2.
    [Theory]
    [InlineData("0,0\n10,0\n0,10\n10,10\n", "self-intersection", "crosses itself")]
    [InlineData("0,0\n10,0\n10,10\n0,10\n\n5,5\n15,5\n15,7\n5,7\n", "self-intersection", "touches or crosses")]
    [InlineData("0,0\n10,0\n20,0\n", "zero-area", "encloses no area")]
    [InlineData("0,0\n1,0\narc, 2,0, 3,0\n3,3\n", "bad-arc", "outline.csv:3: arc through (0.001, 0), (0.002, 0), (0.003, 0): the three points are collinear; move the through point off the line")]
    [InlineData("0,0\n10,zero\n10,10\n", "bad-point-list", "is not a number")]
    public void Bad_outlines_give_one_line_errors_and_exit_2(string text, string code, string fragment)
    {
        string path = PointList(text);
        var (exit, output, err) = CliRunner.Run("section", path);
        Assert.Equal(2, exit);
        Assert.Equal("", output);
        Assert.Single(err.TrimEnd().Split('\n'));
        Assert.Contains("error:", err, StringComparison.Ordinal);
        Assert.Contains(fragment, err, StringComparison.Ordinal);
        Assert.DoesNotContain("   at ", err, StringComparison.Ordinal);
        Assert.Equal(code, Assert.Throws<SectionTwistException>(() => SectionTwist.Import.ProfileSources.Load(path)).Code);
    }

    [Fact]
    public void Hole_outside_and_overlapping_regions_are_reported()
    {
        var sq = LoopBuilder.Polygon([new(0, 0), new(1, 0), new(1, 1), new(0, 1)]);
        var far = LoopBuilder.Circle(new Point2(5, 5), 0.2);
        Assert.Equal("hole-outside", Assert.Throws<SectionTwistException>(() => new Profile([new Region(sq, [far])])).Code);
        var inner = LoopBuilder.Circle(new Point2(0.5, 0.5), 0.2);
        Assert.Equal("overlapping-regions", Assert.Throws<SectionTwistException>(() => new Profile([new Region(sq), new Region(inner)])).Code);
    }

    [Theory]
    [InlineData("--accuracy", "2")]
    [InlineData("--unit", "furlong")]
    [InlineData("--frobnicate", "1")]
    public void Bad_options_exit_2(string option, string value)
    {
        var (exit, _, err) = CliRunner.Run("section", "circle:d=40", option, value);
        Assert.Equal(2, exit);
        Assert.Contains(option.TrimStart('-'), err, StringComparison.Ordinal);
    }

    // Exact: solid circle J = pi d^4 / 32 (Timoshenko and Goodier, ch. 10). JSON keys required by the issue.
    [Fact]
    public void Json_output_has_the_required_keys_in_SI_units()
    {
        var (exit, output, err) = CliRunner.Run("section", "circle:d=40", "--json");
        Assert.True(exit == 0, err);
        using var doc = JsonDocument.Parse(output);
        var r = doc.RootElement;
        foreach (var key in new[] { "area", "centroid", "ixx", "iyy", "ixy", "polarMoment", "torsionConstant", "maxShearPerTorque",
                     "maxShearLocation", "estimatedRelativeError", "mesh", "warnings", "lengthUnit" })
            Assert.True(r.TryGetProperty(key, out _), key);
        Tol.Rel(Math.PI * Math.Pow(0.04, 4) / 32, r.GetProperty("torsionConstant").GetDouble(), 1e-4, "circle, exact");
        Tol.Rel(Math.PI * 0.02 * 0.02, r.GetProperty("area").GetDouble(), 1e-12, "circle area");
        Assert.Equal("mm", r.GetProperty("lengthUnit").GetString());
        Assert.True(r.GetProperty("mesh").GetProperty("minAngleDeg").GetDouble() >= 25);
    }

    // Round trip: the outline exported to DXF reads back with the same J (same profile, solver accuracy).
    [Fact]
    public void Dxf_export_reads_back_with_the_same_J()
    {
        string dxf = Path.Combine(CliRunner.TempDir(), "shs.dxf");
        var (e1, o1, err1) = CliRunner.Run("section", "shs:B=80,t=5", "--json", "--dxf", dxf);
        Assert.True(e1 == 0, err1);
        var (e2, o2, err2) = CliRunner.Run("section", dxf, "--layer", "PROFILE", "--json");
        Assert.True(e2 == 0, err2);
        double j1 = JsonDocument.Parse(o1).RootElement.GetProperty("torsionConstant").GetDouble();
        double j2 = JsonDocument.Parse(o2).RootElement.GetProperty("torsionConstant").GetDouble();
        Tol.Rel(j1, j2, 1e-5, "same outline");
        Assert.Contains("PHI", File.ReadAllText(dxf), StringComparison.Ordinal);
    }

    [Fact]
    public void Verify_passes_on_this_build()
    {
        var (exit, output, _) = CliRunner.Run("verify");
        Assert.Equal(0, exit);
        Assert.Contains("verification cases passed", output, StringComparison.Ordinal);
    }

    [Fact]
    public void Sharp_keyseat_warns_about_the_singular_corner()
    {
        var (exit, output, _) = CliRunner.Run("section", "keyed:d=40,r=0");
        Assert.Equal(0, exit);
        Assert.Contains("sharp-reentrant-corner", output, StringComparison.Ordinal);
        Assert.Contains("fillet", output, StringComparison.Ordinal);
    }
}
