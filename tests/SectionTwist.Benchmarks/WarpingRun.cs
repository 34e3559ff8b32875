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
/// and the analysis with <see cref="AnalysisOptions.Warping"/> run alternately after a warm-up (each section both ways at the measured accuracy), the best of the repeats
/// of the process's processor time is kept (the machine may be shared), and the ratio printed; then the warping stages on the final fine mesh.
/// </summary>
public static class WarpingRun
{
    private static readonly string[] Specs = ["ipe:200", "upn:100", "leq:60x6", "tee:h=60,b=60,tw=7,tf=7,r=6", "channel:h=120,b=50,tw=4,tf=6,r=6"];

    public static void Run(double accuracy, int repeats)
    {
        var inv = CultureInfo.InvariantCulture;
        // warm-up: every section, plain and with warping, at the measured accuracy, so that the code paths of that accuracy
        // (the supernodal factorization, the fine meshes) are compiled and tiered before any timing, not during the first
        // section's timed runs
        foreach (string spec in Specs)
        {
            var p = ProfileSources.Load(spec);
            SectionAnalyzer.Analyze(p, new AnalysisOptions { Accuracy = accuracy });
            SectionAnalyzer.Analyze(p, new AnalysisOptions { Accuracy = accuracy, Warping = true });
        }
        Console.WriteLine(string.Create(inv, $"warping cost at accuracy {accuracy:G2}, best of {repeats}, {Environment.ProcessorCount} cores (processor time of this process; a shared machine still inflates and scatters it)"));
        Console.WriteLine("  section                              plain cpu s  warping cpu s   ratio   elements   steady: plain  warping  ratio");
        double worst = 0, worstSteady = 0;
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
            // steady state: the mean of 3 x repeats alternating runs without a forced collection before each, so the
            // collector's work falls on each run in proportion to what it allocates (as in a long batch), not on
            // whichever run happens to cross the first generation's budget after a forced collection
            double sumPlain = 0, sumWarp = 0;
            for (int k = 0; k < 3 * repeats; k++)
            {
                sumPlain += Cpu(() => SectionAnalyzer.Analyze(profile, new AnalysisOptions { Accuracy = accuracy }), collect: false);
                sumWarp += Cpu(() => SectionAnalyzer.Analyze(profile, new AnalysisOptions { Accuracy = accuracy, Warping = true }), collect: false);
            }
            double mp = sumPlain / (3 * repeats), mw = sumWarp / (3 * repeats);
            worst = Math.Max(worst, warp / plain);
            worstSteady = Math.Max(worstSteady, mw / mp);
            Console.WriteLine(string.Create(inv, $"  {spec,-34} {plain,9:F3}  {warp,9:F3}  {warp / plain,6:F2}   {elements,8:N0}          {mp,6:F3}   {mw,6:F3}  {mw / mp,5:F2}"));
        }
        Console.WriteLine(string.Create(inv, $"  largest ratio {worst:F2} best of {repeats} after a forced collection, {worstSteady:F2} steady-state mean of {3 * repeats} (goal: at most 1.60)"));
    }

    /// <summary>Processor time of this process for one run, s: less disturbed by other load than wall time.</summary>
    private static double Cpu(Action run, bool collect = true)
    {
        if (collect) GC.Collect();
        var p = Process.GetCurrentProcess();
        var t0 = p.TotalProcessorTime;
        run();
        p.Refresh();
        return (p.TotalProcessorTime - t0).TotalSeconds;
    }
}
