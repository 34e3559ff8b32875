using SectionTwist.Profiles;
using SectionTwist.Torsion;

namespace SectionTwist.Tests.Shaft;

/// <summary>
/// The demo's keyed and splined sections (sample-profiles/winch-shaft.yaml) analysed in the test at the default accuracy
/// (for their stated estimates) and independently at 1e-5, once for all tests that check the demo's figures.
/// </summary>
internal static class DemoSectionReferences
{
    public const string Keyed = "keyed:d=45,r=0.5";
    public const string Spline = "spline:series=light,N=8,d=42,r=0.4";

    private static readonly Dictionary<string, Lazy<(SectionResult AtDefault, SectionResult Fine)>> Results = new()
    {
        [Keyed] = new(() => Solve(Keyed)),
        [Spline] = new(() => Solve(Spline)),
    };

    /// <summary>The section at the default accuracy and at 1e-5.</summary>
    public static (SectionResult AtDefault, SectionResult Fine) For(string spec) => Results[spec].Value;

    private static (SectionResult, SectionResult) Solve(string spec)
    {
        var profile = ProfileTemplates.Create(spec);
        return (SectionAnalyzer.Analyze(profile), SectionAnalyzer.Analyze(profile, new AnalysisOptions { Accuracy = 1e-5 }));
    }
}
