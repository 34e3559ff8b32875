using System.Reflection;
using SectionTwist.Rendering.Report;

namespace SectionTwist.Cli;

/// <summary>What the command line stamps on its reports: program name, version and time.</summary>
internal static class CliReport
{
    public static ShaftReportOptions Options() => new()
    {
        Generator = "sectiontwist " + (typeof(CliReport).Assembly.GetCustomAttribute<AssemblyInformationalVersionAttribute>()?.InformationalVersion ?? "0")
            .Split('+')[0],
        Generated = DateTimeOffset.UtcNow,
    };
}
