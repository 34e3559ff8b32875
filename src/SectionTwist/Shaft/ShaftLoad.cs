namespace SectionTwist.Shaft;

/// <summary>
/// An applied torque. Torques are axial vectors by the right-hand rule about the shaft axis, which runs from the first
/// station (smallest position) to the last: a positive torque turns counter-clockwise when seen looking back from the
/// last station toward the first.
/// </summary>
public abstract record ShaftLoad
{
    /// <summary>Optional text for tables, e.g. <c>motor 7.5 kW at 1450 rpm</c>.</summary>
    public string? Description { get; init; }
}

/// <summary>A torque applied at one station, N*m, signed about the axis.</summary>
/// <param name="Station">The station name.</param>
/// <param name="Torque">Torque, N*m.</param>
public sealed record PointTorque(string Station, double Torque) : ShaftLoad
{
    /// <summary>
    /// The torque a power flow exerts at a station, T = P / omega. Power delivered into the shaft (a motor, an input gear)
    /// is positive and acts in the sense of rotation; power taken off (a drum, a pump) is negative.
    /// </summary>
    /// <param name="station">The station name.</param>
    /// <param name="power">Power, W: positive into the shaft, negative taken off.</param>
    /// <param name="angularSpeed">Shaft speed, rad/s, signed about the axis (non-zero).</param>
    public static PointTorque FromPower(string station, double power, double angularSpeed) =>
        new(station, ShaftPower.Torque(power, angularSpeed));
}

/// <summary>A torque distributed uniformly along a segment, N*m per metre, signed about the axis.</summary>
/// <param name="From">One end station of the segment.</param>
/// <param name="To">The other end station of the segment.</param>
/// <param name="TorquePerLength">Intensity, N*m/m.</param>
public sealed record DistributedTorque(string From, string To, double TorquePerLength) : ShaftLoad;
