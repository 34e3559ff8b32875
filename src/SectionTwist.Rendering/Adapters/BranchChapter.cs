using SectionTwist.Rendering.Report;
using SectionTwist.Shaft;
using SectionTwist.Units;

namespace SectionTwist.Rendering.Adapters;

/// <summary>
/// The shaft report's chapter on the further shafts of a geared shaft file (<see cref="GearedShaftSolver"/>): each shaft's
/// stage torque, segments and reactions at its own speed.
/// </summary>
public static class BranchChapter
{
    /// <summary>Builds the chapter.</summary>
    /// <param name="doc">The shaft file (display units).</param>
    /// <param name="geared">The static solution of all shafts.</param>
    public static ReportChapter Build(ShaftDocument doc, GearedShaftResult geared)
    {
        ArgumentNullException.ThrowIfNull(doc);
        ArgumentNullException.ThrowIfNull(geared);
        var u = doc.Units;
        var tables = new List<ReportTable>
        {
            new("Stages and the torque they pass", ["shaft", "stage", "from shaft", "station", "speed / speed of the file's shaft", $"stage torque [{u.Torque.Symbol}]", "set by"],
                [.. geared.Branches.Select(b => (IReadOnlyList<string>)[b.Shaft, b.Stage, b.Parent, b.Station, NumberText.Format(b.SpeedRatio, 5), u.Torque.Format(b.StageTorque, 4),
                    b.TorqueFromOwnLoads ? "the shaft's own loads" : "the torque at the stage on the other shaft"])]),
        };
        foreach (var b in geared.Branches)
        {
            var alert = b.Result.Segments.Select((s, i) => (s, i)).Where(x => x.s.Check != "ok").Select(x => x.i).ToList();
            tables.Add(new ReportTable($"Shaft '{b.Shaft}': segments (rotations relative to '{b.Result.ReferenceStation}')",
                ["segment", "section", $"torque [{u.Torque.Symbol}]", "twist [deg]", $"max shear [{u.Stress.Symbol}]", $"limit [{u.Stress.Symbol}]", "FoS", "check"],
                [.. b.Result.Segments.Select(s => (IReadOnlyList<string>)[s.Label, s.Section, u.Torque.Format(s.InternalTorque, 4), NumberText.Fixed(s.Twist * 180 / Math.PI, 4),
                    ShaftResultChapter.PeakShear(u, s, withUnit: false), s.ShearLimit is { } l ? u.Stress.Format(l, 4) : "-", ShaftResultChapter.SafetyFactor(s), s.Check])]) { AlertRows = alert });
            if (b.Result.Reactions.Count > 0)
                tables.Add(new ReportTable($"Shaft '{b.Shaft}': reactions", ["station", $"torque [{u.Torque.Symbol}]"],
                    [.. b.Result.Reactions.Select(r => (IReadOnlyList<string>)[r.Station, u.Torque.Format(r.Torque, 4)])]));
        }
        return new ReportChapter("Further shafts beyond the gear stages")
        {
            Paragraphs =
            [
                "Each further shaft is solved at its own speed; the torque a stage passes is referred through its ratio by the power balance of a lossless stage, " +
                "T₁ω₁ + T₂ω₂ = 0 (common practice). Gear losses, mesh stiffness and the gear's own bending loads are not included.",
            ],
            Tables = tables,
        };
    }
}
