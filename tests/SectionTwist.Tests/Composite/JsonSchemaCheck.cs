using System.Text.Json.Nodes;
using Json.Schema;
using SectionTwist.Tests.Cli;

namespace SectionTwist.Tests.Composite;

/// <summary>Runs the command and validates its JSON against a schema in docs/schemas (as JsonSchemaTests does).</summary>
internal static class JsonSchemaCheck
{
    public static JsonNode Valid(string schemaName, params string[] argv)
    {
        var (code, output, err) = CliRunner.Run(argv);
        Assert.True(code == 0, $"sectiontwist {string.Join(' ', argv)} exited {code}: {err}");
        var schema = JsonSchema.FromFile(Path.Combine(RepoPaths.Root, "docs", "schemas", schemaName + ".schema.json"));
        var node = JsonNode.Parse(output)!;
        var result = schema.Evaluate(node, new EvaluationOptions { OutputFormat = OutputFormat.List });
        var errors = (result.Details ?? []).Where(d => d.Errors is { Count: > 0 })
            .SelectMany(d => d.Errors!.Select(e => $"{d.InstanceLocation}: {e.Key}: {e.Value}"));
        Assert.True(result.IsValid, $"output does not match docs/schemas/{schemaName}.schema.json:\n" + string.Join("\n", errors.Take(20)));
        return node;
    }
}
