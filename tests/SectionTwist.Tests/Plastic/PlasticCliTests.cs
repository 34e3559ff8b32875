using SectionTwist.Tests.Cli;

namespace SectionTwist.Tests.Plastic;

public sealed class PlasticCliTests
{
    [Fact]
    public void Section_plastic_prints_the_torques_the_curve_and_the_caution_and_draws_the_zones()
    {
        string png = Path.Combine(CliRunner.TempDir(), "zones.png");
        var (exit, output, err) = CliRunner.Run("section", "circle:d=40", "--accuracy", "1e-3", "--plastic", "100MPa", "--plastic-plot", png);
        Assert.True(exit == 0, err);
        // T_p = 2 pi r^3 tau_y / 3 = 1675.5 N*m for r = 20 mm, tau_y = 100 MPa (Nadai sand heap, cone)
        Assert.Matches(@"fully plastic torque T_p +1675\.5 N·m", output);
        Assert.Contains("shape factor T_p/T_y", output, StringComparison.Ordinal);
        Assert.Contains("ideal plasticity", output, StringComparison.Ordinal);
        var bytes = File.ReadAllBytes(png);
        Assert.True(bytes.Length > 1000 && bytes[1] == (byte)'P' && bytes[2] == (byte)'N' && bytes[3] == (byte)'G', "a PNG was written");
    }

    [Fact]
    public void The_plastic_picture_is_titled_by_the_section_not_by_the_output_file()
    {
        // issue 11, pictures: "the plot title from the section, not from the output file's name"
        string svg = Path.Combine(CliRunner.TempDir(), "out-file-name.svg");
        var (exit, _, err) = CliRunner.Run("section", "rect:b=40,h=10", "--accuracy", "1e-3", "--plastic", "100MPa", "--plastic-plot", svg);
        Assert.True(exit == 0, err);
        string text = File.ReadAllText(svg);
        Assert.Contains("rect:b=40,h=10: plastic zone", text, StringComparison.Ordinal);
        Assert.DoesNotContain("out-file-name", text, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("--plastic", "granite", "neither a material")]
    [InlineData("--plastic", "140", "neither a material")]
    [InlineData("--plastic-plot", "z.png", "--plastic-plot needs --plastic")]
    public void Bad_plastic_options_are_usage_errors(string option, string value, string fragment)
    {
        var (exit, _, err) = CliRunner.Run("section", "circle:d=40", option, value);
        Assert.Equal(2, exit);
        Assert.Contains(fragment, err, StringComparison.Ordinal);
    }
}
