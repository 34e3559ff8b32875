using System.Text.Json;
using SectionTwist.Cli;

namespace SectionTwist.Tests.Profiles;

/// <summary>The <c>templates</c> and <c>sweep</c> commands: listings, usage errors (exit code 2) and sweep results.</summary>
public class TemplateCliTests
{
    private static (int Code, string Out, string Err) Run(params string[] argv) => Run(false, argv);

    private static (int Code, string Out, string Err) Run(bool terminal, params string[] argv) => SectionTwist.Tests.Cli.CliRunner.Run(terminal, argv);

    [Fact]
    public void Templates_lists_every_template_with_keys_defaults_and_units()
    {
        var (code, output, _) = Run("templates");
        Assert.Equal(0, code);
        foreach (var t in SectionTwist.Profiles.ProfileTemplates.All)
        {
            Assert.Contains(t.Name, output, StringComparison.Ordinal);
            Assert.Contains(t.Example, output, StringComparison.Ordinal);
        }
        Assert.Contains("default DIN 6885-1 by d", output, StringComparison.Ordinal);
        Assert.Contains("length", output, StringComparison.Ordinal);
        foreach (var family in new[] { "upe", "lun", "hfshs", "hfrhs", "hfchs" }) Assert.Contains(family + ": ", output, StringComparison.Ordinal);
        Assert.Contains("the table rows are from memory", output, StringComparison.Ordinal);
        Assert.Contains("check every row used against the supplier's current table", output, StringComparison.Ordinal);
        var (c2, json, _) = Run("templates", "shs", "--json");
        Assert.Equal(0, c2);
        using var doc = JsonDocument.Parse(json);
        var shs = doc.RootElement[0];
        Assert.Equal("shs", shs.GetProperty("name").GetString());
        Assert.Contains(shs.GetProperty("parameters").EnumerateArray(), p => p.GetProperty("key").GetString() == "form" && p.GetProperty("default").GetString() == "hot");
    }

    [Theory]
    [InlineData(new[] { "templates", "bolt" }, "unknown template 'bolt'")]
    [InlineData(new[] { "sweep", "keyed:d=40" }, "--vary KEY=FROM:TO:STEPS is required")]
    [InlineData(new[] { "sweep", "keyed:d=40", "--vary", "w=1:2:3" }, "template 'keyed' has no key 'w'; its keys are d, n, at, b, t1, r")]
    [InlineData(new[] { "sweep", "keyed:d=40", "--vary", "t1=1:2" }, "write KEY=FROM:TO:STEPS")]
    [InlineData(new[] { "sweep", "keyed:d=40", "--vary", "t1=1mm:2in:3" }, "FROM and TO use different units")]
    [InlineData(new[] { "sweep", "keyed:d=40", "--vary", "t1=3:30:3" }, "sweep step t1=30: keyed:d=40,t1=30: t1: keyseat depth 30 mm reaches the axis")]
    [InlineData(new[] { "sweep", "shs:B=80,t=5", "--vary", "form=1:2:2" }, "cannot be swept")]
    [InlineData(new[] { "sweep", "crosshole:d=40", "--vary", "d=1:2:2" }, "3D stress problem")]
    public void Bad_command_lines_exit_2_with_a_one_line_message(string[] argv, string expected)
    {
        var (code, _, err) = Run(argv);
        Assert.Equal(2, code);
        Assert.Contains(expected, err, StringComparison.Ordinal);
        Assert.DoesNotContain("   at ", err, StringComparison.Ordinal);
    }

    // A round bar is its own plain round: J / (pi D^4 / 32) = 1 (Timoshenko and Goodier, ch. 10) at every step.
    [Fact]
    public void Sweep_of_a_circle_is_relative_one_and_scales_as_d4()
    {
        var (code, output, err) = Run(true, "sweep", "circle:d=20", "--vary", "d=10mm:30mm:3", "--accuracy", "1e-3", "--json");
        Assert.True(code == 0, err);
        Assert.Contains("sweep over 3 steps (3 of 3 done): 100 %", err, StringComparison.Ordinal); // progress on a terminal, on stderr only
        Assert.DoesNotContain("steps", output.Split('\n')[0], StringComparison.Ordinal);
        Assert.DoesNotContain("3 of 3 done", output, StringComparison.Ordinal);
        using var doc = JsonDocument.Parse(output);
        var steps = doc.RootElement.GetProperty("steps").EnumerateArray().ToList();
        Assert.Equal(3, steps.Count);
        double[] d = [0.010, 0.020, 0.030];
        for (int i = 0; i < 3; i++)
        {
            Tol.Rel(1, steps[i].GetProperty("relativeToRound").GetDouble(), 3e-3, "solid circle J = pi d^4 / 32");
            Tol.Rel(Math.PI * Math.Pow(d[i], 4) / 32, steps[i].GetProperty("torsionConstant").GetDouble(), 3e-3, "solid circle");
            Tol.Rel(16 / (Math.PI * Math.Pow(d[i], 3)), steps[i].GetProperty("maxShearPerTorque").GetDouble(), 1e-2, "solid circle 16 T / (pi d^3)");
        }
    }

    // Two opposite sharp keyseats 12 mm wide, 4, 6 and 8 mm deep in a 40 mm shaft (s = 1.5, 1, 0.75; x = 0.2, 0.3, 0.4,
    // inside the fit's range): each J within 2 % of Roark's two-keyway fit (Published.KeywaysJ), the relative column
    // J / (pi D^4 / 32) likewise, and J falls with depth.
    [Fact]
    public void Sweep_of_keyseat_depth_follows_Roark_two_keyway_fit()
    {
        var (code, output, err) = Run("sweep", "keyed:d=40,n=2,b=12,r=0", "--vary", "t1=4:8:3", "--accuracy", "1e-3", "--csv");
        Assert.True(code == 0, err);
        Assert.Equal("", err); // no progress display when stderr is not a terminal
        // The quoted spec (it contains commas) is the last column.
        var rows = output.Split('\n', StringSplitOptions.RemoveEmptyEntries).Skip(1).Select(l => l.Split(',')).ToList();
        Assert.StartsWith("t1,outerSize_m,torsionConstant_m4", output, StringComparison.Ordinal);
        Assert.Equal(3, rows.Count);
        double[] depth = [0.004, 0.006, 0.008];
        var inv = System.Globalization.CultureInfo.InvariantCulture;
        double round = Math.PI * Math.Pow(0.040, 4) / 32;
        for (int i = 0; i < 3; i++)
        {
            double roark = References.Published.KeywaysJ(2, 0.020, 0.012, depth[i]);
            Tol.Rel(roark, double.Parse(rows[i][2], inv), 0.02, References.Published.Roark);
            Tol.Rel(roark / round, double.Parse(rows[i][4], inv), 0.02, References.Published.Roark + ", relative to the round");
        }
        Assert.True(double.Parse(rows[0][2], inv) > double.Parse(rows[1][2], inv) && double.Parse(rows[1][2], inv) > double.Parse(rows[2][2], inv));
    }
}
