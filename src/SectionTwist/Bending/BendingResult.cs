using SectionTwist.Fatigue;
using SectionTwist.Keys;

namespace SectionTwist.Bending;

/// <summary>
/// The transverse solution of a shaft and its strength checks, all SI (m, N, N*m, Pa, rad). Axes as on
/// <see cref="BendingModel"/>; plane moments follow M = EI v'' in each plane (Y: deflection along Y; Z: along Z).
/// </summary>
public sealed record BendingResult
{
    /// <summary>Samples along the shaft: both ends of every beam element, so jumps at loads and bearings show.</summary>
    public required IReadOnlyList<BendingSample> Samples { get; init; }
    /// <summary>Bearing reactions and slopes in axis order.</summary>
    public required IReadOnlyList<BearingResult> Bearings { get; init; }
    /// <summary>The loads as resolved onto the shaft (gear and pull forces computed).</summary>
    public required IReadOnlyList<ResolvedLoad> Loads { get; init; }
    /// <summary>Combined stress and static check per segment, axis order.</summary>
    public required IReadOnlyList<SegmentStress> Segments { get; init; }
    /// <summary>The segment with the lowest static factor of safety (or the highest von Mises stress when no yield strength is known).</summary>
    public required SegmentStress? Governing { get; init; }
    /// <summary>The endurance limit settings used, or null without a fatigue check.</summary>
    public FatigueSettings? FatigueSettings { get; init; }
    /// <summary>Fatigue checks at the notched locations.</summary>
    public required IReadOnlyList<NotchFatigueResult> Fatigue { get; init; }
    /// <summary>Key and spline checks.</summary>
    public required IReadOnlyList<ConnectionResult> Connections { get; init; }
    /// <summary>Notes and warnings (estimates, typical strengths, neglected coupling, missing data).</summary>
    public required IReadOnlyList<string> Warnings { get; init; }
    /// <summary>Largest transverse deflection magnitude, m.</summary>
    public double MaxDeflection => Samples.Max(s => s.Deflection);
    /// <summary>True when a static, fatigue, slope or connection check fails.</summary>
    public bool AnyLimitExceeded =>
        Segments.Any(s => s.ExceedsYield) || Bearings.Any(b => b.ExceedsSlopeLimit) || Fatigue.Any(f => f.SafetyFactor < 1 || f.YieldSafetyFactor < 1)
        || Connections.Any(c => c.Exceeds) || Samples.Any(s => s.FatigueSafetyFactor < 1);
}

/// <summary>One point along the shaft.</summary>
public sealed record BendingSample
{
    /// <summary>Axial position, m.</summary>
    public required double Position { get; init; }
    /// <summary>Segment label.</summary>
    public required string Segment { get; init; }
    /// <summary>Shear force in plane Y (dM/dx), N.</summary>
    public required double ShearY { get; init; }
    /// <summary>Shear force in plane Z, N.</summary>
    public required double ShearZ { get; init; }
    /// <summary>Bending moment in plane Y (EI v''), N*m.</summary>
    public required double MomentY { get; init; }
    /// <summary>Bending moment in plane Z (EI w''), N*m.</summary>
    public required double MomentZ { get; init; }
    /// <summary>Resultant bending moment, N*m.</summary>
    public double Moment => Math.Sqrt(MomentY * MomentY + MomentZ * MomentZ);
    /// <summary>Deflection along Y, m.</summary>
    public required double DeflectionY { get; init; }
    /// <summary>Deflection along Z, m.</summary>
    public required double DeflectionZ { get; init; }
    /// <summary>Deflection magnitude, m.</summary>
    public double Deflection => Math.Sqrt(DeflectionY * DeflectionY + DeflectionZ * DeflectionZ);
    /// <summary>Slope dv/dx in plane Y, rad.</summary>
    public required double SlopeY { get; init; }
    /// <summary>Slope dw/dx in plane Z, rad.</summary>
    public required double SlopeZ { get; init; }
    /// <summary>Axial force, N (tension positive).</summary>
    public required double AxialForce { get; init; }
    /// <summary>Internal torque, N*m (the torsion solution's convention).</summary>
    public required double Torque { get; init; }
    /// <summary>The worst boundary point of the section here.</summary>
    public required CombinedStressPoint Stress { get; init; }
    /// <summary>S_y / von Mises, or null without a yield strength.</summary>
    public double? StaticSafetyFactor { get; init; }
    /// <summary>Fatigue factor of safety of the unnotched section (K_f = K_fs = 1), or null without a fatigue check.</summary>
    public double? FatigueSafetyFactor { get; init; }
}

