using SectionTwist.Plastic;
using SectionTwist.Rendering.Report;
using SectionTwist.Shaft;
using SectionTwist.Units;

namespace SectionTwist.Rendering.Adapters;

/// <summary>
/// The shaft report's chapter "Overload: plastic capacity": per segment the shear yield stress, the first-yield torque T_y,
/// the fully plastic torque T_p (sand-heap analogy), the shape factor and each overload case's torque, margin and check,
/// with the cautions of ideal plasticity.
/// </summary>
public static class OverloadChapter
{
    /// <summary>The cautions printed with the chapter.</summary>
    public const string Caution =
        "T_p assumes an ideal elastic-perfectly-plastic material: no strain hardening, no residual stresses (from straightening, heat treatment or " +
        "shrink fits), no interaction with bending or axial stress. An overload above T_y leaves a permanent twist. This is no fatigue check. " +
        "Follow the applicable code and licensed engineering practice for limit-state design; the factor is the user's, not a code value.";

    /// <summary>Builds the chapter.</summary>
    /// <param name="doc">The shaft file (display units).</param>
    /// <param name="overload">The overload checks.</param>
    public static ReportChapter Build(ShaftDocument doc, OverloadResult overload)
    {
        ArgumentNullException.ThrowIfNull(doc);
        ArgumentNullException.ThrowIfNull(overload);
        var u = doc.Units;
        var capacity = new ReportTable("Plastic capacity of each segment",
            ["segment", "section", $"τ_y [{u.Stress.Symbol}]", $"T_y [{u.Torque.Symbol}]", $"T_p [{u.Torque.Symbol}]", "T_p error (est.)", "shape factor T_p / T_y"],
            [.. overload.Segments.Select(s => (IReadOnlyList<string>)[s.Segment, s.Section,
                s.YieldShear is { } t ? u.Stress.Format(t, 4) : "-",
                s.FirstYieldUnbounded ? "unbounded (sharp corner)" : s.FirstYieldTorque is { } y ? u.Torque.Format(y, 4) : "-",
                s.FullyPlasticTorque is { } p ? u.Torque.Format(p, 4) : "-",
                s.FullyPlasticTorqueError is { } e ? (e == 0 ? "exact" : NumberText.Exponent(e)) : "-",
                s.ShapeFactor is { } f ? NumberText.Fixed(f, 3) : "-"])]);
        var rows = new List<IReadOnlyList<string>>();
        var alert = new List<int>();
        foreach (var s in overload.Segments)
            foreach (var c in s.Checks)
            {
                if (c.Margin < 0) alert.Add(rows.Count);
                rows.Add([s.Segment, c.Case, u.Torque.Format(c.Torque, 4), s.FullyPlasticTorque is { } p ? u.Torque.Format(p / overload.Factor, 4) : "-",
                    c.Margin is { } m ? NumberText.Fixed(100 * m, 0) + " %" : "-", c.Yields ? "yes" : "no", c.Check]);
            }
        var checks = new ReportTable($"Overload checks: factor × |T| ≤ T_p with factor {NumberText.Format(overload.Factor, 4)}",
            ["segment", "case", $"overload torque [{u.Torque.Symbol}]", $"T_p / factor [{u.Torque.Symbol}]", "margin", "beyond first yield", "check"], rows) { AlertRows = alert };
        var paragraphs = new List<string>
        {
            "The fully plastic torque T_p is the torque at which the whole section has yielded (sand-heap analogy, Nadai, Theory of Flow and Fracture of Solids, " +
            "vol. 1, ch. 35; Hill, The Mathematical Theory of Plasticity, ch. IV): exact for rounds and tubes, 2π τ_y (r_o³ − r_i³) / 3, and integrated on the " +
            "analysed outline for template and drawing sections, with the change between a mesh and its refinement as the error estimate. " +
            "T_y = τ_y / (peak shear per unit torque) is the first-yield torque; τ_y is the material's shear yield, else 0.577 times its tensile yield (distortion energy).",
            "Margin = T_p / (factor × |T|) − 1; a negative margin fails the check.",
            "Caution: " + Caution,
        };
        paragraphs.AddRange(overload.Warnings.Select(w => "Warning: " + w.Message));
        return new ReportChapter("Overload: plastic capacity") { Paragraphs = paragraphs, Tables = [capacity, checks] };
    }
}
