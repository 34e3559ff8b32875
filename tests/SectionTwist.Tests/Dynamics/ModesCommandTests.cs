using System.Text.Json.Nodes;
using Json.Schema;
using SectionTwist.Tests.Cli;
using Xunit;

namespace SectionTwist.Tests.Dynamics;

/// <summary>The <c>modes</c> command on the demo file: tables, JSON against its schema, the report, input errors.</summary>
public class ModesCommandTests
{
    private static readonly string Winch = Path.Combine(RepoPaths.SampleProfiles, "winch-shaft.yaml");

    [Fact]
    public void Json_of_the_winch_drive_matches_its_schema_and_the_demo_story()
    {
        var (code, output, err) = CliRunner.Run("modes", Winch, "--json");
        Assert.True(code == 0, err);
        var schema = JsonSchema.FromFile(Path.Combine(RepoPaths.Root, "docs", "schemas", "modes.schema.json"));
        var node = JsonNode.Parse(output)!;
        var result = schema.Evaluate(node, new EvaluationOptions { OutputFormat = OutputFormat.List });
        var errors = (result.Details ?? []).Where(d => d.Errors is { Count: > 0 }).SelectMany(d => d.Errors!.Select(e => $"{d.InstanceLocation}: {e.Key}: {e.Value}"));
        Assert.True(result.IsValid, string.Join("\n", errors.Take(20)));
        Assert.Equal(1, (int)node["rigidBodyModes"]!);
        Assert.True((bool)node["modes"]![0]!["isRigidBody"]!);
        Assert.NotNull(node["resonance"]);
        Assert.NotNull(node["forcedResponse"]);
        // the gear stage 13/157: the motor shaft turns 157/13 times as fast as the drum shaft, the other way
        var rotor = node["stations"]!.AsArray().Single(s => (string?)s!["name"] == "rotor")!;
        Tol.Rel(-157.0 / 13, (double)rotor["speedRatio"]!, 1e-12, "tooth counts of the demo");
    }

    [Fact]
    public void Tables_and_report_are_written()
    {
        string dir = CliRunner.TempDir();
        string report = Path.Combine(dir, "modes.html");
        var (code, output, err) = CliRunner.Run("modes", Winch, "--report", report);
        Assert.True(code == 0, err);
        Assert.Contains("rigid body", output, StringComparison.Ordinal);
        Assert.Contains("interference check", output, StringComparison.Ordinal);
        Assert.Contains("common practice, not a code value", output, StringComparison.Ordinal);
        Assert.Contains("defer to the drive supplier", output, StringComparison.Ordinal);
        string html = File.ReadAllText(report);
        Assert.Contains("Interference diagram", html, StringComparison.Ordinal);
        Assert.Contains("Mode shapes", html, StringComparison.Ordinal);
        Assert.Equal(2, System.Text.RegularExpressions.Regex.Matches(html, "data:image/png;base64").Count);
    }

    [Fact]
    public void A_file_without_dynamics_is_refused_with_a_remedy()
    {
        string dir = CliRunner.TempDir();
        string path = Path.Combine(dir, "plain.yaml");
        File.WriteAllText(path, """
            units: {length: mm, torque: N*m}
            stations: [{name: A, at: 0}, {name: B, at: 100}]
            segments: [{from: A, to: B, section: {round: 20}, material: steel-s355}]
            supports: {fixed: A}
            """);
        var (code, _, err) = CliRunner.Run("modes", path);
        Assert.Equal(2, code);
        Assert.Contains("no 'dynamics' block", err, StringComparison.Ordinal);
        Assert.DoesNotContain("   at ", err, StringComparison.Ordinal);
    }

    [Fact]
    public void A_file_without_dynamics_is_refused_before_its_sections_are_analysed()
    {
        // a template section would take a finite-element analysis first (its progress line says 'analysed'): the refusal
        // must come before it (common practice, no source: fail fast on a missing block)
        string dir = CliRunner.TempDir();
        string path = Path.Combine(dir, "keyed.yaml");
        File.WriteAllText(path, """
            units: {length: mm, torque: N*m}
            sections: {k: {template: "keyed:d=40,r=0.4"}}
            stations: [{name: A, at: 0}, {name: B, at: 100}]
            segments: [{from: A, to: B, section: k, material: steel-s355}]
            supports: {fixed: A}
            """);
        var (code, _, err) = CliRunner.Run("modes", path);
        Assert.Equal(2, code);
        Assert.Contains("no 'dynamics' block", err, StringComparison.Ordinal);
        Assert.DoesNotContain("analysed", err, StringComparison.Ordinal);
    }
}
