using System.Globalization;
using System.Text.Json;
using SectionTwist.Profiles;
using SectionTwist.Torsion;
using SectionTwist.Units;

namespace SectionTwist.Cli;

/// <summary>
/// <c>sectiontwist sweep SPEC --vary KEY=FROM:TO:STEPS</c>: analyses a template at evenly spaced values of one
/// parameter, the steps in parallel across cores, and prints J, peak shear per unit torque and J relative to the plain
/// round of the same outer size D (J / (pi D^4 / 32), D as listed by <c>sectiontwist templates</c>).
/// </summary>
internal sealed class SweepCommand : ICommand
{
    public string Name => "sweep";

    public string Summary => "vary one template parameter and tabulate J, peak shear and J relative to a round";

    public string Usage =>
        "sectiontwist sweep SPEC --vary KEY=FROM:TO:STEPS [--unit U] [--units SYSTEM] [--accuracy REL] [--json|--csv]\n" +
        "  e.g. sectiontwist sweep keyed:d=40,n=2 --vary t1=3:8:6\n" +
        "  FROM and TO may carry a unit (t1=3mm:8mm:6); STEPS >= 1 evenly spaced values, ends included.\n" +
        "  Prints per step: J, peak shear per unit torque, and J / (pi D^4 / 32) with D the template's outer size.\n" +
        "  --json / --csv print SI units (m, m^4, 1/m^3) for other programs, with the warnings of each step;\n" +
        "  the table uses the spec's unit system, or --units SI-mm, SI-m or US.";

    private sealed record Step(string ValueText, double Value, string Spec, Geometry.Profile Profile, double OuterSize);

    public int Run(Args args, CliContext context)
    {
        string vary = args.Option("vary") ?? throw new UsageException("--vary KEY=FROM:TO:STEPS is required");
        string? unitText = args.Option("unit");
        double? accuracy = AccuracyOption.Read(args);
        var units = args.Option("units") is { } us ? UnitSystem.Parse(us) : null;
        bool json = args.Flag("json"), csv = args.Flag("csv");
        args.EnsureAllUsed();
        if (json && csv) throw new UsageException("choose one of --json and --csv");
        if (args.Positional.Count != 1) throw new UsageException("give exactly one template spec, e.g. keyed:d=40,n=2 (quote it if it has spaces)");
        LengthUnit? unit = unitText is null ? null : LengthUnit.Parse(unitText);
        var steps = BuildSteps(args.Positional[0], vary, unit);

        var options = context.Analysis(accuracy);
        int done = 0;
        using var progress = new ProgressLine(context, $"sweep over {steps.Count} steps");
        // The library's batch entry point: all cores, the memory budget shared among the workers.
        var items = SectionBatch.Analyze(steps.Select(s => s.Profile).ToList(), options, 0, context.Cancellation,
            _ => progress.Report((double)Interlocked.Increment(ref done) / steps.Count, $"{done} of {steps.Count} done"));
        // Report the first failing step as if it ran alone (input errors become one-line messages).
        if (items.FirstOrDefault(x => x.Error is not null) is { } failed)
            throw new SectionTwistException(failed.Error!.Code, $"sweep step {steps[failed.Index].Spec}: {failed.Error.Message}", failed.Error);
        var results = items.Select(x => x.Result!).ToArray();
        progress.Clear();

        string key = vary[..vary.IndexOf('=', StringComparison.Ordinal)].Trim();
        var info = ProfileTemplates.Find(TemplateSpec.Parse(args.Positional[0]).Name)!;
        if (json) WriteJson(context.Out, args.Positional[0], key, info, steps, results);
        else if (csv) WriteCsv(context.Out, key, steps, results);
        else WriteTable(context.Out, args.Positional[0], key, info, steps, results, units ?? UnitSystem.For(steps[0].Profile.Unit));
        return 0;
    }

