using System.Globalization;
using SectionTwist.Torsion;

namespace SectionTwist.Cli;

/// <summary>The <c>--accuracy REL</c> option shared by the commands that analyse sections.</summary>
internal static class AccuracyOption
{
    /// <summary>The usage line fragment.</summary>
    public static string Range { get; } = string.Create(CultureInfo.InvariantCulture,
        $"between {AnalysisOptions.FinestAccuracy:0E0} (the finest available) and 0.5");

    /// <summary>Reads <c>--accuracy</c>; null when absent. Refuses values the analysis cannot promise, naming the range.</summary>
    public static double? Read(Args args)
    {
        double? accuracy = args.Double("accuracy");
        if (accuracy is { } a && !(a >= AnalysisOptions.FinestAccuracy && a < 0.5))
            throw new UsageException(string.Create(CultureInfo.InvariantCulture,
                $"--accuracy {a:G3}: use a relative accuracy {Range}, e.g. 1e-4{(a > 0 && a < AnalysisOptions.FinestAccuracy ? $"; {a:G3} is finer than double precision and the element limit allow" : "")}"));
        return accuracy;
    }
}
