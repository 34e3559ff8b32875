using SectionTwist.Dynamics;
using SectionTwist.Shaft;

namespace SectionTwist.Rendering.Report;

/// <summary>
/// Further results of a shaft file that the shaft report shows in chapters of their own (<see cref="ShaftReport.Build"/>):
/// the further shafts beyond gear stages and the drivetrain dynamics of the <c>dynamics</c> block.
/// </summary>
public sealed record ShaftReportExtras
{
    /// <summary>The static solution of all shafts of a geared file, or null.</summary>
    public GearedShaftResult? Geared { get; init; }
    /// <summary>The modal solution of the dynamics block, or null (then no dynamics chapter).</summary>
    public ModalResult? Modes { get; init; }
    /// <summary>The interference check, or null.</summary>
    public ResonanceResult? Resonance { get; init; }
    /// <summary>The forced response, or null.</summary>
    public ForcedResponseResult? Forced { get; init; }
}
