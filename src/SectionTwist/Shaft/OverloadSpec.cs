namespace SectionTwist.Shaft;

/// <summary>
/// The overload checks of a shaft (<see cref="ShaftModel.Overload"/>): each case's torque times <see cref="Factor"/> must not
/// exceed the fully plastic torque T_p of the segment's section (ideal plasticity; the factor is the user's, taken from the
/// applicable code; SectionTwist states no code value).
/// </summary>
public sealed record OverloadSpec
{
    /// <summary>The overload cases.</summary>
    public required IReadOnlyList<OverloadCase> Cases { get; init; }

    /// <summary>Required ratio T_p / overload torque, at least 1; default 1 (no margin beyond the fully plastic state).</summary>
    public double Factor { get; init; } = 1;
}
