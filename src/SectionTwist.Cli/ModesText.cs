using SectionTwist.Dynamics;
using SectionTwist.Shaft;
using SectionTwist.Units;

namespace SectionTwist.Cli;

/// <summary>The tables of <c>sectiontwist modes</c>.</summary>
internal static class ModesText
{
    private static string F(double v, string format = "G5") => NumberText.Styled(v, format);

    public static void Print(TextWriter w, ShaftDocument doc, ModalResult r, ResonanceResult? res, ForcedResponseResult? forced, string path)
    {
        var u = doc.Units;
        string Rpm(double radPerSecond) => u.Speed.Format(radPerSecond, "F0");
        string Hz(double f, string format = "G5") => u.Frequency.Format(f, format);
        w.WriteLine($"{r.Title ?? "drivetrain"} ({path}): torsional modes");
        w.WriteLine($"reference shaft '{r.ReferenceShaft}'; {r.Unknowns} unknowns; segments subdivided for a frequency tolerance of {F(r.Tolerance * 100, "G3")} % " +
                    $"(largest estimated error {F(r.EstimatedError * 100, "G2")} %)");
        w.WriteLine();
        w.WriteLine("stations (speed ratio = own speed / reference-shaft speed; negative: turns the other way)");
        var st = new List<string[]> { new[] { "station", "shaft", "speed ratio", $"inertia [{u.Inertia.Symbol}]", "held" } };
        foreach (var s in r.Stations) st.Add([s.Name, s.Shaft, F(s.SpeedRatio, "G5"), s.Inertia == 0 ? "-" : u.Inertia.Format(s.Inertia, "G4"), s.IsFixed ? "fixed" : ""]);
        Table(w, st);
        w.WriteLine($"total inertia referred to '{r.ReferenceShaft}': {u.Inertia.Text(r.ReferredInertia, 4)} (lumped plus the shafts' own)");
        w.WriteLine();

        w.WriteLine("natural frequencies");
        var mt = new List<string[]> { new[] { "mode", $"f [{u.Frequency.Symbol}]", "[1/min]", "kind", "most strain energy in" } };
        foreach (var m in r.Modes)
        {
            if (m.IsRigidBody) { mt.Add([F(m.Number, "F0"), "0", "0", "rigid body (free chain)", "-"]); continue; }
            var top = m.Parts.OrderByDescending(p => p.EnergyShare).Take(2).Where(p => p.EnergyShare > 0.005).Select(p => $"{p.Name} {F(p.EnergyShare * 100, "F0")} %");
            mt.Add([F(m.Number, "F0"), Hz(m.Frequency), F(m.CyclesPerMinute, "F0"), "elastic", string.Join(", ", top)]);
        }
        Table(w, mt);
        w.WriteLine();

        var elastic = r.ElasticModes.ToList();
        if (elastic.Count > 0)
        {
            w.WriteLine($"mode shapes (station rotation referred to '{r.ReferenceShaft}', largest = 1)");
            var ms = new List<string[]> { new[] { "station" }.Concat(elastic.Select(m => $"mode {m.Number}")).ToArray() };
            for (int i = 0; i < r.Stations.Count; i++) ms.Add(new[] { r.Stations[i].Name }.Concat(elastic.Select(m => F(m.Stations[i].ReferredRotation, "F3"))).ToArray());
            Table(w, ms);
            w.WriteLine();
            w.WriteLine("strain-energy share [%] (stiffen the parts with the largest share to raise a mode)");
            var es = new List<string[]> { new[] { "part" }.Concat(elastic.Select(m => $"mode {m.Number}")).ToArray() };
            for (int p = 0; p < elastic[0].Parts.Count; p++)
                es.Add(new[] { elastic[0].Parts[p].Name }.Concat(elastic.Select(m => F(m.Parts[p].EnergyShare * 100, "F1"))).ToArray());
            Table(w, es);
            w.WriteLine();
        }

        if (res is not null)
        {
            var range = res.Spec.Range;
            w.WriteLine($"interference check: shaft '{range.Shaft}' from {Rpm(range.Minimum)} to {Rpm(range.Maximum)} {u.Speed.Symbol}; bands {F(res.Spec.InnerBand * 100, "G3")} % (avoid) " +
                        $"and {F(res.Spec.OuterBand * 100, "G3")} % (check), common practice, not a code value");
            var ct = new List<string[]> { new[] { "mode", $"f [{u.Frequency.Symbol}]", "excitation", "order", $"meets at [{u.Speed.Symbol} of {range.Shaft}]", "margin", "status" } };
            foreach (var c in res.Crossings)
                ct.Add([F(c.Mode, "F0"), Hz(c.Frequency), c.Excitation, F(c.Order, "G4"), Rpm(c.CrossingSpeed), c.Status == CrossingStatus.Resonance ? "in range" : $"{F(c.Margin * 100, "F0")} %",
                    c.Status switch { CrossingStatus.Resonance => "!! RESONANCE IN RANGE", CrossingStatus.Avoid => "!! AVOID (inside inner band)", CrossingStatus.Check => "! check (inside outer band)", _ => "clear" }]);
            Table(w, ct);
            double topF = elastic.Count > 0 ? elastic[^1].Frequency : 0;
            double maxExc = res.Spec.Orders.Max(o => o.Order * ResonanceCheck.ShaftRatio(r, o.Shaft, o.Name)) * range.Maximum / ResonanceCheck.ShaftRatio(r, range.Shaft, "range") / (2 * Math.PI);
            if (maxExc * (1 + res.Spec.OuterBand) > topF)
                w.WriteLine($"! the highest excitation reaches {u.Frequency.Text(maxExc, 4)}, above the highest listed mode ({u.Frequency.Text(topF, 4)}): list more modes ('modes:') to check them all");
            w.WriteLine(res.AnyConcern ? "!! at least one crossing is in or near the operating range (see 'status')" : "all listed crossings are clear of the operating range by the outer band");
            w.WriteLine();
        }

        if (forced is not null)
        {
            w.WriteLine($"forced response: {u.Torque.Text(forced.Load.Amplitude, 4)} at '{forced.Load.Station}', {u.Frequency.Text(forced.Load.AngularFrequency / (2 * Math.PI), 5)}, modal damping {F(forced.DampingRatio * 100, "G3")} %");
            var ft = new List<string[]> { new[] { "part", "kind", $"alternating torque [{u.Torque.Symbol}]", $"alternating shear [{u.Stress.Symbol}]" } };
            foreach (var p in forced.Parts)
                ft.Add([p.Name, ModalResultJson.Kind(p.Kind), u.Torque.Format(p.TorqueAmplitude, "G4"), p.ShearAmplitude is { } sh ? u.Stress.Format(sh, "G4") : "-"]);
            Table(w, ft);
            w.WriteLine("compare the alternating shear with the static shear of 'sectiontwist shaft' and with the fatigue strength of the material");
            w.WriteLine();
        }
        foreach (var warning in r.Warnings) w.WriteLine($"warning: {warning}");
        w.WriteLine(ModalResultJson.Caution);
    }

    private static void Table(TextWriter w, List<string[]> rows) => ShaftCommand.Table(w, rows);
}
