namespace SectionTwist.Bending;

/// <summary>A load on the shaft at a station, other than a torque (see <see cref="BendingModel"/> for the axes).</summary>
public abstract record TransverseLoad(string Station)
{
    /// <summary>Optional text for tables.</summary>
    public string? Description { get; init; }
}

/// <summary>A force given by its components.</summary>
/// <param name="Station">The station.</param>
/// <param name="ForceY">Component along Y, N.</param>
/// <param name="ForceZ">Component along Z, N.</param>
/// <param name="AxialForce">Component along the axis, N (toward the last station positive).</param>
public sealed record PointForce(string Station, double ForceY, double ForceZ, double AxialForce = 0) : TransverseLoad(Station)
{
    /// <summary>A transverse force of magnitude <paramref name="magnitude"/> (N) in direction <paramref name="direction"/> (rad from +Y toward +Z).</summary>
    public static PointForce Polar(string station, double magnitude, double direction) =>
        new(station, magnitude * PlaneDirection.Of(direction).Cos, magnitude * PlaneDirection.Of(direction).Sin);
}

/// <summary>
/// The mesh force of a spur or helical gear at a station, from the torque applied there in the torsion model (Budynas and
/// Nisbett, Shigley's Mechanical Engineering Design, 10th ed., sec. 13-14 and 13-17, from memory): tangential W_t = |T| / r,
/// radial W_r = W_t tan(phi_n) / cos(psi), axial W_a = W_t tan(psi). The tangential force has the sense that gives the applied
/// torque, the radial force points to the shaft axis, and the axial force acts at the pitch radius (so it bends the shaft too).
/// </summary>
/// <param name="Station">The station.</param>
/// <param name="PitchDiameter">Pitch diameter, m.</param>
/// <param name="PressureAngle">Normal pressure angle phi_n, rad (20 deg usual).</param>
/// <param name="HelixAngle">Helix angle psi, rad (0 for spur); its sign sets the thrust: positive gives thrust toward +x for a positive applied torque.</param>
/// <param name="MeshAngle">Where the mating gear touches, rad from +Y toward +Z.</param>
public sealed record GearMesh(string Station, double PitchDiameter, double PressureAngle, double HelixAngle, double MeshAngle) : TransverseLoad(Station);

/// <summary>
/// The pull of a belt or chain at a station, from the torque applied there: F = factor |T| / r along <see cref="Direction"/>.
/// A chain pulls with factor 1 (slack side unloaded); for belts give the ratio (F1 + F2) / (F1 - F2) of your belt.
/// </summary>
/// <param name="Station">The station.</param>
/// <param name="Diameter">Pitch diameter of the pulley or sprocket, m.</param>
/// <param name="Direction">Direction of the pull on the shaft, rad from +Y toward +Z.</param>
/// <param name="Factor">(F1 + F2) / (F1 - F2), at least 1.</param>
public sealed record BeltPull(string Station, double Diameter, double Direction, double Factor = 1) : TransverseLoad(Station);
