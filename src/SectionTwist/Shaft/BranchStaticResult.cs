namespace SectionTwist.Shaft;

/// <summary>
/// The static torsion of one further shaft of a geared train (<see cref="GearedShaftSolver"/>): the shaft solved at its own
/// speed with the torque its stage passes to it. Values SI, signs about that shaft's own axis (first station to last).
/// </summary>
public sealed record BranchStaticResult
{
    /// <summary>The shaft's name.</summary>
    public required string Shaft { get; init; }
    /// <summary>The stage that joins it to the shaft nearer the file's own shaft.</summary>
    public required string Stage { get; init; }
    /// <summary>The stage's station on this shaft.</summary>
    public required string Station { get; init; }
    /// <summary>The shaft it is joined to (nearer the file's own shaft).</summary>
    public required string Parent { get; init; }
    /// <summary>Speed of this shaft / speed of the file's own shaft, signed (external gears reverse the sense).</summary>
    public required double SpeedRatio { get; init; }
    /// <summary>Torque the stage applies to this shaft at <see cref="Station"/>, N*m.</summary>
    public required double StageTorque { get; init; }
    /// <summary>
    /// True when the stage torque follows from this shaft's own loads (the shaft has no support, so its loads are balanced
    /// by the stage); false when it is the torque written at the stage's station on the parent shaft (this shaft has
    /// supports, which react it).
    /// </summary>
    public required bool TorqueFromOwnLoads { get; init; }
    /// <summary>The shaft's solution (stations, segments, reactions; rotations relative to its own reference station).</summary>
    public required ShaftResult Result { get; init; }
}
