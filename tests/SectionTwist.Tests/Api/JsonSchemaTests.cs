using System.Text.Json.Nodes;
using Json.Schema;
using SectionTwist.Cli;

namespace SectionTwist.Tests.Api;

/// <summary>
/// Every <c>--json</c> output of the command validates against its schema in docs/schemas (JSON Schema 2020-12, checked
/// with JsonSchema.Net). The schemas forbid unknown properties, so a new output field fails here until it is documented.
/// </summary>
public sealed class JsonSchemaTests : IDisposable
{
    private readonly string _dir = Directory.CreateTempSubdirectory("jsonschema").FullName;

    public void Dispose() => Directory.Delete(_dir, recursive: true);

    private static (int Code, string Out, string Err) Run(params string[] argv) => SectionTwist.Tests.Cli.CliRunner.Run(argv);

    private static JsonNode ValidOutput(string schemaName, params string[] argv)
    {
        var (code, output, err) = Run(argv);
        Assert.True(code == 0, $"sectiontwist {string.Join(' ', argv)} exited {code}: {err}");
        var schema = JsonSchema.FromFile(Path.Combine(RepoPaths.Root, "docs", "schemas", schemaName + ".schema.json"));
        var node = JsonNode.Parse(output)!;
        var result = schema.Evaluate(node, new EvaluationOptions { OutputFormat = OutputFormat.List });
        var errors = (result.Details ?? [])
            .Where(d => d.Errors is { Count: > 0 })
            .SelectMany(d => d.Errors!.Select(e => $"{d.InstanceLocation} ({d.EvaluationPath}): {e.Key}: {e.Value}"));
        Assert.True(result.IsValid, $"output of sectiontwist {string.Join(' ', argv)} does not match docs/schemas/{schemaName}.schema.json:\n" +
                                    string.Join("\n", errors.Take(20)));
        return node;
    }

    [Fact]
    public void Section_json_matches_its_schema()
    {
        var n = ValidOutput("section", "section", "tube:D=50,d=40", "--accuracy", "1e-3", "--json");
        Assert.Equal("tube:D=50,d=40", (string?)n["source"]);
    }

    [Fact]
    public void Section_json_with_warnings_and_an_unbounded_shear_estimate_matches_its_schema()
    {
        // A sharp keyseat: the peak-shear error estimate is infinite (written as null) and warnings are present.
        var n = ValidOutput("section", "section", "keyed:d=40,r=0", "--accuracy", "1e-3", "--json");
        Assert.Null(n["estimatedRelativeError"]!["maxShear"]);
        Assert.NotEmpty(n["warnings"]!.AsArray());
    }

    [Fact]
    public void Section_json_with_plastic_results_matches_its_schema()
    {
        var n = ValidOutput("section", "section", "circle:d=40", "--accuracy", "1e-3", "--plastic", "140MPa", "--json");
        // circle: shape factor 4/3 (sand-heap analogy, Nadai; see PlasticClosedFormTests)
        Tol.Rel(4.0 / 3, (double)n["plastic"]!["shapeFactor"]!, 1e-3, "circle shape factor 4/3");
    }

    [Fact]
    public void Section_json_with_warping_matches_its_schema()
    {
        var n = ValidOutput("section", "section", "channel:h=100,b=50,tw=6,tf=8.5,r=8.5", "--accuracy", "1e-3", "--warping", "--json");
        Assert.True((double)n["shearCentre"]!["x"]! < 0, "a channel's shear centre lies behind the web");
        Assert.Equal("warping-sensitive", (string?)n["warping"]!["classification"]);
    }

    [Fact]
    public void Sweep_json_matches_its_schema()
    {
        var n = ValidOutput("sweep", "sweep", "rect:b=40,h=10", "--vary", "h=10:20:2", "--accuracy", "1e-3", "--json");
        Assert.Equal(2, n["steps"]!.AsArray().Count);
    }

    [Fact]
    public void Section_batch_json_lines_match_their_schema()
    {
        var (code, output, _) = Run("section", "circle:d=40", "keyed:d=40,r=0", "circle:d=-1", "--accuracy", "1e-3", "--json");
        Assert.Equal(2, code);
        var schema = JsonSchema.FromFile(Path.Combine(RepoPaths.Root, "docs", "schemas", "section-batch.schema.json"));
        var lines = output.TrimEnd().Split('\n');
        Assert.Equal(3, lines.Length);
        foreach (var line in lines)
            Assert.True(schema.Evaluate(JsonNode.Parse(line)).IsValid, $"line does not match docs/schemas/section-batch.schema.json: {line}");
        Assert.Equal("error", (string?)JsonNode.Parse(lines[2])!["status"]);
        // an ok line without its results, or with an error, breaks the schema
        Assert.False(schema.Evaluate(JsonNode.Parse("{\"index\":0,\"source\":\"x\",\"status\":\"ok\"}")).IsValid);
    }

