namespace SectionTwist.Dynamics;

/// <summary>The natural frequencies and modes of a drivetrain (<see cref="ModalAnalysis.Solve"/>). SI units.</summary>
public sealed record ModalResult
{
    /// <summary>Title of the model, if any.</summary>
    public string? Title { get; init; }
    /// <summary>The shaft whose speed the others are referred to.</summary>
    public required string ReferenceShaft { get; init; }
    /// <summary>Rigid-body modes first, then the elastic modes, lowest first.</summary>
    public required IReadOnlyList<TorsionalMode> Modes { get; init; }
    /// <summary>The stations of all shafts with their speed ratio and lumped inertia.</summary>
    public required IReadOnlyList<TrainStation> Stations { get; init; }
    /// <summary>How many linear elements each segment was divided into.</summary>
    public required IReadOnlyList<SegmentMesh> Meshes { get; init; }
    /// <summary>The discretisation tolerance asked for (relative, on each listed frequency).</summary>
    public required double Tolerance { get; init; }
    /// <summary>The largest estimated relative discretisation error of the listed elastic frequencies.</summary>
    public required double EstimatedError { get; init; }
    /// <summary>Number of rigid-body modes (chains held by no fixed station).</summary>
    public required int RigidBodyModes { get; init; }
    /// <summary>Number of rotation unknowns of the final solve (after rigid stages and fixed stations are removed).</summary>
    public required int Unknowns { get; init; }
    /// <summary>Total inertia referred to the reference shaft, kg*m^2 (lumped plus the shafts' own).</summary>
    public required double ReferredInertia { get; init; }
    /// <summary>Notes on the solution (tolerance not reached, stations not linked to the reference shaft).</summary>
    public IReadOnlyList<string> Warnings { get; init; } = [];

    /// <summary>The elastic (non-rigid) modes.</summary>
    public IEnumerable<TorsionalMode> ElasticModes => Modes.Where(m => !m.IsRigidBody);

    internal TrainMatrices? Matrices { get; init; }
}

/// <summary>A station of the train.</summary>
/// <param name="Name">Station name.</param>
/// <param name="Shaft">Its shaft.</param>
/// <param name="SpeedRatio">Its speed divided by the reference shaft's speed, signed (negative: turns the other way).</param>
/// <param name="Inertia">Lumped inertia at it, kg*m^2 (its own rotation).</param>
/// <param name="IsFixed">Held against rotation.</param>
public sealed record TrainStation(string Name, string Shaft, double SpeedRatio, double Inertia, bool IsFixed);

/// <summary>The subdivision of one segment.</summary>
/// <param name="Segment">Segment name.</param>
/// <param name="Shaft">Its shaft.</param>
/// <param name="Elements">Number of two-node elements.</param>
/// <param name="WaveSpeed">Torsional wave speed sqrt(G J / (rho Ip)), m/s.</param>
public sealed record SegmentMesh(string Segment, string Shaft, int Elements, double WaveSpeed);
