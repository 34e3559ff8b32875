using System.Diagnostics;
using System.Globalization;
using SectionTwist.Import;
using SectionTwist.Torsion;

namespace SectionTwist.Cli;

/// <summary>Time to an accurate J: the whole analysis (mesh, solves, error estimate) at accuracy 1e-4, timed after a warm-up.</summary>
internal static class SectionBench
{
    private static readonly string[] Specs = ["keyed:d=40,r=0", "keyed:d=40", "keyed:d=40,r=0.4", "shs:B=80,t=5", "iso14:8x36x42,r=0.3"];

    public static void Run(TextWriter w)
    {
        var inv = CultureInfo.InvariantCulture;
        w.WriteLine();
        w.WriteLine("time to J within 1e-4 (whole analysis after a warm-up; true error against a 1e-7 solve)");
        w.WriteLine("  section                     time      J [mm^4]     est. error  true error  elements");
        SectionAnalyzer.Analyze(ProfileSources.Load("circle:d=10"), new AnalysisOptions { Accuracy = 1e-3 });
        foreach (var spec in Specs)
        {
            var profile = ProfileSources.Load(spec);
            var sw = Stopwatch.StartNew();
            var r = SectionAnalyzer.Analyze(profile, new AnalysisOptions { Accuracy = 1e-4 });
            double t = sw.Elapsed.TotalSeconds;
            var reference = SectionAnalyzer.Analyze(profile, new AnalysisOptions { Accuracy = 1e-7 });
            double trueErr = Math.Abs(r.TorsionConstant - reference.TorsionConstant) / reference.TorsionConstant;
            w.WriteLine(string.Create(inv,
                $"  {spec,-24} {t,7:F3}s  {r.TorsionConstant * 1e12,12:F1}  {r.EstimatedRelativeError.TorsionConstant,10:E1}  {trueErr,10:E1}  {r.Mesh.Elements,8:N0}"));
        }
    }
}
