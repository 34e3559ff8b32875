using System.Globalization;

namespace SectionTwist.Cli;

/// <summary>
/// A small command-line reader: positional words, <c>--name value</c>, <c>--name=value</c> and flags.
/// Options not consumed by the command are reported by <see cref="EnsureAllUsed"/> as an error.
/// </summary>
internal sealed class Args
{
    private readonly List<string> _positional = [];
    private readonly List<(string Name, string? Value)> _options = [];
    private readonly HashSet<int> _used = [];

    public Args(IEnumerable<string> argv)
    {
        var list = argv.ToList();
        for (int i = 0; i < list.Count; i++)
        {
            string a = list[i];
            if (a.StartsWith("--", StringComparison.Ordinal) && a.Length > 2)
            {
                int eq = a.IndexOf('=', StringComparison.Ordinal);
                if (eq > 0) _options.Add((a[2..eq], a[(eq + 1)..]));
                else if (i + 1 < list.Count && !list[i + 1].StartsWith("--", StringComparison.Ordinal)) _options.Add((a[2..], list[++i]));
                else _options.Add((a[2..], null));
            }
            else _positional.Add(a);
        }
    }

    public IReadOnlyList<string> Positional => _positional;

    /// <summary>True when the flag is present. A value that was read greedily after it is returned to the positional list.</summary>
    public bool Flag(string name)
    {
        for (int i = 0; i < _options.Count; i++)
        {
            if (_options[i].Name != name) continue;
            _used.Add(i);
            if (_options[i].Value is { } v && !IsBool(v)) { _positional.Add(v); _options[i] = (name, null); }
            return _options[i].Value is null || v_true(_options[i].Value!);
        }
        return false;

        static bool IsBool(string v) => v is "true" or "false";
        static bool v_true(string v) => v == "true";
    }

    public string? Option(string name)
    {
        for (int i = _options.Count - 1; i >= 0; i--)
        {
            if (_options[i].Name != name) continue;
            _used.Add(i);
            return _options[i].Value ?? throw new UsageException($"--{name} needs a value");
        }
        return null;
    }

    /// <summary>Every value of a repeatable option, in command-line order.</summary>
    public IReadOnlyList<string> Options(string name)
    {
        var list = new List<string>();
        for (int i = 0; i < _options.Count; i++)
        {
            if (_options[i].Name != name) continue;
            _used.Add(i);
            list.Add(_options[i].Value ?? throw new UsageException($"--{name} needs a value"));
        }
        return list;
    }

    public double? Double(string name)
    {
        string? s = Option(name);
        if (s is null) return null;
        if (!double.TryParse(s, NumberStyles.Float, CultureInfo.InvariantCulture, out double v) || !double.IsFinite(v))
            throw new UsageException($"--{name}: '{s}' is not a number");
        return v;
    }

    public int? Int(string name)
    {
        string? s = Option(name);
        if (s is null) return null;
        if (!int.TryParse(s, NumberStyles.Integer, CultureInfo.InvariantCulture, out int v))
            throw new UsageException($"--{name}: '{s}' is not a whole number");
        return v;
    }

    /// <summary>The options the command knows (names without dashes), for suggestions; empty when not given.</summary>
    public IReadOnlyList<string> Known { get; init; } = [];

    /// <summary>Throws a usage error for the first option no one asked for, with the nearest of <see cref="Known"/> as a suggestion.</summary>
    public void EnsureAllUsed()
    {
        for (int i = 0; i < _options.Count; i++)
        {
            if (_used.Contains(i)) continue;
            string name = _options[i].Name;
            string hint = Suggest.Nearest(name, Known) is { } near ? $"; did you mean --{near}?" : "";
            throw new UsageException($"unknown option --{name}{hint}");
        }
    }

    /// <summary>The option names (without dashes) a usage text mentions, e.g. <c>accuracy</c> for <c>--accuracy REL</c>.</summary>
    public static IReadOnlyList<string> OptionsIn(string usage) =>
        System.Text.RegularExpressions.Regex.Matches(usage, @"--([a-z][a-z0-9-]*)").Select(m => m.Groups[1].Value).Append("help").Distinct().ToList();
}
