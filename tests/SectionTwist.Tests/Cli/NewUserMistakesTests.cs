namespace SectionTwist.Tests.Cli;

/// <summary>
/// Mistakes of a first session found by trying the tool from its documentation alone: each gets one line naming the
/// input and a remedy that can be followed, exit code 2. Common practice, no source.
/// </summary>
public sealed class NewUserMistakesTests : IDisposable
{
    private readonly string _dir = CliRunner.TempDir();

    public void Dispose() => Directory.Delete(_dir, recursive: true);

    [Fact]
    public void A_shaft_file_given_to_section_points_to_the_shaft_command()
    {
        string path = Path.Combine(_dir, "design.yaml");
        File.WriteAllText(path, "title: x\n");
        var (code, _, err) = CliRunner.Run("section", path);
        Assert.Equal(2, code);
        Assert.Contains("no profile source reads '.yaml' files", err);
        Assert.Contains("sectiontwist shaft", err);
        Assert.DoesNotContain("   at ", err);
    }

    [Fact]
    public void A_mistyped_plastic_material_gets_the_nearest_name()
    {
        var (code, _, err) = CliRunner.Run("section", "circle:d=20", "--plastic", "steel-s335");
        Assert.Equal(2, code);
        Assert.Contains("did you mean 'steel-s355'", err);
    }

    [Fact]
    public void An_angle_is_warping_negligible_without_being_called_solid_or_closed()
    {
        // thin-wall theory: the walls of an angle meet at the shear centre, so its sectorial coordinate and Iw are
        // almost zero (Iw = t^3 (b'^3 + h'^3) / 36; Timoshenko and Gere, Theory of Elastic Stability, ch. 5, from memory)
        var (code, output, err) = CliRunner.Run("section", "angle:h=60,b=60,t=6,r=6", "--warping", "--accuracy", "1e-3");
        Assert.True(code == 0, err);
        Assert.Contains("warping torsion negligible", output);
        Assert.Contains("angle, tee", output);
        Assert.DoesNotContain("solid or closed:", output);
    }

    [Fact]
    public void The_shear_centre_of_a_doubly_symmetric_section_prints_as_the_centroid_not_as_round_off()
    {
        // an I-section's shear centre is its centroid by symmetry (Timoshenko and Gere, Theory of Elastic Stability,
        // ch. 5); the guide promises zeros to the accuracy of the computation print as 0
        var (code, output, err) = CliRunner.Run("section", "ibeam:h=200,b=100,tw=5.6,tf=8.5,r=12", "--warping", "--accuracy", "1e-3");
        Assert.True(code == 0, err);
        Assert.Contains("shear centre (x, y)       (0, 0) mm", output);
    }

    [Fact]
    public void Inspect_of_a_drawing_with_bonded_layers_offers_a_remedy_inspect_can_follow()
    {
        // the junction where two layers meet suggested '--material', an option of 'section' only; common practice, no source
        string path = Path.Combine(_dir, "layers.dxf");
        File.WriteAllText(path, new SectionTwist.Tests.Import.DxfText().Header(4).Entities().Rect(0, 0, 40, 3, "A").Rect(0, 3, 40, 3, "B").End().ToString());
        var (code, output, err) = CliRunner.Run("inspect", path);
        Assert.Equal(2, code);
        Assert.Contains("--material A=MATERIAL,B=MATERIAL on 'section'", output + err);
        Assert.Contains("--layer NAME", output + err);
        (code, _, err) = CliRunner.Run("inspect", path, "--layer", "A");
        Assert.True(code == 0, err);
    }

    [Fact]
    public void A_drawing_given_to_shaft_points_to_the_section_command()
    {
        // the YAML reader answered with "expected a mapping of keys ..., found '0 SECTION 2 HEADER ...'"
        string path = Path.Combine(_dir, "strip.dxf");
        File.WriteAllText(path, new SectionTwist.Tests.Import.DxfText().Header(4).Entities().Rect(0, 0, 40, 3, "A").End().ToString());
        var (code, _, err) = CliRunner.Run("shaft", path);
        Assert.Equal(2, code);
        Assert.Contains("not a shaft file", err);
        Assert.Contains("sectiontwist section", err);
        Assert.DoesNotContain("   at ", err);
    }

    [Fact]
    public void A_sweep_without_units_takes_the_unit_the_spec_gives_the_key()
    {
        // circle:d=1in swept over d=1:2:2 must analyse 1 in and 2 in circles: J = pi d^4 / 32 (exact), 0.0982 and 1.571 in^4
        var (code, output, err) = CliRunner.Run("sweep", "circle:d=1in", "--vary", "d=1:2:2", "--csv");
        Assert.True(code == 0, err);
        var rows = output.Split('\n', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries).Skip(1).ToArray();
        Assert.Equal(2, rows.Length);
        double j1 = double.Parse(rows[0].Split(',')[2], System.Globalization.CultureInfo.InvariantCulture);
        double j2 = double.Parse(rows[1].Split(',')[2], System.Globalization.CultureInfo.InvariantCulture);
        double inch = 0.0254;
        Assert.Equal(Math.PI * Math.Pow(1 * inch, 4) / 32, j1, 1e-6 * j1);
        Assert.Equal(Math.PI * Math.Pow(2 * inch, 4) / 32, j2, 1e-6 * j2);
    }
}
