using System.Text;
using SectionTwist.Limits;
using SectionTwist.Shaft;

namespace SectionTwist.Tests.Hostile;

/// <summary>
/// One regression test per class of the hostile-input table (issue "Hostile input") for the shaft-file reader and the
/// shaft solve, each with an input of our own making: every one ends in the documented one-line error with file, line and
/// column, quickly. The YAML rules quoted are YAML 1.2 (sec. 5.1 printable characters; sec. 3.2.2.2 anchors and aliases).
/// </summary>
public class HostileShaftFileTests
{
    // 15 s: the first unit parse of a test run initialises the unit library (seconds on a loaded machine)
    private static SectionTwistException Parse(string text, double seconds = 15) =>
        Hostile.Refused(() => ShaftFile.Parse(text, "hostile.yaml"), seconds, "shaft-file");

    [Fact]
    public void Process_death_a_key_that_is_an_alias_of_the_node_holding_it_is_refused()
    {
        var e = Parse("? &k [a, *k]\n: 1\n");
        Assert.StartsWith("hostile.yaml:1:", e.Message);
    }

    [Fact]
    public void Process_death_an_alias_inside_its_own_anchor_is_refused()
    {
        var e = Parse("title: &t [a, b, *t]\n");
        Assert.Contains("*t", e.Message);
    }

    [Theory]
    [InlineData("[", "]")]
    [InlineData("{a: ", "}")]
    public void Process_death_nesting_fifty_thousand_levels_deep_is_refused(string open, string close)
    {
        string text = "title: " + string.Concat(Enumerable.Repeat(open, 50_000)) + "x" + string.Concat(Enumerable.Repeat(close, 50_000)) + "\n";
        var e = Parse(text);
        Assert.Contains($"deeper than {InputLimits.MaxYamlDepth}", e.Message);
    }

    [Fact]
    public void Hang_aliases_of_aliases_expanded_many_times_are_refused_early()
    {
        var b = new StringBuilder("l0: &l0 [w, w, w, w, w, w, w, w, w, w]\n");
        for (int d = 1; d < 12; d++) b.Append($"l{d}: &l{d} [{string.Join(", ", Enumerable.Repeat($"*l{d - 1}", 10))}]\n");
        var e = Parse(b.ToString(), 2);
        Assert.Contains($"more than {InputLimits.MaxYamlNodes} values", e.Message);
    }

    [Fact]
    public void Aliases_within_the_budget_still_work()
    {
        // a material written once and used twice through an alias
        string text = Hostile.Shaft().Replace("material: steel-1045-cd", "material: &m steel-1045-cd", StringComparison.Ordinal)
            + "\nreference: A\n";
        var doc = ShaftFile.Parse(text, "alias.yaml");
        Assert.Equal(2, doc.Model.Stations.Count);
    }

    [Theory]
    [InlineData("title: !<bad uri> x\n")]
    [InlineData("title: a\0b\n")]
    [InlineData("? {a: 1}\n: 2\n")]
    [InlineData("title: a\ntitle: b\n")]
    [InlineData("title: !!binary @@@\n")]
    [InlineData("stations: [{name: A, at: 0 m}, {name: B, at: *nowhere}]\n")]
    public void Crash_library_exceptions_become_the_documented_error(string text)
    {
        var e = Parse(text);
        Assert.Matches(@"^hostile\.yaml:\d+(:\d+)?: ", e.Message);
    }

    [Fact]
    public void Non_finite_a_torque_of_1e308_is_refused_with_its_line()
    {
        var e = Parse(Hostile.Shaft(load: "{at: B, torque: 1e308 N*m}"));
        Assert.StartsWith("hostile.yaml:7:", e.Message);
        Assert.Contains("torque", e.Message);
    }

    [Fact]
    public void Silent_nan_a_station_after_1e308_is_refused()
    {
        var e = Parse(Hostile.Shaft(stationB: "{name: B, after: 1e308 m}"));
        Assert.Contains("after", e.Message);
    }

