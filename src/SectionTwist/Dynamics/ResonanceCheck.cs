namespace SectionTwist.Dynamics;

/// <summary>How close a natural frequency comes to an excitation over the operating range.</summary>
public enum CrossingStatus
{
    /// <summary>The excitation meets the natural frequency inside the operating range: resonance in operation.</summary>
    Resonance,
    /// <summary>The crossing lies outside the range but within the inner band.</summary>
    Avoid,
    /// <summary>Within the outer band: check with damping and forced response, or move it.</summary>
    Check,
    /// <summary>Separated by at least the outer band.</summary>
    Clear,
}

/// <summary>One natural frequency against one excitation order (an interference-diagram crossing).</summary>
/// <param name="Mode">Mode number.</param>
/// <param name="Frequency">Natural frequency, Hz.</param>
/// <param name="Excitation">Excitation name.</param>
/// <param name="Order">Cycles per revolution of <paramref name="OrderShaft"/>.</param>
/// <param name="OrderShaft">The shaft the order counts.</param>
/// <param name="CrossingSpeed">Speed of the range's shaft at which the excitation frequency equals the natural frequency, rad/s.</param>
/// <param name="Margin">Separation: 0 inside the range; (minimum - speed) / minimum below it; (speed - maximum) / maximum above it.</param>
/// <param name="Status">The verdict against the two bands.</param>
public sealed record ResonanceCrossing(int Mode, double Frequency, string Excitation, double Order, string OrderShaft, double CrossingSpeed, double Margin, CrossingStatus Status);

/// <summary>The result of <see cref="ResonanceCheck.Evaluate"/>.</summary>
public sealed record ResonanceResult
{
    /// <summary>The check that was made.</summary>
    public required ExcitationSpec Spec { get; init; }
    /// <summary>Every elastic mode against every order, lowest mode first.</summary>
    public required IReadOnlyList<ResonanceCrossing> Crossings { get; init; }
    /// <summary>The crossing with the smallest margin, or null when there are no elastic modes.</summary>
    public ResonanceCrossing? Closest => Crossings.OrderBy(c => c.Margin).FirstOrDefault();
    /// <summary>True when any crossing is not <see cref="CrossingStatus.Clear"/>.</summary>
    public bool AnyConcern => Crossings.Any(c => c.Status != CrossingStatus.Clear);
}

/// <summary>
/// Interference (Campbell) check: an excitation of order o of a shaft turning at n (rad/s) has the frequency o n / (2 pi) Hz;
/// it meets a natural frequency f at n* = 2 pi f / o. Every elastic mode is checked against every order: inside the range is a
/// resonance, otherwise the separation margin is measured to the nearer end of the range (common practice, no code value).
/// Only the listed modes are checked: list enough modes to pass the highest excitation frequency.
/// </summary>
public static class ResonanceCheck
{
    /// <summary>Checks the modes of <paramref name="modes"/> against <paramref name="spec"/>.</summary>
    public static ResonanceResult Evaluate(ModalResult modes, ExcitationSpec spec)
    {
        ArgumentNullException.ThrowIfNull(modes);
        ArgumentNullException.ThrowIfNull(spec);
        var r = spec.Range;
        if (!(r.Minimum >= 0) || !(r.Maximum >= r.Minimum) || !(r.Maximum > 0) || !double.IsFinite(r.Maximum))
            throw new SectionTwistException("bad-excitation", $"speed range {r.Minimum:G4}..{r.Maximum:G4} rad/s: needs 0 <= minimum <= maximum and maximum > 0");
        if (!(spec.InnerBand >= 0 && spec.OuterBand >= spec.InnerBand && spec.OuterBand < 10))
            throw new SectionTwistException("bad-excitation", $"separation bands {spec.InnerBand:P0} and {spec.OuterBand:P0}: need 0 <= inner <= outer");
        double rangeRatio = ShaftRatio(modes, r.Shaft, "the speed range");
        var list = new List<ResonanceCrossing>();
        foreach (var mode in modes.ElasticModes)
        {
            foreach (var o in spec.Orders)
            {
                if (!(o.Order > 0) || !double.IsFinite(o.Order))
                    throw new SectionTwistException("bad-excitation", $"excitation '{o.Name}': order {o.Order} must be positive");
                double orderRatio = ShaftRatio(modes, o.Shaft, $"excitation '{o.Name}'");
                // reference speed at which o * |r_order| * n_ref = omega; then the range shaft's speed
                double nRef = mode.AngularFrequency / (o.Order * orderRatio);
                double n = nRef * rangeRatio;
                double margin = n < r.Minimum ? (r.Minimum - n) / r.Minimum : n > r.Maximum ? (n - r.Maximum) / r.Maximum : 0;
                var status = n >= r.Minimum && n <= r.Maximum ? CrossingStatus.Resonance
                    : margin < spec.InnerBand ? CrossingStatus.Avoid
                    : margin < spec.OuterBand ? CrossingStatus.Check : CrossingStatus.Clear;
                list.Add(new ResonanceCrossing(mode.Number, mode.Frequency, o.Name, o.Order, o.Shaft, n, margin, status));
            }
        }
        return new ResonanceResult { Spec = spec, Crossings = list };
    }

    /// <summary>|speed of the shaft / speed of the reference shaft|.</summary>
    internal static double ShaftRatio(ModalResult modes, string shaft, string what)
    {
        var st = modes.Stations.FirstOrDefault(s => s.Shaft == shaft)
            ?? throw new SectionTwistException("bad-excitation", $"{what}: no shaft named '{shaft}' (shafts: {string.Join(", ", modes.Stations.Select(s => s.Shaft).Distinct())})");
        return Math.Abs(st.SpeedRatio);
    }
}