    [Theory]
    [InlineData("")]
    [InlineData("keyed")]
    public void Templates_json_matches_its_schema(string name)
    {
        var n = name.Length == 0 ? ValidOutput("templates", "templates", "--json") : ValidOutput("templates", "templates", name, "--json");
        Assert.Equal(name.Length == 0 ? SectionTwist.Profiles.ProfileTemplates.All.Count : 1, n.AsArray().Count);
    }

    [Fact]
    public void Verify_json_matches_its_schema()
    {
        var n = ValidOutput("verify", "verify", "--json");
        Assert.True((bool)n["passed"]!);
        Assert.Equal(SectionTwist.Verification.VerificationSuite.Cases.Count, n["cases"]!.AsArray().Count);
    }

    [Fact]
    public void Shaft_json_of_a_fixed_shaft_with_a_spring_and_a_taper_matches_its_schema()
    {
        string yaml = """
            title: schema check
            units: {length: mm, torque: N*m}
            materials:
              steel: {library: steel-1045-cd}
            sections:
              journal: {round: 40}
            stations:
              - {name: A, at: 0}
              - {name: B, after: 100}
              - {name: C, after: 200}
              - {name: E, after: 50}
            segments:
              - {from: A, to: B, section: journal, material: steel}
              - {from: B, to: C, taper: {from: 40, to: 30}, material: steel}
              - {from: C, to: E, section: {tube: {outer: 30, inner: 20}}, material: steel}
            loads:
              - {at: B, torque: 250}
              - {from: B, to: C, torquePerLength: -100 N*m/m}
            supports:
              fixed: [A]
            springs:
              - {name: coupling, between: [A, C], stiffness: 50 kN*m/rad}
            twistLimit: 0.25 deg/m
            """;
        string path = Path.Combine(_dir, "check.yaml");
        File.WriteAllText(path, yaml);
        var n = ValidOutput("shaft", "shaft", path, "--json");
        Assert.Single(n["reactions"]!.AsArray());
        Assert.Single(n["springs"]!.AsArray());
        // Segment C-E carries no torque: its factor of safety is infinite, written as null.
        Assert.Null(n["segments"]!.AsArray()[2]!["safetyFactor"]);
    }

    [Fact]
    public void Shaft_json_of_the_winch_sample_matches_its_schema()
    {
        var n = ValidOutput("shaft", "shaft", Path.Combine(RepoPaths.SampleProfiles, "winch-shaft.yaml"), "--json");
        Assert.Equal("motor", (string?)n["referenceStation"]);
    }

    [Fact]
    public void Shaft_json_with_an_unbounded_peak_and_warnings_matches_its_schema()
    {
        // A sharp keyseat (keyed:d=50,r=0, no floor radius) in a loaded segment: maxShear and safetyFactor null, warnings present.
        string yaml = """
            units: {length: mm, torque: N*m}
            stations:
              - {name: A, at: 0}
              - {name: B, at: 100}
            segments:
              - {from: A, to: B, section: {template: "keyed:d=50,r=0"}, material: steel-1045-cd}
            loads:
              - {at: B, torque: 300}
            supports: {fixed: [A]}
            """;
        string path = Path.Combine(_dir, "sharp.yaml");
        File.WriteAllText(path, yaml);
        var n = ValidOutput("shaft", "shaft", path, "--json");
        Assert.Null(n["segments"]![0]!["maxShear"]);
        Assert.NotEmpty(n["warnings"]!.AsArray());
    }

    [Fact]
    public void Shaft_json_with_restrained_warping_matches_its_schema()
    {
        var n = ValidOutput("shaft", "shaft", Path.Combine(RepoPaths.SampleProfiles, "conveyor-cross-beam.yaml"), "--json");
        Assert.Equal(2, n["warping"]!["segments"]!.AsArray().Count);
    }

    [Fact]
    public void Shaft_json_with_bending_of_the_conveyor_sample_matches_its_schema()
    {
        var n = ValidOutput("shaft", "shaft", Path.Combine(RepoPaths.SampleProfiles, "conveyor-head-shaft.yaml"), "--json");
        var b = n["bending"]!;
        Assert.Equal(2, b["bearings"]!.AsArray().Count);
        Assert.Single(b["fatigue"]!.AsArray());
        Assert.Single(b["connections"]!.AsArray());
    }

    [Fact]
    public void A_schema_rejects_output_that_breaks_it()
    {
        // The validator itself must reject: a missing required field and an unknown extra field.
        var schema = JsonSchema.FromFile(Path.Combine(RepoPaths.Root, "docs", "schemas", "verify.schema.json"));
        var (_, output, _) = Run("verify", "--json", "--accuracy", "1e-3");
        var node = JsonNode.Parse(output)!.AsObject();
        node.Remove("total");
        Assert.False(schema.Evaluate(node).IsValid);
        node["total"] = 1;
        node["extra"] = "x";
        Assert.False(schema.Evaluate(node).IsValid);
        node.Remove("extra");
        Assert.True(schema.Evaluate(node).IsValid);
    }
}
