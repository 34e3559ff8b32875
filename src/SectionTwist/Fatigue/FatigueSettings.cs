namespace SectionTwist.Fatigue;

/// <summary>
/// Fatigue check of a rotating shaft under steady torque and fully reversed bending by the distortion-energy Goodman or
/// ASME-elliptic criterion with Marin endurance-limit factors (Budynas and Nisbett, Shigley's Mechanical Engineering Design,
/// 10th ed., ch. 6 and sec. 7-4). Every factor is an estimate; the results say so.
/// </summary>
public sealed record FatigueSettings
{
    /// <summary>Surface finish for the surface factor k_a.</summary>
    public SurfaceFinish Surface { get; init; } = SurfaceFinish.Machined;
    /// <summary>Reliability for k_e: one of 0.5, 0.9, 0.95, 0.99, 0.999, 0.9999.</summary>
    public double Reliability { get; init; } = 0.99;
    /// <summary>Temperature factor k_d (1 at room temperature).</summary>
    public double TemperatureFactor { get; init; } = 1;
    /// <summary>Miscellaneous-effects factor k_f (1 when none is known).</summary>
    public double MiscellaneousFactor { get; init; } = 1;
    /// <summary>The rotating-beam endurance limit S'_e, Pa, when known from tests; null: 0.5 S_ut (capped at 700 MPa).</summary>
    public double? EnduranceLimit { get; init; }
    /// <summary>The failure criterion.</summary>
    public FatigueCriterion Criterion { get; init; } = FatigueCriterion.Goodman;
    /// <summary>Notched locations (shoulders, keyseat ends, grooves) with their stress-concentration factors.</summary>
    public IReadOnlyList<NotchLocation> Locations { get; init; } = [];
}

/// <summary>Surface finish classes of the surface factor (Shigley 10th ed., Table 6-2).</summary>
public enum SurfaceFinish
{
    /// <summary>Ground: k_a = 1.58 S_ut^-0.085.</summary>
    Ground,
    /// <summary>Machined or cold-drawn: k_a = 4.51 S_ut^-0.265.</summary>
    Machined,
    /// <summary>Hot-rolled: k_a = 57.7 S_ut^-0.718.</summary>
    HotRolled,
    /// <summary>As-forged: k_a = 272 S_ut^-0.995.</summary>
    AsForged,
}

/// <summary>The fatigue failure criterion (Shigley 10th ed., sec. 7-4).</summary>
public enum FatigueCriterion
{
    /// <summary>Distortion-energy Goodman: 1/n = sigma_a' / S_e + sigma_m' / S_ut (eq. 7-7).</summary>
    Goodman,
    /// <summary>Distortion-energy ASME elliptic: 1/n = sqrt((sigma_a' / S_e)^2 + (sigma_m' / S_y)^2) (eq. 7-11).</summary>
    AsmeElliptic,
}

/// <summary>
/// A notch at a station: the stress-concentration factors in bending and torsion, given or taken from a named feature
/// estimate, and the notch sensitivities, given or computed from the notch radius.
/// </summary>
/// <param name="Station">The station where the notch is.</param>
public sealed record NotchLocation(string Station)
{
    /// <summary>The segment whose section carries the notch; null: the smaller of the two segments meeting at the station.</summary>
    public string? Segment { get; init; }
    /// <summary>A feature whose first-iteration estimates fill in <see cref="Kt"/> and <see cref="Kts"/> when not given.</summary>
    public NotchFeature Feature { get; init; } = NotchFeature.None;
    /// <summary>Bending stress-concentration factor K_t.</summary>
    public double? Kt { get; init; }
    /// <summary>Torsional stress-concentration factor K_ts.</summary>
    public double? Kts { get; init; }
    /// <summary>Notch sensitivity in bending q; null: from the notch radius (Neuber, Shigley eq. 6-34) or 1.</summary>
    public double? Q { get; init; }
    /// <summary>Notch sensitivity in torsion q_s; null: from the notch radius or 1.</summary>
    public double? Qs { get; init; }
    /// <summary>Notch (fillet) radius, m; null: the feature's r/d times the diameter, or none (q = 1).</summary>
    public double? NotchRadius { get; init; }
    /// <summary>Optional display name.</summary>
    public string? Name { get; init; }
}

/// <summary>
/// Notch features with first-iteration stress-concentration estimates (Shigley 10th ed., Table 7-1, from memory).
/// </summary>
public enum NotchFeature
{
    /// <summary>No feature: give K_t and K_ts.</summary>
    None,
    /// <summary>Shoulder fillet, sharp (r/d = 0.02): K_t 2.7, K_ts 2.2.</summary>
    ShoulderSharp,
    /// <summary>Shoulder fillet, well rounded (r/d = 0.1): K_t 1.7, K_ts 1.5.</summary>
    ShoulderRounded,
    /// <summary>End-mill keyseat (r/d = 0.02): K_t 2.14, K_ts 3.0.</summary>
    KeyseatEndMill,
    /// <summary>Retaining-ring groove: K_t 5.0, K_ts 3.0.</summary>
    RetainingRingGroove,
}
