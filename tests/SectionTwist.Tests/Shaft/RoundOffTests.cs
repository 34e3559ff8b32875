using SectionTwist.Import;
using SectionTwist.Profiles;
using SectionTwist.Shaft;
using SectionTwist.Tests.Cli;
using static SectionTwist.Tests.Shaft.ShaftTestModels;

namespace SectionTwist.Tests.Shaft;

/// <summary>
/// Values that are zero in exact arithmetic print as zero (issue 11 found centroid -4.7E-16, Ixy 4.1E-12, reactions
/// -9.09E-13 and a principal angle of 65 deg for a circle). References: statics for the reactions; symmetry for the
/// centroid, Ixy and I1 = I2 (any section with two axes of symmetry, or a regular polygon, has Ixy = 0 about them and, with
/// n >= 3 fold symmetry, I1 = I2: Gere, Mechanics of Materials, ch. 12, polar and principal moments).
/// </summary>
public sealed class RoundOffTests
{
    [Fact]
    public void Balanced_loads_beyond_a_support_give_exact_zero_reaction_and_rotation()
    {
        // fixed at A; +T at B and -T at C: the segment A-B carries no torque, so A reacts nothing and B does not turn (statics)
        var model = new ShaftModel
        {
            Stations = Stations(("A", 0), ("B", 0.3), ("C", 0.7)),
            Segments = [new ShaftSegment("A", "B", SectionStiffness.Round(0.031), Steel), new ShaftSegment("B", "C", SectionStiffness.Round(0.027), Steel)],
            Loads = [new PointTorque("B", 437.676), new PointTorque("C", -437.676)],
            FixedStations = ["A"],
        };
        var r = ShaftSolver.Solve(model);
        Assert.Equal(0.0, Reaction(r, "A"));
        Assert.Equal(0.0, Rotation(r, "B"));
        Assert.Equal(0.0, Segment(r, "A", "B").TorqueAtFrom);
        Assert.Equal(0.0, Segment(r, "A", "B").Twist);
        Assert.True(Rotation(r, "C") != 0);
    }

    [Theory]
    [InlineData("circle:d=40")]
    [InlineData("square:s=30,r=2")]
    [InlineData("hex:s=24")]
    [InlineData("tube:D=50,d=36")]
    public void Symmetric_sections_have_zero_centroid_and_ixy_and_no_principal_angle(string spec)
    {
        var p = ProfileTemplates.Create(spec).Properties;
        Assert.Equal(0.0, p.Centroid.X);
        Assert.Equal(0.0, p.Centroid.Y);
        Assert.Equal(0.0, p.Ixy);
        Assert.False(p.HasPrincipalAxes);
        Assert.Equal(0.0, p.PrincipalAngle);
    }

    [Fact]
    public void Keyed_shaft_has_a_defined_principal_axis_at_plus_90_degrees()
    {
        // keyed:d=40 is symmetric about y only: Ixy = 0, centroid on the y axis, I1 about the y axis (Iyy > Ixx)
        var p = ProfileTemplates.Create("keyed:d=40").Properties;
        Assert.Equal(0.0, p.Centroid.X);
        Assert.Equal(0.0, p.Ixy);
        Assert.True(p.HasPrincipalAxes);
        Assert.Equal(Math.PI / 2, p.PrincipalAngle);
    }

    [Fact]
    public void Section_text_prints_zero_and_omits_the_principal_angle_of_a_circle()
    {
        var (code, output, err) = CliRunner.Run("section", "circle:d=40", "--accuracy", "1e-3");
        Assert.True(code == 0, err);
        Assert.Contains("centroid (x, y)           (0, 0) mm", output, StringComparison.Ordinal);
        Assert.Contains("I1 = I2 (principal)", output, StringComparison.Ordinal);
        Assert.DoesNotContain(" deg from x", output, StringComparison.Ordinal);
        Assert.DoesNotContain("E-1", output, StringComparison.Ordinal); // no round-off noise like 4.7E-16
        var json = System.Text.Json.Nodes.JsonNode.Parse(CliRunner.Run("section", "circle:d=40", "--accuracy", "1e-3", "--json").Out)!;
        Assert.Null(json["principalAngleDeg"]);
    }

    [Fact]
    public void Dxf_end_points_that_meet_to_round_off_are_no_news()
    {
        // the inch hollow-section sample: its arcs and lines meet to about 1e-16 in; before, a note said "joined end points up to 1.11E-16 in apart"
        var notes = new List<string>();
        ProfileSources.Load(Path.Combine(RepoPaths.SampleProfiles, "winch-frame-shs-inch.dxf"), new ProfileSourceOptions { Notes = notes.Add });
        Assert.DoesNotContain(notes, n => n.Contains("joined end points", StringComparison.Ordinal));
    }
}
