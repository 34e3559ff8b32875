using YamlDotNet.RepresentationModel;

namespace SectionTwist.Shaft;

/// <summary>
/// A YAML mapping of the shaft file with the keys it may hold. Unknown keys are reported at construction with file,
/// line and the nearest allowed key; every value read keeps its position for later messages.
/// </summary>
internal sealed class YamlMap
{
    private readonly Dictionary<string, (YamlNode Key, YamlNode Value)> _entries = new(StringComparer.Ordinal);

    public YamlMap(ShaftFileContext file, YamlNode node, string what, params string[] allowed)
    {
        File = file; Node = node; What = what;
        if (node is not YamlMappingNode map)
            throw file.Error(node, what, $"expected a mapping of keys ({string.Join(", ", allowed)}), found {Describe(node)}");
        foreach (var (k, v) in map.Children)
        {
            string key = k is YamlScalarNode s ? s.Value ?? "" : "";
            if (!allowed.Contains(key, StringComparer.Ordinal))
            {
                string? near = Suggest.Nearest(key, allowed);
                throw file.Error(k, key, $"unknown key in {what}{(near is null ? "" : $"; did you mean '{near}'?")} (allowed: {string.Join(", ", allowed)})");
            }
            _entries[key] = (k, v);
        }
    }

    public ShaftFileContext File { get; }
    public YamlNode Node { get; }
    public string What { get; }

    public bool Has(string key) => _entries.ContainsKey(key);

    public YamlNode? Get(string key) => _entries.TryGetValue(key, out var e) ? e.Value : null;

    public YamlNode Require(string key, string hint) =>
        Get(key) ?? throw File.Error(Node, key, $"{What} needs '{YamlGuard.Short(key)}'; {hint}");

    public string? String(string key)
    {
        var n = Get(key);
        if (n is null) return null;
        if (n is YamlScalarNode s) return s.Value ?? "";
        throw File.Error(n, key, $"expected a single value, found {Describe(n)}");
    }

    public string RequireString(string key, string hint) => String(key) ?? throw File.Error(Node, key, $"{What} needs '{YamlGuard.Short(key)}'; {hint}");

    /// <summary>A value of <paramref name="kind"/> in SI, or null when the key is absent.</summary>
    public double? Quantity(string key, QuantityKind kind) => Get(key) is { } n ? File.Quantity(n, key, kind) : null;

    /// <summary>Position of the key itself (for messages about the entry).</summary>
    public YamlNode KeyNode(string key) => _entries.TryGetValue(key, out var e) ? e.Key : Node;

    internal static string Describe(YamlNode n) => n switch
    {
        YamlMappingNode => "a mapping",
        YamlSequenceNode => "a list",
        YamlScalarNode s => $"'{YamlGuard.Short(s.Value ?? "")}'",
        _ => "nothing",
    };

    /// <summary>Names for a message: at most twelve, then how many there are in all.</summary>
    internal static string Names(IEnumerable<string> names)
    {
        var list = names.ToList();
        string shown = string.Join(", ", list.Take(12).Select(n => YamlGuard.Short(n, 30)));
        return list.Count <= 12 ? shown : $"{shown}, ... ({list.Count} in all)";
    }
}
