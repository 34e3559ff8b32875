using YamlDotNet.RepresentationModel;

namespace SectionTwist.Shaft;

/// <summary>The file being read, its default units, and the error format <c>file:line:column: key: problem; fix</c>.</summary>
internal sealed class ShaftFileContext(string fileName)
{
    private readonly Dictionary<QuantityKind, (string Symbol, double Factor)> _defaults = [];

    public string FileName { get; } = fileName;

    public SectionTwistException Error(YamlNode at, string key, string message) =>
        new("shaft-file", $"{Where(at)}: {YamlGuard.Short(key)}: {message}");

    public string Where(YamlNode at) => $"{FileName}:{at.Start.Line}:{at.Start.Column}";

    public void SetDefault(QuantityKind kind, string symbol, double factor) => _defaults[kind] = (symbol, factor);

    public (string Symbol, double Factor)? Default(QuantityKind kind)
    {
        if (_defaults.TryGetValue(kind, out var d)) return d;
        // Derived defaults from the length and torque units.
        if (_defaults.TryGetValue(QuantityKind.Length, out var l))
        {
            if (kind == QuantityKind.Volume) return ($"{l.Symbol}^3", Math.Pow(l.Factor, 3));
            if (kind == QuantityKind.AreaMoment) return ($"{l.Symbol}^4", Math.Pow(l.Factor, 4));
            if (kind == QuantityKind.ShearPerTorque) return ($"1/{l.Symbol}^3", 1 / Math.Pow(l.Factor, 3));
            if (kind == QuantityKind.TorquePerLength && _defaults.TryGetValue(QuantityKind.Torque, out var t))
                return ($"{t.Symbol}/{l.Symbol}", t.Factor / l.Factor);
        }
        if (kind == QuantityKind.RotationalStiffness && _defaults.TryGetValue(QuantityKind.Torque, out var tq)) return ($"{tq.Symbol}/rad", tq.Factor);
        if (kind == QuantityKind.Number) return ("", 1);
        return null;
    }

    /// <summary>Reads a scalar value of <paramref name="kind"/> into SI, with its own unit or the file's default.</summary>
    public double Quantity(YamlNode node, string key, QuantityKind kind)
    {
        if (node is not YamlScalarNode s || string.IsNullOrWhiteSpace(s.Value))
            throw Error(node, key, $"expected a value such as '12 {QuantityText.Examples(kind).Split(',')[0]}', found {YamlMap.Describe(node)}");
        string text = s.Value!;
        if (!QuantityText.TrySplit(text, out double v, out string unit))
            throw Error(node, key, $"'{YamlGuard.Short(text)}' is not a number with a unit; write e.g. '12 {QuantityText.Examples(kind).Split(',')[0]}'");
        double factor;
        if (unit.Length == 0)
        {
            factor = Default(kind)?.Factor ?? throw Error(node, key,
                $"'{YamlGuard.Short(text)}' has no unit and the file's units block gives no default for it; write the unit ({QuantityText.Examples(kind)}) or add a default under 'units:'");
        }
        else
        {
            factor = QuantityText.UnitFactor(unit, kind) ?? throw Error(node, key,
                kind == QuantityKind.Number ? $"'{YamlGuard.Short(text)}' must be a plain number without a unit"
                    : $"'{YamlGuard.Short(unit)}' is not a unit of this kind; use one of {QuantityText.Examples(kind)}");
        }
        double si = v * factor;
        if (ShaftValueRange.Check(kind, si) is { } problem) throw Error(node, key, $"'{YamlGuard.Short(text)}' {problem}");
        return si;
    }
}
