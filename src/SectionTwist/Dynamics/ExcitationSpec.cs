namespace SectionTwist.Dynamics;

/// <summary>An excitation at a fixed number of cycles per revolution of a shaft (1x running speed, 2x, gear mesh = teeth).</summary>
/// <param name="Name">Display name, e.g. <c>stage 1 mesh</c>.</param>
/// <param name="Shaft">The shaft whose revolutions it counts.</param>
/// <param name="Order">Cycles per revolution of that shaft, positive (need not be whole).</param>
public sealed record ExcitationOrder(string Name, string Shaft, double Order);

/// <summary>The operating speed range of a shaft, rad/s (non-negative, minimum &lt;= maximum).</summary>
/// <param name="Shaft">The shaft whose speed is given.</param>
/// <param name="Minimum">Lowest operating speed, rad/s.</param>
/// <param name="Maximum">Highest operating speed, rad/s.</param>
public sealed record SpeedRange(string Shaft, double Minimum, double Maximum);

/// <summary>
/// What <see cref="ResonanceCheck.Evaluate"/> checks: the speed range, the excitation orders and the two separation bands.
/// The default bands, 10 % and 20 % of the operating speed, are common practice, not a code value: use the limits of the
/// applicable code or of the drive supplier where there are any.
/// </summary>
public sealed record ExcitationSpec
{
    /// <summary>The operating speed range.</summary>
    public required SpeedRange Range { get; init; }
    /// <summary>The excitation orders.</summary>
    public required IReadOnlyList<ExcitationOrder> Orders { get; init; }
    /// <summary>Inner band: a crossing closer than this to the range is flagged "avoid". Default 0.10.</summary>
    public double InnerBand { get; init; } = 0.10;
    /// <summary>Outer band: a crossing closer than this is flagged "check"; beyond it, "clear". Default 0.20.</summary>
    public double OuterBand { get; init; } = 0.20;
}