    private static List<Step> BuildSteps(string specText, string vary, LengthUnit? unit)
    {
        var spec = TemplateSpec.Parse(specText);
        var info = ProfileTemplates.RequireInfo(spec.Name, specText.Trim());
        if (info.Parameters.Count == 0) throw new UsageException($"template '{info.Name}' has no parameters to vary");
        int eq = vary.IndexOf('=', StringComparison.Ordinal);
        string[] range = eq < 0 ? [] : vary[(eq + 1)..].Split(':', StringSplitOptions.TrimEntries);
        if (eq <= 0 || range.Length != 3)
            throw new UsageException($"--vary '{vary}': write KEY=FROM:TO:STEPS, e.g. --vary t1=3:8:6");
        string key = vary[..eq].Trim();
        var par = info.Find(key) ?? throw new UsageException(
            $"--vary: template '{info.Name}' has no key '{key}'; its keys are {string.Join(", ", info.Parameters.Select(p => p.Key))}");
        if (par.Kind is ParameterKind.Choice or ParameterKind.AngleList)
            throw new UsageException($"--vary: '{key}' is a {par.UnitHint} parameter and cannot be swept; sweep a length, angle, count or number");
        if (!SpecValue.TryParse(range[0], out var from) || !SpecValue.TryParse(range[1], out var to))
            throw new UsageException($"--vary '{vary}': FROM and TO must be numbers with an optional unit, e.g. 3mm:8mm");
        if (!int.TryParse(range[2], NumberStyles.Integer, CultureInfo.InvariantCulture, out int count) || count < 1 || count > 1000)
            throw new UsageException($"--vary '{vary}': STEPS must be a whole number from 1 to 1000");
        if (from.Unit.Length > 0 && to.Unit.Length > 0 && !string.Equals(from.Unit, to.Unit, StringComparison.OrdinalIgnoreCase))
            throw new UsageException($"--vary '{vary}': FROM and TO use different units ({from.Unit}, {to.Unit}); use one unit");
        string u = from.Unit.Length > 0 ? from.Unit : to.Unit;
        // 'circle:d=1in --vary d=1:2:3' means inches: bare sweep values take the unit the spec gives the same key
        if (u.Length == 0 && par.Kind is ParameterKind.Length or ParameterKind.Angle && spec[key] is { } given
            && SpecValue.TryParse(given, out var base0) && base0.Unit.Length > 0)
            u = base0.Unit;
        var steps = new List<Step>();
        var seen = new HashSet<string>(StringComparer.Ordinal);
        for (int i = 0; i < count; i++)
        {
            double v = count == 1 ? from.Number : from.Number + (to.Number - from.Number) * i / (count - 1);
            if (par.Kind == ParameterKind.Count) v = Math.Round(v);
            string text = (par.Kind == ParameterKind.Count ? v.ToString("0", CultureInfo.InvariantCulture) : v.ToString("G10", CultureInfo.InvariantCulture)) + (par.Kind == ParameterKind.Count ? "" : u);
            if (!seen.Add(text)) continue;
            string stepSpec = spec.With(key, text).ToString();
            try
            {
                var (profile, outer, _, _) = ProfileTemplates.Build(stepSpec, unit);
                steps.Add(new Step(text, v, stepSpec, profile, outer));
            }
            catch (SectionTwistException e)
            {
                throw new SectionTwistException(e.Code, $"sweep step {key}={text}: {e.Message}", e);
            }
        }
        return steps;
    }

    private static double RelativeToRound(SectionResult r, double outer) => r.TorsionConstant / (Math.PI * Math.Pow(outer, 4) / 32);

    private static void WriteTable(TextWriter w, string spec, string key, TemplateInfo info, List<Step> steps, SectionResult[] results, UnitSystem u)
    {
        w.WriteLine($"sweep of {spec} over {key}; J_round = pi D^4 / 32 with {info.OuterSize}; units {u.Name}");
        w.WriteLine($"{key,12}  {"J [" + u.SecondMoment.Symbol + "]",14}  {"tau/T [" + u.ShearPerTorque.Symbol + "]",22}  {"J/J_round",9}  {"err(J)",8}");
        for (int i = 0; i < steps.Count; i++)
        {
            var r = results[i];
            string tau = double.IsPositiveInfinity(r.EstimatedRelativeError.MaxShear) ? "unbounded" : u.ShearPerTorque.Format(r.MaxShearPerTorque, 6);
            w.WriteLine($"{steps[i].ValueText,12}  {u.SecondMoment.Format(r.TorsionConstant, 6),14}  {tau,22}  {NumberText.Fixed(RelativeToRound(r, steps[i].OuterSize), 4),9}  {NumberText.Exponent(r.EstimatedRelativeError.TorsionConstant),8}");
        }
        // One line per kind of warning: the first message and how many steps carry it.
        foreach (var g in results.SelectMany((r, i) => r.Warnings.Select(x => (Step: i, x.Code, x.Message))).GroupBy(x => x.Code))
            w.WriteLine($"warning ({g.Select(x => x.Step).Distinct().Count()} of {steps.Count} steps, first at {key}={steps[g.First().Step].ValueText}): {g.First().Message}");
    }

