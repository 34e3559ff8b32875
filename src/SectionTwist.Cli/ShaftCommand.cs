using SectionTwist.Rendering.Adapters;
using SectionTwist.Rendering.Report;
using SectionTwist.Shaft;
using SectionTwist.Units;
using SectionTwist.Verification;

namespace SectionTwist.Cli;

/// <summary>
/// <c>sectiontwist shaft design.yaml [--json] [--csv DIR] [--report OUT.html]</c>: solves a segmented shaft file and prints
/// stations, segments, reactions, the governing segment and margins in the file's units (JSON and CSV in SI); the report is
/// assembled by <see cref="ShaftReport"/>.
/// </summary>
internal sealed class ShaftCommand : ICommand
{
    internal const string Caution =
        "caution: results assume linear elastic, Saint-Venant torsion; stress concentrations at shoulders, keyseat ends and fillets " +
        "are not included; verify against local codes and licensed engineering practice.";

    /// <summary>Turns template and DXF sections into J and peak shear per unit torque; null: a <see cref="ShaftSectionCatalog"/>
    /// (templates, drawings, section analysis), which also keeps the solved sections for the report's pictures.</summary>
    internal static Func<SectionSource, SectionStiffness>? SectionResolver { get; set; }

    public string Name => "shaft";

    public string Summary => "twist, shear and reactions along a segmented shaft described in a YAML file";

    public string Usage =>
        "sectiontwist shaft FILE.yaml [--units SI-mm|SI-m|US] [--json] [--csv DIR] [--report OUT.html]\n" +
        "  Solves the shaft file (format: docs/shaft-file.md) by the stiffness method and prints the rotation of every station,\n" +
        "  the internal torque, twist, peak shear, factor of safety, twist rate and check of every segment, the support\n" +
        "  reactions, the governing segment and the warnings.\n" +
        "  --units SYS   units of the tables, CSV files and report: SI-mm, SI-m or US (default: the file's own 'units' block)\n" +
        "  --json        print the result as JSON in SI base units (m, N*m, Pa, rad) instead of tables; --units does not change it\n" +
        "  --csv DIR     also write DIR/stations.csv, DIR/segments.csv and DIR/warnings.csv, DIR/bending.csv with a 'bending' block\n" +
        "                DIR/warping-stations.csv and DIR/warping-segments.csv when warping is restrained, and DIR/overload.csv\n" +
        "                with an 'overload' block\n" +
        "  --report OUT  also write one self-contained HTML report (inputs, tables, pictures, verification, method; with a\n" +
        "                'dynamics' block also the further shafts and the torsional modes, as 'sectiontwist modes' computes them)\n" +
        "  Exceeded limits and unbounded peaks (sharp corners) are flagged in the 'check' column, not errors; the exit code is\n" +
        "  0 when the shaft solved, 2 for bad input.";

