using SectionTwist.Plastic;
using SectionTwist.Shaft;
using SectionTwist.Units;

namespace SectionTwist.Cli;

/// <summary>The overload table of the <c>shaft</c> command: T_y, T_p, shape factor and each case's margin per segment.</summary>
internal static class ShaftOverloadText
{
    internal const string Caution =
        "caution: T_p assumes ideal (elastic-perfectly-plastic) material with no strain hardening and no residual stresses; " +
        "an overload above T_y leaves a permanent twist; follow the applicable code for limit-state design.";

    public static void Write(TextWriter w, ShaftDocument doc, OverloadResult o)
    {
        var u = doc.Units;
        w.WriteLine($"overload checks (fully plastic torque T_p, sand-heap analogy; required T_p / overload torque >= {NumberText.Format(o.Factor, 4)})");
        var rows = new List<string[]>
        {
            new[] { "segment", $"tau_y [{u.Stress.Symbol}]", $"T_y [{u.Torque.Symbol}]", $"T_p [{u.Torque.Symbol}]", "shape factor", "case", $"torque [{u.Torque.Symbol}]", "margin", "check" },
        };
        foreach (var s in o.Segments)
        {
            string tauY = s.YieldShear is { } t ? u.Stress.Format(t, 4) : "-";
            string ty = s.FirstYieldUnbounded ? "unbounded" : s.FirstYieldTorque is { } y ? u.Torque.Format(y, 4) : "-";
            string tp = s.FullyPlasticTorque is { } p ? u.Torque.Format(p, 4) : "-";
            string sf = s.ShapeFactor is { } f ? NumberText.Fixed(f, 3) : "-";
            if (s.Checks.Count == 0) rows.Add([s.Segment, tauY, ty, tp, sf, "-", "", "", ""]);
            for (int i = 0; i < s.Checks.Count; i++)
            {
                var c = s.Checks[i];
                string check = c.Check == "ok" ? (c.Yields ? "ok (yields)" : "ok") : c.Check == "not checked" ? "not checked" : "!! " + c.Check.ToUpperInvariant();
                rows.Add(i == 0 ? [s.Segment, tauY, ty, tp, sf, c.Case, u.Torque.Format(c.Torque, 4), Margin(c.Margin), check]
                                : ["", "", "", "", "", c.Case, u.Torque.Format(c.Torque, 4), Margin(c.Margin), check]);
            }
        }
        ShaftCommand.Table(w, rows);
        foreach (var x in o.Warnings) w.WriteLine($"  warning [{x.Code}]: {x.Message}");
        w.WriteLine(Caution);
        w.WriteLine();
    }

    internal static string Margin(double? m) => m is { } v ? NumberText.Fixed(100 * v, 0) + " %" : "-";
}
