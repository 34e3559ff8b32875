using System.Globalization;
using SectionTwist.Units;

namespace SectionTwist.Profiles;

/// <summary>
/// The typed values of one spec for one template: lengths in metres, angles in radians. Every accessor checks its key
/// against the template's parameter list and throws a one-line <see cref="SectionTwistException"/> naming the spec,
/// the key and the remedy.
/// </summary>
internal sealed class TemplateArguments
{
    private readonly Dictionary<string, string> _values = new(StringComparer.Ordinal);
    private readonly TemplateInfo _info;

    public TemplateArguments(string spec, TemplateInfo info, IEnumerable<(string Key, string Value)> values, LengthUnit defaultUnit)
    {
        Spec = spec;
        _info = info;
        DefaultUnit = defaultUnit;
        foreach (var (key, value) in values)
        {
            if (info.Find(key) is null)
            {
                string near = info.Parameters.FirstOrDefault(p => string.Equals(p.Key, key, StringComparison.OrdinalIgnoreCase)) is { } p
                    ? $" (keys are case-sensitive: did you mean '{p.Key}'?)" : Suggest.DidYouMean(key, info.Parameters.Select(q => q.Key));
                throw new SectionTwistException("unknown-key",
                    $"{spec}: template '{info.Name}' has no key '{key}'{near}; its keys are {string.Join(", ", info.Parameters.Select(q => q.Key))}");
            }
            _values[key] = value;
        }
        // Parse every value now so that a bad number is reported even when the template does not read the key.
        foreach (var (key, _) in _values)
        {
            var par = info.Find(key)!;
            switch (par.Kind)
            {
                case ParameterKind.Length: _ = ParseLength(key); break;
                case ParameterKind.Angle: _ = ParseAngle(key, _values[key]); break;
                case ParameterKind.AngleList: _ = Angles(key, []); break;
                case ParameterKind.Count: _ = Count(key, 0); break;
                case ParameterKind.Number: _ = Number(key, 0); break;
                default: _ = Choice(key, par.Choices[0]); break;
            }
        }
    }

    /// <summary>The spec text, for messages.</summary>
    public string Spec { get; }

    /// <summary>The unit of bare numbers.</summary>
    public LengthUnit DefaultUnit { get; }

    /// <summary>The first unit written explicitly on a length value (in parameter order), or null.</summary>
    public LengthUnit? FirstExplicitUnit { get; private set; }

    /// <summary>The unit for display: the first explicit one, else the default.</summary>
    public LengthUnit DisplayUnit => FirstExplicitUnit ?? DefaultUnit;

    /// <summary>Cautions raised while building (e.g. a default quoted from memory of a standard), in order.</summary>
    public List<Geometry.ProfileWarning> Warnings { get; } = [];

    /// <summary>
    /// Records that a value quoted from memory of a standard (not checked against the standard's text) supplied the
    /// default of <paramref name="key"/>: <paramref name="what"/> names the value, the remedy is appended.
    /// </summary>
    public void DefaultFromMemory(string key, string what) => DefaultFromMemory(key, what, $"give {key}= explicitly");

    /// <summary>As <see cref="DefaultFromMemory(string, string)"/> with the given remedy (e.g. several keys to give).</summary>
    public void DefaultFromMemory(string key, string what, string remedy) =>
        Warnings.Add(new Geometry.ProfileWarning("default-from-memory",
            $"{Spec}: {key}: default {what} quoted from memory of the standard (not checked against its text); compare it with the standard or your drawing, or {remedy}"));

    /// <summary>True when the spec gives <paramref name="key"/>.</summary>
    public bool Has(string key) => _values.ContainsKey(key);

    /// <summary>An error about <paramref name="key"/> of this spec.</summary>
    public SectionTwistException Error(string key, string message) =>
        new("bad-template-parameter", $"{Spec}: {key}: {message}");

    /// <summary>A length in metres formatted in the display unit, e.g. <c>12 mm</c>.</summary>
    public string Show(double metres) => LengthUnit.Inv(DisplayUnit.FromMetres(metres), "G6") + " " + DisplayUnit.Symbol;

    /// <summary>A required positive length, metres.</summary>
    public double Length(string key)
    {
        if (!Has(key)) throw Missing(key);
        double v = ParseLength(key);
        if (!(v > 0)) throw Error(key, $"must be positive, got {_values[key]}");
        return v;
    }

    /// <summary>An optional positive length, metres; <paramref name="fallback"/> when not given.</summary>
    public double Length(string key, double fallback) => Has(key) ? Length(key) : fallback;

    /// <summary>An optional length that may be zero (a radius), metres.</summary>
    public double LengthOrZero(string key, double fallback)
    {
        if (!Has(key)) return fallback;
        double v = ParseLength(key);
        if (v < 0) throw Error(key, $"must not be negative, got {_values[key]}");
        return v;
    }

    /// <summary>An optional angle, radians.</summary>
    public double Angle(string key, double fallbackRadians) => Has(key) ? ParseAngle(key, _values[key]) : fallbackRadians;

    /// <summary>An optional list of angles separated by '/', radians.</summary>
    public double[] Angles(string key, double[] fallbackRadians) =>
        Has(key) ? _values[key].Split('/', StringSplitOptions.TrimEntries).Select(s => ParseAngle(key, s)).ToArray() : fallbackRadians;