    public int Run(Args args, CliContext context)
    {
        bool json = args.Flag("json");
        string? csv = args.Option("csv");
        string? report = args.Option("report");
        var units = args.Option("units") is { } us ? UnitSystem.Parse(us) : null;
        args.EnsureAllUsed();
        if (args.Positional.Count != 1) throw new UsageException(args.Positional.Count == 0 ? "give the shaft file, e.g. 'sectiontwist shaft winch-shaft.yaml'" : "give exactly one shaft file");
        string path = args.Positional[0];
        if (report is not null) OutputPaths.CheckFile(report, "--report");
        if (csv is not null) OutputPaths.PrepareFolder(csv, "--csv");

        // the report's verification cases run beside the section analyses
        var verifying = report is null ? null : Task.Run(() => VerificationSuite.Run(context.Analysis(), context.Cancellation));
        ShaftDocument doc;
        ShaftSectionCatalog sections;
        using (var progress = new ProgressLine(context, $"shaft {Path.GetFileName(path)}"))
        {
            sections = new ShaftSectionCatalog(context.Analysis(), context.Err.WriteLine, context.Cancellation)
            {
                Progress = (name, p) => progress.Report(p.Fraction, $"section '{name}': {p.Stage}"),
            };
            doc = ShaftFile.Load(path, SectionResolver ?? sections.Resolver);
        }
        if (units is not null) doc = doc with { Units = units };
        ShaftResult result;
        GearedShaftResult? geared = null;
        try
        {
            // further shafts joined by stages: every shaft solved at its own speed, never silently dropped
            if (doc.Dynamics is { } dyn && dyn.Drivetrain.Shafts.Count > 1)
            {
                geared = GearedShaftSolver.Solve(dyn.Drivetrain, context.Cancellation);
                result = geared.Main;
            }
            else result = ShaftSolver.Solve(doc.Model, context.Cancellation);
        }
        catch (SectionTwistException e) { throw new SectionTwistException(e.Code, $"{Path.GetFileName(path)}: {e.Message}", e); }

        context.Cancellation.ThrowIfCancellationRequested();
        var csvFiles = csv is null ? [] : ShaftResultCsv.WriteAll(result, csv, doc.Units, geared);
        if (report is not null)
        {
            IReadOnlyList<Verification.VerificationOutcome> outcomes;
            using (var progress = new ProgressLine(context, "report"))
            using (progress.Pulse("verification cases"))
                outcomes = verifying!.GetAwaiter().GetResult();
            var extras = ShaftExtras.Compute(doc, geared, path, context.Cancellation);
            ShaftReport.Write(ShaftReport.Build(doc, result, sections, outcomes, CliReport.Options(), extras), report);
            context.Err.WriteLine($"wrote {report}");
        }
        if (json) context.Out.WriteLine(ShaftResultJson.Write(result, path, geared));
        else PrintTables(context.Out, doc, result, path, geared);
        if (csv is not null) context.Err.WriteLine($"wrote {string.Join(", ", csvFiles)}");
        return 0;
    }

