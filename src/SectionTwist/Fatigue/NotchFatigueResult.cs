using SectionTwist.Bending;

namespace SectionTwist.Fatigue;

/// <summary>The fatigue check at one notched location; every factor carries its source.</summary>
public sealed record NotchFatigueResult
{
    /// <summary>Display name.</summary>
    public required string Label { get; init; }
    /// <summary>Station.</summary>
    public required string Station { get; init; }
    /// <summary>Segment whose section carries the notch.</summary>
    public required string Segment { get; init; }
    /// <summary>Position, m.</summary>
    public required double Position { get; init; }
    /// <summary>Resultant bending moment (fully reversed amplitude on a rotating shaft), N*m.</summary>
    public required double Moment { get; init; }
    /// <summary>Steady torque, N*m.</summary>
    public required double Torque { get; init; }
    /// <summary>K_t, K_ts, q, q_s, K_f, K_fs with their sources.</summary>
    public required IReadOnlyList<FatigueFactor> NotchFactors { get; init; }
    /// <summary>The endurance limit and its Marin factors.</summary>
    public required EnduranceLimit Endurance { get; init; }
    /// <summary>
    /// Torsional stress concentration that the section analysis itself resolves (peak shear of the real section over
    /// 16 / (pi d^3)), or null for a round section.
    /// </summary>
    public double? SectionTorsionConcentration { get; init; }
    /// <summary>von Mises alternating stress sigma_a', Pa, at the worst point.</summary>
    public required double AlternatingStress { get; init; }
    /// <summary>von Mises mean stress sigma_m', Pa, at the worst point.</summary>
    public required double MeanStress { get; init; }
    /// <summary>Fatigue factor of safety by the criterion.</summary>
    public required double SafetyFactor { get; init; }
    /// <summary>First-cycle yield factor of safety S_y / sigma'_max (Shigley 10th ed., eq. 7-15), or +inf without S_y.</summary>
    public required double YieldSafetyFactor { get; init; }
    /// <summary>The criterion used.</summary>
    public required FatigueCriterion Criterion { get; init; }
    /// <summary>Where on the section (relative to the centroid), m.</summary>
    public required (double X, double Y) Point { get; init; }
}
