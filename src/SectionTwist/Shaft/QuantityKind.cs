namespace SectionTwist.Shaft;

/// <summary>The physical kind of a value in the shaft file; decides which units it accepts.</summary>
internal enum QuantityKind
{
    Length,
    Torque,
    Stress,
    Modulus,
    Volume,
    Power,
    Speed,
    TorquePerLength,
    RotationalStiffness,
    AreaMoment,
    ShearPerTorque,
    TwistRate,
    Density,
    Number,
    Force,
    Angle,
    /// <summary>Warping spring: bimoment per rate of twist (N*m^2 per rad/m = N*m^3).</summary>
    WarpingStiffness,
}
