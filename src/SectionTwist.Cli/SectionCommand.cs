using SectionTwist.Import;
using SectionTwist.Torsion;
using SectionTwist.Units;

namespace SectionTwist.Cli;

/// <summary><c>sectiontwist section SOURCE</c>: J, peak shear and area properties of one cross-section.</summary>
internal sealed class SectionCommand : ICommand
{
    public string Name => "section";
    public string Summary => "torsion constant J, peak shear per torque and area properties of a cross-section";
    public string Usage => $$"""
        sectiontwist section SOURCE [--accuracy REL] [--unit U] [--units SYSTEM] [drawing options] [--json] [--warping] [--plot FILE.png|svg] [--torque T] [--dxf FILE.dxf [--dxf-mesh]] [--plugins DIR] [--plastic MATERIAL|STRESS [--plastic-plot FILE.png|svg]]
          SOURCE      a template spec such as circle:d=40, keyed:d=40, rect:b=60,h=20, a drawing file (.dxf),
                      a point list (.csv, .pts) or anything a plugin reads
          --accuracy  requested relative accuracy of J (default 1e-4)
          --unit      length unit of the input (mm, cm, m, in, ft); specs default to mm
          --units     units of the table and the plot: SI-mm, SI-m or US (default: the input's own, e.g. US for inches)
        drawing options (see 'sectiontwist inspect' to list layers and parts):
        {{DrawingOptions.Usage}}
        output options:
          --json      print one JSON object in SI base units (m, m^2, m^4, 1/m^3); --units does not change it
          --warping   also solve the warping function: shear centre, warping constant Iw, largest sectorial
                      coordinate, warping length for steel and whether restrained warping matters
          --plot      write a shear-stress contour picture (PNG or SVG)
          --torque    torque for the plot colour bar, in N*m, or with a unit: 250Nm, 2kN*m, 1800lbf*in (default: stress per unit torque)
          --dxf       write the outline (layer PROFILE) and stress-function contours (layer PHI) to a DXF file for CAD
          --dxf-mesh  also write the mesh edges (layer MESH)
          --plastic   also the elastic-perfectly-plastic torsion: first-yield torque, fully plastic torque,
                      shape factor and the torque-twist curve, for a material's shear yield (e.g. s355) or a
                      shear yield stress (e.g. 140MPa)
          --plastic-plot  write the plastic zone at each curve point (PNG or SVG)
          --plugins   load profile-source plugins (*.dll) from DIR; the SECTIONTWIST_PLUGINS environment
                      variable may list more folders (separated by the system path separator)
        """;

    /// <summary>Environment variable listing plugin folders, separated by <see cref="Path.PathSeparator"/>.</summary>
    internal const string PluginsVariable = "SECTIONTWIST_PLUGINS";

    public int Run(Args args, CliContext ctx)
    {
        bool json = args.Flag("json");
        bool warping = args.Flag("warping");
        double accuracy = AccuracyOption.Read(args) ?? 1e-4;
        var unitText = args.Option("unit");
        var drawingNotes = new List<string>();
        var srcOptions = DrawingOptions.Read(args, new ProfileSourceOptions
        {
            Unit = unitText is null ? null : LengthUnit.Parse(unitText),
            Accuracy = accuracy,
            Notes = json ? drawingNotes.Add : note => ctx.Err.WriteLine($"note: {note}"),
            Cancellation = ctx.Cancellation,
        });
        string? plot = args.Option("plot");
        double? torque = TorqueOption(args.Option("torque"));
        var units = args.Option("units") is { } us ? UnitSystem.Parse(us) : null;
        string? dxf = args.Option("dxf");
        bool dxfMesh = args.Flag("dxf-mesh");
        string? plugins = args.Option("plugins");
        var plasticYield = args.Option("plastic") is { } py ? PlasticCli.ParseYield(py) : ((double, string)?)null;
        string? plasticPlot = args.Option("plastic-plot");
        if (plasticPlot is not null && plasticYield is null) throw new UsageException("--plastic-plot needs --plastic MATERIAL|STRESS");
        if (args.Positional.Count != 1) throw new UsageException(args.Positional.Count == 0 ? "give one SOURCE (a template spec or a .dxf file)" : $"give one SOURCE, not {args.Positional.Count}");
        args.EnsureAllUsed();
        LoadPlugins(plugins);
        if (plot is not null) OutputPaths.CheckFile(plot, "--plot");
        if (dxf is not null) OutputPaths.CheckFile(dxf, "--dxf");
        string source = args.Positional[0];
        var profile = ProfileSources.Load(source, srcOptions);
        SectionResult result;
        using (var progress = new ProgressLine(ctx, $"section {source}"))
            result = SectionAnalyzer.Analyze(profile, ctx.Analysis(accuracy) with { Warping = warping }, ctx.Cancellation, progress.Analysis("analysis"));
        // in JSON the reader's notes (parts analysed together, entities left out, facets) travel with the warnings
        if (drawingNotes.Count > 0)
            result = result with { Warnings = drawingNotes.Select(n => new AnalysisWarning("drawing", n)).Concat(result.Warnings).ToList().AsReadOnly() };
        if (plot is not null) SectionPlotHook.Write(result, plot, torque, SectionPlotHook.Title(source, srcOptions.Part), units);
        if (dxf is not null) SectionDxfExport.Write(result, dxf, dxfMesh);
        Plastic.PlasticResult? plastic;
        using (var progress = new ProgressLine(ctx, $"section {source}"))
        using (progress.Pulse("plastic torsion"))
            plastic = plasticYield is { } yv ? Plastic.PlasticAnalyzer.Analyze(result, yv.Item1, new Plastic.PlasticOptions { MemoryBudgetBytes = ctx.MemoryBudget ?? AnalysisOptions.DefaultMemoryBudget }, ctx.Cancellation) : null;
        if (plastic is not null && plasticPlot is not null) PlasticPlotHook.Write(plastic, plasticPlot);
        if (json) ctx.Out.WriteLine(SectionJson.Write(result, source, plastic is null ? null : w => PlasticCli.WriteJson(w, plastic, plasticYield!.Value.Item2)));
        else
        {
            SectionText.Write(ctx.Out, result, source, units);
            if (plastic is not null) PlasticCli.WriteText(ctx.Out, plastic, plasticYield!.Value.Item2, units);
        }
        return 0;
    }

    /// <summary>The <c>--torque</c> value in N*m: a plain number is N*m; a number with a torque unit (250Nm, 1800lbf*in) is converted.</summary>
    internal static double? TorqueOption(string? text)
    {
        if (text is null) return null;
        double? t = Shaft.QuantityText.TrySplit(text, out double v, out string unit)
            ? unit.Length == 0 ? v : Shaft.QuantityText.UnitFactor(unit, Shaft.QuantityKind.Torque) * v
            : null;
        if (t is not { } x || !double.IsFinite(x) || x == 0)
            throw new UsageException($"--torque: '{text}' is not a non-zero torque; write N*m (250) or a number with a unit: {Shaft.QuantityText.Examples(Shaft.QuantityKind.Torque)}");
        return x;
    }

    private static void LoadPlugins(string? folder)
    {
        var folders = (Environment.GetEnvironmentVariable(PluginsVariable) ?? "")
            .Split(Path.PathSeparator, StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries).ToList();
        if (folder is not null) folders.Add(folder); // last: takes precedence
        foreach (var f in folders) ProfileSources.LoadPlugins(f);
    }
}
