namespace SectionTwist.Dynamics;

/// <summary>
/// One natural mode of the train. Rotations are normalised so that the largest station rotation referred to the reference
/// shaft is 1 (positive); they are shapes, not amplitudes.
/// </summary>
public sealed record TorsionalMode
{
    /// <summary>1 for the lowest mode (rigid-body modes first).</summary>
    public required int Number { get; init; }
    /// <summary>True for a rigid-body mode of a chain not held by any fixed station (frequency zero to round-off).</summary>
    public required bool IsRigidBody { get; init; }
    /// <summary>Eigenvalue omega^2, rad^2/s^2, as computed (near zero, possibly slightly negative, for rigid-body modes).</summary>
    public required double Eigenvalue { get; init; }
    /// <summary>Natural angular frequency omega, rad/s (0 for rigid-body modes).</summary>
    public double AngularFrequency => IsRigidBody ? 0 : Math.Sqrt(Math.Max(Eigenvalue, 0));
    /// <summary>Natural frequency, Hz.</summary>
    public double Frequency => AngularFrequency / (2 * Math.PI);
    /// <summary>Natural frequency in cycles per minute (the reference-shaft speed in rpm at which a 1x excitation would meet it).</summary>
    public double CyclesPerMinute => Frequency * 60;
    /// <summary>Estimated relative discretisation error of <see cref="Frequency"/>.</summary>
    public required double EstimatedError { get; init; }
    /// <summary>Rotation of every station.</summary>
    public required IReadOnlyList<ModeStation> Stations { get; init; }
    /// <summary>Twist and strain-energy share of every segment, spring and stage mesh.</summary>
    public required IReadOnlyList<ModePart> Parts { get; init; }

    /// <summary>The full shape (stations then inner nodes), M-normalised, for the forced response.</summary>
    internal double[] Shape { get; init; } = [];
}

/// <summary>A station's rotation in a mode.</summary>
/// <param name="Station">Station name.</param>
/// <param name="Shaft">Its shaft.</param>
/// <param name="Rotation">Rotation in the station's own shaft (at its own speed).</param>
/// <param name="ReferredRotation">Rotation referred to the reference shaft: own rotation divided by the station's speed ratio.</param>
public sealed record ModeStation(string Station, string Shaft, double Rotation, double ReferredRotation);

/// <summary>A segment, spring or stage mesh in a mode.</summary>
/// <param name="Kind">Segment, spring or mesh.</param>
/// <param name="Name">Display name.</param>
/// <param name="Shaft">The shaft it belongs to (the driving shaft for a mesh).</param>
/// <param name="Twist">Twist: rotation of the 'to' (or second) station minus that of the 'from' station, own rotations; for a
/// mesh, the driving rotation minus the driven rotation referred to the driving side.</param>
/// <param name="EnergyShare">Share of the mode's strain energy stored in it, 0..1 (all shares add up to 1).</param>
public sealed record ModePart(TrainPartKind Kind, string Name, string Shaft, double Twist, double EnergyShare);