/// <summary>A bearing's result.</summary>
public sealed record BearingResult
{
    /// <summary>Display name.</summary>
    public required string Label { get; init; }
    /// <summary>Station.</summary>
    public required string Station { get; init; }
    /// <summary>Position, m.</summary>
    public required double Position { get; init; }
    /// <summary>Force the bearing applies to the shaft along Y, N.</summary>
    public required double ForceY { get; init; }
    /// <summary>Force along Z, N.</summary>
    public required double ForceZ { get; init; }
    /// <summary>Radial force magnitude, N.</summary>
    public double Force => Math.Sqrt(ForceY * ForceY + ForceZ * ForceZ);
    /// <summary>Axial force the bearing applies, N (thrust bearing only).</summary>
    public required double AxialForce { get; init; }
    /// <summary>Restraining moment in plane Y (clamped bearings), N*m.</summary>
    public required double MomentY { get; init; }
    /// <summary>Restraining moment in plane Z, N*m.</summary>
    public required double MomentZ { get; init; }
    /// <summary>Slope magnitude sqrt(slopeY^2 + slopeZ^2), rad.</summary>
    public required double Slope { get; init; }
    /// <summary>Allowed slope, rad, or null.</summary>
    public double? SlopeLimit { get; init; }
    /// <summary>True when the slope exceeds the limit.</summary>
    public bool ExceedsSlopeLimit => SlopeLimit is { } l && Slope > l;
}

/// <summary>A load as applied to the beam model.</summary>
/// <param name="Station">Station.</param>
/// <param name="Kind"><c>force</c>, <c>gear</c> or <c>pull</c>.</param>
/// <param name="ForceY">Along Y, N.</param>
/// <param name="ForceZ">Along Z, N.</param>
/// <param name="AxialForce">Along the axis, N.</param>
/// <param name="MomentY">Moment vector about Y (from an axial force at the pitch radius), N*m.</param>
/// <param name="MomentZ">Moment vector about Z, N*m.</param>
/// <param name="Description">Text.</param>
public sealed record ResolvedLoad(string Station, string Kind, double ForceY, double ForceZ, double AxialForce, double MomentY, double MomentZ, string Description);

/// <summary>The combined stress and static check of one segment.</summary>
public sealed record SegmentStress
{
    /// <summary>Segment label.</summary>
    public required string Label { get; init; }
    /// <summary>Section text.</summary>
    public required string Section { get; init; }
    /// <summary>Material name.</summary>
    public required string Material { get; init; }
    /// <summary>Largest resultant bending moment, N*m.</summary>
    public required double MaxMoment { get; init; }
    /// <summary>Position of the worst von Mises stress, m.</summary>
    public required double Position { get; init; }
    /// <summary>The worst point there.</summary>
    public required CombinedStressPoint Stress { get; init; }
    /// <summary>Tensile yield strength, Pa, or null.</summary>
    public double? YieldStrength { get; init; }
    /// <summary><c>specified-minimum</c>, <c>typical</c> or <c>user</c>.</summary>
    public required string StrengthBasis { get; init; }
    /// <summary>S_y / von Mises, or null.</summary>
    public double? SafetyFactor => YieldStrength is { } sy && Stress.VonMises > 0 ? sy / Stress.VonMises : YieldStrength is null ? null : double.PositiveInfinity;
    /// <summary>True when the von Mises stress exceeds the yield strength.</summary>
    public bool ExceedsYield => SafetyFactor < 1;
    /// <summary>Lowest unnotched fatigue factor of safety along the segment, or null.</summary>
    public double? FatigueSafetyFactor { get; init; }
}
