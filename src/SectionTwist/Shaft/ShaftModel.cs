namespace SectionTwist.Shaft;

/// <summary>
/// A segmented shaft: stations on the axis, segments between them, applied torques, fixed supports and torsional springs.
/// All values SI (m, N*m, Pa, rad). Solve it with <see cref="ShaftSolver.Solve"/>.
/// </summary>
/// <remarks>
/// Sign convention: the axis runs from the first station (smallest position) to the last. Applied torques, reactions
/// and rotations are axial vectors by the right-hand rule about that axis. The internal torque in a segment is positive
/// when it acts counter-clockwise on the cut face looking back toward the first station, i.e. when its vector points
/// out of the cut face of the part nearer the first station (the usual positive-internal-torque convention).
/// </remarks>
public sealed record ShaftModel
{
    /// <summary>Stations, any order (they are sorted by position; ties keep the given order).</summary>
    public required IReadOnlyList<Station> Stations { get; init; }
    /// <summary>Segments between stations.</summary>
    public required IReadOnlyList<ShaftSegment> Segments { get; init; }
    /// <summary>Applied torques.</summary>
    public IReadOnlyList<ShaftLoad> Loads { get; init; } = [];
    /// <summary>
    /// Stations held against rotation. Empty means a free shaft, allowed only when the applied torques balance
    /// (for example a motor torque at the input and the drum torque at the output).
    /// </summary>
    public IReadOnlyList<string> FixedStations { get; init; } = [];
    /// <summary>Torsional springs (couplings) between stations.</summary>
    public IReadOnlyList<TorsionalSpring> Springs { get; init; } = [];
    /// <summary>
    /// The station whose rotation is zero in the results. Null: the first fixed support along the axis, or the first station
    /// of a free shaft.
    /// </summary>
    public string? ReferenceStation { get; init; }
    /// <summary>Allowed twist rate, rad/m (e.g. 0.25 deg/m = 0.00436 rad/m); null for no check.</summary>
    public double? TwistRateLimit { get; init; }
    /// <summary>
    /// Warping conditions per station for segments of open section (Vlasov torsion, <see cref="WarpingTorsion.WarpingMemberSolver"/>):
    /// null when not stated (open sections then draw a warning), empty when free warping everywhere is stated.
    /// </summary>
    public IReadOnlyDictionary<string, WarpingTorsion.WarpingEnd>? Warping { get; init; }
    /// <summary>Bearings, transverse loads and strength checks (bending with torsion); null for torsion only.</summary>
    public Bending.BendingModel? Bending { get; init; }
    /// <summary>Overload torques checked against each segment's fully plastic torque (<see cref="Plastic.OverloadCheck"/>); null for none.</summary>
    public OverloadSpec? Overload { get; init; }
    /// <summary>Optional title for reports.</summary>
    public string? Title { get; init; }
}
