namespace SectionTwist.WarpingTorsion;

/// <summary>The solved member: station values, values along each segment and warnings (SI).</summary>
public sealed record WarpingMemberResult
{
    /// <summary>Stations in axis order.</summary>
    public required IReadOnlyList<WarpingStationResult> Stations { get; init; }
    /// <summary>Segments in axis order.</summary>
    public required IReadOnlyList<WarpingSegmentResult> Segments { get; init; }
    /// <summary>Torsional springs (couplings): torque k (phi_B - phi_A) and wind-up, as in the shaft result.</summary>
    public IReadOnlyList<Shaft.SpringResult> Springs { get; init; } = [];
    /// <summary>Warnings about the result.</summary>
    public required IReadOnlyList<string> Warnings { get; init; }
}

/// <summary>Values at a station.</summary>
/// <param name="Name">Station name.</param>
/// <param name="Position">Axial position, m.</param>
/// <param name="Rotation">Rotation, rad.</param>
/// <param name="RateOfTwist">phi', rad/m.</param>
/// <param name="ReactionTorque">Support torque where the station is held against rotation, N*m, else 0.</param>
/// <param name="ReactionBimoment">Bimoment taken by a warping restraint or spring, N*m^2, else 0.</param>
public sealed record WarpingStationResult(string Name, double Position, double Rotation, double RateOfTwist, double ReactionTorque, double ReactionBimoment);

/// <summary>Values along one segment, sampled at equal steps including both ends, and their largest magnitudes.</summary>
public sealed record WarpingSegmentResult
{
    /// <summary>Segment label.</summary>
    public required string Label { get; init; }
    /// <summary>The samples.</summary>
    public required IReadOnlyList<WarpingPoint> Points { get; init; }
    /// <summary>Largest |bimoment|, N*m^2.</summary>
    public required double MaxBimoment { get; init; }
    /// <summary>Largest warping normal stress E |omega|max |phi''|, Pa.</summary>
    public required double MaxWarpingNormalStress { get; init; }
    /// <summary>Largest Saint-Venant shear stress, Pa (the mesh value when <see cref="ShearUnbounded"/>).</summary>
    public required double MaxSaintVenantShear { get; init; }
    /// <summary>Largest warping shear stress E |phi'''| q_w, Pa (0 when the section gives no warping shear factor).</summary>
    public double MaxWarpingShear { get; init; }
    /// <summary>
    /// Largest combined shear: at each point along the segment the Saint-Venant and the warping peak added (a bound: the
    /// two peaks need not lie at the same point of the section), Pa.
    /// </summary>
    public double MaxCombinedShear { get; init; }
    /// <summary>
    /// True when the section's peak shear is unbounded (a sharp re-entrant corner): the shear values are then only the
    /// analysis mesh's values and are reported as unbounded.
    /// </summary>
    public bool ShearUnbounded { get; init; }
    /// <summary>
    /// With a bending solution: the largest sum of the bending (and axial) normal stress at the bending check's worst
    /// point and the warping normal stress at the same axial position, Pa; null without bending. See
    /// docs/shaft-file.md, "Open sections and restrained warping".
    /// </summary>
    public double? MaxCombinedNormalStress { get; init; }
    /// <summary>Largest |rotation|, rad.</summary>
    public required double MaxRotation { get; init; }
    /// <summary>The warping length a = sqrt(E Iw / (G J)) of the segment, m (0 for a round taper, which does not warp).</summary>
    public required double WarpingLength { get; init; }
}

/// <summary>Values at one point of a segment.</summary>
/// <param name="Position">Axial position, m.</param>
/// <param name="Rotation">phi, rad.</param>
/// <param name="RateOfTwist">phi', rad/m.</param>
/// <param name="SaintVenantTorque">G J phi', N*m (internal-torque sign as in the shaft model).</param>
/// <param name="WarpingTorque">-E Iw phi''', N*m; the internal torque is the sum of the two.</param>
/// <param name="Bimoment">B = -E Iw phi'', N*m^2.</param>
/// <param name="WarpingNormalStress">E |omega|max |phi''| at the worst point of the section, Pa.</param>
/// <param name="SaintVenantShear">|G J phi'| times the section's peak shear per unit torque, Pa.</param>
/// <param name="WarpingShear">E |phi'''| times the section's warping shear factor q_w (<see cref="WarpingSection.WarpingShearFactor"/>), Pa.</param>
/// <param name="CombinedShear">Saint-Venant plus warping shear peak (a bound), Pa.</param>
public sealed record WarpingPoint(double Position, double Rotation, double RateOfTwist, double SaintVenantTorque, double WarpingTorque,
    double Bimoment, double WarpingNormalStress, double SaintVenantShear, double WarpingShear, double CombinedShear);
