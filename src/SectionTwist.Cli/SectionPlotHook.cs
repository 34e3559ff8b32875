using SectionTwist.Torsion;

namespace SectionTwist.Cli;

/// <summary>Writes the section picture for <c>--plot</c> (wired to the renderer).</summary>
internal static class SectionPlotHook
{
    public static void Write(SectionResult result, string path, double? torque)
    {
        _ = (result, torque);
        throw new UsageException($"--plot {path}: pictures are not available in this build");
    }
}
