namespace SectionTwist.Plastic;

/// <summary>
/// The plastic torsion capacity of one shaft segment (<see cref="OverloadCheck"/>), SI (N*m, Pa). Ideal plasticity: no
/// strain hardening, no residual stresses; limit-state design follows the applicable code.
/// </summary>
public sealed record SegmentPlasticCapacity
{
    /// <summary>The segment's label.</summary>
    public required string Segment { get; init; }
    /// <summary>The section's description.</summary>
    public required string Section { get; init; }
    /// <summary>Shear yield stress tau_y used, Pa (the material's shear yield, else 0.577 times its tensile yield); null when the material has neither.</summary>
    public required double? YieldShear { get; init; }
    /// <summary>First-yield torque T_y = tau_y / (peak shear per unit torque), N*m; null when unknown or when the peak is unbounded (sharp corner: yields at any torque in theory).</summary>
    public required double? FirstYieldTorque { get; init; }
    /// <summary>True when the section has a sharp re-entrant corner, so T_y is not bounded away from zero.</summary>
    public required bool FirstYieldUnbounded { get; init; }
    /// <summary>Fully plastic torque T_p (sand-heap analogy, Nadai), N*m; null when the section's outline or the yield stress is unknown. For a taper, that of the smaller end.</summary>
    public required double? FullyPlasticTorque { get; init; }
    /// <summary>Estimated relative error of <see cref="FullyPlasticTorque"/> (0 for the exact round and tube formulas); null when unknown.</summary>
    public required double? FullyPlasticTorqueError { get; init; }
    /// <summary>
    /// True when <see cref="FullyPlasticTorque"/> is a lower bound rather than the value: a composite section, taken at its
    /// weakest material's shear yield everywhere (static theorem of limit analysis).
    /// </summary>
    public bool FullyPlasticTorqueIsLowerBound { get; init; }
    /// <summary>Shape factor T_p / T_y; null when either is unknown, T_y is unbounded or T_p is only a lower bound.</summary>
    public double? ShapeFactor => !FullyPlasticTorqueIsLowerBound && FullyPlasticTorque is { } p && FirstYieldTorque is { } y && y > 0 ? p / y : null;
    /// <summary>The checks of this segment, one per overload case that applies to it.</summary>
    public required IReadOnlyList<OverloadCheckResult> Checks { get; init; }
}
