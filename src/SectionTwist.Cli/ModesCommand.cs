using System.Globalization;
using SectionTwist.Dynamics;
using SectionTwist.Rendering.Adapters;
using SectionTwist.Shaft;
using SectionTwist.Units;

namespace SectionTwist.Cli;

/// <summary>
/// <c>sectiontwist modes design.yaml [--json] [--report OUT.html]</c>: torsional natural frequencies, mode shapes, energy shares,
/// the interference check and the forced response of the drivetrain in the shaft file's <c>dynamics</c> block.
/// </summary>
internal sealed class ModesCommand : ICommand
{
    public string Name => "modes";

    public string Summary => "torsional natural frequencies, mode shapes and resonance margins of a drivetrain";

    public string Usage =>
        "sectiontwist modes FILE.yaml [--units SI-mm|SI-m|US] [--json] [--report OUT.html]\n" +
        "  Reads the shaft file and its 'dynamics' block (inertias, further shafts, gear and belt stages, speeds and excitation\n" +
        "  orders; docs/shaft-file.md) and prints the lowest natural frequencies (Hz and cycles per minute), the mode shapes, the\n" +
        "  strain-energy share of every segment, spring and mesh, every crossing of a natural frequency with an excitation and its\n" +
        "  separation margin, and the alternating torques of a harmonic torque when one is given.\n" +
        "  --units SYS   units of the tables and the report: SI-mm, SI-m or US (default: the file's own 'units' block)\n" +
        "  --json        print the result as JSON in SI units (Hz, rad/s, kg*m^2, N*m, Pa, rad) instead of tables\n" +
        "  --report OUT  also write one self-contained HTML report (interference diagram, mode shapes, tables)\n" +
        "  Resonances and small margins are flagged, not errors; the exit code is 0 when the train solved, 2 for bad input.";

    public int Run(Args args, CliContext context)
    {
        bool json = args.Flag("json");
        string? report = args.Option("report");
        var units = args.Option("units") is { } us ? UnitSystem.Parse(us) : null;
        args.EnsureAllUsed();
        if (args.Positional.Count != 1) throw new UsageException(args.Positional.Count == 0 ? "give the shaft file, e.g. 'sectiontwist modes winch-shaft.yaml'" : "give exactly one shaft file");
        string path = args.Positional[0];
        if (report is not null) OutputPaths.CheckFile(report, "--report");
        ShaftDocument doc;
        using (var progress = new ProgressLine(context, $"modes {Path.GetFileName(path)}"))
        {
            var sections = new ShaftSectionCatalog(context.Analysis(), context.Err.WriteLine, context.Cancellation)
            {
                Progress = (name, p) => progress.Report(p.Fraction, $"section '{name}': {p.Stage}"),
            };
            doc = ShaftFile.Read(path, ShaftCommand.SectionResolver ?? sections.Resolver, requireDynamics: true);
        }
        if (units is not null) doc = doc with { Units = units };
        var dyn = doc.Dynamics ?? throw ShaftFileReader.NoDynamics(Path.GetFileName(path));
        ModalResult modes;
        ResonanceResult? resonance;
        ForcedResponseResult? forced;
        try
        {
            modes = ModalAnalysis.Solve(dyn.Drivetrain, dyn.Options, context.Cancellation);
            resonance = dyn.Excitation is { } ex ? ResonanceCheck.Evaluate(modes, ex) : null;
            forced = dyn.Forcing is { } f ? ForcedResponse.Compute(modes, f, dyn.DampingRatio) : null;
        }
        catch (SectionTwistException e) { throw new SectionTwistException(e.Code, $"{Path.GetFileName(path)}: dynamics: {e.Message}", e); }

        if (report is not null)
        {
            Rendering.Report.ModesReport.Write(doc, modes, resonance, forced, report, CliReport.Options());
            context.Err.WriteLine($"wrote {report}");
        }
        if (json) context.Out.WriteLine(ModalResultJson.Write(modes, resonance, forced, path));
        else ModesText.Print(context.Out, doc, modes, resonance, forced, path);
        return 0;
    }
}