    private static void WriteCsv(TextWriter w, string key, List<Step> steps, SectionResult[] results)
    {
        w.WriteLine($"{key},outerSize_m,torsionConstant_m4,maxShearPerTorque_per_m3,relativeToRound,estimatedRelativeErrorJ,spec,peakShearUnbounded,warnings");
        for (int i = 0; i < steps.Count; i++)
        {
            var r = results[i];
            w.WriteLine(string.Join(",",
                steps[i].ValueText, steps[i].OuterSize.ToString("R", CultureInfo.InvariantCulture), r.TorsionConstant.ToString("R", CultureInfo.InvariantCulture),
                r.MaxShearPerTorque.ToString("R", CultureInfo.InvariantCulture), RelativeToRound(r, steps[i].OuterSize).ToString("R", CultureInfo.InvariantCulture),
                r.EstimatedRelativeError.TorsionConstant.ToString("R", CultureInfo.InvariantCulture),
                Quote(steps[i].Spec), double.IsPositiveInfinity(r.EstimatedRelativeError.MaxShear) ? "yes" : "no",
                Quote(string.Join("; ", r.Warnings.Select(x => $"[{x.Code}] {x.Message}")))));
        }
    }

    private static string Quote(string s) => "\"" + s.Replace("\"", "\"\"", StringComparison.Ordinal) + "\"";

    private static void WriteJson(TextWriter w, string spec, string key, TemplateInfo info, List<Step> steps, SectionResult[] results)
    {
        using var stream = new MemoryStream();
        using (var j = new Utf8JsonWriter(stream, new JsonWriterOptions { Indented = true }))
        {
            j.WriteStartObject();
            j.WriteString("spec", spec);
            j.WriteString("key", key);
            j.WriteString("outerSizeDefinition", info.OuterSize);
            j.WriteString("lengthUnit", steps[0].Profile.Unit.Symbol);
            j.WriteStartArray("steps");
            for (int i = 0; i < steps.Count; i++)
            {
                var r = results[i];
                j.WriteStartObject();
                j.WriteString("value", steps[i].ValueText);
                j.WriteString("spec", steps[i].Spec);
                j.WriteNumber("outerSize", steps[i].OuterSize);
                j.WriteNumber("torsionConstant", r.TorsionConstant);
                j.WriteNumber("maxShearPerTorque", r.MaxShearPerTorque);
                j.WriteNumber("relativeToRound", RelativeToRound(r, steps[i].OuterSize));
                j.WriteStartObject("estimatedRelativeError");
                WriteNumberOrNull(j, "torsionConstant", r.EstimatedRelativeError.TorsionConstant);
                WriteNumberOrNull(j, "maxShear", r.EstimatedRelativeError.MaxShear);
                j.WriteEndObject();
                j.WriteStartArray("warnings");
                foreach (var x in r.Warnings) { j.WriteStartObject(); j.WriteString("code", x.Code); j.WriteString("message", x.Message); j.WriteEndObject(); }
                j.WriteEndArray();
                j.WriteEndObject();
            }
            j.WriteEndArray();
            j.WriteEndObject();
        }
        w.WriteLine(System.Text.Encoding.UTF8.GetString(stream.ToArray()));
    }

    private static void WriteNumberOrNull(Utf8JsonWriter j, string name, double v)
    {
        if (double.IsFinite(v)) j.WriteNumber(name, v); else j.WriteNull(name);
    }
}
