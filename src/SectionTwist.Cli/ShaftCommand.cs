using System.Globalization;
using SectionTwist.Rendering.Adapters;
using SectionTwist.Rendering.Report;
using SectionTwist.Shaft;
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
        "sectiontwist shaft FILE.yaml [--json] [--csv DIR] [--report OUT.html]\n" +
        "  Solves the shaft file (format: docs/shaft-file.md) by the stiffness method and prints the rotation of every station,\n" +
        "  the internal torque, twist, peak shear, factor of safety and twist rate of every segment, the support reactions and\n" +
        "  the governing segment, in the file's units.\n" +
        "  --json        print the result as JSON in SI base units (m, N*m, Pa, rad) instead of tables\n" +
        "  --csv DIR     also write DIR/stations.csv and DIR/segments.csv (SI units), and DIR/bending.csv with a 'bending' block\n" +
        "  --report OUT  also write one self-contained HTML report (inputs, tables, pictures, verification, method)\n" +
        "  Exceeded limits are flagged, not errors; the exit code is 0 when the shaft solved, 2 for bad input.";

    public int Run(Args args, CliContext context)
    {
        bool json = args.Flag("json");
        string? csv = args.Option("csv");
        string? report = args.Option("report");
        args.EnsureAllUsed();
        if (args.Positional.Count != 1) throw new UsageException(args.Positional.Count == 0 ? "give the shaft file, e.g. 'sectiontwist shaft winch-shaft.yaml'" : "give exactly one shaft file");
        string path = args.Positional[0];
        if (report is not null) OutputPaths.CheckFile(report, "--report");

        // the report's verification cases run beside the section analyses
        var verifying = report is null ? null : Task.Run(() => VerificationSuite.Run(context.Analysis(), context.Cancellation));
        var sections = new ShaftSectionCatalog(context.Analysis(), context.Err.WriteLine, context.Cancellation);
        var doc = ShaftFile.Load(path, SectionResolver ?? sections.Resolver);
        ShaftResult result;
        try { result = ShaftSolver.Solve(doc.Model); }
        catch (SectionTwistException e) { throw new SectionTwistException(e.Code, $"{Path.GetFileName(path)}: {e.Message}", e); }

        context.Cancellation.ThrowIfCancellationRequested();
        if (csv is not null) ShaftResultCsv.WriteAll(result, csv);
        if (report is not null)
        {
            ShaftReport.Write(ShaftReport.Build(doc, result, sections, verifying!.GetAwaiter().GetResult(), CliReport.Options()), report);
            context.Err.WriteLine($"wrote {report}");
        }
        if (json) context.Out.WriteLine(ShaftResultJson.Write(result, path));
        else PrintTables(context.Out, doc, result, path);
        if (csv is not null) context.Err.WriteLine($"wrote {Path.Combine(csv, "stations.csv")} and {Path.Combine(csv, "segments.csv")}{(result.Bending is null ? "" : $" and {Path.Combine(csv, "bending.csv")}")}");
        return 0;
    }

    private static string F(double v, string format = "G5") => v.ToString(format, CultureInfo.InvariantCulture);

    private static double Deg(double rad) => rad * 180 / Math.PI;

    internal static void PrintTables(TextWriter w, ShaftDocument doc, ShaftResult r, string path)
    {
        var u = doc.Units;
        w.WriteLine($"{doc.Model.Title ?? "shaft"} ({path})");
        w.WriteLine($"sign convention: right-hand rule about the axis from '{r.Stations[0].Name}' to '{r.Stations[^1].Name}'; " +
                    "internal torque positive when it acts counter-clockwise on the cut face looking back toward the first station");
        w.WriteLine($"rotations relative to station '{r.ReferenceStation}'");
        w.WriteLine();

        w.WriteLine("stations");
        var st = new List<string[]> { new[] { "name", $"position [{u.Length.Symbol}]", $"applied torque [{u.Torque.Symbol}]", "rotation [deg]", "rotation [rad]", "support" } };
        foreach (var s in r.Stations)
            st.Add([s.Name, u.Length.Format(s.Position), s.AppliedTorque == 0 ? "-" : u.Torque.Format(s.AppliedTorque), F(Deg(s.Rotation), "F4"), F(s.Rotation, "G4"), s.IsFixed ? "fixed" : ""]);
        Table(w, st);
        w.WriteLine();

        w.WriteLine("segments");
        var sg = new List<string[]>
        {
            new[] { "segment", "section", "material", $"length [{u.Length.Symbol}]", $"torque [{u.Torque.Symbol}]", "twist [deg]",
                $"max shear [{u.Stress.Symbol}]", $"limit [{u.Stress.Symbol}]", "FoS", "twist rate [deg/m]", "check" },
        };
        foreach (var s in r.Segments)
        {
            string torque = s.TorqueAtFrom == s.TorqueAtTo ? u.Torque.Format(s.TorqueAtFrom) : $"{u.Torque.Format(s.TorqueAtFrom)}..{u.Torque.Format(s.TorqueAtTo)}";
            string label = s.Label == $"{s.From}-{s.To}" ? s.Label : $"{s.Label} ({s.From}-{s.To})";
            var flags = new List<string>();
            if (s.ExceedsShearLimit) flags.Add($"SHEAR OVER {s.Material.LimitBasis.ToUpperInvariant()}");
            if (s.ExceedsTwistRateLimit) flags.Add("TWIST RATE OVER LIMIT");
            sg.Add([label, s.Section, s.Material.Name, u.Length.Format(s.Length), torque, F(Deg(s.Twist), "F4"), u.Stress.Format(s.MaxShear, "G4"),
                s.ShearLimit is { } lim ? u.Stress.Format(lim, "G4") : "-", s.SafetyFactor is { } sf ? double.IsFinite(sf) ? F(sf, "F2") : "inf" : "-",
                F(s.MaxTwistRateDegPerMetre, "G4"), flags.Count == 0 ? "ok" : "!! " + string.Join(", ", flags)]);
        }
        Table(w, sg);
        w.WriteLine();

        if (r.Springs.Count > 0)
        {
            w.WriteLine("springs");
            var sp = new List<string[]> { new[] { "spring", "between", $"torque [{u.Torque.Symbol}]", "wind-up [deg]" } };
            foreach (var s in r.Springs) sp.Add([s.Label, $"{s.StationA}-{s.StationB}", u.Torque.Format(s.Torque), F(Deg(s.Windup), "F4")]);
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

        if (r.GoverningSegment is { } g)
            w.WriteLine($"governing segment (shear): {g.Label}: {u.Stress.Format(g.MaxShear, "G4")} {u.Stress.Symbol} against {g.Material.LimitBasis} " +
                        $"{u.Stress.Format(g.ShearLimit!.Value, "G4")} {u.Stress.Symbol}, factor of safety {F(g.SafetyFactor!.Value, "F2")} " +
                        $"(margin {F((g.SafetyFactor.Value - 1) * 100, "F0")} %){(g.ExceedsShearLimit ? "  !! EXCEEDED" : "")}");
        else w.WriteLine("governing segment (shear): none (no loaded segment has a shear limit; give the materials 'allowableShear' or 'yield')");
        if (r.GoverningTwistSegment is { } t)
        {
            string lim = r.TwistRateLimit is { } l
                ? $" against limit {F(Deg(l), "G4")} deg/m (margin {F((l / t.MaxTwistRate - 1) * 100, "F0")} %){(t.ExceedsTwistRateLimit ? "  !! EXCEEDED" : "")}"
                : " (no twist limit given)";
            w.WriteLine($"largest twist rate: {t.Label}: {F(t.MaxTwistRateDegPerMetre, "G4")} deg/m{lim}");
        }
        w.WriteLine($"end-to-end twist: {F(Deg(r.EndToEndTwist), "F4")} deg ({F(r.EndToEndTwist, "G4")} rad)");
        if (r.AnyLimitExceeded) w.WriteLine("!! at least one segment exceeds its limit (see 'check' above)");
        w.WriteLine();
        if (r.Bending is { } bending)
        {
            BendingTables.Print(w, u, bending, doc.Model.Bending!.Rotating);
            w.WriteLine();
        }
        ShaftWarpingText.Write(w, doc, r);
        w.WriteLine(Caution);
    }

    internal static void Table(TextWriter w, List<string[]> rows)
    {
        int cols = rows[0].Length;
        var width = new int[cols];
        foreach (var row in rows) for (int c = 0; c < cols; c++) width[c] = Math.Max(width[c], row[c].Length);
        foreach (var row in rows)
            w.WriteLine("  " + string.Join("  ", row.Select((cell, c) => c == cols - 1 ? cell : cell.PadRight(width[c]))).TrimEnd());
    }
}
