namespace SectionTwist.Shaft;

/// <summary>
/// The solution of a <see cref="ShaftModel"/>, all SI (m, N*m, Pa, rad). Signs follow the convention documented on
/// <see cref="ShaftModel"/>: right-hand rule about the axis from the first station to the last; internal torque positive
/// when it acts counter-clockwise on the cut face looking back toward the first station.
/// </summary>
public sealed record ShaftResult
{
    /// <summary>The solved model.</summary>
    public required ShaftModel Model { get; init; }
    /// <summary>Stations in axis order with their rotations.</summary>
    public required IReadOnlyList<StationResult> Stations { get; init; }
    /// <summary>Segments in axis order.</summary>
    public required IReadOnlyList<SegmentResult> Segments { get; init; }
    /// <summary>Support reactions (torque the support applies to the shaft), one per fixed station in axis order.</summary>
    public required IReadOnlyList<SupportReaction> Reactions { get; init; }
    /// <summary>Torques carried by the springs.</summary>
    public required IReadOnlyList<SpringResult> Springs { get; init; }
    /// <summary>The station whose rotation is zero.</summary>
    public required string ReferenceStation { get; init; }
    /// <summary>
    /// The segment with the lowest factor of safety (highest shear utilisation), or a loaded segment whose peak shear is
    /// unbounded (those come first); null when no loaded segment has a shear limit or an unbounded peak.
    /// </summary>
    public required SegmentResult? GoverningSegment { get; init; }
    /// <summary>The segment with the highest twist rate.</summary>
    public required SegmentResult? GoverningTwistSegment { get; init; }
    /// <summary>
    /// Warnings about the result: section-analysis warnings (each names its section) and one per loaded segment whose peak
    /// shear is unbounded. Every output form (text, JSON, CSV, report) carries them.
    /// </summary>
    public IReadOnlyList<Torsion.AnalysisWarning> Warnings { get; init; } = [];
    /// <summary>True when some loaded segment's peak shear is unbounded (see <see cref="SegmentResult.PeakShearUnbounded"/>).</summary>
    public bool AnyPeakShearUnbounded => Segments.Any(s => s.PeakShearUnbounded);
    /// <summary>Non-uniform torsion with restrained warping (when <see cref="ShaftModel.Warping"/> restrains a station), else null.</summary>
    public WarpingTorsion.WarpingMemberResult? Warping { get; init; }
    /// <summary>Warnings about warping: open sections solved with free warping, and the cautions of the warping analysis.</summary>
    public IReadOnlyList<string> WarpingWarnings { get; init; } = [];
    /// <summary>The bending solution and strength checks, or null when the model has no <see cref="ShaftModel.Bending"/>.</summary>
    public SectionTwist.Bending.BendingResult? Bending { get; init; }
    /// <summary>The overload checks against the fully plastic torque, or null when the model has no <see cref="ShaftModel.Overload"/>.</summary>
    public Plastic.OverloadResult? Overload { get; init; }
    /// <summary>Twist-rate limit, rad/m, or null.</summary>
    public double? TwistRateLimit => Model.TwistRateLimit;
    /// <summary>True when some segment exceeds its allowable shear or the twist-rate limit.</summary>
    public bool AnyLimitExceeded => Segments.Any(s => s.ExceedsShearLimit || s.ExceedsTwistRateLimit);
    /// <summary>Rotation of the last station relative to the first, rad (end-to-end wind-up).</summary>
    public double EndToEndTwist => Stations[^1].Rotation - Stations[0].Rotation;
}

/// <summary>One station's result.</summary>
/// <param name="Name">Station name.</param>
/// <param name="Position">Axial position, m.</param>
/// <param name="Rotation">Rotation relative to the reference station, rad, right-hand rule about the axis.</param>
/// <param name="AppliedTorque">Sum of the point torques applied there, N*m (reactions not included).</param>
/// <param name="IsFixed">True when the station is a fixed support.</param>
public sealed record StationResult(string Name, double Position, double Rotation, double AppliedTorque, bool IsFixed);

/// <summary>One support reaction.</summary>
/// <param name="Station">The fixed station.</param>
/// <param name="Torque">Torque the support applies to the shaft, N*m, right-hand rule about the axis.</param>
public sealed record SupportReaction(string Station, double Torque);

/// <summary>One spring's result.</summary>
/// <param name="Label">Spring name.</param>
/// <param name="StationA">First station.</param>
/// <param name="StationB">Second station.</param>
/// <param name="Torque">k (phi_B - phi_A), N*m.</param>
/// <param name="Windup">phi_B - phi_A, rad.</param>
public sealed record SpringResult(string Label, string StationA, string StationB, double Torque, double Windup);
