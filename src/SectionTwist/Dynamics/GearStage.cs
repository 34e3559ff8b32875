namespace SectionTwist.Dynamics;

/// <summary>How a stage turns the driven shaft relative to the driving one.</summary>
public enum StageKind
{
    /// <summary>External gear pair: the driven shaft turns the other way.</summary>
    External,
    /// <summary>Internal (ring) gear pair: same sense of rotation.</summary>
    Internal,
    /// <summary>Belt or chain: same sense of rotation.</summary>
    Belt,
}

/// <summary>
/// A gear pair or belt stage joining a station of one shaft (driving side) to a station of another (driven side):
/// speed of the driving station / speed of the driven station = <see cref="Ratio"/>. Rigid unless a mesh stiffness is given;
/// the gear or pulley inertias are <see cref="PointInertia"/> entries at the two stations.
/// </summary>
/// <param name="Driving">Station of the driving gear or pulley.</param>
/// <param name="Driven">Station of the driven gear or pulley.</param>
/// <param name="Ratio">Speed ratio n_driving / n_driven (= z_driven / z_driving for gears), positive.</param>
public sealed record GearStage(string Driving, string Driven, double Ratio)
{
    /// <summary>Optional display name, e.g. <c>stage 1</c>.</summary>
    public string? Name { get; init; }

    /// <summary>External gears reverse the rotation; internal gears and belts do not.</summary>
    public StageKind Kind { get; init; } = StageKind.External;

    /// <summary>
    /// Torsional mesh (or belt) stiffness referred to the driving station, N*m/rad (a linear mesh stiffness k times the
    /// square of the driving base radius); null for a rigid stage (kinematic constraint).
    /// </summary>
    public double? MeshStiffness { get; init; }

    /// <summary>Teeth on the driving gear (the gear-mesh order per revolution of the driving shaft); null when not given.</summary>
    public int? DrivingTeeth { get; init; }

    /// <summary>Teeth on the driven gear; null when not given.</summary>
    public int? DrivenTeeth { get; init; }

    /// <summary>The display name.</summary>
    public string Label => Name ?? $"{Driving}>{Driven}";

    /// <summary>Rotation of the driven station per unit rotation of the driving one: +-1 / ratio.</summary>
    public double Transmission => (Kind == StageKind.External ? -1.0 : 1.0) / Ratio;
}
