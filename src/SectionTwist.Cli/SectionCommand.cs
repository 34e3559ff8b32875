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
        sectiontwist section SOURCE [SOURCE ...] [--accuracy REL] [--unit U] [--units SYSTEM] [drawing options] [--json] [--warping [--warping-plot FILE.png|svg]] [--plot FILE.png|svg] [--torque T] [--dxf FILE.dxf [--dxf-mesh]] [--plugins DIR] [--plastic MATERIAL|STRESS [--plastic-plot FILE.png|svg]] [--material PART=MATERIAL,... [--reference PART|MATERIAL]]
          SOURCE      a template spec such as circle:d=40, keyed:d=40, rect:b=60,h=20, a drawing file (.dxf),
                      a point list (.csv, .pts) or anything a plugin reads; several SOURCEs (or a wildcard
                      such as drawings/*.dxf) are analysed on all cores and printed as one table (batch)
          --accuracy  requested relative accuracy of J (default 1e-4)
          --unit      length unit of the input (mm, cm, m, in, ft); specs default to mm
          --units     units of the table and the plot: SI-mm, SI-m or US (default: the input's own, e.g. US for inches)
        drawing options (see 'sectiontwist inspect' to list layers and parts):
        {{DrawingOptions.Usage}}
        output options:
          --json      print one JSON object in SI base units (m, m^2, m^4, 1/m^3); --units does not change it;
                      in a batch one JSON object per line and source
          --csv       print the batch as CSV (SI base units), one row per source
          --jobs      analyses at once in a batch (default: one per core)
          --warping   also solve the warping function: shear centre, warping constant Iw, largest sectorial
                      coordinate, warping length for steel and whether restrained warping matters
          --warping-plot  write a picture of the normalized warping function omega (PNG or SVG): filled bands
                      from negative (blue) through zero (white) to positive (red), shear centre and centroid marked
          --plot      write a shear-stress contour picture (PNG or SVG)
          --torque    torque for the plot colour bar, in N*m, or with a unit: 250Nm, 2kN*m, 1800lbf*in (default: stress per unit torque)
          --dxf       write the outline (layer PROFILE) and stress-function contours (layer PHI) to a DXF file for CAD
          --dxf-mesh  also write the mesh edges (layer MESH)
          --plastic   also the elastic-perfectly-plastic torsion: first-yield torque, fully plastic torque,
                      shape factor and the torque-twist curve, for a material's shear yield (e.g. s355) or a
                      shear yield stress (e.g. 140MPa)
          --plastic-plot  write the plastic zone at each curve point (PNG or SVG)
          --material  a composite section: each part (a drawing layer, or a part of a composite template such as
                      sleeved:d=40,t=5 with parts core and sleeve) and its library material, e.g.
                      --material core=steel-1045-cd,sleeve=brass; the parts are taken as perfectly bonded
          --reference the material the equivalent J refers to: a part or a library material (default: the first part's)
          --plugins   load profile-source plugins (*.dll) from DIR; the SECTIONTWIST_PLUGINS environment
                      variable may list more folders (separated by the system path separator)
        """;

    /// <summary>Environment variable listing plugin folders, separated by <see cref="Path.PathSeparator"/>.</summary>
    internal const string PluginsVariable = "SECTIONTWIST_PLUGINS";

    public int Run(Args args, CliContext ctx)
    {
        bool json = args.Flag("json");
        bool warping = args.Flag("warping");
        string? warpingPlot = args.Option("warping-plot");
        if (warpingPlot is not null && !warping) throw new UsageException("--warping-plot needs --warping (the picture shows the warping function it solves); add --warping");
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
        var materialText = args.Options("material");
        string? referenceText = args.Option("reference");
        bool csv = args.Flag("csv");
        int? jobs = args.Int("jobs");
        if (args.Positional.Count == 0) throw new UsageException("give a SOURCE (a template spec or a .dxf file)");
        args.EnsureAllUsed();
        if (SectionBatchCli.IsBatch(args.Positional, csv))
        {
            string? single = warpingPlot is not null ? "--warping-plot" : plot is not null ? "--plot" : dxf is not null ? "--dxf" : plasticYield is not null ? "--plastic" : warping ? "--warping" : torque is not null ? "--torque" : materialText.Count > 0 ? "--material" : referenceText is not null ? "--reference" : null;
            if (single is not null) throw new UsageException($"{single} works on one SOURCE; run it for each source on its own");
            if (json && csv) throw new UsageException("choose one of --json and --csv");
            if (jobs is < 1 or > 1024) throw new UsageException($"--jobs {jobs}: give the number of analyses at once, from 1 to 1024");
            LoadPlugins(plugins);
            var form = json ? SectionBatchCli.Form.JsonLines : csv ? SectionBatchCli.Form.Csv : SectionBatchCli.Form.Table;
            return SectionBatchCli.Run(ctx, SectionBatchCli.Expand(args.Positional), srcOptions with { Notes = null }, ctx.Analysis(accuracy), units, form, jobs ?? 0);
        }
        if (jobs is not null) throw new UsageException("--jobs applies to a batch of several SOURCEs");
        if (materialText.Count > 0 || Profiles.ProfileTemplates.IsComposite(args.Positional[0]))
        {
            if (warping || plasticYield is not null || dxf is not null)
                throw new UsageException("--warping, --plastic and --dxf are not available for composite sections yet; leave them out");
            LoadPlugins(plugins);
            if (plot is not null) OutputPaths.CheckFile(plot, "--plot");
            return RunComposite(ctx, args.Positional[0], CompositeCli.ParseMaterials(materialText), referenceText, srcOptions, accuracy, json, units, drawingNotes, plot, torque);
        }
        if (referenceText is not null) throw new UsageException("--reference needs --material (a composite section)");
        LoadPlugins(plugins);
        if (plot is not null) OutputPaths.CheckFile(plot, "--plot");
        if (dxf is not null) OutputPaths.CheckFile(dxf, "--dxf");
        if (warpingPlot is not null)
        {
            if (Path.GetExtension(warpingPlot).ToLowerInvariant() is not (".png" or ".svg"))
                throw new UsageException($"--warping-plot {warpingPlot}: unknown picture type '{Path.GetExtension(warpingPlot)}'; name the file *.png or *.svg");
            OutputPaths.CheckFile(warpingPlot, "--warping-plot");
        }
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
        if (warpingPlot is not null)
            Rendering.Warping.WarpingPicture.Save(result, warpingPlot, $"{SectionPlotHook.Title(source, srcOptions.Part)}: warping function ω (about the shear centre)", units);
        Plastic.PlasticResult? plastic;
        using (var progress = new ProgressLine(ctx, $"section {source}"))
        using (progress.Pulse("plastic torsion"))
            plastic = plasticYield is { } yv ? Plastic.PlasticAnalyzer.Analyze(result, yv.Item1, new Plastic.PlasticOptions { MemoryBudgetBytes = ctx.MemoryBudget ?? AnalysisOptions.DefaultMemoryBudget }, ctx.Cancellation) : null;
        if (plastic is not null && plasticPlot is not null) PlasticPlotHook.Write(plastic, plasticPlot, SectionPlotHook.Title(source, srcOptions.Part));
        if (json) ctx.Out.WriteLine(SectionJson.Write(result, source, plastic is null ? null : w => PlasticCli.WriteJson(w, plastic, plasticYield!.Value.Item2)));
        else
        {
            SectionText.Write(ctx.Out, result, source, units);
            if (plastic is not null) PlasticCli.WriteText(ctx.Out, plastic, plasticYield!.Value.Item2, units);
        }
        return 0;
    }

    private static int RunComposite(CliContext ctx, string source, IReadOnlyList<KeyValuePair<string, Shaft.Material>> materials, string? referenceText,
        ProfileSourceOptions srcOptions, double accuracy, bool json, UnitSystem? units, List<string> drawingNotes, string? plot, double? torque)
    {
        var section = Composite.CompositeSources.Load(source, materials, srcOptions);
        var reference = CompositeCli.Reference(referenceText, section);
        Composite.CompositeResult result;
        using (var progress = new ProgressLine(ctx, $"section {source}"))
        using (progress.Pulse("composite torsion"))
            result = Composite.CompositeAnalyzer.Analyze(section, reference, ctx.Analysis(accuracy), ctx.Cancellation);
        if (drawingNotes.Count > 0)
            result = result with { Warnings = drawingNotes.Select(n => new AnalysisWarning("drawing", n)).Concat(result.Warnings).ToList().AsReadOnly() };
        if (plot is not null)
            Rendering.Section.CompositePicture.Save(result, plot, $"{SectionPlotHook.Title(source, srcOptions.Part)}: materials and shear stress",
                new Rendering.Section.SectionPlotOptions { Torque = torque, Units = units });
        if (json) ctx.Out.WriteLine(CompositeCli.WriteJson(result, source));
        else CompositeCli.WriteText(ctx.Out, result, source, units);
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
