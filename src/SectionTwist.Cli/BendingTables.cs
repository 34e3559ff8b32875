using SectionTwist.Bending;
using SectionTwist.Shaft;
using SectionTwist.Units;

namespace SectionTwist.Cli;

/// <summary>The bending part of <c>sectiontwist shaft</c>'s text output: loads, bearings, combined stress, fatigue, keys.</summary>
internal static class BendingTables
{
    internal const string Caution =
        "caution: the combined stress uses linear elastic beam bending with Saint-Venant torsion on the modelled sections; fatigue factors " +
        "(Marin factors, stress concentrations, notch sensitivity) are estimates; keyseat ends, press fits and fretting are not resolved by a " +
        "2D section and need the applicable code (national shaft-strength standards) and testing; defer to licensed engineering practice.";

    private static string F(double v, string format = "G4") => NumberText.Styled(v, format);

    private static string Sf(double? v) => v is { } x ? double.IsFinite(x) ? F(x, "F2") : "inf" : "-";

    public static void Print(TextWriter w, UnitSystem u, BendingResult r, bool rotating)
    {
        string L = u.Length.Symbol, S = u.Stress.Symbol, T = u.Torque.Symbol, N = u.Force.Symbol;
        string Force(double si) => u.Force.Format(si, "G4");
        w.WriteLine("BENDING WITH TORSION");
        w.WriteLine("axes: x along the shaft; looking back toward the first station Y points right and Z up; directions from +Y toward +Z" +
                    (rotating ? "; rotating shaft: each boundary point is taken at its worst angle to the bending moment" : "; sections stand as drawn"));
        w.WriteLine();
        if (r.Loads.Count > 0)
        {
            w.WriteLine("loads on the shaft");
            var rows = new List<string[]> { new[] { "station", "kind", $"Fy [{N}]", $"Fz [{N}]", $"axial [{N}]", "what" } };
            foreach (var l in r.Loads) rows.Add([l.Station, l.Kind, Force(l.ForceY), Force(l.ForceZ), Force(l.AxialForce), l.Description]);
            Table(w, rows);
            w.WriteLine();
        }
        w.WriteLine("bearings (force the bearing applies to the shaft)");
        var br = new List<string[]> { new[] { "bearing", $"at [{L}]", $"Fy [{N}]", $"Fz [{N}]", $"radial [{N}]", $"axial [{N}]", "slope [mrad]", "limit [mrad]", "check" } };
        foreach (var b in r.Bearings)
            br.Add([b.Label, u.Length.Format(b.Position), Force(b.ForceY), Force(b.ForceZ), Force(b.Force), Force(b.AxialForce), F(b.Slope * 1e3, "F3"),
                b.SlopeLimit is { } sl ? F(sl * 1e3, "F3") : "-", b.ExceedsSlopeLimit ? "!! SLOPE OVER LIMIT" : "ok"]);
        Table(w, br);
        w.WriteLine();

        w.WriteLine("combined stress on the real sections (worst boundary point of each segment)");
        var sr = new List<string[]> { new[] { "segment", $"max M [{T}]", $"at [{L}]", $"point x,y [{L}]", $"von Mises [{S}]", $"Tresca [{S}]", "dominant", $"S_y [{S}]", "FoS yield", "FoS fatigue (unnotched)", "check" } };
        foreach (var s in r.Segments)
            sr.Add([s.Label, u.Torque.Format(s.MaxMoment, "G4"), u.Length.Format(s.Position), $"{u.Length.Format(s.Stress.X, "G3")},{u.Length.Format(s.Stress.Y, "G3")}",
                u.Stress.Format(s.Stress.VonMises, "G4"), u.Stress.Format(s.Stress.Tresca, "G4"), s.Stress.Dominant,
                s.YieldStrength is { } sy ? u.Stress.Format(sy, "G4") + (s.StrengthBasis == "typical" ? " (typical)" : "") : "-",
                Sf(s.SafetyFactor), Sf(s.FatigueSafetyFactor), s.ExceedsYield ? "!! OVER YIELD" : s.FatigueSafetyFactor < 1 ? "!! FATIGUE" : s.SafetyFactor is null ? "no yield strength" : s.FatigueSafetyFactor is null ? "ok (yield)" : "ok (yield, unnotched fatigue)"]);
        Table(w, sr);
        if (r.Governing is { } g)
            w.WriteLine($"governing (static): {g.Label} at {u.Length.Format(g.Position)} {L}: von Mises {u.Stress.Format(g.Stress.VonMises, "G4")} {S}, " +
                        $"{g.Stress.Dominant} dominates, factor of safety on yield {Sf(g.SafetyFactor)}");
        double maxDefl = r.MaxDeflection;
        var at = r.Samples.MaxBy(s => s.Deflection)!;
        w.WriteLine($"largest deflection: {u.Length.Format(maxDefl, "G4")} {L} at {u.Length.Format(at.Position)} {L}");
        w.WriteLine();

        foreach (var f in r.Fatigue)
        {
            w.WriteLine($"fatigue at {f.Label}, {u.Length.Format(f.Position)} {L} ({(f.Criterion == Fatigue.FatigueCriterion.Goodman ? "DE-Goodman" : "DE-ASME elliptic")}): " +
                        $"M {u.Torque.Format(f.Moment, "G4")} {T} reversed, T {u.Torque.Format(f.Torque, "G4")} {T} steady");
            foreach (var k in f.NotchFactors) w.WriteLine($"  {k.Symbol,-4} = {F(k.Value, "F3")}  {k.Meaning}: {k.Source}");
            w.WriteLine($"  S'e  = {u.Stress.Format(f.Endurance.Unmodified, "G4")} {S}: {f.Endurance.UnmodifiedSource}");
            foreach (var k in f.Endurance.Factors) w.WriteLine($"  {k.Symbol,-4} = {F(k.Value, "F3")}  {k.Meaning}: {k.Source}");
            w.WriteLine($"  Se   = {u.Stress.Format(f.Endurance.Value, "G4")} {S}");
            if (f.SectionTorsionConcentration is { } kc)
                w.WriteLine($"  the section analysis resolves the cross-section's notch: computed torsional concentration {F(kc, "F2")} (peak shear over 16 T / (pi d^3)); the 2D field cannot show the keyseat end");
            w.WriteLine($"  sigma_a' {u.Stress.Format(f.AlternatingStress, "G4")} {S}, sigma_m' {u.Stress.Format(f.MeanStress, "G4")} {S}: " +
                        $"fatigue factor of safety {Sf(f.SafetyFactor)}, first-cycle yield {Sf(f.YieldSafetyFactor)}{(f.SafetyFactor < 1 || f.YieldSafetyFactor < 1 ? "  !! BELOW 1" : "")}");
        }
        if (r.Fatigue.Count > 0) w.WriteLine();

        if (r.Connections.Count > 0)
        {
            w.WriteLine("keys and splines");
            var cr = new List<string[]> { new[] { "connection", "kind", $"torque [{T}]", $"shear [{S}]", $"pressure [{S}]", $"shaft side [{S}]", $"allowable p [{S}]", "FoS", "check" } };
            foreach (var c in r.Connections)
                cr.Add([c.Label, c.Kind, u.Torque.Format(c.Torque, "G4"), c.Shear is { } sh ? u.Stress.Format(sh, "G4") : "-", u.Stress.Format(c.Pressure, "G4"),
                    c.ShaftPressure is { } sp ? u.Stress.Format(sp, "G4") : "-", c.AllowablePressure is { } ap ? u.Stress.Format(ap, "G4") : "-",
                    Sf(c.SafetyFactor), c.Exceeds ? "!! OVER ALLOWABLE" : c.SafetyFactor is null ? "no allowable given" : "ok"]);
            Table(w, cr);
            foreach (var c in r.Connections) w.WriteLine($"  {c.Label}: {c.Method}");
            w.WriteLine();
        }
        foreach (var n in r.Warnings) w.WriteLine($"note: {n}");
        if (r.AnyLimitExceeded) w.WriteLine("!! at least one bending, fatigue, slope or connection check fails (see above)");
        w.WriteLine(Caution);
    }

    private static void Table(TextWriter w, List<string[]> rows) => ShaftCommand.Table(w, rows);
}
