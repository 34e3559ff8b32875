using System.Text;
using System.Text.Json;
using SectionTwist.Torsion;
using SectionTwist.Units;
using SectionTwist.Verification;

namespace SectionTwist.Cli;

/// <summary><c>sectiontwist verify</c>: runs the built-in verification cases; exit code 1 if any falls outside its tolerance.</summary>
internal sealed class VerifyCommand : ICommand
{
    public string Name => "verify";
    public string Summary => "run the built-in verification cases against exact and series solutions";
    public string Usage => """
        sectiontwist verify [--accuracy REL] [--json]
          Runs every verification case and prints computed, reference, relative error and source.
          --json      print one JSON object (SI base units: m^4 for J, 1/m^3 for peak shear per torque)
          Exit code 0 when all pass, 1 when any falls outside its tolerance.
        """;

    public int Run(Args args, CliContext ctx)
    {
        double accuracy = AccuracyOption.Read(args) ?? 1e-4;
        bool json = args.Flag("json");
        args.EnsureAllUsed();
        IReadOnlyList<VerificationOutcome> outcomes;
        using (var progress = new ProgressLine(ctx, "verify"))
            outcomes = VerificationSuite.RunReporting(ctx.Analysis(accuracy), new Sink(f => progress.Report(f, "cases")), ctx.Cancellation);
        int failed = outcomes.Count(o => !o.Passed);
        if (json) ctx.Out.WriteLine(WriteJson(outcomes, accuracy));
        else WriteTable(ctx.Out, outcomes, failed);
        return failed == 0 ? 0 : 1;
    }

    private static void WriteTable(TextWriter w, IReadOnlyList<VerificationOutcome> outcomes, int failed)
    {
        string G(double v) => NumberText.Format(v, 6);
        w.WriteLine($"{"case",-40} {"computed",-13} {"reference",-13} {"rel. error",-10} {"tol.",-8} result  source");
        foreach (var o in outcomes)
            w.WriteLine($"{o.Case.Name,-40} {G(o.Computed),-13} {G(o.Case.Reference),-13} {NumberText.Exponent(o.RelativeError, 2),-10} {NumberText.Exponent(o.Tolerance, 1),-8} {(o.Passed ? "pass" : "FAIL"),-7} {o.Case.Source}");
        w.WriteLine(failed == 0 ? $"all {outcomes.Count} verification cases passed" : $"{failed} of {outcomes.Count} verification cases FAILED");
    }

    /// <summary>Reports on the calling thread.</summary>
    private sealed class Sink(Action<double> report) : IProgress<double>
    {
        public void Report(double value) => report(value);
    }

    private static string WriteJson(IReadOnlyList<VerificationOutcome> outcomes, double accuracy)
    {
        using var ms = new MemoryStream();
        using (var w = new Utf8JsonWriter(ms, new JsonWriterOptions { Indented = true }))
        {
            w.WriteStartObject();
            w.WriteNumber("accuracy", accuracy);
            w.WriteNumber("total", outcomes.Count);
            w.WriteNumber("failed", outcomes.Count(o => !o.Passed));
            w.WriteBoolean("passed", outcomes.All(o => o.Passed));
            w.WriteStartArray("cases");
            foreach (var o in outcomes)
            {
                w.WriteStartObject();
                w.WriteString("name", o.Case.Name);
                w.WriteString("quantity", o.Case.QuantityKey);
                w.WriteString("unit", o.Case.UnitAscii);
                SectionJson.Num(w, "computed", o.Computed);
                SectionJson.Num(w, "reference", o.Case.Reference);
                SectionJson.Num(w, "relativeError", o.RelativeError);
                SectionJson.Num(w, "estimatedRelativeError", o.EstimatedRelativeError);
                w.WriteNumber("tolerance", o.Tolerance);
                w.WriteBoolean("passed", o.Passed);
                w.WriteString("source", o.Case.Source);
                w.WriteEndObject();
            }
            w.WriteEndArray();
            w.WriteEndObject();
        }
        return Encoding.UTF8.GetString(ms.ToArray());
    }
}
