namespace SectionTwist.Shaft;

/// <summary>The static torsion of a shaft file with further shafts joined by gear or belt stages (<see cref="GearedShaftSolver"/>).</summary>
public sealed record GearedShaftResult
{
    /// <summary>The file's own shaft, with the torques of unsupported further shafts referred to its stage stations.</summary>
    public required ShaftResult Main { get; init; }
    /// <summary>The further shafts in the order they are reached from the file's own shaft.</summary>
    public required IReadOnlyList<BranchStaticResult> Branches { get; init; }
    /// <summary>Warnings about the stages (a stage that passes no torque); each names the stage and the shaft.</summary>
    public IReadOnlyList<Torsion.AnalysisWarning> Warnings { get; init; } = [];
}
