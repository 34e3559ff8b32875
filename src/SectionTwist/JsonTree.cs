using System.Text.Encodings.Web;
using System.Text.Json;
using System.Text.Json.Nodes;

namespace SectionTwist;

/// <summary>
/// Builds the JSON outputs as <see cref="JsonNode"/> trees and writes them without reflection, so the same code serves the
/// framework-dependent build and the ahead-of-time compiled tool (which has no reflection-based serializer). Numbers that
/// are not finite (an infinite factor of safety of an unloaded segment) are written as null: JSON has no infinity.
/// </summary>
internal static class JsonTree
{
    private static readonly JsonSerializerOptions Indented = new() { WriteIndented = true, Encoder = JavaScriptEncoder.Default };

    /// <summary>An array of the projected items (null items stay null); null when there are no items at all.</summary>
    public static JsonArray? Arr<T>(IEnumerable<T>? items, Func<T, JsonNode?> project)
    {
        if (items is null) return null;
        var a = new JsonArray();
        foreach (var x in items) a.Add(project(x));
        return a;
    }

    /// <summary>An array of strings.</summary>
    public static JsonArray? Arr(IEnumerable<string>? items) => Arr(items, s => (JsonNode?)s);

    /// <summary>The tree as indented JSON text, non-finite numbers replaced by null.</summary>
    public static string Write(JsonNode root)
    {
        ReplaceNonFinite(root);
        return root.ToJsonString(Indented);
    }

    private static void ReplaceNonFinite(JsonNode? node)
    {
        switch (node)
        {
            case JsonObject o:
                foreach (var key in o.Select(kv => kv.Key).ToList())
                {
                    if (IsNonFinite(o[key])) o[key] = null;
                    else ReplaceNonFinite(o[key]);
                }
                break;
            case JsonArray a:
                for (int i = 0; i < a.Count; i++)
                {
                    if (IsNonFinite(a[i])) a[i] = null;
                    else ReplaceNonFinite(a[i]);
                }
                break;
        }
    }

    private static bool IsNonFinite(JsonNode? n) =>
        n is JsonValue v && v.TryGetValue<double>(out var d) && !double.IsFinite(d);
}
