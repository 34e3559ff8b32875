using SectionTwist.Rendering.Report;
using SectionTwist.Shaft;
using static SectionTwist.Rendering.Adapters.ShaftInputTables;

namespace SectionTwist.Rendering.Adapters;

/// <summary>
/// The results chapter of a shaft report in the file's units: stations (rotation), segments (internal torque, twist, peak
/// shear, limit, factor of safety, margin, twist rate and flags), springs, reactions and the governing segment; and the
/// one-line summaries that the report's key figures and the command line share, so both show the same numbers.
/// </summary>
internal static class ShaftResultChapter
{
    private const double Deg = 180 / Math.PI;

    public static ReportChapter Build(ShaftDocument doc, ShaftResult r, ReportFigure? diagram)
    {
        var u = doc.Units;
        var tables = new List<ReportTable>
        {
            new("Stations: rotation relative to the reference station",
                ["station", $"position, {u.Length.Symbol}", $"applied torque, {u.Torque.Symbol}", "rotation, deg", "rotation, rad", "support"],
                r.Stations.Select(s => Row(s.Name, u.Length.Format(s.Position), s.AppliedTorque == 0 ? "–" : u.Torque.Format(s.AppliedTorque),
                    F(s.Rotation * Deg, "F4"), F(s.Rotation, "G4"), s.IsFixed ? "fixed" : "")).ToList()),
            Segments(r, u),
        };
        if (r.Springs.Count > 0)
            tables.Add(new ReportTable("Springs", ["spring", "between", $"torque, {u.Torque.Symbol}", "wind-up, deg"],
                r.Springs.Select(s => Row(s.Label, $"{s.StationA} – {s.StationB}", u.Torque.Format(s.Torque), F(s.Windup * Deg, "F4"))).ToList()));
        tables.Add(r.Reactions.Count == 0
            ? new ReportTable("Support reactions", ["station", $"torque, {u.Torque.Symbol}"], [Row("none", "free shaft: the applied torques balance")])
            : new ReportTable("Support reactions (torque the support applies to the shaft)", ["station", $"torque, {u.Torque.Symbol}"],
                r.Reactions.Select(x => Row(x.Station, u.Torque.Format(x.Torque))).ToList()));

        var paragraphs = new List<string>
        {
            $"Sign convention: torques and rotations follow the right-hand rule about the axis from station '{r.Stations[0].Name}' to " +
            $"station '{r.Stations[^1].Name}'. The internal torque is positive when it acts counter-clockwise on the cut face looking back " +
            "toward the first station. Rotations are measured from station '" + r.ReferenceStation + "'.",
            Governing(doc, r),
            TwistRate(r),
            EndToEnd(r),
        };
        if (r.AnyLimitExceeded) paragraphs.Add("At least one segment exceeds its limit: see the flagged rows of the segment table.");
        return new ReportChapter("Shaft: results")
        {
            Paragraphs = paragraphs,
            Tables = tables,
            Figures = diagram is null ? [] : [diagram],
        };
    }

    private static ReportTable Segments(ShaftResult r, ShaftDisplayUnits u)
    {
        var rows = new List<IReadOnlyList<string>>();
        var alerts = new List<int>();
        foreach (var s in r.Segments)
        {
            if (s.ExceedsShearLimit || s.ExceedsTwistRateLimit) alerts.Add(rows.Count);
            rows.Add(Row(s.Label, $"{s.From} – {s.To}", u.Torque.Format(s.TorqueAtFrom), u.Torque.Format(s.TorqueAtTo), F(s.Twist * Deg, "F4"),
                u.Stress.Format(s.MaxShear, "G4"), s.ShearLimit is { } lim ? u.Stress.Format(lim, "G4") : "–", s.Material.LimitBasis,
                s.SafetyFactor is { } sf ? double.IsFinite(sf) ? F(sf, "F2") : "∞" : "–",
                s.SafetyFactor is { } sf2 && double.IsFinite(sf2) ? F((sf2 - 1) * 100, "F0") : "–",
                F(s.MaxTwistRateDegPerMetre, "G4"), Flags(s)));
        }
        return new ReportTable("Segments: internal torque at both ends, twist, peak shear and margins",
            ["segment", "stations", $"torque at start, {u.Torque.Symbol}", $"torque at end, {u.Torque.Symbol}", "twist, deg",
                $"peak shear, {u.Stress.Symbol}", $"limit, {u.Stress.Symbol}", "limit basis", "factor of safety", "margin, %",
                "twist rate, deg/m", "check"], rows) { AlertRows = alerts };
    }

