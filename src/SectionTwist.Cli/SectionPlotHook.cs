using SectionTwist.Rendering.Section;
using SectionTwist.Torsion;

namespace SectionTwist.Cli;

/// <summary>Writes the section picture for <c>--plot</c> (PNG or SVG by the file extension).</summary>
internal static class SectionPlotHook
{
    public static void Write(SectionResult result, string path, double? torque) =>
        SectionPicture.Save(SectionPlotData.From(result, $"{Path.GetFileNameWithoutExtension(path)}: shear stress magnitude"), path,
            new SectionPlotOptions { Torque = torque });
}
