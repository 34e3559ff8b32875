using SectionTwist.Units;
using System.Globalization;
using SectionTwist.Dynamics;
using SectionTwist.Rendering.Drawing;
using SectionTwist.Rendering.Dynamics;
using SectionTwist.Shaft;

namespace SectionTwist.Rendering.Report;

/// <summary>
/// The dynamics chapters shared by the separate modes report (<see cref="ModesReport"/>) and the shaft report's dynamics
/// chapter (<see cref="ShaftReport"/>): natural frequencies, mode shapes and energy shares, the interference check with its
/// diagram and crossings, the forced response; key figures and the stations and stages tables.
/// </summary>
public static class ModesChapters
{
    /// <summary>Builds the key figures, input tables and chapters of the drivetrain in <paramref name="doc"/>'s dynamics block.</summary>
    /// <param name="doc">The shaft file (with its <c>dynamics</c> block).</param>
    /// <param name="modes">The modal solution.</param>
    /// <param name="check">The interference check, or null.</param>
    /// <param name="forced">The forced response, or null.</param>
    /// <param name="prefix">Put before every chapter and table title (e.g. <c>Dynamics: </c> inside the shaft report).</param>
    public static ModesReportParts Build(ShaftDocument doc, ModalResult modes, ResonanceResult? check, ForcedResponseResult? forced, string prefix = "")
    {
        ArgumentNullException.ThrowIfNull(doc);
        ArgumentNullException.ThrowIfNull(modes);
        if (doc.Dynamics is null) throw new ArgumentException("the document has no dynamics block", nameof(doc));
        static string F(double v, string f = "G4") => NumberText.Styled(v, f);
        var u = doc.Units;
        string Hz(double f, string format = "G5") => u.Frequency.Format(f, format);
        // no Measure of its own: ft/s with inch or foot lengths, m/s otherwise (mm/s would print millions)
        var speed = u.Length.Symbol is "in" or "ft" ? new DisplayUnit("ft/s", 0.3048) : new DisplayUnit("m/s", 1);
        var elastic = modes.ElasticModes.ToList();
        var key = new List<KeyFigure>();
        if (elastic.Count > 0) key.Add(new KeyFigure("lowest natural frequency", $"{u.Frequency.Text(elastic[0].Frequency, 4)} ({F(elastic[0].CyclesPerMinute, "F0")} 1/min)"));
        key.Add(new KeyFigure("rigid-body modes", F(modes.RigidBodyModes, "F0")));
        key.Add(new KeyFigure("discretisation error (estimated)", $"{F(modes.EstimatedError * 100, "G2")} % (tolerance {F(modes.Tolerance * 100, "G2")} %)"));
        if (check?.Closest is { } worst)
            key.Add(new KeyFigure("closest crossing", $"mode {worst.Mode} with {worst.Excitation}: {(worst.Status == CrossingStatus.Resonance ? "in the operating range" : $"margin {F(worst.Margin * 100, "F0")} %")}",
                worst.Status != CrossingStatus.Clear));

        var stations = new ReportTable(prefix + "Stations (speed ratio = own speed / speed of the reference shaft)", ["station", "shaft", "speed ratio", $"inertia [{u.Inertia.Symbol}]", "held"],
            [.. modes.Stations.Select(s => (IReadOnlyList<string>)[s.Name, s.Shaft, F(s.SpeedRatio, "G5"), s.Inertia == 0 ? "-" : u.Inertia.Format(s.Inertia, "G4"), s.IsFixed ? "fixed" : ""])]);
        var stages = new ReportTable(prefix + "Gear and belt stages", ["stage", "driving", "driven", "ratio", "kind", "teeth", $"mesh stiffness [{u.RotationalStiffness.Symbol}]"],
            [.. doc.Dynamics!.Drivetrain.Stages.Select(g => (IReadOnlyList<string>)[g.Label, g.Driving, g.Driven, F(g.Ratio, "G5"), g.Kind.ToString().ToLowerInvariant(),
                g.DrivingTeeth is { } za ? $"{za}/{g.DrivenTeeth}" : "-", g.MeshStiffness is { } km ? u.RotationalStiffness.Format(km, "G4") : "rigid"])]);
        var meshes = new ReportTable("Elements per segment", ["segment", "shaft", "elements", $"wave speed [{speed.Symbol}]"],
            [.. modes.Meshes.Select(m => (IReadOnlyList<string>)[m.Segment, m.Shaft, F(m.Elements, "F0"), speed.Format(m.WaveSpeed, "G4")])]);

        var freq = new ReportTable("Natural frequencies", ["mode", $"f [{u.Frequency.Symbol}]", "[1/min]", "kind", "estimated error"],
            [.. modes.Modes.Select(m => (IReadOnlyList<string>)[F(m.Number, "F0"), m.IsRigidBody ? "0" : Hz(m.Frequency), m.IsRigidBody ? "0" : F(m.CyclesPerMinute, "F0"),
                m.IsRigidBody ? "rigid body" : "elastic", m.IsRigidBody ? "-" : $"{F(m.EstimatedError * 100, "G2")} %"])]);
        var chapters = new List<ReportChapter>();
        var figures = new List<ReportFigure> { new("Mode shapes: station rotations referred to the reference shaft (largest = 1); dotted lines separate the shafts", ImageFormat.Png, ModeShapePlot.Render(modes, ImageFormat.Png, units: u), "mode-shapes.png") };
        var tables = new List<ReportTable> { freq };
        if (elastic.Count > 0)
        {
            tables.Add(new ReportTable("Strain-energy share [%] of each part (stiffen the largest share to raise a mode)", ["part", .. elastic.Select(m => $"mode {m.Number}")],
                [.. elastic[0].Parts.Select((p, i) => (IReadOnlyList<string>)[p.Name, .. elastic.Select(m => F(m.Parts[i].EnergyShare * 100, "F1"))])]));
        }
        chapters.Add(new ReportChapter(prefix + "Natural frequencies and mode shapes")
        {
            Paragraphs = [$"Reference shaft '{modes.ReferenceShaft}', {modes.Unknowns} unknowns, total inertia referred to it {u.Inertia.Text(modes.ReferredInertia, 4)}."],
            Tables = [.. tables, meshes],
            Figures = figures,
        });
        if (check is not null)
        {
            var r = check.Spec.Range;
            var alert = check.Crossings.Select((c, i) => (c, i)).Where(x => x.c.Status != CrossingStatus.Clear).Select(x => x.i).ToList();
            chapters.Add(new ReportChapter(prefix + "Interference check")
            {
                Paragraphs =
                [
                    $"Operating range of '{r.Shaft}': {u.Speed.Format(r.Minimum, "F0")} to {u.Speed.Format(r.Maximum, "F0")} {u.Speed.Symbol}. Bands {F(check.Spec.InnerBand * 100, "G3")} % (avoid) and " +
                    $"{F(check.Spec.OuterBand * 100, "G3")} % (check) - common practice, not a code value; use the applicable code's or the drive supplier's limits where there are any.",
                    "Only the listed modes are checked; list enough modes to pass the highest excitation frequency.",
                ],
                Tables =
                [
                    new ReportTable("Crossings of natural frequencies with excitations", ["mode", $"f [{u.Frequency.Symbol}]", "excitation", "order", $"meets at [{u.Speed.Symbol} of {r.Shaft}]", "margin", "status"],
                        [.. check.Crossings.Select(c => (IReadOnlyList<string>)[F(c.Mode, "F0"), Hz(c.Frequency), c.Excitation, F(c.Order, "G4"), u.Speed.Format(c.CrossingSpeed, "F0"),
                            c.Status == CrossingStatus.Resonance ? "in range" : $"{F(c.Margin * 100, "F0")} %", ModalResultJson.Status(c.Status)])]) { AlertRows = alert },
                ],
                Figures = [new ReportFigure("Interference diagram: natural frequencies (dashed), excitation orders (rays), operating range (red band) with the two separation bands; dots mark the crossings (red: resonance or inside the inner band)",
                    ImageFormat.Png, InterferenceDiagram.Render(modes, check, ImageFormat.Png, units: u), "interference.png")],
            });
        }
        if (forced is not null)
        {
            chapters.Add(new ReportChapter(prefix + "Forced response")
            {
                Paragraphs = [$"Harmonic torque {u.Torque.Text(forced.Load.Amplitude, 4)} at '{forced.Load.Station}', {u.Frequency.Text(forced.Load.AngularFrequency / (2 * Math.PI), 5)}, modal damping {F(forced.DampingRatio * 100, "G3")} % in every mode; " +
                    "compare the alternating shear with the static shear of the shaft report and with the material's fatigue strength."],
                Tables = [new ReportTable("Alternating torque and shear", ["part", "kind", $"torque [{doc.Units.Torque.Symbol}]", $"shear [{doc.Units.Stress.Symbol}]"],
                    [.. forced.Parts.Select(p => (IReadOnlyList<string>)[p.Name, ModalResultJson.Kind(p.Kind), doc.Units.Torque.Format(p.TorqueAmplitude, "G4"), p.ShearAmplitude is { } s ? doc.Units.Stress.Format(s, "G4") : "-"])])],
            });
        }
        return new ModesReportParts(key, doc.Dynamics.Drivetrain.Stages.Count > 0 ? [stations, stages] : [stations], chapters);
    }
}
