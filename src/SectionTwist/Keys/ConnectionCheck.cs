namespace SectionTwist.Keys;

/// <summary>A shaft-hub connection to check against the largest torque of its segment.</summary>
/// <param name="Segment">The segment label (its name, or <c>From-To</c>).</param>
public abstract record ConnectionCheck(string Segment)
{
    /// <summary>Allowed flank (bearing) pressure, Pa; null: no verdict, the pressure is only reported.</summary>
    public double? AllowablePressure { get; init; }
    /// <summary>Optional display name.</summary>
    public string? Name { get; init; }
}

/// <summary>
/// A parallel key: shear 2 T / (d l b) in the key and flank pressure 2 T / (d l (h - t1)) on the hub side and 2 T / (d l t1) on
/// the shaft side, the force T / (d / 2) acting at the shaft surface and spread evenly over the bearing length (Budynas and
/// Nisbett, Shigley's Mechanical Engineering Design, 10th ed., sec. 7-7; DIN 6892 method C; from memory). Two keys share the
/// torque with the load-share factor 0.75 (DIN 6892, from memory); more are not allowed.
/// </summary>
/// <param name="Segment">The segment.</param>
/// <param name="Width">Key width b, m.</param>
/// <param name="Height">Key height h, m.</param>
/// <param name="ShaftDepth">Keyseat depth in the shaft t1, m (0 &lt; t1 &lt; h).</param>
/// <param name="Length">Bearing length l, m (without rounded ends).</param>
public sealed record ParallelKey(string Segment, double Width, double Height, double ShaftDepth, double Length) : ConnectionCheck(Segment)
{
    /// <summary>Shaft diameter, m; null: the section's outer diameter.</summary>
    public double? Diameter { get; init; }
    /// <summary>Number of keys, 1 or 2.</summary>
    public int Count { get; init; } = 1;
    /// <summary>Allowed shear stress in the key, Pa; null: no verdict on shear.</summary>
    public double? AllowableShear { get; init; }
}

/// <summary>
/// A spline: mean flank pressure p = 2 T / (d_m l h z phi) with mean diameter d_m, contact height h per tooth, z teeth and the
/// load-share factor phi (0.75: about three quarters of the teeth carry, common practice for straight-sided and involute shaft
/// splines, e.g. Roloff/Matek Maschinenelemente, spline chapter, from memory).
/// </summary>
/// <param name="Segment">The segment.</param>
/// <param name="Teeth">Number of teeth z.</param>
/// <param name="MeanDiameter">d_m, m (straight-sided: (D + d) / 2; involute: the pitch diameter m z).</param>
/// <param name="ContactHeight">Carrying flank height per tooth h, m (straight-sided: (D - d) / 2 less the chamfers).</param>
/// <param name="Length">Engaged length l, m.</param>
public sealed record SplineConnection(string Segment, int Teeth, double MeanDiameter, double ContactHeight, double Length) : ConnectionCheck(Segment)
{
    /// <summary><c>straight</c> or <c>involute</c> (for the tables).</summary>
    public string Kind { get; init; } = "straight";
    /// <summary>Load-share factor phi.</summary>
    public double LoadShare { get; init; } = 0.75;
}