    [Theory]
    [InlineData("{J: 1e-300 m^4, shearFactor: 1e-4 1/mm^3}")]
    [InlineData("{J: 1e300 m^4, shearFactor: 1e-4 1/mm^3}")]
    [InlineData("{round: 1e-300 m}")]
    [InlineData("{J: 4e5 mm^4, shearFactor: 1e300 1/mm^3}")]
    public void Values_beyond_the_computable_range_are_refused_at_their_line(string section)
    {
        var e = Parse(Hostile.Shaft(section: section));
        Assert.StartsWith("hostile.yaml:5:", e.Message);
    }

    [Fact]
    public void A_tiny_J_beside_a_normal_segment_is_refused_not_answered_with_contradictions()
    {
        // J = 1e-30 m^4 is inside the accepted range, but 1e23 times softer than the round beside it: the stiffness
        // matrix then carries no digits about it, so the solve is refused instead of reporting torque 0 with a twist.
        string text = """
            stations: [{name: A, at: 0 m}, {name: B, at: 1 m}, {name: C, at: 2 m}]
            segments:
              - {from: A, to: B, section: {round: 40 mm}, material: steel-1045-cd}
              - {from: B, to: C, section: {J: 1e-30 m^4, shearFactor: 1 1/m^3}, material: steel-1045-cd}
            loads: [{at: B, torque: 100 N*m}]
            supports: {fixed: [A, C]}
            """;
        var doc = ShaftFile.Parse(text, "tiny.yaml");
        var e = Hostile.Refused(() => ShaftSolver.Solve(doc.Model), 2, "ill-conditioned");
        Assert.Contains("stiffer than segment B-C", e.Message);
    }

    [Fact]
    public void Crash_size_a_hundred_thousand_stations_are_refused()
    {
        var b = new StringBuilder("stations:\n");
        for (int i = 0; i < 100_000; i++) b.Append("  - {name: S").Append(i).Append(", at: ").Append(i).Append(" mm}\n");
        Parse(b.ToString(), 30);
    }

    [Fact]
    public void Crash_size_more_stations_than_the_solver_takes_are_refused_by_count()
    {
        var b = new StringBuilder("stations:\n");
        for (int i = 0; i <= InputLimits.MaxStations; i++) b.Append("  - {name: S").Append(i).Append(", at: ").Append(i).Append(" mm}\n");
        var e = Parse(b.ToString());
        Assert.Contains($"more than the {InputLimits.MaxStations}", e.Message);
    }

    [Fact]
    public void Crash_size_a_model_in_code_with_too_many_stations_is_refused()
    {
        var stations = Enumerable.Range(0, InputLimits.MaxStations + 1).Select(i => new Station($"S{i}", i * 0.01)).ToArray();
        var model = new ShaftModel
        {
            Stations = stations,
            Segments = [new ShaftSegment("S0", "S1", SectionStiffness.Round(0.04), ShaftMaterials.All.Values.First())],
        };
        Hostile.Refused(() => ShaftSolver.Solve(model), 2, "shaft-too-large");
    }

    [Fact]
    public void Slow_refusal_a_value_of_four_million_characters_is_refused_quickly_without_echo()
    {
        var e = Parse("title: " + new string('x', 4_000_000) + "\n", 3);
        Assert.Contains("4000000 characters", e.Message);
        Assert.DoesNotContain("xxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxxx", e.Message);
    }

    [Fact]
    public void Crash_size_a_shaft_file_over_the_size_limit_is_refused_before_reading()
    {
        string dir = Cli.CliRunner.TempDir();
        string path = Path.Combine(dir, "huge.yaml");
        using (var f = new FileStream(path, FileMode.Create)) f.SetLength(InputLimits.MaxShaftFileBytes + 1);
        var e = Hostile.Refused(() => ShaftFile.Load(path), 2, "file-too-large");
        Assert.Contains("limit", e.Message);
    }

    [SkippableFact]
    public void Crash_size_a_path_that_links_to_an_endless_device_is_refused_at_once()
    {
        Skip.IfNot(File.Exists("/dev/zero"), "needs /dev/zero (Unix)");
        string dir = Cli.CliRunner.TempDir();
        string link = Path.Combine(dir, "endless.yaml");
        File.CreateSymbolicLink(link, "/dev/zero");
        var e = Hostile.Refused(() => ShaftFile.Load(link), 2, "not-a-file");
        Assert.Contains("not a regular file", e.Message);
    }
}
