using System.Globalization;
using SectionTwist.Torsion;
using SectionTwist.Verification;

namespace SectionTwist.Cli;

/// <summary><c>sectiontwist verify</c>: runs the built-in verification cases; exit code 1 if any falls outside its tolerance.</summary>
internal sealed class VerifyCommand : ICommand
{
    public string Name => "verify";
    public string Summary => "run the built-in verification cases against exact and series solutions";
    public string Usage => """
        sectiontwist verify [--accuracy REL]
          Runs every verification case and prints computed, reference, relative error and source.
          Exit code 0 when all pass, 1 when any falls outside its tolerance.
        """;

    public int Run(Args args, CliContext ctx)
    {
        double accuracy = args.Double("accuracy") ?? 1e-4;
        args.EnsureAllUsed();
        var outcomes = VerificationSuite.Run(new AnalysisOptions { Accuracy = accuracy });
        var w = ctx.Out;
        string G(double v) => v.ToString("G6", CultureInfo.InvariantCulture);
        w.WriteLine($"{"case",-40} {"computed",-13} {"reference",-13} {"rel. error",-10} {"tol.",-8} result  source");
        foreach (var o in outcomes)
            w.WriteLine($"{o.Case.Name,-40} {G(o.Computed),-13} {G(o.Case.Reference),-13} {o.RelativeError.ToString("0.0E+0", CultureInfo.InvariantCulture),-10} {o.Tolerance.ToString("0E+0", CultureInfo.InvariantCulture),-8} {(o.Passed ? "pass" : "FAIL"),-7} {o.Case.Source}");
        int failed = outcomes.Count(o => !o.Passed);
        w.WriteLine(failed == 0 ? $"all {outcomes.Count} verification cases passed" : $"{failed} of {outcomes.Count} verification cases FAILED");
        return failed == 0 ? 0 : 1;
    }
}
