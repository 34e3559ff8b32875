using SectionTwist.Fatigue;
using SectionTwist.Keys;

namespace SectionTwist.Bending;

/// <summary>
/// The transverse side of a shaft: bearings, transverse and axial loads, self-weight and the options of the beam solution
/// and the strength checks. Referenced from <see cref="Shaft.ShaftModel.Bending"/>; all values SI (m, N, rad).
/// </summary>
/// <remarks>
/// Axes: x along the shaft from the first station to the last, Y and Z transverse so that (x, Y, Z) is right-handed. Looking
/// back from the last station toward the first, Y points right and Z up; a section's profile x is Y and its profile y is Z.
/// Directions in the transverse plane are angles from +Y toward +Z.
/// </remarks>
public sealed record BendingModel
{
    /// <summary>Bearings (at least two simple supports, or one moment-restraining; any number: indeterminate shafts are solved).</summary>
    public required IReadOnlyList<Bearing> Bearings { get; init; }
    /// <summary>Transverse and axial loads.</summary>
    public IReadOnlyList<TransverseLoad> Loads { get; init; } = [];
    /// <summary>Adds the shaft's own weight from the segment materials' densities.</summary>
    public bool SelfWeight { get; init; }
    /// <summary>Direction of gravity in the transverse plane, rad from +Y toward +Z (default -pi/2: along -Z, "down").</summary>
    public double GravityDirection { get; init; } = -Math.PI / 2;
    /// <summary>Standard gravity, m/s^2 (ISO 80000-3: 9.80665).</summary>
    public double Gravity { get; init; } = 9.80665;
    /// <summary>Adds shear deformation (Timoshenko beam) to the deflections.</summary>
    public bool ShearDeformation { get; init; }
    /// <summary>Allowed slope at the bearings, rad; null for no check. A bearing's own limit overrides it.</summary>
    public double? SlopeLimit { get; init; }
    /// <summary>
    /// True (default): the shaft turns under loads fixed in space, so each boundary point meets the bending moment at every
    /// angle; the combined and fatigue checks take each point at its worst alignment. False: the sections stand as drawn.
    /// </summary>
    public bool Rotating { get; init; } = true;
    /// <summary>Fatigue check settings, or null for no fatigue check.</summary>
    public FatigueSettings? Fatigue { get; init; }
    /// <summary>Parallel keys and splines to check.</summary>
    public IReadOnlyList<ConnectionCheck> Connections { get; init; } = [];
}

/// <summary>A bearing: a simple support (deflection held) at a station, optionally restraining the slope too.</summary>
/// <param name="Station">The station.</param>
public sealed record Bearing(string Station)
{
    /// <summary>Also holds the slope (a wide or paired bearing acting as a clamp).</summary>
    public bool Clamped { get; init; }
    /// <summary>Takes the axial force (at most one bearing).</summary>
    public bool TakesThrust { get; init; }
    /// <summary>Allowed slope at this bearing, rad; null: the model's limit.</summary>
    public double? SlopeLimit { get; init; }
    /// <summary>Optional display name.</summary>
    public string? Name { get; init; }
    /// <summary>The display name.</summary>
    public string Label => Name ?? Station;
}
