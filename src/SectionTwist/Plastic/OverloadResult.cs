namespace SectionTwist.Plastic;

/// <summary>
/// The overload checks of a shaft (<see cref="OverloadCheck"/>): per segment the first-yield torque, the fully plastic torque,
/// the shape factor and each case's margin. Ideal plasticity: no strain hardening, no residual stresses; limit-state
/// design follows the applicable code.
/// </summary>
public sealed record OverloadResult
{
    /// <summary>Required ratio T_p / overload torque.</summary>
    public required double Factor { get; init; }
    /// <summary>Segments in axis order.</summary>
    public required IReadOnlyList<SegmentPlasticCapacity> Segments { get; init; }
    /// <summary>Warnings: segments that could not be checked (no yield stress, a section known only by its values), sharp corners.</summary>
    public required IReadOnlyList<Torsion.AnalysisWarning> Warnings { get; init; }
    /// <summary>True when some check fails (factor |T| &gt; T_p).</summary>
    public bool AnyOverCapacity => Segments.Any(s => s.Checks.Any(c => c.Margin < 0));
}
