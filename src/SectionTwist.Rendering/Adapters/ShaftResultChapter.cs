using SectionTwist.Rendering.Report;
using SectionTwist.Shaft;
using SectionTwist.Units;
using static SectionTwist.Rendering.Adapters.ShaftInputTables;

namespace SectionTwist.Rendering.Adapters;

/// <summary>
/// The results chapter of a shaft report in the document's display units: stations (rotation), segments (internal torque,
/// twist, peak shear, limit, factor of safety, margin, twist rate and the check), springs, reactions and the governing
/// segment; and the one-line summaries that the report's key figures and the command line share, so both show the same
/// numbers in the same words.
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
                    NumberText.Fixed(s.Rotation * Deg, 4), F(s.Rotation, "G4"), s.IsFixed ? "fixed" : "")).ToList()),
            Segments(r, u),
        };
        if (r.Springs.Count > 0)
            tables.Add(new ReportTable("Springs", ["spring", "between", $"torque, {u.Torque.Symbol}", "wind-up, deg"],
                r.Springs.Select(s => Row(s.Label, $"{s.StationA} – {s.StationB}", u.Torque.Format(s.Torque), NumberText.Fixed(s.Windup * Deg, 4))).ToList()));
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
            TwistRate(doc, r),
            EndToEnd(r),
        };
        paragraphs.AddRange(Alarms(r));
        return new ReportChapter("Shaft: results")
        {
            Paragraphs = paragraphs,
            Tables = tables,
            Figures = diagram is null ? [] : [diagram],
        };
    }

    private static ReportTable Segments(ShaftResult r, UnitSystem u)
    {
        var rows = new List<IReadOnlyList<string>>();
        var alerts = new List<int>();
        foreach (var s in r.Segments)
        {
            if (s.Check != "ok") alerts.Add(rows.Count);
            rows.Add(Row(s.Label, $"{s.From} – {s.To}", u.Torque.Format(s.TorqueAtFrom), u.Torque.Format(s.TorqueAtTo), NumberText.Fixed(s.Twist * Deg, 4),
                PeakShear(u, s, withUnit: false), s.ShearLimit is { } lim ? u.Stress.Format(lim, 4) : "–", s.Material.LimitBasis,
                SafetyFactor(s), s.SafetyFactor is { } sf2 && double.IsFinite(sf2) ? NumberText.Fixed((sf2 - 1) * 100, 0) : "–",
                u.TwistRate.Format(s.MaxTwistRate, 4), s.Check));
        }
        return new ReportTable("Segments: internal torque at both ends, twist, peak shear and margins",
            ["segment", "stations", $"torque at start, {u.Torque.Symbol}", $"torque at end, {u.Torque.Symbol}", "twist, deg",
                $"peak shear, {u.Stress.Symbol}", $"limit, {u.Stress.Symbol}", "limit basis", "factor of safety", "margin, %",
                $"twist rate, {u.TwistRate.Symbol}", "check"], rows) { AlertRows = alerts };
    }

    /// <summary>The factor of safety as printed: two decimals, <c>∞</c> for an unloaded segment, <c>–</c> without a limit or with an unbounded peak.</summary>
    internal static string SafetyFactor(SegmentResult s) =>
        s.SafetyFactor is { } sf ? double.IsFinite(sf) ? NumberText.Fixed(sf, 2) : "∞" : "–";

    /// <summary>A segment's peak shear as printed: the value, or <c>unbounded</c> at a sharp corner (never a confident number).</summary>
    internal static string PeakShear(UnitSystem u, SegmentResult s, bool withUnit = true) =>
        s.PeakShearUnbounded ? "unbounded" : withUnit ? Shear(u, s.MaxShear) : u.Stress.Format(s.MaxShear, 4);

    /// <summary>A stress as printed everywhere (value and unit in the display stress unit).</summary>
    internal static string Shear(UnitSystem u, double pa) => u.Stress.Text(pa, 4);

    /// <summary>One line on the governing segment: its peak shear against the limit, factor of safety and margin, or why there is none.</summary>
    internal static string Governing(ShaftDocument doc, ShaftResult r)
    {
        var u = doc.Units;
        if (r.GoverningSegment is not { } g)
        {
            return r.Segments.All(s => s.TorqueAtFrom == 0 && s.TorqueAtTo == 0)
                ? "Governing segment (shear): none; no segment carries torque (the shaft has no loads, or they cancel)."
                : "Governing segment (shear): none; no loaded segment has a shear limit (give its material 'allowableShear' or 'yield' in the shaft file).";
        }
        if (g.PeakShearUnbounded)
            return $"Governing segment (shear): {g.Label} ({g.From} – {g.To}), peak shear UNBOUNDED at a sharp re-entrant corner of section " +
                   $"'{g.Section}', so no factor of safety is given; model the real fillet radius (r= on the keyseat and spline templates).";
        double sf = g.SafetyFactor!.Value;
        return $"Governing segment (shear): {g.Label} ({g.From} – {g.To}), peak shear {Shear(u, g.MaxShear)} against {g.Material.LimitBasis} " +
               $"{Shear(u, g.ShearLimit!.Value)}, factor of safety {NumberText.Fixed(sf, 2)} (margin {NumberText.Fixed((sf - 1) * 100, 0)} %)" +
               (g.ExceedsShearLimit ? ": EXCEEDED." : ".");
    }

    /// <summary>One line on the largest twist rate and its limit.</summary>
    internal static string TwistRate(ShaftDocument doc, ShaftResult r)
    {
        var u = doc.Units;
        if (r.GoverningTwistSegment is not { } t) return "Largest twist rate: none (no segment carries torque).";
        string lim = r.TwistRateLimit is { } l
            ? $" against the limit {u.TwistRate.Text(l, 4)} (margin {NumberText.Fixed((l / t.MaxTwistRate - 1) * 100, 0)} %){(t.ExceedsTwistRateLimit ? ": EXCEEDED" : "")}"
            : " (no twist-rate limit given)";
        return $"Largest twist rate: {t.Label}, {u.TwistRate.Text(t.MaxTwistRate, 4)}{lim}.";
    }

    /// <summary>One line on the rotation of the last station relative to the first.</summary>
    internal static string EndToEnd(ShaftResult r) =>
        $"Total twist (station '{r.Stations[^1].Name}' relative to '{r.Stations[0].Name}'): {NumberText.Fixed(r.EndToEndTwist * Deg, 4)} deg ({F(r.EndToEndTwist, "G4")} rad).";

    /// <summary>The closing alarms: unbounded peaks and exceeded limits (none when all is well).</summary>
    internal static IEnumerable<string> Alarms(ShaftResult r)
    {
        if (r.AnyPeakShearUnbounded)
            yield return "At least one loaded segment has an unbounded peak shear (a sharp re-entrant corner): its check says 'unbounded' and it has no factor of safety; see the warnings.";
        if (r.AnyLimitExceeded) yield return "At least one segment exceeds its limit: see the flagged rows of the segment table.";
    }

    /// <summary>The headline numbers of a shaft.</summary>
    public static IReadOnlyList<KeyFigure> KeyFigures(ShaftDocument doc, ShaftResult r)
    {
        var u = doc.Units;
        var list = new List<KeyFigure>();
        if (r.GoverningSegment is { } g)
        {
            bool alert = g.ExceedsShearLimit || g.PeakShearUnbounded;
            list.Add(new KeyFigure("governing segment", $"{g.Label} ({g.From} – {g.To})", alert));
            list.Add(new KeyFigure("peak shear", g.PeakShearUnbounded ? "unbounded (sharp corner)" : Shear(u, g.MaxShear), alert));
            if (g.ShearLimit is { } lim) list.Add(new KeyFigure($"{g.Material.LimitBasis} shear", Shear(u, lim)));
            list.Add(new KeyFigure("factor of safety", SafetyFactor(g), alert));
        }
        else if (r.Segments.MaxBy(s => s.MaxShear) is { MaxShear: > 0 } peak)
            list.Add(new KeyFigure("largest peak shear", $"{Shear(u, peak.MaxShear)} in {peak.Label} (no limit given)"));
        else list.Add(new KeyFigure("peak shear", "0 (no segment carries torque)"));
        list.Add(new KeyFigure("total twist", $"{NumberText.Fixed(r.EndToEndTwist * Deg, 4)} deg"));
        if (r.GoverningTwistSegment is { } t)
            list.Add(new KeyFigure("largest twist rate", $"{u.TwistRate.Text(t.MaxTwistRate, 4)} in {t.Label}" +
                (r.TwistRateLimit is { } l ? $" (limit {u.TwistRate.Format(l, 4)})" : ""), t.ExceedsTwistRateLimit));
        return list;
    }
}
