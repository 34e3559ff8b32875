using SectionTwist.Dynamics;
using SectionTwist.Rendering.Drawing;
using SectionTwist.Rendering.Dynamics;
using SectionTwist.Shaft;
using SectionTwist.Units;

namespace SectionTwist.Rendering.Report;

/// <summary>
/// The drivetrain-dynamics report of a shaft file: key figures, stations and stages, natural frequencies, mode shapes and
/// energy shares, the interference diagram with every crossing and its margin, the forced response, method and cautions.
/// </summary>
public static class ModesReport
{
    /// <summary>Method lines of the dynamics chapter.</summary>
    public static readonly IReadOnlyList<string> Method =
    [
        "Each shaft segment is divided into two-node linear elements with the exact stiffness G J / h (for a round taper the exact flexibility of each piece) " +
        "and the consistent inertia matrix ∫ρ Ip NᵢNⱼ dx, where Ip is the polar second moment of area (Ix + Iy, not J) (Bathe, Finite Element Procedures, sec. 4.2; " +
        "Petyt, Introduction to Finite Element Vibration Analysis, ch. 3). Lumped inertias (rotors, hubs, discs, drums) are added at their stations.",
        "Rigid gear and belt stages are kinematic constraints θ_driven = ±θ_driving / ratio, eliminated by the transformation K' = TᵀKT, M' = TᵀMT - the usual " +
        "referral of inertia and stiffness by the square of the speed ratio; a stage with a mesh stiffness is a spring between the driving rotation and the referred driven one.",
        "K v = ω² M v is solved by the Cholesky factor of M and a symmetric eigenvalue decomposition (Golub and Van Loan, Matrix Computations, 4th ed., sec. 8.7.2). " +
        "Chains held by no fixed station have one rigid-body mode each, reported as such.",
        "Elements per segment: the fewest with (ω h / c)² / 24 ≤ tolerance for the highest listed mode, c = √(G J / (ρ Ip)) the torsional wave speed - the " +
        "frequency error of the linear consistent-mass element (its dispersion relation). The error shown for each mode is that estimate weighted by each element's share of the mode's energy.",
        "Interference check: an order o of a shaft turning at n excites o·n / 60 Hz (n in rpm); a natural frequency f is met at n = 60 f / o. A crossing inside the operating " +
        "range is a resonance; otherwise its margin to the nearer end of the range is compared with the two bands (default 10 % and 20 %: common practice, not a code value).",
        "Forced response: steady modal superposition of all modes of the discretised train with one modal damping ratio for every mode.",
    ];

    /// <summary>Assumptions of the dynamics chapter.</summary>
    public static readonly IReadOnlyList<string> Assumptions =
    [
        "Linear elastic torsion; undamped natural frequencies; damping only in the forced response, as one modal ratio.",
        "No gear backlash, no tooth-mesh stiffness variation, no motor electromechanical coupling (the motor is an inertia only), no coupling non-linearity.",
        "Inertias of hubs, discs and drums as given; the shafts' own inertia from the section's polar moment and the material density.",
    ];

    /// <summary>The caution note.</summary>
    public const string Caution = ModalResultJson.Caution;

    /// <summary>Builds the report model.</summary>
    public static ReportModel Build(ShaftDocument doc, ModalResult modes, ResonanceResult? check, ForcedResponseResult? forced, ShaftReportOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(doc);
        ArgumentNullException.ThrowIfNull(modes);
        options ??= new ShaftReportOptions();
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

        var stations = new ReportTable("Stations (speed ratio = own speed / speed of the reference shaft)", ["station", "shaft", "speed ratio", $"inertia [{u.Inertia.Symbol}]", "held"],
            [.. modes.Stations.Select(s => (IReadOnlyList<string>)[s.Name, s.Shaft, F(s.SpeedRatio, "G5"), s.Inertia == 0 ? "-" : u.Inertia.Format(s.Inertia, "G4"), s.IsFixed ? "fixed" : ""])]);
        var stages = new ReportTable("Gear and belt stages", ["stage", "driving", "driven", "ratio", "kind", "teeth", $"mesh stiffness [{u.RotationalStiffness.Symbol}]"],
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
        chapters.Add(new ReportChapter("Natural frequencies and mode shapes")
        {
            Paragraphs = [$"Reference shaft '{modes.ReferenceShaft}', {modes.Unknowns} unknowns, total inertia referred to it {u.Inertia.Text(modes.ReferredInertia, 4)}."],
            Tables = [.. tables, meshes],
            Figures = figures,
        });
        if (check is not null)
        {
            var r = check.Spec.Range;
            var alert = check.Crossings.Select((c, i) => (c, i)).Where(x => x.c.Status != CrossingStatus.Clear).Select(x => x.i).ToList();
            chapters.Add(new ReportChapter("Interference check")
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
            chapters.Add(new ReportChapter("Forced response")
            {
                Paragraphs = [$"Harmonic torque {u.Torque.Text(forced.Load.Amplitude, 4)} at '{forced.Load.Station}', {u.Frequency.Text(forced.Load.AngularFrequency / (2 * Math.PI), 5)}, modal damping {F(forced.DampingRatio * 100, "G3")} % in every mode; " +
                    "compare the alternating shear with the static shear of the shaft report and with the material's fatigue strength."],
                Tables = [new ReportTable("Alternating torque and shear", ["part", "kind", $"torque [{doc.Units.Torque.Symbol}]", $"shear [{doc.Units.Stress.Symbol}]"],
                    [.. forced.Parts.Select(p => (IReadOnlyList<string>)[p.Name, ModalResultJson.Kind(p.Kind), doc.Units.Torque.Format(p.TorqueAmplitude, "G4"), p.ShearAmplitude is { } s ? doc.Units.Stress.Format(s, "G4") : "-"])])],
            });
        }
        return new ReportModel
        {
            Title = doc.Model.Title is { } t ? $"Drivetrain dynamics: {t}" : "Drivetrain dynamics",
            Subtitle = $"input: {doc.Path}",
            Generator = options.Generator,
            Generated = options.Generated,
            KeyFigures = key,
            Inputs = doc.Dynamics.Drivetrain.Stages.Count > 0 ? [stations, stages] : [stations],
            Chapters = chapters,
            Warnings = modes.Warnings,
            Method = Method,
            Assumptions = Assumptions,
            Caution = Caution,
        };
    }

    /// <summary>Writes the report as one self-contained HTML file.</summary>
    public static void Write(ShaftDocument doc, ModalResult modes, ResonanceResult? check, ForcedResponseResult? forced, string path, ShaftReportOptions? options = null) =>
        HtmlReportWriter.Save(Build(doc, modes, check, forced, options), path);
}
