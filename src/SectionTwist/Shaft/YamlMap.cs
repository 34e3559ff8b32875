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
                string? near = Nearest(key, allowed);
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
        Get(key) ?? throw File.Error(Node, key, $"{What} needs '{key}'; {hint}");

    public string? String(string key)
    {
        var n = Get(key);
        if (n is null) return null;
        if (n is YamlScalarNode s) return s.Value ?? "";
        throw File.Error(n, key, $"expected a single value, found {Describe(n)}");
    }

    public string RequireString(string key, string hint) => String(key) ?? throw File.Error(Node, key, $"{What} needs '{key}'; {hint}");

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

    /// <summary>The allowed word nearest to <paramref name="word"/> by edit distance (at most 3, case-insensitive), or null.</summary>
    internal static string? Nearest(string word, IEnumerable<string> candidates)
    {
        string? best = null;
        int bestD = int.MaxValue;
        foreach (var c in candidates)
        {
            int d = Distance(word.ToLowerInvariant(), c.ToLowerInvariant());
            if (d < bestD) { bestD = d; best = c; }
        }
        return bestD <= Math.Max(2, Math.Min(3, word.Length / 2)) ? best : null;
    }

    private static int Distance(string a, string b)
    {
        var prev = new int[b.Length + 1];
        var cur = new int[b.Length + 1];
        for (int j = 0; j <= b.Length; j++) prev[j] = j;
        for (int i = 1; i <= a.Length; i++)
        {
            cur[0] = i;
            for (int j = 1; j <= b.Length; j++)
                cur[j] = Math.Min(Math.Min(cur[j - 1] + 1, prev[j] + 1), prev[j - 1] + (a[i - 1] == b[j - 1] ? 0 : 1));
            (prev, cur) = (cur, prev);
        }
        return prev[b.Length];
    }
}