    internal static void PrintTables(TextWriter w, ShaftDocument doc, ShaftResult r, string path, GearedShaftResult? geared = null)
    {
        var u = doc.Units;
        w.WriteLine($"{doc.Model.Title ?? "shaft"} ({path}), units {u.Name}");
        w.WriteLine($"sign convention: right-hand rule about the axis from '{r.Stations[0].Name}' to '{r.Stations[^1].Name}'; " +
                    "internal torque positive when it acts counter-clockwise on the cut face looking back toward the first station");
        w.WriteLine($"rotations relative to station '{r.ReferenceStation}'");
        if (r.Warping is not null)
            w.WriteLine("free warping (Saint-Venant) in these tables; the file restrains warping: the restrained-warping tables after them " +
                        "give the member's rotations, support torques, spring torques and bimoments");
        w.WriteLine();

        w.WriteLine("stations");
        var st = new List<string[]> { new[] { "name", $"position [{u.Length.Symbol}]", $"applied torque [{u.Torque.Symbol}]", "rotation [deg]", "rotation [rad]", "support" } };
        foreach (var s in r.Stations)
            st.Add([s.Name, u.Length.Format(s.Position), s.AppliedTorque == 0 ? "-" : u.Torque.Format(s.AppliedTorque), NumberText.Fixed(Deg(s.Rotation), 4),
                NumberText.Format(s.Rotation, 4), s.IsFixed ? "fixed" : ""]);
        Table(w, st);
        w.WriteLine();

        w.WriteLine("segments");
        var sg = new List<string[]>
        {
            new[] { "segment", "section", "material", $"length [{u.Length.Symbol}]", $"torque [{u.Torque.Symbol}]", "twist [deg]",
                $"max shear [{u.Stress.Symbol}]", $"limit [{u.Stress.Symbol}]", "FoS", $"twist rate [{u.TwistRate.Symbol}]", "check" },
        };
        foreach (var s in r.Segments)
        {
            string torque = s.TorqueAtFrom == s.TorqueAtTo ? u.Torque.Format(s.TorqueAtFrom) : $"{u.Torque.Format(s.TorqueAtFrom)}..{u.Torque.Format(s.TorqueAtTo)}";
            string label = s.Label == $"{s.From}-{s.To}" ? s.Label : $"{s.Label} ({s.From}-{s.To})";
            sg.Add([label, s.Section, s.Material.Name, u.Length.Format(s.Length), torque, NumberText.Fixed(Deg(s.Twist), 4),
                ShaftResultChapter.PeakShear(u, s, withUnit: false), s.ShearLimit is { } lim ? u.Stress.Format(lim, 4) : "-",
                ShaftResultChapter.SafetyFactor(s).Replace('–', '-'), u.TwistRate.Format(s.MaxTwistRate, 4), s.Check == "ok" ? "ok" : "!! " + s.Check.ToUpperInvariant()]);
        }
        Table(w, sg);
        foreach (var s in r.Segments.Where(s => s.MaterialChecks.Count > 0))
            w.WriteLine($"  composite {s.Label}: " + string.Join("; ", s.MaterialChecks.Select(c =>
                $"{c.Material.Name} max shear {u.Stress.Text(c.MaxShear, 4)}, {(c.Material.LimitShear is { } l ? $"{c.Material.LimitBasis} {u.Stress.Text(l, 4)}, FoS {(c.SafetyFactor is { } f ? double.IsPositiveInfinity(f) ? "-" : NumberText.Fixed(f, 2) : "-")}" : "no limit")}{(c.Exceeds ? " !! OVER" : "")}")));
        w.WriteLine();

        if (r.Springs.Count > 0)
        {
            w.WriteLine("springs");
            var sp = new List<string[]> { new[] { "spring", "between", $"torque [{u.Torque.Symbol}]", "wind-up [deg]" } };
            foreach (var s in r.Springs) sp.Add([s.Label, $"{s.StationA}-{s.StationB}", u.Torque.Format(s.Torque), NumberText.Fixed(Deg(s.Windup), 4)]);
            Table(w, sp);
            w.WriteLine();
        }

        if (r.Reactions.Count == 0) w.WriteLine("reactions: none (free shaft; the applied torques balance)");
        else
        {
            w.WriteLine("reactions (torque the support applies to the shaft)");
            var re = new List<string[]> { new[] { "station", $"torque [{u.Torque.Symbol}]" } };
            foreach (var x in r.Reactions) re.Add([x.Station, u.Torque.Format(x.Torque)]);
            Table(w, re);
        }
        w.WriteLine();

        // the same sentences as the report's summary
        w.WriteLine(ShaftResultChapter.Governing(doc, r));
        w.WriteLine(ShaftResultChapter.TwistRate(doc, r));
        w.WriteLine(ShaftResultChapter.EndToEnd(r));
        foreach (var alarm in ShaftResultChapter.Alarms(r)) w.WriteLine("!! " + alarm);
        if (r.Warnings.Count > 0)
        {
            w.WriteLine();
            w.WriteLine("warnings");
            foreach (var x in r.Warnings) w.WriteLine($"  warning [{x.Code}]: {x.Message}");
        }
        w.WriteLine();
        if (r.Bending is { } bending)
        {
            BendingTables.Print(w, u, bending, doc.Model.Bending!.Rotating);
            w.WriteLine();
        }
        ShaftWarpingText.Write(w, doc, r);
        if (r.Overload is { } overload) ShaftOverloadText.Write(w, doc, overload);
        if (geared is not null) ShaftBranchText.Write(w, doc, geared);
        w.WriteLine(Caution);
    }

    private static double Deg(double rad) => rad * 180 / Math.PI;

    internal static void Table(TextWriter w, List<string[]> rows)
    {
        int cols = rows[0].Length;
        var width = new int[cols];
        foreach (var row in rows) for (int c = 0; c < cols; c++) width[c] = Math.Max(width[c], row[c].Length);
        foreach (var row in rows)
            w.WriteLine("  " + string.Join("  ", row.Select((cell, c) => c == cols - 1 ? cell : cell.PadRight(width[c]))).TrimEnd());
    }
}
