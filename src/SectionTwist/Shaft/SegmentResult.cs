namespace SectionTwist.Shaft;

/// <summary>
/// One segment's result. <see cref="From"/> is the end nearer the first station (axis order), whatever order the model gave.
/// </summary>
public sealed record SegmentResult
{
    /// <summary>Display name.</summary>
    public required string Label { get; init; }
    /// <summary>End station nearer the first station.</summary>
    public required string From { get; init; }
    /// <summary>End station nearer the last station.</summary>
    public required string To { get; init; }
    /// <summary>Length, m.</summary>
    public required double Length { get; init; }
    /// <summary>Section text for tables.</summary>
    public required string Section { get; init; }
    /// <summary>The material.</summary>
    public required Material Material { get; init; }
    /// <summary>Torsional stiffness 1 / integral(dx / (G J)), N*m/rad (G J / L for a prismatic segment).</summary>
    public required double Stiffness { get; init; }
    /// <summary>Internal torque at the <see cref="From"/> end, N*m (positive-internal-torque convention).</summary>
    public required double TorqueAtFrom { get; init; }
    /// <summary>Internal torque at the <see cref="To"/> end, N*m; equals <see cref="TorqueAtFrom"/> unless a distributed torque acts.</summary>
    public required double TorqueAtTo { get; init; }
    /// <summary>Twist phi(To) - phi(From), rad.</summary>
    public required double Twist { get; init; }
    /// <summary>
    /// Peak shear stress anywhere in the segment, Pa (|T| times the section's peak shear per unit torque, largest along the
    /// segment). For a composite section: the peak in the governing material (smallest factor of safety against its own
    /// limit); <see cref="MaterialChecks"/> lists every material's peak.
    /// </summary>
    public required double MaxShear { get; init; }
    /// <summary>The stress the factor of safety is measured against, Pa (allowable, or shear yield), or null.</summary>
    public required double? ShearLimit { get; init; }
    /// <summary>ShearLimit / MaxShear; +infinity when the segment carries no torque; null without a limit or when the peak shear is unbounded.</summary>
    public required double? SafetyFactor { get; init; }
    /// <summary>Largest twist rate |T| / (G J) in the segment, rad/m.</summary>
    public required double MaxTwistRate { get; init; }
    /// <summary>True when <see cref="MaxShear"/> exceeds <see cref="ShearLimit"/>.</summary>
    public required bool ExceedsShearLimit { get; init; }
    /// <summary>True when <see cref="MaxTwistRate"/> exceeds the model's twist-rate limit.</summary>
    public required bool ExceedsTwistRateLimit { get; init; }

    /// <summary>
    /// True when the segment carries torque and its section's peak shear is unbounded (a sharp re-entrant corner):
    /// <see cref="MaxShear"/> is then only the value on the analysis mesh, <see cref="SafetyFactor"/> is null and
    /// <see cref="Check"/> says <c>unbounded</c>.
    /// </summary>
    public bool PeakShearUnbounded { get; init; }

    /// <summary>
    /// True when the shaft was solved with restrained warping and the combined (Saint-Venant plus warping) shear of that
    /// solve exceeded the free-warping peak: <see cref="MaxShear"/>, <see cref="SafetyFactor"/> and
    /// <see cref="ExceedsShearLimit"/> then hold the combined value, so the check covers both solves.
    /// </summary>
    public bool ShearFromRestrainedWarping { get; init; }

    /// <summary>
    /// A composite segment's check of each material against its own limit shear (the governing one gives
    /// <see cref="ShearLimit"/> and <see cref="SafetyFactor"/>); empty for a homogeneous segment.
    /// </summary>
    public IReadOnlyList<MaterialShearCheck> MaterialChecks { get; init; } = [];

    /// <summary>
    /// The check as every output writes it: <c>ok</c>, or the problems joined by commas: <c>unbounded</c> (peak shear at a
    /// sharp corner), <c>shear over allowable</c> (or <c>over yield</c>), <c>twist rate over limit</c>.
    /// </summary>
    public string Check
    {
        get
        {
            var flags = new List<string>(3);
            if (PeakShearUnbounded) flags.Add("unbounded");
            if (ExceedsShearLimit && MaterialChecks.Count > 0)
                flags.AddRange(MaterialChecks.Where(c => c.Exceeds).Select(c => $"shear over {c.Material.LimitBasis} in {c.Material.Name}"));
            else if (ExceedsShearLimit) flags.Add($"shear over {Material.LimitBasis}");
            if (ExceedsTwistRateLimit) flags.Add("twist rate over limit");
            return flags.Count == 0 ? "ok" : string.Join(", ", flags);
        }
    }

    /// <summary>The internal torque of largest magnitude in the segment, N*m.</summary>
    public double InternalTorque => Math.Abs(TorqueAtTo) > Math.Abs(TorqueAtFrom) ? TorqueAtTo : TorqueAtFrom;
    /// <summary>Largest twist rate in degrees per metre.</summary>
    public double MaxTwistRateDegPerMetre => MaxTwistRate * 180 / Math.PI;
}
