using SectionTwist.Import;
using SectionTwist.Torsion;
using SectionTwist.Units;

namespace SectionTwist.Cli;

/// <summary><c>sectiontwist section SOURCE</c>: J, peak shear and area properties of one cross-section.</summary>
internal sealed class SectionCommand : ICommand
{
    public string Name => "section";
    public string Summary => "torsion constant J, peak shear per torque and area properties of a cross-section";
    public string Usage => """
        sectiontwist section SOURCE [--accuracy REL] [--unit U] [--layer NAME] [--part N] [--json] [--plot FILE.png|svg] [--torque T] [--dxf FILE.dxf [--dxf-mesh]] [--plugins DIR]
          SOURCE      a template spec such as circle:d=40, keyed:d=40, rect:b=60,h=20, a drawing file (.dxf),
                      a point list (.csv, .pts) or anything a plugin reads
          --accuracy  requested relative accuracy of J (default 1e-4)
          --unit      length unit of the input (mm, cm, m, in, ft); specs default to mm
          --layer     use only this drawing layer;  --part N  use only the N-th separate part (largest first)
          --json      print one JSON object in SI base units (m, m^2, m^4, 1/m^3)
          --plot      write a shear-stress contour picture (PNG or SVG)
          --torque    torque in N*m for the plot colour bar in MPa (default: stress per unit torque)
          --dxf       write the outline (layer PROFILE) and stress-function contours (layer PHI) to a DXF file for CAD
          --dxf-mesh  also write the mesh edges (layer MESH)
          --plugins   load profile-source plugins (*.dll) from DIR; the SECTIONTWIST_PLUGINS environment
                      variable may list more folders (separated by the system path separator)
        """;

    /// <summary>Environment variable listing plugin folders, separated by <see cref="Path.PathSeparator"/>.</summary>
    internal const string PluginsVariable = "SECTIONTWIST_PLUGINS";

    public int Run(Args args, CliContext ctx)
    {
        bool json = args.Flag("json");
        double accuracy = AccuracyOption.Read(args) ?? 1e-4;
        var unitText = args.Option("unit");
        var srcOptions = new ProfileSourceOptions
        {
            Unit = unitText is null ? null : LengthUnit.Parse(unitText),
            Layer = args.Option("layer"),
            Part = args.Int("part"),
            Accuracy = accuracy,
            Notes = json ? null : note => ctx.Err.WriteLine($"note: {note}"),
        };
        string? plot = args.Option("plot");
        double? torque = args.Double("torque");
        string? dxf = args.Option("dxf");
        bool dxfMesh = args.Flag("dxf-mesh");
        string? plugins = args.Option("plugins");
        if (args.Positional.Count != 1) throw new UsageException(args.Positional.Count == 0 ? "give one SOURCE (a template spec or a .dxf file)" : $"give one SOURCE, not {args.Positional.Count}");
        args.EnsureAllUsed();
        LoadPlugins(plugins);
        var profile = ProfileSources.Load(args.Positional[0], srcOptions);
        var result = SectionAnalyzer.Analyze(profile, new AnalysisOptions { Accuracy = accuracy });
        if (plot is not null) SectionPlotHook.Write(result, plot, torque);
        if (dxf is not null) SectionDxfExport.Write(result, dxf, dxfMesh);
        if (json) ctx.Out.WriteLine(SectionJson.Write(result, args.Positional[0]));
        else SectionText.Write(ctx.Out, result, args.Positional[0]);
        return 0;
    }

    private static void LoadPlugins(string? folder)
    {
        var folders = (Environment.GetEnvironmentVariable(PluginsVariable) ?? "")
            .Split(Path.PathSeparator, StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries).ToList();
        if (folder is not null) folders.Add(folder); // last: takes precedence
        foreach (var f in folders) ProfileSources.LoadPlugins(f);
    }
}
