using System.Globalization;
using SectionTwist.WarpingTorsion;
using YamlDotNet.RepresentationModel;

namespace SectionTwist.Shaft;

/// <summary>The <c>warping:</c> key of the shaft file (docs/shaft-file.md, "Open sections and restrained warping").</summary>
internal sealed partial class ShaftFileReader
{
    private const string WarpingExample = "'warping: free' or 'warping: {A: restrained, D: {spring: 2.5e4}}'";

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
                _ => throw _file.Error(value, "warping", $"station '{station}': expected 'free', 'restrained' or '{{spring: K}}' (K in N*m^3, bimoment per rad/m), found {YamlMap.Describe(value)}"),
            };
        }
        return result;
    }

    private WarpingEnd Spring(YamlMap m)
    {
        var n = m.Require("spring", "give the stiffness, e.g. 'spring: 2.5e4' (N*m^3: bimoment in N*m^2 per rad/m of twist rate)");
        if (n is YamlScalarNode { Value: { } text } && double.TryParse(text, NumberStyles.Float, CultureInfo.InvariantCulture, out double k) && k >= 0 && double.IsFinite(k))
            return WarpingEnd.Spring(k);
        throw _file.Error(n, "spring", $"the warping spring stiffness must be a plain number >= 0 in N*m^3 (SI), found {YamlMap.Describe(n)}");
    }
}
