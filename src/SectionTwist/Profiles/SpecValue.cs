using System.Globalization;
using System.Text.RegularExpressions;

namespace SectionTwist.Profiles;

/// <summary>A number with an optional unit word as written in a spec value, e.g. <c>40</c>, <c>40mm</c>, <c>0.25 in</c>, <c>30deg</c>.</summary>
/// <param name="Number">The number.</param>
/// <param name="Unit">The unit word as written (empty when none).</param>
internal readonly partial record struct SpecValue(double Number, string Unit)
{
    [GeneratedRegex(@"^\s*([-+]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][-+]?\d+)?)\s*([A-Za-z""'°µ%]*)\s*$", RegexOptions.CultureInvariant)]
    private static partial Regex Pattern();

    /// <summary>Parses <paramref name="text"/>; false when it is not a finite number followed by an optional unit word.</summary>
    public static bool TryParse(string text, out SpecValue value)
    {
        var m = Pattern().Match(text);
        if (m.Success && double.TryParse(m.Groups[1].Value, NumberStyles.Float, CultureInfo.InvariantCulture, out double v) && double.IsFinite(v))
        {
            value = new SpecValue(v, m.Groups[2].Value);
            return true;
        }
        value = default;
        return false;
    }

    /// <summary>The value written back so that <see cref="TryParse"/> gives the same number and unit.</summary>
    public override string ToString() => Number.ToString("R", CultureInfo.InvariantCulture) + Unit;
}
