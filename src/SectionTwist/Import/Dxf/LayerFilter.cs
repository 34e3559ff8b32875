using System.Text;
using System.Text.RegularExpressions;

namespace SectionTwist.Import.Dxf;

/// <summary>
/// The layer choice of a drawing: names and name patterns separated by commas, case-insensitive; <c>*</c> stands for
/// any run of characters and <c>?</c> for one character. A text that equals a layer name of the drawing exactly is
/// that one layer, even when it holds a comma or a wildcard character.
/// </summary>
internal sealed class LayerFilter
{
    private readonly string? _exact;
    private readonly List<(string Text, Regex? Pattern)> _items = [];

    private LayerFilter(string spec, IReadOnlyCollection<string> drawingLayers)
    {
        Spec = spec;
        if (drawingLayers.Contains(spec.Trim(), StringComparer.OrdinalIgnoreCase)) { _exact = spec.Trim(); return; }
        foreach (var raw in spec.Split(',', StringSplitOptions.TrimEntries | StringSplitOptions.RemoveEmptyEntries))
            _items.Add((raw, raw.IndexOfAny(['*', '?']) >= 0 ? ToRegex(raw) : null));
        if (_items.Count == 0)
            throw new SectionTwistException("bad-option", $"layer choice '{spec}' names no layer; give a layer name, a comma list or a pattern such as 'SHAFT*'");
    }

    /// <summary>The text as given.</summary>
    public string Spec { get; }

    /// <summary>Null when <paramref name="spec"/> is null (all layers).</summary>
    public static LayerFilter? Create(string? spec, IReadOnlyCollection<string> drawingLayers) =>
        spec is null ? null : new LayerFilter(spec, drawingLayers);

    /// <summary>True when <paramref name="layer"/> is chosen.</summary>
    public bool Matches(string layer)
    {
        if (_exact is not null) return layer.Equals(_exact, StringComparison.OrdinalIgnoreCase);
        foreach (var (text, rx) in _items)
            if (rx is null ? layer.Equals(text, StringComparison.OrdinalIgnoreCase) : rx.IsMatch(layer)) return true;
        return false;
    }

    /// <summary>Items of the choice that match none of <paramref name="layers"/> (a mistyped name or pattern).</summary>
    public IEnumerable<string> Unmatched(IEnumerable<string> layers)
    {
        var list = layers.ToList();
        if (_exact is not null) yield break;
        foreach (var (text, rx) in _items)
            if (!list.Any(l => rx is null ? l.Equals(text, StringComparison.OrdinalIgnoreCase) : rx.IsMatch(l))) yield return text;
    }

    /// <summary>"layer 'A'" or "layers 'A, B*'" for messages.</summary>
    public string Describe() => _exact is not null || _items.Count == 1 && _items[0].Pattern is null ? $"layer '{Spec}'" : $"layers '{Spec}'";

    private static Regex ToRegex(string pattern)
    {
        var sb = new StringBuilder("^");
        foreach (char c in pattern)
            sb.Append(c switch { '*' => ".*", '?' => ".", _ => Regex.Escape(c.ToString()) });
        return new Regex(sb.Append('$').ToString(), RegexOptions.IgnoreCase | RegexOptions.CultureInvariant | RegexOptions.Singleline, TimeSpan.FromSeconds(1));
    }
}
