using System.Diagnostics;
using System.Globalization;
using SectionTwist.Import;
using SectionTwist.Torsion;
using SectionTwist.Units;

namespace SectionTwist.Cli;

/// <summary>
/// Time to an accurate J: the whole analysis (mesh, solves, error estimate) at accuracy 1e-4, timed after a warm-up, and
/// its true error against a reference solve at 1e-6 (whose own error, about 1e-8, is far below the 1e-4 being judged).
/// Every second spent is accounted for: the table shows the reference solves' time too, and a closing line the total.
/// </summary>
internal static class SectionBench
{
    private static readonly string[] Specs = ["keyed:d=40,r=0", "keyed:d=40", "keyed:d=40,r=0.4", "shs:B=80,t=5", "iso14:8x36x42,r=0.3"];

    /// <summary>Accuracy of the reference solves: 1e-7 took 45-65 s per section on 2 shared cores, 1e-6 takes 5-15 s.</summary>
    internal const double ReferenceAccuracy = 1e-6;

    /// <summary>Runs the table; returns the wall time it took, s.</summary>
    public static double Run(TextWriter w, CliContext context)
    {
        var inv = CultureInfo.InvariantCulture;
        var total = Stopwatch.StartNew();
        w.WriteLine();
        w.WriteLine($"time to J within 1e-4 (whole analysis after a warm-up; true error against a {NumberText.Exponent(ReferenceAccuracy, 1)} solve)");
        w.WriteLine($"  section                     time      J [{UnitSystem.SiMillimetre.SecondMoment.Symbol}]      est. error  true error  elements  reference solve");
        var ct = context.Cancellation;
        var warm = Stopwatch.StartNew();
        SectionAnalyzer.Analyze(ProfileSources.Load("circle:d=10"), context.Analysis(1e-3), ct);
        double warmUp = warm.Elapsed.TotalSeconds, timed = 0, reference = 0;
        using var progress = new ProgressLine(context, "bench sections");
        for (int i = 0; i < Specs.Length; i++)
        {
            ct.ThrowIfCancellationRequested();
            string spec = Specs[i];
            var profile = ProfileSources.Load(spec);
            var sw = Stopwatch.StartNew();
            var r = SectionAnalyzer.Analyze(profile, context.Analysis(1e-4), ct);
            double t = sw.Elapsed.TotalSeconds;
            timed += t;
            sw.Restart();
            var refResult = SectionAnalyzer.Analyze(profile, context.Analysis(ReferenceAccuracy), ct,
                progress.Analysis($"{spec} reference", (i + 0.1) / Specs.Length, (i + 1.0) / Specs.Length));
            double tr = sw.Elapsed.TotalSeconds;
            reference += tr;
            double trueErr = Math.Abs(r.TorsionConstant - refResult.TorsionConstant) / refResult.TorsionConstant;
            progress.Clear();
            w.WriteLine(string.Create(inv,
                $"  {spec,-24} {t,7:F3}s  {NumberText.Fixed(UnitSystem.SiMillimetre.SecondMoment.FromSi(r.TorsionConstant), 1),12}  {NumberText.Exponent(r.EstimatedRelativeError.TorsionConstant),10}  {NumberText.Exponent(trueErr),10}  {r.Mesh.Elements,8:N0}  {tr,8:F1}s"));
        }
        double wall = total.Elapsed.TotalSeconds;
        w.WriteLine(string.Create(inv,
            $"  wall time {wall:F1} s: timed analyses {timed:F1} s, reference solves {reference:F1} s, warm-up {warmUp:F1} s, other {Math.Max(0, wall - timed - reference - warmUp):F1} s"));
        return wall;
    }
}
