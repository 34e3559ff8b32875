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
        var parts = ModesChapters.Build(doc, modes, check, forced);
        return new ReportModel
        {
            Title = doc.Model.Title is { } t ? $"Drivetrain dynamics: {t}" : "Drivetrain dynamics",
            Subtitle = $"input: {doc.Path}",
            Generator = options.Generator,
            Generated = options.Generated,
            KeyFigures = parts.KeyFigures,
            Inputs = parts.Inputs,
            Chapters = parts.Chapters,
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
