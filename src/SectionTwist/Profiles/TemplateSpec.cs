namespace SectionTwist.Profiles;

/// <summary>
/// The text form of a template spec: <c>name:key=value,key=value</c> (an item without <c>=</c> is positional, e.g.
/// <c>iso14:8x32x36</c>). Values are kept as text here; <see cref="TemplateArguments"/> types and checks them.
/// </summary>
/// <param name="Name">Template name as written (matched case-insensitively).</param>
/// <param name="Body">Everything after the first colon (empty when there is none).</param>
/// <param name="Items">The comma-separated items: key (null for positional) and value text.</param>
internal sealed record TemplateSpec(string Name, string Body, IReadOnlyList<(string? Key, string Value)> Items)
{
    /// <summary>Splits a spec into name and items; throws a <see cref="SectionTwistException"/> on empty keys or values and repeated keys.</summary>
    public static TemplateSpec Parse(string spec)
    {
        ArgumentNullException.ThrowIfNull(spec);
        string text = spec.Trim();
        int colon = text.IndexOf(':', StringComparison.Ordinal);
        string name = (colon < 0 ? text : text[..colon]).Trim();
        string body = colon < 0 ? "" : text[(colon + 1)..].Trim();
        if (name.Length == 0)
            throw new SectionTwistException("bad-spec", $"'{spec}': no template name; write NAME:key=value,... (run 'sectiontwist templates' for the list)");
        var items = new List<(string?, string)>();
        var seen = new HashSet<string>(StringComparer.Ordinal);
        foreach (string raw in body.Split(',', StringSplitOptions.TrimEntries | StringSplitOptions.RemoveEmptyEntries))
        {
            int eq = raw.IndexOf('=', StringComparison.Ordinal);
            if (eq < 0) { items.Add((null, raw)); continue; }
            string key = raw[..eq].Trim(), value = raw[(eq + 1)..].Trim();
            if (key.Length == 0)
                throw new SectionTwistException("bad-spec", $"'{spec}': item '{raw}' has no key before '='; write key=value");
            if (value.Length == 0)
                throw new SectionTwistException("bad-spec", $"'{spec}': key '{key}' has no value; write {key}=VALUE");
            if (!seen.Add(key))
                throw new SectionTwistException("bad-spec", $"'{spec}': key '{key}' is given twice; keep one");
            items.Add((key, value));
        }
        return new TemplateSpec(name, body, items);
    }

    /// <summary>Builds a spec from a name and key/value items.</summary>
    public static TemplateSpec Of(string name, IEnumerable<(string? Key, string Value)> items)
    {
        var list = items.ToList();
        return new TemplateSpec(name, string.Join(",", list.Select(FormatItem)), list);
    }

    /// <summary>The value of <paramref name="key"/>, or null.</summary>
    public string? this[string key] => Items.FirstOrDefault(i => i.Key == key).Value;

    /// <summary>This spec with <paramref name="key"/> set to <paramref name="value"/> (replaced or appended).</summary>
    public TemplateSpec With(string key, string value)
    {
        var list = Items.ToList();
        int i = list.FindIndex(x => x.Key == key);
        if (i >= 0) list[i] = (key, value); else list.Add((key, value));
        return Of(Name, list);
    }

    private static string FormatItem((string? Key, string Value) i) => i.Key is null ? i.Value : i.Key + "=" + i.Value;

    /// <summary>The spec as text: <c>name:key=value,...</c>.</summary>
    public override string ToString() => Body.Length == 0 ? Name : Name + ":" + Body;
}
