using SectionTwist.Plastic;
using SectionTwist.Rendering.Section;

namespace SectionTwist.Cli;

/// <summary>Writes the plastic-zone picture for <c>--plastic-plot</c> (PNG or SVG by the file extension).</summary>
internal static class PlasticPlotHook
{
    /// <param name="result">The plastic analysis.</param>
    /// <param name="path">The picture file.</param>
    /// <param name="section">The section's name as the section picture titles it (the source, not the output file).</param>
    public static void Write(PlasticResult result, string path, string section) =>
        PlasticZonePicture.Save(result, path, $"{section}: plastic zone (red) as the twist grows");
}
