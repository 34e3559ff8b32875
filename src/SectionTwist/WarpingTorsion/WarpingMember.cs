using SectionTwist.Shaft;
using SectionTwist.Torsion;

namespace SectionTwist.WarpingTorsion;

/// <summary>
/// A straight member of open (or any) section in non-uniform torsion with restrained warping (Vlasov): stations on the
/// axis, segments of constant section between them, point and uniform torques, stations held against rotation, and a
/// warping condition per station. All values SI (m, N*m, Pa, rad). Solve it with <see cref="WarpingMemberSolver.Solve"/>.
/// Torque signs follow <see cref="ShaftModel"/>. The rate of twist phi' is continuous through every station (one
/// member, continuous flanges).
/// </summary>
public sealed record WarpingMember
{
    /// <summary>Stations, any order (sorted by position).</summary>
    public required IReadOnlyList<Station> Stations { get; init; }
    /// <summary>Segments between consecutive stations.</summary>
    public required IReadOnlyList<WarpingSegment> Segments { get; init; }
    /// <summary>Applied torques: <see cref="PointTorque"/> and <see cref="DistributedTorque"/>.</summary>
    public IReadOnlyList<ShaftLoad> Loads { get; init; } = [];
    /// <summary>Stations held against rotation (at least one).</summary>
    public required IReadOnlyList<string> FixedStations { get; init; }
    /// <summary>Warping condition per station name; stations not listed warp freely.</summary>
    public IReadOnlyDictionary<string, WarpingEnd> Warping { get; init; } = new Dictionary<string, WarpingEnd>();
    /// <summary>
    /// Torsional springs between stations (flexible couplings). A spring carries torque only, no bimoment: the stations
    /// on its two sides have their own rates of twist, so a coupling also separates the warping of the parts it joins.
    /// </summary>
    public IReadOnlyList<TorsionalSpring> Springs { get; init; } = [];
}

/// <summary>A prismatic piece of the member between two stations.</summary>
/// <param name="From">Station at one end.</param>
/// <param name="To">Station at the other end.</param>
/// <param name="Section">Torsion and warping values of the section.</param>
/// <param name="Material">Material; needs <see cref="Material.YoungsModulus"/>.</param>
public sealed record WarpingSegment(string From, string To, WarpingSection Section, Material Material)
{
    /// <summary>Display name; defaults to <c>From-To</c>.</summary>
    public string? Name { get; init; }
    /// <summary>The display name.</summary>
    public string Label => Name ?? $"{From}-{To}";

    /// <summary>
    /// Set for a linearly tapered solid round segment (<see cref="Tapered"/>): a round section does not warp, so the
    /// segment carries its torque as Saint-Venant torque with J varying along it (the exact element of the shaft solver),
    /// and transmits no bimoment. Its <see cref="Section"/> then holds the flexibility-equivalent J and the peak shear per
    /// unit torque of the thinner end, for tables.
    /// </summary>
    public RoundTaper? Taper { get; init; }

    /// <summary>A linearly tapered solid round segment; diameters at <paramref name="from"/> and <paramref name="to"/> as in <see cref="RoundTaper"/>.</summary>
    public static WarpingSegment Tapered(string from, string to, RoundTaper taper, Material material)
    {
        ArgumentNullException.ThrowIfNull(taper);
        taper.Validate($"segment {from}-{to}");
        double d0 = taper.StartDiameter, d1 = taper.EndDiameter, dMin = Math.Min(d0, d1);
        // 1 / J_eq = (1/L) integral dx / J(x) for d linear in x (see SegmentElement): J_eq = 3 pi d0^3 d1^3 / (32 (d0^2 + d0 d1 + d1^2))
        double jEq = 3 * Math.PI * d0 * d0 * d0 * d1 * d1 * d1 / (32 * (d0 * d0 + d0 * d1 + d1 * d1));
        var section = new WarpingSection(jEq, 0, 0, 16 / (Math.PI * dMin * dMin * dMin), $"taper d={d0 * 1e3:G5}..{d1 * 1e3:G5} mm");
        return new WarpingSegment(from, to, section, material) { Taper = taper };
    }
}

/// <summary>Torsion and warping values of a section.</summary>
/// <param name="TorsionConstant">Saint-Venant torsion constant J, m^4.</param>
/// <param name="WarpingConstant">Warping constant Iw about the shear centre, m^6 (positive; 0 only for a <see cref="WarpingSegment.Taper"/>).</param>
/// <param name="MaxSectorialCoordinate">Largest |omega| of the normalized warping function, m^2.</param>
/// <param name="ShearPerTorque">Peak Saint-Venant shear per unit Saint-Venant torque, 1/m^3.</param>
/// <param name="Description">Optional text for tables.</param>
public sealed record WarpingSection(double TorsionConstant, double WarpingConstant, double MaxSectorialCoordinate, double ShearPerTorque, string? Description = null)
{
    /// <summary>
    /// Warping shear factor q_w = max |grad chi|, m^3 (<see cref="Warping.WarpingResult.WarpingShearFactor"/>; thin walls:
    /// max S_w / t); the warping shear stress is E |phi'''| q_w. 0 when not known: the warping shear is then left out
    /// with a warning.
    /// </summary>
    public double WarpingShearFactor { get; init; }

    /// <summary>True when the section's peak shear is unbounded (sharp re-entrant corner); shear results are then flagged.</summary>
    public bool ShearUnbounded { get; init; }

    /// <summary>The values of an analysed section; it must have been analysed with <see cref="AnalysisOptions.Warping"/>.</summary>
    public static WarpingSection From(SectionResult result, string? description = null)
    {
        ArgumentNullException.ThrowIfNull(result);
        var w = result.Warping ?? throw new SectionTwistException("no-warping",
            $"{result.Profile.Name}: the section was analysed without its warping function; analyse it with AnalysisOptions.Warping = true");
        return new(result.TorsionConstant, w.WarpingConstant, w.MaxSectorialCoordinate, result.MaxShearPerTorque, description ?? result.Profile.Name)
        {
            WarpingShearFactor = w.WarpingShearFactor,
            ShearUnbounded = double.IsPositiveInfinity(result.EstimatedRelativeError.MaxShear) || double.IsPositiveInfinity(w.EstimatedError.WarpingShearFactor),
        };
    }
}

/// <summary>The warping condition at a station.</summary>
/// <param name="Kind">Free, restrained (phi' = 0) or an elastic spring.</param>
/// <param name="Stiffness">For <see cref="WarpingEndKind.Spring"/>: bimoment per unit rate of twist, N*m^3 (N*m^2 per rad/m).</param>
public sealed record WarpingEnd(WarpingEndKind Kind, double Stiffness = 0)
{
    /// <summary>Free warping (bimoment zero).</summary>
    public static WarpingEnd Free { get; } = new(WarpingEndKind.Free);
    /// <summary>Warping fully restrained (phi' = 0), e.g. a welded end plate.</summary>
    public static WarpingEnd Restrained { get; } = new(WarpingEndKind.Restrained);
    /// <summary>An elastic warping restraint of the given stiffness, N*m^3.</summary>
    public static WarpingEnd Spring(double stiffness) => new(WarpingEndKind.Spring, stiffness);
}

/// <summary>Kinds of warping condition.</summary>
public enum WarpingEndKind
{
    /// <summary>Warping free: zero bimoment.</summary>
    Free,
    /// <summary>Warping prevented: zero rate of twist.</summary>
    Restrained,
    /// <summary>Elastic restraint: bimoment proportional to the rate of twist.</summary>
    Spring,
}