    /// <summary>A required whole number.</summary>
    public int Count(string key) => Has(key) ? Count(key, 0) : throw Missing(key);

    /// <summary>An optional whole number.</summary>
    public int Count(string key, int fallback)
    {
        if (!Has(key)) return fallback;
        string s = _values[key];
        if (!int.TryParse(s, NumberStyles.Integer, CultureInfo.InvariantCulture, out int n))
            throw Error(key, $"'{s}' is not a whole number; write e.g. {key}=2");
        return n;
    }

    /// <summary>An optional plain number (a trailing % is allowed and ignored).</summary>
    public double Number(string key, double fallback)
    {
        if (!Has(key)) return fallback;
        string s = _values[key];
        if (!SpecValue.TryParse(s, out var v) || (v.Unit.Length > 0 && v.Unit != "%"))
            throw Error(key, $"'{s}' is not a plain number; write e.g. {key}=14");
        return v.Number;
    }

    /// <summary>An optional word from the parameter's choices (case-insensitive), returned in its listed spelling.</summary>
    public string Choice(string key, string fallback)
    {
        if (!Has(key)) return fallback;
        var par = _info.Find(key)!;
        string s = _values[key];
        return par.Choices.FirstOrDefault(c => string.Equals(c, s, StringComparison.OrdinalIgnoreCase))
            ?? throw Error(key, $"'{s}' is not one of {string.Join(", ", par.Choices)}{Suggest.DidYouMean(s, par.Choices)}");
    }

    private SectionTwistException Missing(string key) =>
        new("missing-key", $"{Spec}: template '{_info.Name}' needs {key} ({_info.Find(key)?.Description}); add {key}=VALUE, e.g. {_info.Example}");

    private double ParseLength(string key)
    {
        string s = _values[key];
        if (!SpecValue.TryParse(s, out var v))
            throw Error(key, $"'{s}' is not a length; write a number with an optional unit, e.g. {key}=40 or {key}=1.5in");
        if (v.Unit.Length == 0) return InRange(key, s, DefaultUnit.ToMetres(v.Number), true);
        if (!LengthUnit.TryParse(v.Unit, out var unit))
            throw Error(key, $"unknown length unit '{v.Unit}' in '{s}'{Suggest.DidYouMean(v.Unit, LengthUnit.Known.Select(k => k.Symbol))}; use one of {string.Join(", ", LengthUnit.Known.Select(k => k.Symbol))}");
        FirstExplicitUnit ??= unit;
        return InRange(key, s, unit.ToMetres(v.Number), true);
    }

    /// <summary>Largest length a template takes, m: beyond it the value is a typo or a unit mistake (1e300, 40 m for 40 mm).</summary>
    internal const double MaxLength = 1000;

    /// <summary>Smallest non-zero size a template takes, m (1 µm): below it the mesh and the area integrals lose their digits.</summary>
    internal const double MinLength = 1e-6;

    /// <summary>
    /// A length within what a cross-section can be: |v| at most <see cref="MaxLength"/>, and (for sizes, not coordinates)
    /// zero or at least <see cref="MinLength"/>; otherwise one line naming the key, the value and the range.
    /// </summary>
    private double InRange(string key, string text, double metres, bool size)
    {
        double a = Math.Abs(metres);
        if (!double.IsFinite(metres) || a > MaxLength || (size && a > 0 && a < MinLength))
            throw Error(key, $"{text} is outside the sizes a cross-section can have here (1 µm to 1 km, bare numbers in {DefaultUnit.Symbol}); check the number and its unit" +
                (size && a > 0 && a < MinLength ? " (write 0 for a sharp corner)" : ""));
        return metres;
    }

    /// <summary>Parses a length written with an optional unit (for positional values such as polygon coordinates).</summary>
    internal double ParseLengthText(string what, string s)
    {
        if (!SpecValue.TryParse(s, out var v))
            throw new SectionTwistException("bad-template-parameter", $"{Spec}: {what}: '{s}' is not a number; write numbers with an optional unit, e.g. 10 or 10mm");
        if (v.Unit.Length == 0) return InRange(what, s, DefaultUnit.ToMetres(v.Number), false);
        if (!LengthUnit.TryParse(v.Unit, out var unit))
            throw new SectionTwistException("bad-template-parameter", $"{Spec}: {what}: unknown length unit '{v.Unit}'; use one of {string.Join(", ", LengthUnit.Known.Select(k => k.Symbol))}");
        FirstExplicitUnit ??= unit;
        return InRange(what, s, unit.ToMetres(v.Number), false);
    }

    private double ParseAngle(string key, string s)
    {
        if (!SpecValue.TryParse(s, out var v))
            throw Error(key, $"'{s}' is not an angle; write degrees, e.g. {key}=30 or {key}=30deg or {key}=0.5rad");
        return v.Unit.ToLowerInvariant() switch
        {
            "" or "deg" or "°" or "degree" or "degrees" => v.Number * Math.PI / 180,
            "rad" or "radian" or "radians" => v.Number,
            _ => throw Error(key, $"unknown angle unit '{v.Unit}' in '{s}'; use deg or rad"),
        };
    }
}
