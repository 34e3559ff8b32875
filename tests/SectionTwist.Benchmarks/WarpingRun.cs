using System.Diagnostics;
using System.Globalization;
using SectionTwist.Import;
using SectionTwist.Meshing;
using SectionTwist.Torsion;
using SectionTwist.Warping;

namespace SectionTwist.Benchmarks;

/// <summary>
/// <c>dotnet run -c Release --project tests/SectionTwist.Benchmarks -- warping [accuracy] [repeats]</c>: the cost of the
/// warping solve beside a plain section analysis (issue 14: at most +60 %). For each open section the plain analysis
/// and the analysis with <see cref="AnalysisOptions.Warping"/> run alternately after a warm-up, the best of the repeats
/// of the process's processor time is kept (the machine may be shared), and the ratio printed; then the warping stages on the final fine mesh.
/// </summary>
public static class WarpingRun
{
    private static readonly string[] Specs = ["ipe:200", "upn:100", "leq:60x6", "tee:h=60,b=60,tw=7,tf=7,r=6", "channel:h=120,b=50,tw=4,tf=6,r=6"];

    public static void Run(double accuracy, int repeats)
    {
        var inv = CultureInfo.InvariantCulture;
        SectionAnalyzer.Analyze(ProfileSources.Load("ipe:100"), new AnalysisOptions { Accuracy = 1e-3, Warping = true }); // JIT warm-up
        Console.WriteLine(string.Create(inv, $"warping cost at accuracy {accuracy:G2}, best of {repeats}, {Environment.ProcessorCount} cores (processor time of this process; a shared machine still inflates and scatters it)"));
        Console.WriteLine("  section                              plain cpu s  warping cpu s   ratio   elements");
        double worst = 0;
        foreach (string spec in Specs)
        {
            var profile = ProfileSources.Load(spec);
            double plain = double.MaxValue, warp = double.MaxValue;
            int elements = 0;
            for (int k = 0; k < repeats; k++)
            {
                plain = Math.Min(plain, Cpu(() => elements = SectionAnalyzer.Analyze(profile, new AnalysisOptions { Accuracy = accuracy }).Mesh.Elements));
                warp = Math.Min(warp, Cpu(() => SectionAnalyzer.Analyze(profile, new AnalysisOptions { Accuracy = accuracy, Warping = true })));
            }
            worst = Math.Max(worst, warp / plain);
            Console.WriteLine(string.Create(inv, $"  {spec,-34} {plain,9:F3}  {warp,9:F3}  {warp / plain,6:F2}   {elements,8:N0}"));
        }
        Console.WriteLine(string.Create(inv, $"  largest ratio {worst:F2} (goal: at most 1.60)"));
    }

    /// <summary>Processor time of this process for one run, s: less disturbed by other load than wall time.</summary>
    private static double Cpu(Action run)
    {
        GC.Collect();
        var p = Process.GetCurrentProcess();
        var t0 = p.TotalProcessorTime;
        run();
        p.Refresh();
        return (p.TotalProcessorTime - t0).TotalSeconds;
    }
}
