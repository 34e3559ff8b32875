using System.Diagnostics;
using System.Globalization;
using SectionTwist.Profiles;
using SectionTwist.Torsion;

namespace SectionTwist.Benchmarks;

/// <summary>
/// <c>answer [runs]</c>: time to an accurate answer (the whole analysis) of a few sections at 1e-4 and 1e-6, with the
/// former settings (first mesh factor 0.6, every solve direct) and the current ones (first mesh factor up to 1.5 below
/// the default accuracy, the solve
/// on each refinement by two-grid CG from the coarse solution), interleaved in one process after a warm-up so both
/// see the same machine load. Prints the minimum and median of each, their ratio, and the elements and estimates.
/// </summary>
internal static class AnswerRun
{
    private static readonly (string Spec, double Accuracy)[] Cases =
    [
        ("keyed:d=40,r=0.4", 1e-6), ("keyed:d=40,r=0.4", 1e-4), ("circle:d=40", 1e-4), ("keyed:d=40", 1e-4),
        ("shs:B=80,t=5", 1e-4), ("iso14:8x36x42,r=0.3", 1e-4),
    ];

    public static void Run(int runs)
    {
        var inv = CultureInfo.InvariantCulture;
        double factor = SectionAnalysis.FineMeshFactor;
        int threshold = TorsionSolver.TwoGridThreshold;
        void Former() { SectionAnalysis.FineMeshFactor = 0.6; TorsionSolver.TwoGridThreshold = int.MaxValue; }
        void Current() { SectionAnalysis.FineMeshFactor = factor; TorsionSolver.TwoGridThreshold = threshold; }
        Console.WriteLine($"time to an accurate answer, former vs current settings, {runs} runs each interleaved, {Environment.ProcessorCount} cores");
        Console.WriteLine("  section               accuracy   former min/median      current min/median    ratio(min)  elements former/current  est. J former/current");
        foreach (var (spec, acc) in Cases)
        {
            var profile = ProfileTemplates.Create(spec);
            var options = new AnalysisOptions { Accuracy = acc };
            Former(); SectionAnalyzer.Analyze(profile, options); Current(); SectionAnalyzer.Analyze(profile, options); // warm-up
            var tf = new List<double>(); var tc = new List<double>();
            SectionResult? rf = null, rc = null;
            for (int i = 0; i < runs; i++)
            {
                Former(); var sw = Stopwatch.StartNew(); rf = SectionAnalyzer.Analyze(profile, options); tf.Add(sw.Elapsed.TotalSeconds);
                Current(); sw.Restart(); rc = SectionAnalyzer.Analyze(profile, options); tc.Add(sw.Elapsed.TotalSeconds);
            }
            Current();
            tf.Sort(); tc.Sort();
            Console.WriteLine(string.Create(inv,
                $"  {spec,-22} {acc,7:0E0}  {tf[0],8:F3} / {tf[runs / 2],6:F3} s   {tc[0],8:F3} / {tc[runs / 2],6:F3} s   {tc[0] / tf[0],8:F2}   {rf!.Mesh.Elements,9} / {rc!.Mesh.Elements,-9}      {rf.EstimatedRelativeError.TorsionConstant,8:0.0E0} / {rc.EstimatedRelativeError.TorsionConstant:0.0E0}"));
        }
    }
}
