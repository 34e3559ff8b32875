using System.Diagnostics;
using SectionTwist.Dynamics;
using SectionTwist.Rendering.Adapters;
using SectionTwist.Rendering.Report;
using SectionTwist.Shaft;
using SectionTwist.Units;
using SectionTwist.Verification;

namespace SectionTwist.Cli;

/// <summary>
/// <c>sectiontwist demo [--out DIR]</c>: solves the bundled winch drive shaft (sample-profiles/winch-shaft.yaml, embedded in
/// this assembly so it runs from any folder) and writes its report and pictures to DIR.
/// </summary>
internal sealed class DemoCommand : ICommand
{
    /// <summary>Logical name of the embedded demo shaft file.</summary>
    internal const string ResourceName = "SectionTwist.Cli.Demo.winch-shaft.yaml";

    /// <summary>The default output folder, relative to the current folder.</summary>
    internal const string DefaultFolder = "sectiontwist-demo";

    public string Name => "demo";

    public string Summary => "solve the bundled winch drive shaft and write its report and pictures";

    public string Usage =>
        "sectiontwist demo [--out DIR] [--units SI-mm|SI-m|US]\n" +
        "  Solves the bundled demo: the drive shaft of a small winch (an invented scenario) with a keyed input, a hollow middle\n" +
        "  and a splined output, driven through a flexible coupling. The keyed and splined sections are analysed, the shaft is\n" +
        "  solved, the verification cases are run, and DIR receives report.html, shaft.png, shaft.svg and section-NAME.png;\n" +
        "  the drivetrain (motor shaft, gear stage, inertias) gets its torsional modes and resonance check in modes.html.\n" +
        $"  --out DIR   output folder (default ./{DefaultFolder}; created when missing)\n" +
        "  --units SYS units of the summary, report and pictures: SI-mm (the demo file's own), SI-m or US\n" +
        "  The shaft file itself: sample-profiles/winch-shaft.yaml ('sectiontwist shaft' reads it too).";

    public int Run(Args args, CliContext context)
    {
        string folder = args.Option("out") ?? DefaultFolder;
        var units = args.Option("units") is { } us ? UnitSystem.Parse(us) : null;
        args.EnsureAllUsed();
        if (args.Positional.Count > 0) throw new UsageException($"unexpected '{args.Positional[0]}'; the demo takes only --out DIR");
        OutputPaths.PrepareFolder(folder, "--out");

        var clock = Stopwatch.StartNew();
        // the verification cases run beside the section analyses (both are single-threaded for these sizes)
        var verifying = Task.Run(() => VerificationSuite.Run(context.Analysis(), context.Cancellation));
        ShaftDocument doc;
        ShaftResult result;
        IReadOnlyList<VerificationOutcome> verification;
        List<string> files;
        ShaftSectionCatalog sections;
        string? modesLine = null;
        using (var progress = new ProgressLine(context, "demo"))
        {
            sections = new ShaftSectionCatalog(context.Analysis(), context.Err.WriteLine, context.Cancellation)
            {
                Progress = (name, p) => progress.Report(0.8 * p.Fraction, $"section '{name}': {p.Stage}"),
            };
            doc = ShaftFile.Parse(ReadDemoFile(), "winch-shaft.yaml", resolver: sections.Resolver);
            if (units is not null) doc = doc with { Units = units };
            GearedShaftResult? geared = null;
            if (doc.Dynamics is { } d && d.Drivetrain.Shafts.Count > 1)
            {
                geared = GearedShaftSolver.Solve(d.Drivetrain, context.Cancellation);
                result = geared.Main;
            }
            else result = ShaftSolver.Solve(doc.Model, context.Cancellation);
            using (progress.Pulse("verification cases"))
                verification = verifying.GetAwaiter().GetResult();
            progress.Report(0.9, "torsional modes, pictures and report");
            // the report holds the further shafts and the dynamics chapter; modes.html is the dynamics report on its own
            var extras = ShaftExtras.Compute(doc, geared, "winch-shaft.yaml", context.Cancellation);
            var content = ShaftReport.Build(doc, result, sections, verification, CliReport.Options(), extras);
            files = ShaftReport.WriteBundle(content, folder).ToList();
            if (extras.Modes is { } modes)
            {
                var check = extras.Resonance;
                string modesFile = Path.Combine(folder, "modes.html");
                ModesReport.Write(doc, modes, check, extras.Forced, modesFile, CliReport.Options());
                files.Add(modesFile);
                var first = modes.ElasticModes.FirstOrDefault();
                modesLine = $"  Drivetrain: lowest torsional natural frequency {(first is null ? "-" : doc.Units.Frequency.Text(first.Frequency, 4))}" +
                            (check?.Closest is { } c ? $"; closest crossing: mode {c.Mode} with {c.Excitation} ({(c.Status == CrossingStatus.Resonance ? "in the operating range" : $"margin {NumberText.Fixed(c.Margin * 100, 0)} %")}, {ModalResultJson.Status(c.Status)})" : "") +
                            " (report chapter 'Dynamics' and modes.html)";
            }
        }

        var w = context.Out;
        w.WriteLine($"{doc.Model.Title ?? "demo shaft"} (bundled sample-profiles/winch-shaft.yaml)");
        foreach (string line in ShaftReport.Summary(doc, result)) w.WriteLine("  " + line);
        if (modesLine is not null) w.WriteLine(modesLine);
        int failed = verification.Count(v => !v.Passed);
        w.WriteLine(failed == 0
            ? $"  Verification: all {verification.Count} cases passed on this build."
            : $"  Verification: {failed} of {verification.Count} cases FAILED on this build (see the report).");
        w.WriteLine($"wrote {files.Count} files to {Path.GetFullPath(folder)} in {NumberText.Fixed(clock.Elapsed.TotalSeconds, 1)} s");
        w.WriteLine($"report: {Path.GetFullPath(files[0])}");
        w.WriteLine(ShaftCommand.Caution);
        return 0;
    }

    /// <summary>The text of the bundled demo shaft file.</summary>
    internal static string ReadDemoFile()
    {
        using var stream = typeof(DemoCommand).Assembly.GetManifestResourceStream(ResourceName)
                           ?? throw new SectionTwistException("demo-missing", $"the demo shaft file ({ResourceName}) is not embedded in this build; rebuild the CLI from a full checkout");
        using var reader = new StreamReader(stream);
        return reader.ReadToEnd();
    }
}
