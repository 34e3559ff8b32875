namespace SectionTwist.Dynamics;

/// <summary>A harmonic torque T(t) = amplitude cos(omega t) applied at a station (in the station's own rotation).</summary>
/// <param name="Station">Where it acts; the station must carry inertia (a lumped one or a segment's).</param>
/// <param name="Amplitude">Torque amplitude, N*m, positive.</param>
/// <param name="AngularFrequency">omega, rad/s, positive.</param>
public sealed record HarmonicTorque(string Station, double Amplitude, double AngularFrequency)
{
    /// <summary>Optional display name.</summary>
    public string? Name { get; init; }
}

/// <summary>The steady alternating response of a part to a <see cref="HarmonicTorque"/>.</summary>
/// <param name="Kind">Segment, spring or mesh.</param>
/// <param name="Name">Display name.</param>
/// <param name="Shaft">Its shaft.</param>
/// <param name="TorqueAmplitude">Amplitude of the alternating torque, N*m (largest along a segment; a mesh referred to the driving side).</param>
/// <param name="ShearAmplitude">Amplitude of the alternating peak shear stress, Pa (segments only; a taper uses its smaller end); null otherwise.</param>
public sealed record PartResponse(TrainPartKind Kind, string Name, string Shaft, double TorqueAmplitude, double? ShearAmplitude);

/// <summary>The result of <see cref="ForcedResponse.Compute"/>.</summary>
public sealed record ForcedResponseResult
{
    /// <summary>The applied torque.</summary>
    public required HarmonicTorque Load { get; init; }
    /// <summary>The modal damping ratio used for every elastic mode.</summary>
    public required double DampingRatio { get; init; }
    /// <summary>Alternating torque and shear of every segment, spring and elastic mesh.</summary>
    public required IReadOnlyList<PartResponse> Parts { get; init; }
    /// <summary>Rotation amplitude of every station (own rotation), rad.</summary>
    public required IReadOnlyList<double> StationAmplitudes { get; init; }
    /// <summary>Number of modes superposed (all of the discretised train).</summary>
    public required int ModesUsed { get; init; }
}
