namespace SectionTwist.Shaft;

/// <summary>
/// One overload of a shaft file's <c>overload</c> block (docs/shaft-file.md, "Overload"): a torque the shaft must carry
/// without collapse (motor stall, brake slip, a jammed drum), checked against the fully plastic torque of each segment's
/// section. Exactly one of <see cref="Scale"/> and <see cref="Torque"/> is set.
/// </summary>
/// <param name="Name">Display name, e.g. <c>motor stall</c>.</param>
public sealed record OverloadCase(string Name)
{
    /// <summary>Multiple of the solved load case: each segment's largest internal torque times this (e.g. stall / rated torque).</summary>
    public double? Scale { get; init; }

    /// <summary>A torque, N*m, taken to pass through every listed segment (all segments when <see cref="Segments"/> is empty).</summary>
    public double? Torque { get; init; }

    /// <summary>Segment labels the case applies to; empty for every segment.</summary>
    public IReadOnlyList<string> Segments { get; init; } = [];
}
