using SectionTwist.Rendering.Adapters;
using SectionTwist.Shaft;
using SectionTwist.Units;

namespace SectionTwist.Cli;

/// <summary>The text tables of the further shafts of a geared shaft file (<see cref="GearedShaftSolver"/>), after the main tables.</summary>
internal static class ShaftBranchText
{
    public static void Write(TextWriter w, ShaftDocument doc, GearedShaftResult geared)
    {
        var u = doc.Units;
        foreach (var b in geared.Branches)
        {
            var r = b.Result;
            w.WriteLine($"shaft '{b.Shaft}' beyond stage '{b.Stage}' (from shaft '{b.Parent}'): speed {NumberText.Format(b.SpeedRatio, 5)} x the file's shaft, " +
                        $"stage torque {u.Torque.Text(b.StageTorque, 4)} at '{b.Station}' " +
                        (b.TorqueFromOwnLoads ? "(balances the shaft's own loads)" : "(the torque at the stage on the other shaft, referred through the ratio)"));
            w.WriteLine($"rotations relative to station '{r.ReferenceStation}' of this shaft");
            var st = new List<string[]> { new[] { "name", $"position [{u.Length.Symbol}]", $"applied torque [{u.Torque.Symbol}]", "rotation [deg]", "support" } };
            foreach (var s in r.Stations)
                st.Add([s.Name, u.Length.Format(s.Position), s.AppliedTorque == 0 ? "-" : u.Torque.Format(s.AppliedTorque), NumberText.Fixed(s.Rotation * 180 / Math.PI, 4), s.IsFixed ? "fixed" : ""]);
            ShaftCommand.Table(w, st);
            var sg = new List<string[]>
            {
                new[] { "segment", "section", $"torque [{u.Torque.Symbol}]", "twist [deg]", $"max shear [{u.Stress.Symbol}]", $"limit [{u.Stress.Symbol}]", "FoS", "check" },
            };
            foreach (var s in r.Segments)
            {
                string torque = s.TorqueAtFrom == s.TorqueAtTo ? u.Torque.Format(s.TorqueAtFrom) : $"{u.Torque.Format(s.TorqueAtFrom)}..{u.Torque.Format(s.TorqueAtTo)}";
                sg.Add([s.Label, s.Section, torque, NumberText.Fixed(s.Twist * 180 / Math.PI, 4), ShaftResultChapter.PeakShear(u, s, withUnit: false),
                    s.ShearLimit is { } lim ? u.Stress.Format(lim, 4) : "-", ShaftResultChapter.SafetyFactor(s).Replace('–', '-'), s.Check == "ok" ? "ok" : "!! " + s.Check.ToUpperInvariant()]);
            }
            ShaftCommand.Table(w, sg);
            foreach (var x in r.Reactions) w.WriteLine($"  reaction at '{x.Station}': {u.Torque.Text(x.Torque, 4)}");
            foreach (var x in r.Warnings) w.WriteLine($"  warning [{x.Code}]: {x.Message}");
            w.WriteLine();
        }
        foreach (var x in geared.Warnings) w.WriteLine($"warning [{x.Code}]: {x.Message}");
        if (geared.Warnings.Count > 0) w.WriteLine();
    }
}
