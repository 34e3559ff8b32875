namespace SectionTwist.Dynamics;

/// <summary>The <c>dynamics</c> block of a shaft file: the drivetrain and what to compute for it.</summary>
public sealed record DynamicsInput
{
    /// <summary>The drivetrain: the file's shaft first, then the further shafts of the block.</summary>
    public required DrivetrainModel Drivetrain { get; init; }
    /// <summary>Mode count and tolerance.</summary>
    public ModalOptions Options { get; init; } = new();
    /// <summary>The interference check, or null when no speed range is given.</summary>
    public ExcitationSpec? Excitation { get; init; }
    /// <summary>A harmonic torque for the forced response, or null.</summary>
    public HarmonicTorque? Forcing { get; init; }
    /// <summary>Modal damping ratio for the forced response. Default 0.02 (common practice for steel drivetrains without dampers, no source).</summary>
    public double DampingRatio { get; init; } = 0.02;
}
