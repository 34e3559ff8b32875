using SectionTwist.Rendering.Section;
using SectionTwist.Torsion;
using SectionTwist.Units;

namespace SectionTwist.Cli;

/// <summary>Writes the section picture for <c>--plot</c> (PNG or SVG by the file extension), titled with the section it shows.</summary>
internal static class SectionPlotHook
{
    public static void Write(SectionResult result, string path, double? torque, string title, UnitSystem? units) =>
        SectionPicture.Save(SectionPlotData.From(result, $"{title}: shear stress magnitude"), path,
            new SectionPlotOptions { Torque = torque, Units = units });

    /// <summary>The section's name for titles: the spec as typed, or the drawing's file name (with the part, when one was picked).</summary>
    internal static string Title(string source, int? part) =>
        File.Exists(source) ? Path.GetFileName(source) + (part is { } n ? $", part {n}" : "") : source;
}
