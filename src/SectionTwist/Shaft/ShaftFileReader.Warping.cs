using SectionTwist.WarpingTorsion;
using YamlDotNet.RepresentationModel;

namespace SectionTwist.Shaft;

/// <summary>The <c>warping:</c> key of the shaft file (docs/shaft-file.md, "Open sections and restrained warping").</summary>
internal sealed partial class ShaftFileReader
{
    private const string WarpingExample = "'warping: free' or 'warping: {A: restrained, D: {spring: 25 kN*m^3}}'";

    private Dictionary<string, WarpingEnd> ReadWarping(YamlNode node)
    {
        var result = new Dictionary<string, WarpingEnd>(StringComparer.Ordinal);
        if (node is YamlScalarNode { Value: "free" }) return result;
        if (node is not YamlMappingNode map)
            throw _file.Error(node, "warping", $"expected 'free' or a map of stations, found {YamlMap.Describe(node)}; e.g. {WarpingExample}");
        foreach (var (keyNode, value) in map.Children)
        {
            string station = StationName(keyNode, "warping");
            result[station] = value switch
            {
                YamlScalarNode { Value: "free" } => WarpingEnd.Free,
                YamlScalarNode { Value: "restrained" } => WarpingEnd.Restrained,
                YamlMappingNode => Spring(new YamlMap(_file, value, $"the warping spring at '{station}'", "spring")),
                _ => throw _file.Error(value, "warping", $"station '{station}': expected 'free', 'restrained' or '{{spring: K}}' (K a bimoment per rate of twist, e.g. 25 kN*m^3), found {YamlMap.Describe(value)}"),
            };
        }
        return result;
    }

    private WarpingEnd Spring(YamlMap m)
    {
        var n = m.Require("spring", "give the stiffness, e.g. 'spring: 25 kN*m^3' (bimoment per rate of twist: N*m^2 per rad/m)");
        if (n is YamlScalarNode { Value: { } text } && QuantityText.TrySplit(text, out double plain, out string unit) && unit.Length == 0)
        {
            // a plain number has always meant N*m^3; in a file whose units are not SI that would be a trap, so there it needs its unit
            bool si = _file.Default(QuantityKind.Torque) is null or { Factor: 1 } && _file.Default(QuantityKind.Length) is null or { Factor: 1 };
            if (!si)
                throw _file.Error(n, "spring", $"'{YamlGuard.Short(text)}' has no unit and this file's units are not metres and N*m (only there is a plain number N*m^3); write the unit, e.g. '{YamlGuard.Short(text)} N*m^3' or '{YamlGuard.Short(text)} lbf*in^3'");
            if (!(plain >= 0) || ShaftValueRange.Check(QuantityKind.WarpingStiffness, plain) is not null)
                throw _file.Error(n, "spring", $"the warping spring stiffness must be zero or positive and below 1e18 N*m^3, found {YamlMap.Describe(n)}");
            return WarpingEnd.Spring(plain);
        }
        double k = _file.Quantity(n, "spring", QuantityKind.WarpingStiffness);
        if (!(k >= 0)) throw _file.Error(n, "spring", $"the warping spring stiffness must be zero or positive, found {YamlMap.Describe(n)}");
        return WarpingEnd.Spring(k);
    }
}
