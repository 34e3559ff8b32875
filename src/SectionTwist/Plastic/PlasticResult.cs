using SectionTwist.Torsion;

namespace SectionTwist.Plastic;

/// <summary>
/// Elastic-perfectly-plastic torsion of one section (SI: N*m, Pa). Ideal plasticity: no strain hardening, no residual
/// stresses; limit-state design follows the applicable code.
/// </summary>
public sealed record PlasticResult
{
    /// <summary>The elastic analysis the first-yield values come from.</summary>
    public required SectionResult Elastic { get; init; }
    /// <summary>Shear yield stress tau_y used, Pa.</summary>
    public required double YieldShear { get; init; }
    /// <summary>First-yield torque T_y = tau_y / (peak shear per unit torque), N*m.</summary>
    public required double FirstYieldTorque { get; init; }
    /// <summary>Fully plastic torque T_p (sand-heap analogy), N*m.</summary>
    public required double FullyPlasticTorque { get; init; }
    /// <summary>Estimated relative error of <see cref="FullyPlasticTorque"/>.</summary>
    public required double FullyPlasticTorqueError { get; init; }
    /// <summary>The torque-twist curve from first yield toward the fully plastic state.</summary>
    public required IReadOnlyList<TorqueTwistPoint> Curve { get; init; }
    /// <summary>The plastic zone at each curve point, for pictures.</summary>
    public required PlasticField Field { get; init; }
    /// <summary>Warnings (e.g. a sharp re-entrant corner that yields at once).</summary>
    public required IReadOnlyList<AnalysisWarning> Warnings { get; init; }
    /// <summary>Shape factor T_p / T_y.</summary>
    public double ShapeFactor => FullyPlasticTorque / FirstYieldTorque;

    /// <summary>Twist rate at first yield, rad/m, for shear modulus <paramref name="shearModulus"/> (Pa): T_y / (G J).</summary>
    public double FirstYieldTwistRate(double shearModulus) => FirstYieldTorque / (shearModulus * Elastic.TorsionConstant);
}