    /// <summary>The check column: <c>ok</c> or the exceeded limits.</summary>
    internal static string Flags(SegmentResult s)
    {
        var flags = new List<string>();
        if (s.ExceedsShearLimit) flags.Add($"shear over {s.Material.LimitBasis}");
        if (s.ExceedsTwistRateLimit) flags.Add("twist rate over limit");
        return flags.Count == 0 ? "ok" : "EXCEEDED: " + string.Join(", ", flags);
    }

    /// <summary>The peak shear of a segment as printed everywhere (value and unit in the file's stress unit).</summary>
    internal static string Shear(ShaftDisplayUnits u, double pa) => $"{u.Stress.Format(pa, "G4")} {u.Stress.Symbol}";

    /// <summary>One line on the governing segment: its peak shear against the limit, factor of safety and margin.</summary>
    internal static string Governing(ShaftDocument doc, ShaftResult r)
    {
        var u = doc.Units;
        if (r.GoverningSegment is not { } g)
            return "Governing segment (shear): none; no loaded segment has a shear limit (give the materials an allowable shear or a yield strength).";
        double sf = g.SafetyFactor!.Value;
        return $"Governing segment (shear): {g.Label} ({g.From} – {g.To}), peak shear {Shear(u, g.MaxShear)} against {g.Material.LimitBasis} " +
               $"{Shear(u, g.ShearLimit!.Value)}, factor of safety {F(sf, "F2")} (margin {F((sf - 1) * 100, "F0")} %)" +
               (g.ExceedsShearLimit ? ": EXCEEDED." : ".");
    }

    /// <summary>One line on the largest twist rate and its limit.</summary>
    internal static string TwistRate(ShaftResult r)
    {
        if (r.GoverningTwistSegment is not { } t) return "Largest twist rate: none (no segment carries torque).";
        string lim = r.TwistRateLimit is { } l
            ? $" against the limit {F(l * Deg, "G4")} deg/m (margin {F((l / t.MaxTwistRate - 1) * 100, "F0")} %){(t.ExceedsTwistRateLimit ? ": EXCEEDED" : "")}"
            : " (no twist-rate limit given)";
        return $"Largest twist rate: {t.Label}, {F(t.MaxTwistRateDegPerMetre, "G4")} deg/m{lim}.";
    }

    /// <summary>One line on the rotation of the last station relative to the first.</summary>
    internal static string EndToEnd(ShaftResult r) =>
        $"Total twist (station '{r.Stations[^1].Name}' relative to '{r.Stations[0].Name}'): {F(r.EndToEndTwist * Deg, "F4")} deg ({F(r.EndToEndTwist, "G4")} rad).";

    /// <summary>The headline numbers of a shaft.</summary>
    public static IReadOnlyList<KeyFigure> KeyFigures(ShaftDocument doc, ShaftResult r)
    {
        var u = doc.Units;
        var list = new List<KeyFigure>();
        if (r.GoverningSegment is { } g)
        {
            list.Add(new KeyFigure("governing segment", $"{g.Label} ({g.From} – {g.To})", g.ExceedsShearLimit));
            list.Add(new KeyFigure("peak shear", Shear(u, g.MaxShear), g.ExceedsShearLimit));
            list.Add(new KeyFigure($"{g.Material.LimitBasis} shear", Shear(u, g.ShearLimit!.Value)));
            list.Add(new KeyFigure("factor of safety", F(g.SafetyFactor!.Value, "F2"), g.ExceedsShearLimit));
        }
        else
        {
            var peak = r.Segments.MaxBy(s => s.MaxShear)!;
            list.Add(new KeyFigure("largest peak shear", $"{Shear(u, peak.MaxShear)} in {peak.Label} (no limit given)"));
        }
        list.Add(new KeyFigure("total twist", $"{F(r.EndToEndTwist * Deg, "F4")} deg"));
        if (r.GoverningTwistSegment is { } t)
            list.Add(new KeyFigure("largest twist rate", $"{F(t.MaxTwistRateDegPerMetre, "G4")} deg/m in {t.Label}" +
                (r.TwistRateLimit is { } l ? $" (limit {F(l * Deg, "G4")})" : ""), t.ExceedsTwistRateLimit));
        return list;
    }
}
