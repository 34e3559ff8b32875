using SectionTwist.Plastic;
using SectionTwist.Rendering.Section;

namespace SectionTwist.Cli;

/// <summary>Writes the plastic-zone picture for <c>--plastic-plot</c> (PNG or SVG by the file extension).</summary>
internal static class PlasticPlotHook
{
    public static void Write(PlasticResult result, string path) =>
        PlasticZonePicture.Save(result, path, $"{Path.GetFileNameWithoutExtension(path)}: plastic zone (red) as the twist grows");
}
